package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.riffle.signal.Unit.Quantity;

/**
 * Unit recognition and conversion. Factors: NIST Special Publication 811 (2008), Appendix B (exact
 * definitions: inch, standard gravity, US gallon; psi to 10 digits); 1 in/s = 25.4 mm/s as stated in
 * DOMAIN.md §3. Tolerance 1e-12 relative: the conversions are single multiplications.
 */
class UnitTest {
    private static double conv(double v, String from, String to) {
        return Unit.parse(from).convert(v, Unit.parse(to));
    }

    @Test
    void everyUnitListedInTheIssueIsRecognised() {
        String[][] cases = {
            {"mm/s", "VELOCITY"}, {"in/s", "VELOCITY"}, {"ips", "VELOCITY"}, {"m/s\u00b2", "ACCELERATION"},
            {"m/s^2", "ACCELERATION"}, {"g", "ACCELERATION"}, {"\u00b5m", "DISPLACEMENT"},
            {"\u03bcm", "DISPLACEMENT"}, {"um", "DISPLACEMENT"}, {"mil", "DISPLACEMENT"}, {"bar", "PRESSURE"},
            {"mbar", "PRESSURE"}, {"kPa", "PRESSURE"}, {"psi", "PRESSURE"}, {"\u00b0C", "TEMPERATURE"},
            {"degC", "TEMPERATURE"}, {"\u00b0F", "TEMPERATURE"}, {"A", "CURRENT"}, {"mA", "CURRENT"},
            {"V", "VOLTAGE"}, {"m\u00b3/h", "FLOW"}, {"m3/h", "FLOW"}, {"l/s", "FLOW"}, {"gpm", "FLOW"},
            {"rpm", "FREQUENCY"}, {"Hz", "FREQUENCY"}, {"%", "RATIO"}, {"[mm/s]", "VELOCITY"},
            {" deg C ", "TEMPERATURE"}, {"G", "ACCELERATION"}, {"IPS", "VELOCITY"},
        };
        for (String[] c : cases) {
            Unit u = Unit.parse(c[0]);
            assertEquals(Quantity.valueOf(c[1]), u.quantity(), "'" + c[0] + "'");
            assertTrue(u.known());
            assertEquals(c[0], u.text(), "text kept as written");
        }
    }

    @Test
    void velocityConversionsFromTheInchDefinition() {
        assertEquals(25.4, conv(1, "in/s", "mm/s"), 1e-12, "1 in/s = 25.4 mm/s (exact)");
        assertEquals(25.4, conv(1, "ips", "mm/s"), 1e-12);
        assertEquals(1, conv(25.4, "mm/s", "in/s"), 1e-12);
        assertEquals(25.4, conv(1, "mil", "\u00b5m"), 1e-12, "1 mil = 25.4 µm (exact)");
    }

    /** analytic: RMS of a sine = peak/√2; 0.1 in/s × 25.4 / √2 = 1.796 mm/s, quoted 1.80 (DOMAIN.md §3). */
    @Test
    void aSineOfOneTenthInchPerSecondPeakIs180MillimetresPerSecondRms() {
        double rms = conv(0.1, "in/s", "mm/s") / Math.sqrt(2);
        assertEquals(1.80, rms, 0.005, "rounded to the two decimals quoted");
    }

    @Test
    void otherConversionsFromNistSp811() {
        assertEquals(9.80665, conv(1, "g", "m/s\u00b2"), 1e-12, "standard gravity (exact)");
        assertEquals(6894.757293168, conv(1, "psi", "Pa"), 1e-6);
        assertEquals(1, conv(1000, "mbar", "bar"), 1e-12);
        assertEquals(100, conv(212, "\u00b0F", "\u00b0C"), 1e-9, "boiling point of water");
        assertEquals(0, conv(32, "degF", "degC"), 1e-9, "freezing point of water");
        assertEquals(-40, conv(-40, "degC", "\u00b0F"), 1e-9, "the scales cross at -40");
        assertEquals(0.227124707, conv(1, "gpm", "m\u00b3/h"), 1e-9, "3.785411784 L/min × 60 / 1000");
        assertEquals(3.6, conv(1, "l/s", "m3/h"), 1e-12);
        assertEquals(25, conv(1500, "rpm", "Hz"), 1e-12);
        assertEquals(20, conv(0.02, "A", "mA"), 1e-12);
        assertEquals(0.5, Unit.parse("%").toBase(50), 1e-12);
    }

    @Test
    void anUnknownUnitIsKeptAsTextAndNotConverted() {
        Unit u = Unit.parse("furlong/fortnight");
        assertFalse(u.known());
        assertEquals("furlong/fortnight", u.text());
        assertEquals(Quantity.UNKNOWN, u.quantity());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> u.convert(1, Unit.parse("mm/s")));
        assertEquals("cannot convert 'furlong/fortnight' (UNKNOWN) to 'mm/s' (VELOCITY)", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Unit.parse("bar").convert(1, Unit.parse("mm/s")));
        assertEquals("cannot convert 'bar' (PRESSURE) to 'mm/s' (VELOCITY)", e.getMessage());
        assertFalse(Unit.parse("").known());
    }
}
