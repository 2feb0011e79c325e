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
        Reservoir.State s = r.newState();
        double[] x = s.x;
        double[] z = new double[n + 2];
        z[0] = 1;
        int since = 0;
        for (int t = 0; t < input.length; t++) {
            double u = input[t];
            if ((t & 4095) == 4095 && Thread.currentThread().isInterrupted()) {
                throw new CancellationException("reservoir run cancelled");
            }
            if (Double.isNaN(u)) {
                s.reset();
                since = 0;
                continue;
            }
            r.step(s, u);
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

    /** w · z, summed in four interleaved partial sums ((s0 + s1) + (s2 + s3)) + tail, a fixed order. */
    static double dot(double[] w, double[] z) {
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        double s3 = 0;
        int n = w.length;
        int i = 0;
        for (; i + 3 < n; i += 4) {
            s0 += w[i] * z[i];
            s1 += w[i + 1] * z[i + 1];
            s2 += w[i + 2] * z[i + 2];
            s3 += w[i + 3] * z[i + 3];
        }
        double s = (s0 + s1) + (s2 + s3);
        for (; i < n; i++) {
            s += w[i] * z[i];
        }
        return s;
    }
}
