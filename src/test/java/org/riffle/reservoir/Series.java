package org.riffle.reservoir;

import java.util.SplittableRandom;

/** Benchmark series of the reservoir checks, generated here from their published definitions. */
final class Series {
    private Series() {
    }

    /**
     * Mackey–Glass delay equation dx/dt = a·x(t−τ)/(1 + x(t−τ)^n) − b·x(t) (Mackey &amp; Glass 1977,
     * Science 197:287), integrated by classical Runge–Kutta with step 0.1 and the delayed value linearly
     * interpolated at half steps, constant history 1.2, the first 1000 time units discarded, sampled every
     * 1 time unit.
     */
    static double[] mackeyGlass(int samples, double tau, double a, double b, double n) {
        double dt = 0.1;
        int lag = (int) Math.round(tau / dt);
        int perSample = 10;
        int warm = 1000 * perSample;
        int steps = warm + samples * perSample;
        double[] x = new double[lag + steps + 1];
        for (int i = 0; i <= lag; i++) {
            x[i] = 1.2;
        }
        double[] out = new double[samples];
        for (int s = 0; s < steps; s++) {
            int i = lag + s;
            double d0 = x[i - lag];
            double d1 = x[i - lag + 1];
            double dh = 0.5 * (d0 + d1);
            double k1 = mg(x[i], d0, a, b, n);
            double k2 = mg(x[i] + 0.5 * dt * k1, dh, a, b, n);
            double k3 = mg(x[i] + 0.5 * dt * k2, dh, a, b, n);
            double k4 = mg(x[i] + dt * k3, d1, a, b, n);
            x[i + 1] = x[i] + dt / 6 * (k1 + 2 * k2 + 2 * k3 + k4);
            int after = s + 1 - warm;
            if (after > 0 && after % perSample == 0) {
                out[after / perSample - 1] = x[i + 1];
            }
        }
        return out;
    }

    private static double mg(double x, double delayed, double a, double b, double n) {
        return a * delayed / (1 + Math.pow(delayed, n)) - b * x;
    }

    /**
     * NARMA-10 (Atiya &amp; Parlos 2000, IEEE Trans. Neural Netw. 11:697): inputs u(n) iid uniform on
     * [0, 0.5], y(n+1) = 0.3·y(n) + 0.05·y(n)·Σ_{i=0..9} y(n−i) + 1.5·u(n−9)·u(n) + 0.1. Returns
     * {inputs, targets} with targets[n] = y(n+1), so that row n predicts it from inputs up to n.
     */
    static double[][] narma10(int samples, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] u = new double[samples];
        double[] y = new double[samples + 1];
        for (int i = 0; i < samples; i++) {
            u[i] = 0.5 * rnd.nextDouble();
        }
        for (int t = 0; t < samples; t++) {
            double sum = 0;
            for (int i = 0; i < 10 && t - i >= 0; i++) {
                sum += y[t - i];
            }
            double u9 = t >= 9 ? u[t - 9] : 0;
            y[t + 1] = 0.3 * y[t] + 0.05 * y[t] * sum + 1.5 * u9 * u[t] + 0.1;
        }
        double[] target = new double[samples];
        System.arraycopy(y, 1, target, 0, samples);
        return new double[][] {u, target};
    }

    /**
     * NRMSE of {@code esn}'s one-step predictions of u[t + 1] for t in [from, u.length − 1), the
     * network run over the whole of {@code u}.
     */
    static double oneStepNrmse(Esn esn, double[] u, int from) {
        double[] err = esn.oneStepErrors(u);
        double[] target = new double[u.length];
        double[] predicted = new double[u.length];
        for (int t = from; t < u.length - 1; t++) {
            target[t] = u[t + 1];
            predicted[t] = u[t + 1] - err[t];
        }
        return nrmse(target, predicted, from, u.length - 1);
    }

    /** Root-mean-square of a − b over [from, to) divided by the standard deviation of a there. */
    static double nrmse(double[] a, double[] b, int from, int to) {
        double mean = 0;
        for (int i = from; i < to; i++) {
            mean += a[i];
        }
        mean /= to - from;
        double var = 0;
        double se = 0;
        for (int i = from; i < to; i++) {
            var += (a[i] - mean) * (a[i] - mean);
            se += (a[i] - b[i]) * (a[i] - b[i]);
        }
        return Math.sqrt(se / var);
    }

    /** (x − mean) / std with the statistics of x[0, n). */
    static double[] normalise(double[] x, int n) {
        double mean = 0;
        for (int i = 0; i < n; i++) {
            mean += x[i];
        }
        mean /= n;
        double var = 0;
        for (int i = 0; i < n; i++) {
            var += (x[i] - mean) * (x[i] - mean);
        }
        double std = Math.sqrt(var / (n - 1));
        double[] out = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            out[i] = (x[i] - mean) / std;
        }
        return out;
    }
}
