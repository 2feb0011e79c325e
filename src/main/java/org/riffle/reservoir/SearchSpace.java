package org.riffle.reservoir;

import java.util.Arrays;

/**
 * The small automatic search of {@link OneStepTrainer}: a grid of spectral radii, leak rates and ridge
 * penalties, judged on {@code folds} contiguous time blocks of the baseline (each block validated by a
 * readout fitted on the others, with a washout-long gap after the block left out of training).
 * A series longer than {@code searchRows} usable steps is searched on {@code folds} stretches spread
 * evenly over it, of searchRows / folds steps each plus the longest washout, and on every k-th of
 * their rows so that about {@code searchRows} are used (as a series of up to twice that length is); the
 * final readout is
 * fitted on every step, or every k-th of a baseline longer than {@link OneStepTrainer#FIT_ROWS} steps,
 * and the held-out errors are computed on every step.
 *
 * <p>Immutable: arrays are copied in and out.
 *
 * @param radii spectral radii to try (each &gt; 0)
 * @param leaks leak rates to try (each in (0, 1])
 * @param ridges ridge penalties per sample to try (each ≥ 0)
 * @param folds number of time-blocked folds (2 to 20)
 * @param searchRows about how many rows the search uses (≥ 100)
 * @param maxWashout longest washout accepted; a setting whose two test states have not converged to
 *     1e-9 by then lacks the echo state property on this input and is skipped
 */
public record SearchSpace(double[] radii, double[] leaks, double[] ridges, int folds, int searchRows,
                          int maxWashout) {
    public SearchSpace {
        radii = radii.clone();
        leaks = leaks.clone();
        ridges = ridges.clone();
        if (radii.length == 0 || leaks.length == 0 || ridges.length == 0) {
            throw new IllegalArgumentException("search grid needs at least one radius, leak and ridge ("
                    + radii.length + ", " + leaks.length + ", " + ridges.length + " given)");
        }
        if (folds < 2 || folds > 20) {
            throw new IllegalArgumentException("folds " + folds + " must be between 2 and 20");
        }
        if (searchRows < 100) {
            throw new IllegalArgumentException("search rows " + searchRows + " must be at least 100");
        }
        if (maxWashout < 10) {
            throw new IllegalArgumentException("maximum washout " + maxWashout + " must be at least 10");
        }
    }

    /**
     * riffle's grid: radius {0.5, 0.8, 0.95} × leak {0.2, 0.5, 1} × ridge {1e-9, 1e-7, 1e-5, 1e-3, 1e-1},
     * 4 folds, about 8000 search rows, washout at most 2000 steps.
     */
    public static SearchSpace defaults() {
        return new SearchSpace(new double[] {0.5, 0.8, 0.95}, new double[] {0.2, 0.5, 1.0},
                new double[] {1e-9, 1e-7, 1e-5, 1e-3, 1e-1}, 4, 8000, 2000);
    }

    /** A single point: no search, the given settings only (still validated on the folds). */
    public static SearchSpace fixed(EsnParams p, int folds) {
        return new SearchSpace(new double[] {p.spectralRadius()}, new double[] {p.leak()},
                new double[] {p.ridge()}, folds, Integer.MAX_VALUE, 2000);
    }

    @Override
    public double[] radii() {
        return radii.clone();
    }

    @Override
    public double[] leaks() {
        return leaks.clone();
    }

    @Override
    public double[] ridges() {
        return ridges.clone();
    }

    /** How the grid prints, e.g. {@code "radius {0.5, 0.8} × leak {1.0} × ridge {1.0E-6}, 4 folds"}. */
    public String describe() {
        return "radius " + list(radii) + " × leak " + list(leaks) + " × ridge " + list(ridges) + ", " + folds
                + " time-blocked folds";
    }

    private static String list(double[] v) {
        return Arrays.toString(v).replace('[', '{').replace(']', '}');
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SearchSpace s && Arrays.equals(radii, s.radii) && Arrays.equals(leaks, s.leaks)
                && Arrays.equals(ridges, s.ridges) && folds == s.folds && searchRows == s.searchRows
                && maxWashout == s.maxWashout;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(radii) * 31 + Arrays.hashCode(leaks) * 17 + Arrays.hashCode(ridges) + folds;
    }

    @Override
    public String toString() {
        return describe();
    }
}
