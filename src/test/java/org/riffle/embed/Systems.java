package org.riffle.embed;

/** Test signals from well-known systems, generated here (no data files). */
final class Systems {
    private Systems() {
    }

    /** x of the Hénon map x' = 1 − a x² + y, y' = b x with a = 1.4, b = 0.3, after 1000 transient steps. */
    static double[] henonX(int n) {
        double x = 0.1;
        double y = 0;
        double[] out = new double[n];
        for (int i = -1000; i < n; i++) {
            double nx = 1 - 1.4 * x * x + y;
            y = 0.3 * x;
            x = nx;
            if (i >= 0) {
                out[i] = x;
            }
        }
        return out;
    }

    /**
     * x of the Lorenz system (σ = 10, ρ = 28, β = 8/3), classical Runge–Kutta with step 0.01, one sample
     * every {@code every} steps, after 50 time units of transient, from (1, 1, 1).
     */
    static double[] lorenzX(int n, int every) {
        double[] s = {1, 1, 1};
        double[] out = new double[n];
        int k = 0;
        for (long i = -5000L * every; k < n; i++) {
            step(s, 0.01);
            if (i >= 0 && i % every == 0) {
                out[k++] = s[0];
            }
        }
        return out;
    }

    private static void step(double[] s, double h) {
        double[] k1 = f(s);
        double[] k2 = f(add(s, k1, h / 2));
        double[] k3 = f(add(s, k2, h / 2));
        double[] k4 = f(add(s, k3, h));
        for (int d = 0; d < 3; d++) {
            s[d] += h / 6 * (k1[d] + 2 * k2[d] + 2 * k3[d] + k4[d]);
        }
    }

    private static double[] f(double[] s) {
        return new double[] {10 * (s[1] - s[0]), s[0] * (28 - s[2]) - s[1], s[0] * s[1] - 8.0 / 3 * s[2]};
    }

    private static double[] add(double[] s, double[] k, double h) {
        return new double[] {s[0] + h * k[0], s[1] + h * k[1], s[2] + h * k[2]};
    }

    /** sin(2π i / period + phase). */
    static double[] sine(int n, double period, double phase) {
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = Math.sin(2 * Math.PI * i / period + phase);
        }
        return out;
    }
}
