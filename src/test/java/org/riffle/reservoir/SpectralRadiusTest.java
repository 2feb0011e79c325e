package org.riffle.reservoir;

import java.util.SplittableRandom;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.junit.jupiter.api.Test;

/**
 * The spectral radius against Commons Math 3.6.1's {@code EigenDecomposition} of the dense matrix (a
 * general-purpose reference library, independent code: JAMA's hqr2) and against analytic cases.
 * Tolerance 1e-9: both are backward stable, so they agree to a few hundred ulps of the norm.
 */
class SpectralRadiusTest {
    static double reference(double[][] m) {
        EigenDecomposition e = new EigenDecomposition(MatrixUtils.createRealMatrix(m));
        double[] re = e.getRealEigenvalues();
        double[] im = e.getImagEigenvalues();
        double r = 0;
        for (int i = 0; i < re.length; i++) {
            r = Math.max(r, Math.hypot(re[i], im[i]));
        }
        return r;
    }

    @Test
    void randomDenseMatricesAgreeWithCommonsMath() {
        SplittableRandom rnd = new SplittableRandom(7);
        for (int n : new int[] {1, 2, 3, 4, 7, 20, 60}) {
            for (int rep = 0; rep < 5; rep++) {
                double[][] m = new double[n][n];
                for (double[] row : m) {
                    for (int j = 0; j < n; j++) {
                        row[j] = rnd.nextDouble(-1, 1);
                    }
                }
                Close.within(reference(m), SpectralRadius.of(m), 1e-9, "radius of random " + n + "x" + n);
            }
        }
    }

    @Test
    void reservoirIsRescaledToTheTargetRadiusExactly() {
        for (long seed : new long[] {1, 2, EsnParams.DEFAULT_SEED}) {
            for (double target : new double[] {0.5, 0.9, 1.25}) {
                Reservoir r = Reservoir.build(EsnParams.defaults().withUnits(200).withSeed(seed)
                        .withSpectralRadius(target));
                Close.within(target, reference(r.denseMatrix()), 1e-9,
                        "Commons Math radius of reservoir seed " + seed + " target " + target);
            }
        }
    }

    @Test
    void analyticCases() {
        // analytic: a rotation by 30 degrees times 0.7 has eigenvalues 0.7·e^{±iπ/6}, modulus 0.7
        double c = 0.7 * Math.cos(Math.PI / 6);
        double s = 0.7 * Math.sin(Math.PI / 6);
        Close.within(0.7, SpectralRadius.of(new double[][] {{c, -s}, {s, c}}), 1e-15, "scaled rotation");
        // analytic: a triangular matrix's eigenvalues are its diagonal
        double[][] tri = {{0.2, 5, -3, 1}, {0, -1.5, 2, 7}, {0, 0, 0.9, 4}, {0, 0, 0, 1.1}};
        Close.within(1.5, SpectralRadius.of(tri), 1e-12, "triangular");
        // analytic: the companion matrix of (x-2)(x+3)(x^2+1) = x^4 + x^3 - 5x^2 + x - 6 has roots 2, -3, ±i
        double[][] comp = {{-1, 5, -1, 6}, {1, 0, 0, 0}, {0, 1, 0, 0}, {0, 0, 1, 0}};
        Close.within(3, SpectralRadius.of(comp), 1e-12, "companion");
        // analytic: a cyclic permutation of 50 elements scaled by 0.8: eigenvalues 0.8·(roots of unity)
        double[][] cyc = new double[50][50];
        for (int i = 0; i < 50; i++) {
            cyc[i][(i + 1) % 50] = 0.8;
        }
        Close.within(0.8, SpectralRadius.of(cyc), 1e-12, "scaled cyclic permutation");
    }
}
