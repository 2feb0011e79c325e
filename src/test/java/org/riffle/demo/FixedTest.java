package org.riffle.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Random;
import org.junit.jupiter.api.Test;

class FixedTest {
    @Test
    void smallCases() {
        assertEquals("0.0", Fixed.format(-0.04, 1));
        assertEquals("-0.1", Fixed.format(-0.06, 1));
        assertEquals("12.05", Fixed.format(12.05, 2));
        assertEquals("962", Fixed.format(961.5, 0));
        assertEquals("3.000", Fixed.format(3, 3));
    }

    /** Oracle: BigDecimal of the scaled double, rounded half-up (what Math.round does for |x| < 2^52). */
    @Test
    void agreesWithBigDecimalOnRandomValues() {
        Random r = new Random(42);
        for (int i = 0; i < 20_000; i++) {
            double v = (r.nextDouble() - 0.5) * 2000;
            int d = r.nextInt(4);
            double scaled = v * Math.pow(10, d);
            String expected = new BigDecimal(scaled).setScale(0, RoundingMode.HALF_UP).movePointLeft(d).toPlainString();
            if (expected.startsWith("-") && new BigDecimal(expected).signum() == 0) {
                expected = expected.substring(1);
            }
            assertEquals(expected, Fixed.format(v, d), "v=" + v + " d=" + d);
        }
    }
}
