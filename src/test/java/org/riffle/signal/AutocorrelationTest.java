package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.riffle.signal.Close.assertClose;

import org.junit.jupiter.api.Test;

class AutocorrelationTest {
    /**
     * Analytic: for an alternating ±1 run of even length n, Σ d_i d_{i+1} = −(n−1) and Σ d_i² = n, so
     * r(1) = −(n−1)/n; and r(2) = (n−2)/n. Tolerance 1e-15: exact small integers.
     */
    @Test
    void alternatingSequence() {
        double[] x = new double[10];
        for (int i = 0; i < x.length; i++) {
            x[i] = i % 2 == 0 ? 1 : -1;
        }
        assertClose("r(1)", -0.9, Autocorrelation.lag1(x), 1e-15);
        assertClose("r(2)", 0.8, Autocorrelation.at(x, 2), 1e-15);
        assertClose("r(0)", 1.0, Autocorrelation.at(x, 0), 1e-15);
    }

    /** Missing samples drop out: {1, NaN, 3, 5}: mean 3, den 8, only the pair (3, 5) counts: 0/8 = 0. */
    @Test
    void missingSamplesDropOutOfTheSums() {
        assertEquals(0.0, Autocorrelation.lag1(new double[] {1, Double.NaN, 3, 5}));
        // {1, 3, NaN, 5, 7}: mean 4, den 9+1+1+9 = 20, pairs (1,3): (-3)(-1) = 3 and (5,7): 1·3 = 3 → 0.3
        assertClose("r(1)", 0.3, Autocorrelation.lag1(new double[] {1, 3, Double.NaN, 5, 7}), 1e-15);
    }

    @Test
    void undefinedCasesAreNaNAndANegativeLagIsRefused() {
        assertTrue(Double.isNaN(Autocorrelation.lag1(new double[] {2, 2, 2})));
        assertTrue(Double.isNaN(Autocorrelation.lag1(new double[] {2})));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Autocorrelation.at(new double[3], -1));
        assertEquals("lag -1 is negative", e.getMessage());
    }
}
