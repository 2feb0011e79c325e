package org.riffle.reservoir;

import java.util.Arrays;

/**
 * A trained echo state network: a {@link Reservoir}, its washout and its readout weights
 * W_out = (w₀ bias, w₁ input, w₂… states), fitted by ridge regression in closed form on the harvested
 * rows [1; u(t); x(t)] ({@link Gram}: penalty λ per training sample on every coefficient except the
 * bias). Steps within the washout after the start or after a missing input are neither trained on nor
 * predicted.
 *
 * <p>Immutable and thread-safe.
 */
public final class Esn {
    private final Reservoir reservoir;
    private final double[] weights;
    private final int washout;

    private Esn(Reservoir reservoir, double[] weights, int washout) {
        if (weights.length != reservoir.units() + 2) {
            throw new IllegalArgumentException(weights.length + " readout weights for " + reservoir.units()
                    + " units: need units + 2");
        }
        if (washout < 0) {
            throw new IllegalArgumentException("washout " + washout + " is negative");
        }
        this.reservoir = reservoir;
        this.weights = weights.clone();
        this.washout = washout;
    }

    /** Restores a network from its reservoir, its readout weights (copied) and washout. */
    public static Esn of(Reservoir reservoir, double[] weights, int washout) {
        return new Esn(reservoir, weights, washout);
    }

    /**
     * Fits the readout so that row t predicts {@code target[t]} from the state after {@code input[t]},
     * with the ridge penalty of the reservoir's parameters.
     *
     * @throws IllegalArgumentException when the arrays differ in length or no row is usable
     */
    public static Esn fit(Reservoir reservoir, double[] input, double[] target, int washout) {
        if (input.length != target.length) {
            throw new IllegalArgumentException("input has " + input.length + " samples, target " + target.length);
        }
        Gram gram = new Gram(reservoir.units() + 2);
        Harvest.run(reservoir, input, target, washout, (t, z, y) -> gram.add(z, y));
        gram.flush();
        if (gram.count == 0) {
            throw new IllegalArgumentException("no usable rows: " + input.length + " samples, washout " + washout);
        }
        return new Esn(reservoir, gram.solve(reservoir.params().ridge()), washout);
    }

    /** The outputs for {@code input}: element t from the state after input t; NaN where not usable. */
    public double[] predict(double[] input) {
        double[] out = new double[input.length];
        Arrays.fill(out, Double.NaN);
        double[] any = new double[input.length];
        Harvest.run(reservoir, input, any, washout, (t, z, y) -> out[t] = Harvest.dot(weights, z));
        return out;
    }

    /**
     * One-step prediction errors on {@code u}: element t is u[t+1] − (prediction from the state after
     * u[t]); NaN where either is missing or within the washout.
     */
    public double[] oneStepErrors(double[] u) {
        double[] err = new double[u.length];
        Arrays.fill(err, Double.NaN);
        Harvest.run(reservoir, u, Harvest.nextValues(u), washout,
                (t, z, y) -> err[t] = y - Harvest.dot(weights, z));
        return err;
    }

    public Reservoir reservoir() {
        return reservoir;
    }

    /** A copy of the readout weights (bias, input, states). */
    public double[] weights() {
        return weights.clone();
    }

    public int washout() {
        return washout;
    }
}
