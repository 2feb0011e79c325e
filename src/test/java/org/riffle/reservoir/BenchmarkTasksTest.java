package org.riffle.reservoir;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;

/** The echo state network on the benchmark tasks of the literature, 200 units, fixed seeds. */
class BenchmarkTasksTest {
    @Test
    void mackeyGlassOneStepNrmseIsBelowOneThousandth() {
        // Jaeger 2001 (GMD Report 148) and Jaeger & Haas 2004 (Science 304:78) report far smaller
        // multi-step errors on Mackey–Glass (tau 17, a 0.2, b 0.1, n 10) with larger reservoirs (from
        // memory); one step ahead with 200 units, after the automatic search on the first 3000 samples,
        // NRMSE <= 1e-3 on the next 2000 is the bound for a sound implementation (measured: 4.7e-4).
        double[] s = Series.mackeyGlass(5000, 17, 0.2, 0.1, 10);
        double[] u = Series.normalise(s, 3000);
        OneStepFit fit = OneStepTrainer.train(Arrays.copyOf(u, 3000), EsnParams.defaults().withUnits(200),
                SearchSpace.defaults(), null);
        double nrmse = Series.oneStepNrmse(fit.esn(), u, 3000);
        assertTrue(nrmse <= 1e-3, "Mackey-Glass one-step NRMSE " + nrmse + " exceeds 1e-3");
        assertTrue(fit.validationNrmse() <= 1e-3, "held-out baseline NRMSE " + fit.validationNrmse());
    }

    @Test
    void narma10NrmseIsBelowPointThreeAndClearlyBeatsALinearModel() {
        // Rodan & Tiňo 2011 (IEEE Trans. Neural Netw. 22:131) report NMSE about 0.1 (NRMSE about 0.3) at
        // about 100 units (from memory); NARMA-10 as defined by Atiya & Parlos 2000. The best linear
        // model on the last 10 inputs (OLS by Commons Math 3.6.1 QR) cannot form the product
        // u(n-9)·u(n) and sits far higher (measured 0.18 vs 0.58): "clearly better" is taken as <= 0.7 x.
        double[][] d = Series.narma10(7000, 11);
        double[] u = d[0];
        double[] y = d[1];
        int trainEnd = 5000;
        EsnParams p = EsnParams.defaults().withUnits(200).withSpectralRadius(0.95).withLeak(1.0)
                .withInputScaling(0.5).withBiasScaling(0.2).withRidge(1e-8);
        Esn esn = Esn.fit(Reservoir.build(p), Arrays.copyOf(u, trainEnd), Arrays.copyOf(y, trainEnd), 200);
        double esnNrmse = Series.nrmse(y, esn.predict(u), trainEnd, u.length);
        double linearNrmse = Series.nrmse(y, linearOnLastTen(u, y, trainEnd), trainEnd, u.length);
        assertTrue(esnNrmse <= 0.3, "NARMA-10 NRMSE " + esnNrmse);
        assertTrue(esnNrmse <= 0.7 * linearNrmse, "ESN " + esnNrmse + " vs linear " + linearNrmse);
    }

    /** Least squares y(n) ~ c + Σ_{i<10} a_i·u(n−i) on [9, trainEnd), predictions everywhere from 9. */
    private static double[] linearOnLastTen(double[] u, double[] y, int trainEnd) {
        double[][] rows = new double[trainEnd - 9][11];
        double[] rhs = new double[trainEnd - 9];
        for (int t = 9; t < trainEnd; t++) {
            rows[t - 9] = lagRow(u, t);
            rhs[t - 9] = y[t];
        }
        RealVector w = new QRDecomposition(new Array2DRowRealMatrix(rows)).getSolver()
                .solve(new ArrayRealVector(rhs));
        double[] out = new double[u.length];
        for (int t = 9; t < u.length; t++) {
            out[t] = w.dotProduct(new ArrayRealVector(lagRow(u, t)));
        }
        return out;
    }

    private static double[] lagRow(double[] u, int t) {
        double[] row = new double[11];
        row[0] = 1;
        for (int i = 0; i < 10; i++) {
            row[i + 1] = u[t - i];
        }
        return row;
    }
}
