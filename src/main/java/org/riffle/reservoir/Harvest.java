package org.riffle.reservoir;

import java.util.concurrent.CancellationException;

/**
 * Drives a reservoir over an input series and hands every usable step to a sink as the readout row
 * z(t) = [1; u(t); x(t)]. A missing ({@code NaN}) input resets the state to zero and restarts the
 * washout: a gap is never bridged by guessing. A step is usable when at least {@code washout} steps
 * have run since the last (re)start and its target is present.
 *
 * <p>Stateless; each run allocates its own state.
 */
final class Harvest {
    /** Receives usable rows; {@code z} is reused between calls. */
    interface Sink {
        void row(int t, double[] z, double target);
    }

    private Harvest() {
    }

    /**
     * Runs {@code r} over {@code input}; {@code target[t]} is what row {@code t} should predict.
     *
     * @throws CancellationException when the thread is interrupted
     */
    static void run(Reservoir r, double[] input, double[] target, int washout, Sink sink) {
        int n = r.units();
        double[] x = new double[n];
        double[] pre = new double[n];
        double[] z = new double[n + 2];
        z[0] = 1;
        int since = 0;
        for (int t = 0; t < input.length; t++) {
            double u = input[t];
            if ((t & 4095) == 4095 && Thread.currentThread().isInterrupted()) {
                throw new CancellationException("reservoir run cancelled");
            }
            if (Double.isNaN(u)) {
                java.util.Arrays.fill(x, 0);
                since = 0;
                continue;
            }
            r.step(x, pre, u);
            since++;
            double y = target[t];
            if (since > washout && !Double.isNaN(y)) {
                z[1] = u;
                System.arraycopy(x, 0, z, 2, n);
                sink.row(t, z, y);
            }
        }
    }

    /** The one-step targets of {@code u}: target[t] = u[t + 1], the last one missing. */
    static double[] nextValues(double[] u) {
        double[] y = new double[u.length];
        for (int t = 0; t + 1 < u.length; t++) {
            y[t] = u[t + 1];
        }
        if (u.length > 0) {
            y[u.length - 1] = Double.NaN;
        }
        return y;
    }

    /** w · z. */
    static double dot(double[] w, double[] z) {
        double s = 0;
        for (int i = 0; i < w.length; i++) {
            s += w[i] * z[i];
        }
        return s;
    }
}
