package org.riffle.reservoir;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;

/** The closed-form ridge readout and the fold arithmetic against slow, obvious oracles. */
class GramTest {
    @Test
    void ridgeMatchesAugmentedLeastSquaresByCommonsMathQr() {
        // analytic: min (1/n)|y - Zw|^2 + lambda·sum_{j>=1} w_j^2 is the least-squares solution of
        // [Z; sqrt(n·lambda)·E] w = [y; 0] with E the rows e_1..e_{d-1} (bias e_0 unpenalised); solved by
        // Commons Math 3.6.1 QRDecomposition. Tolerance 1e-9: both well conditioned here (lambda >= 1e-6).
        SplittableRandom rnd = new SplittableRandom(5);
        int n = 300;
        int d = 12;
        for (double lambda : new double[] {1e-6, 1e-3, 0.5}) {
            Gram g = new Gram(d);
            double[][] aug = new double[n + d - 1][d];
            double[] rhs = new double[n + d - 1];
            for (int t = 0; t < n; t++) {
                double[] z = new double[d];
                z[0] = 1;
                for (int j = 1; j < d; j++) {
                    z[j] = rnd.nextGaussian();
                }
                double y = 0.3 + 2 * z[1] - z[5] + 0.1 * rnd.nextGaussian();
                g.add(z, y);
                aug[t] = z;
                rhs[t] = y;
            }
            for (int j = 1; j < d; j++) {
                aug[n + j - 1][j] = Math.sqrt(n * lambda);
            }
            RealVector ref = new QRDecomposition(new Array2DRowRealMatrix(aug)).getSolver()
                    .solve(new ArrayRealVector(rhs));
            double[] w = g.solve(lambda);
            double sse = 0;
            for (int t = 0; t < n; t++) {
                double e = rhs[t] - Harvest.dot(w, aug[t]);
                sse += e * e;
            }
            for (int j = 0; j < d; j++) {
                Close.within(ref.getEntry(j), w[j], 1e-9, "w[" + j + "] at lambda " + lambda);
            }
            Close.within(sse, g.sse(w), 1e-9 * sse, "SSE from sums at lambda " + lambda);
        }
    }

    @Test
    void blockedValidationErrorMatchesARefitPerFold() {
        // oracle: refit each fold's readout from its own rows (all rows outside the fold, minus the
        // washout-long gap after it) and sum the squared errors directly
        SplittableRandom rnd = new SplittableRandom(9);
        double[] u = new double[1500];
        for (int t = 0; t < u.length; t++) {
            u[t] = Math.sin(0.3 * t) + 0.2 * rnd.nextGaussian();
        }
        u[700] = Double.NaN;
        double[] y = Harvest.nextValues(u);
        Reservoir r = Reservoir.build(EsnParams.defaults().withUnits(20).withConnections(4));
        int washout = 30;
        int k = 4;
        Folds folds = Folds.harvest(r, u, y, washout, k, 1);
        List<double[]> rows = new ArrayList<>();
        List<Integer> times = new ArrayList<>();
        List<Double> targets = new ArrayList<>();
        Harvest.run(r, u, y, washout, (t, z, target) -> {
            rows.add(z.clone());
            times.add(t);
            targets.add(target);
        });
        double lambda = 1e-4;
        double sse = 0;
        int count = 0;
        for (int fold = 0; fold < k; fold++) {
            int nextStart = (int) Math.ceil((fold + 1) * u.length / (double) k);
            Gram train = new Gram(22);
            for (int i = 0; i < rows.size(); i++) {
                int t = times.get(i);
                int f = (int) ((long) t * k / u.length);
                boolean gap = f == fold + 1 && t - nextStart < washout;
                if (f != fold && !gap) {
                    train.add(rows.get(i), targets.get(i));
                }
            }
            double[] w = train.solve(lambda);
            for (int i = 0; i < rows.size(); i++) {
                if ((int) ((long) times.get(i) * k / u.length) == fold) {
                    double e = targets.get(i) - Harvest.dot(w, rows.get(i));
                    sse += e * e;
                    count++;
                }
            }
        }
        Close.within(sse / count, folds.validationMse(lambda), 1e-9 * sse / count, "blocked validation MSE");
    }
}
