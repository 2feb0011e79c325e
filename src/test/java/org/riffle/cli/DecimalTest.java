package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DecimalTest {
    @Test
    void plainDecimalsNeverAnExponent() {
        assertEquals("0.1", Decimal.format(0.1, 7, ""));
        assertEquals("0.0000001234568", Decimal.format(1.2345678e-7, 7, ""));
        assertEquals("12345680000", Decimal.format(1.2345678e10, 7, ""));
        assertEquals("-779.8", Decimal.format(-779.77, 4, "-"));
        assertEquals("100", Decimal.format(100, 4, "-"));
        assertEquals("0", Decimal.format(-0.0, 4, "-"));
        assertEquals("", Decimal.format(Double.NaN, 7, ""));
        assertEquals("-", Decimal.format(Double.POSITIVE_INFINITY, 4, "-"));
    }

    /** Half-even on the exact binary value: 0.125 is exact, so it rounds to the even 0.12. */
    @Test
    void roundsHalfEvenOnTheExactBinaryValue() {
        assertEquals("0.12", Decimal.format(0.125, 2, ""));
        assertEquals("0.38", Decimal.format(0.375, 2, ""));
        // 2.675 is stored as 2.67499999999999982236431605997495353221893310546875
        assertEquals("2.67", Decimal.format(2.675, 3, ""));
    }

    @Test
    void spans() {
        assertEquals("39 s", Decimal.span(39));
        assertEquals("17m 14s", Decimal.span(1034));
        assertEquals("2h 5m", Decimal.span(7500));
        assertEquals("1d 23h 59m", Decimal.span(172_794));
        assertEquals("-", Decimal.span(Double.NaN));
    }
}
