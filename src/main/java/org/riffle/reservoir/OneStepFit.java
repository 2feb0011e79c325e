package org.riffle.reservoir;

import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * The result of {@link OneStepTrainer}: the network chosen and trained on the whole baseline, the
 * held-out one-step errors (each step predicted by a readout that did not see its fold), and every
 * setting tried with its validation error. Immutable: the error array is copied out.
 *
 * @param esn the trained network (readout fitted on every usable baseline step)
 * @param heldOutErrors per input index t: u[t+1] minus its held-out prediction; NaN where not scored
 * @param heldOutMse mean of the squared held-out errors (normalised units²)
 * @param validationNrmse held-out RMSE divided by the standard deviation of the targets
 * @param candidates every setting tried, in grid order
 * @param searchSteps steps of the excerpt the search ran on, 0 when it ran on the whole series
 */
public record OneStepFit(Esn esn, double[] heldOutErrors, double heldOutMse, double validationNrmse,
                         List<Candidate> candidates, int searchSteps) {
    public OneStepFit {
        Objects.requireNonNull(esn, "esn");
        heldOutErrors = heldOutErrors.clone();
        candidates = List.copyOf(candidates);
    }

    @Override
    public double[] heldOutErrors() {
        return heldOutErrors.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof OneStepFit f && esn == f.esn && Arrays.equals(heldOutErrors, f.heldOutErrors)
                && candidates.equals(f.candidates);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(heldOutErrors);
    }

    /**
     * One setting of the search.
     *
     * @param radius spectral radius
     * @param leak leak rate
     * @param ridge ridge penalty per sample
     * @param washout washout used, −1 when the echo state property did not show within the limit
     * @param nrmse validation NRMSE, NaN when skipped
     */
    public record Candidate(double radius, double leak, double ridge, int washout, double nrmse) {
    }
}
