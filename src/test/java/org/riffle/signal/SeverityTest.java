package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.riffle.signal.ZoneTable.Group;
import org.riffle.signal.ZoneTable.Support;
import org.riffle.signal.ZoneTable.Zone;

/** Overall RMS velocity in the standard's band, against analytic values of sines. */
class SeverityTest {
    private static final double FS = 5120;

    private static double[] sine(int n, double amp, double hz) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = amp * Math.sin(2 * Math.PI * hz * i / FS + 0.3);
        }
        return x;
    }

    private static Severity severity(double[] x, String unit, Optional<ShaftSpeed> shaft, Optional<ZoneTable> t) {
        return Severity.of(Welch.estimate(x, FS, WelchParams.auto()), Unit.parse(unit), shaft, t);
    }

    /**
     * 0.1 in/s peak is 1.80 mm/s RMS (DOMAIN.md §3; analytic 0.1 × 25.4/√2 = 1.796). 1 %: the band sum
     * of a Hann-windowed sine well inside the band keeps all but ~0.05 % of its power.
     */
    @Test
    void aSineOfOneTenthInchPerSecondPeakReads180MillimetresPerSecond() {
        Severity s = severity(sine((int) FS * 20, 0.1, 29.3), "in/s", Optional.empty(), Optional.empty());
        assertEquals(0.1 * 25.4 / Math.sqrt(2), s.velocityRmsMmS(), 0.01 * 1.796);
        assertEquals(1.80, s.velocityRmsMmS(), 0.005);
        assertEquals("no zone: name the machine group and support", s.remark());
    }

    /** analytic: a = A sin(ωt) integrates to v = −A/ω cos(ωt); RMS = A/(ω√2). 1 g at 50 Hz → 22.07 mm/s. */
    @Test
    void accelerationIsIntegratedToVelocity() {
        Severity s = severity(sine((int) FS * 20, 1.0, 50), "g", Optional.of(ShaftSpeed.given(3000)),
                Optional.of(new ZoneTable(Group.TWO, Support.RIGID)));
        double want = 9.80665 / (2 * Math.PI * 50) / Math.sqrt(2) * 1000;
        assertEquals(want, s.velocityRmsMmS(), 0.01 * want);
        assertEquals(Optional.of(Zone.D), s.zone());
        assertEquals("", s.remark());
    }

    /** A line outside the band is not counted: 5 Hz and 1500 Hz lines carry no severity, 100 Hz does. */
    @Test
    void onlyTheBandCounts() {
        double[] x = sine((int) FS * 20, 3, 5);
        double[] y = sine((int) FS * 20, 3, 1500);
        double[] z = sine((int) FS * 20, 2, 100);
        for (int i = 0; i < x.length; i++) {
            x[i] += y[i] + z[i];
        }
        Severity s = severity(x, "mm/s", Optional.of(ShaftSpeed.given(1500)), Optional.empty());
        assertEquals(2 / Math.sqrt(2), s.velocityRmsMmS(), 0.01 * 2 / Math.sqrt(2));
        assertEquals(10, s.band().loHz());
        Severity slow = severity(x, "mm/s", Optional.of(ShaftSpeed.given(300)), Optional.empty());
        assertEquals(2, slow.band().loHz(), "below 600 r/min the band starts at 2 Hz");
        assertEquals(Math.sqrt(4.5 + 2), slow.velocityRmsMmS(), 0.01 * Math.sqrt(6.5), "5 Hz now counts");
        assertEquals("300 r/min given, below 600 r/min", slow.band().how());
    }

    @Test
    void aSlowSampleRateSaysSo() {
        double[] x = new double[20_000];
        Severity s = Severity.of(Welch.estimate(x, 2000, WelchParams.auto()), Unit.parse("mm/s"), Optional.empty(),
                Optional.empty());
        assertFalse(s.computed());
        assertEquals("sample rate 2000 Hz too low for the band 10-1000 Hz (needs at least 2560 Hz)", s.remark());
    }

    @Test
    void otherUnitsAndCoarseBinsSaySo() {
        Severity s = severity(sine((int) FS * 4, 1, 100), "bar", Optional.empty(), Optional.empty());
        assertEquals("severity needs a velocity or acceleration unit, not 'bar'", s.remark());
        Severity coarse = Severity.of(Welch.estimate(sine(2048, 1, 100), FS, WelchParams.auto()), Unit.parse("mm/s"),
                Optional.empty(), Optional.empty());
        assertTrue(coarse.remark().startsWith("bins of 10 Hz too coarse for the band's lower edge 10 Hz"),
                coarse.remark());
    }
}
