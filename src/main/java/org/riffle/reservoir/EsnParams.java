package org.riffle.reservoir;

/**
 * The settings of one leaky echo state network (Jaeger 2001, GMD Report 148; Lukoševičius 2012,
 * "A practical guide to applying echo state networks"), one input, one output:
 * <pre>
 *   x(n) = (1 − α)·x(n−1) + α·tanh(W_in·[1; u(n)] + W·x(n−1))
 *   y(n) = W_out·[1; u(n); x(n)]
 * </pre>
 * {@code W} is sparse ({@code connections} non-zero entries per row, values uniform in [−1, 1], columns
 * drawn without repetition) and rescaled so that its spectral radius is exactly {@code spectralRadius};
 * {@code W_in}'s input column is uniform in ±{@code inputScaling}, its bias column uniform in
 * ±{@code biasScaling}. {@code W_out} is fitted by ridge regression with penalty {@code ridge} per
 * training sample on every coefficient but the bias (see {@link Esn}). All draws come from
 * {@code seed}. Inputs are dimensionless (normalised by the caller).
 *
 * <p>Immutable.
 *
 * @param units reservoir size N (2 to 2000)
 * @param connections non-zero recurrent weights per unit (1 to N)
 * @param spectralRadius target spectral radius of W (&gt; 0)
 * @param leak leak rate α in (0, 1]
 * @param inputScaling scale of the input weights (≥ 0)
 * @param biasScaling scale of the bias weights (≥ 0)
 * @param ridge ridge penalty λ per training sample (≥ 0)
 * @param seed seed of every random draw
 */
public record EsnParams(int units, int connections, double spectralRadius, double leak, double inputScaling,
                        double biasScaling, double ridge, long seed) {
    /** The seed used unless another is asked for. */
    public static final long DEFAULT_SEED = 20_261_201L;

    public EsnParams {
        if (units < 2 || units > 2000) {
            throw new IllegalArgumentException("reservoir units " + units + " must be between 2 and 2000");
        }
        if (connections < 1 || connections > units) {
            throw new IllegalArgumentException("connections per unit " + connections + " must be between 1 and "
                    + units + " units");
        }
        if (!(spectralRadius > 0) || Double.isInfinite(spectralRadius)) {
            throw new IllegalArgumentException("spectral radius " + spectralRadius + " must be positive and finite");
        }
        if (!(leak > 0 && leak <= 1)) {
            throw new IllegalArgumentException("leak rate " + leak + " must be in (0, 1]");
        }
        if (!(inputScaling >= 0) || Double.isInfinite(inputScaling)) {
            throw new IllegalArgumentException("input scaling " + inputScaling + " must be finite and not negative");
        }
        if (!(biasScaling >= 0) || Double.isInfinite(biasScaling)) {
            throw new IllegalArgumentException("bias scaling " + biasScaling + " must be finite and not negative");
        }
        if (!(ridge >= 0) || Double.isInfinite(ridge)) {
            throw new IllegalArgumentException("ridge penalty " + ridge + " must be finite and not negative");
        }
    }

    /** riffle's defaults: 100 units, 10 connections each, ρ 0.9, α 0.5, input 0.5, bias 0.2, λ 1e-6. */
    public static EsnParams defaults() {
        return new EsnParams(100, 10, 0.9, 0.5, 0.5, 0.2, 1e-6, DEFAULT_SEED);
    }

    public EsnParams withUnits(int n) {
        return new EsnParams(n, Math.min(connections, n), spectralRadius, leak, inputScaling, biasScaling, ridge,
                seed);
    }

    public EsnParams withConnections(int c) {
        return new EsnParams(units, c, spectralRadius, leak, inputScaling, biasScaling, ridge, seed);
    }

    public EsnParams withSpectralRadius(double rho) {
        return new EsnParams(units, connections, rho, leak, inputScaling, biasScaling, ridge, seed);
    }

    public EsnParams withLeak(double alpha) {
        return new EsnParams(units, connections, spectralRadius, alpha, inputScaling, biasScaling, ridge, seed);
    }

    public EsnParams withInputScaling(double s) {
        return new EsnParams(units, connections, spectralRadius, leak, s, biasScaling, ridge, seed);
    }

    public EsnParams withBiasScaling(double s) {
        return new EsnParams(units, connections, spectralRadius, leak, inputScaling, s, ridge, seed);
    }

    public EsnParams withRidge(double lambda) {
        return new EsnParams(units, connections, spectralRadius, leak, inputScaling, biasScaling, lambda, seed);
    }

    public EsnParams withSeed(long s) {
        return new EsnParams(units, connections, spectralRadius, leak, inputScaling, biasScaling, ridge, s);
    }

    /** True when both build the same reservoir matrix W up to its scale (same seed, size, sparsity). */
    boolean sameStructure(EsnParams o) {
        return units == o.units && connections == o.connections && seed == o.seed;
    }
}
