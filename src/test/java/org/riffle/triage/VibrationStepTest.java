package org.riffle.triage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.riffle.log.Channel;
import org.riffle.signal.BearingGeometry;
import org.riffle.signal.VibrationParams;
import org.riffle.signal.WelchParams;
import org.riffle.signal.ZoneTable;
import org.riffle.signal.ZoneTable.Group;
import org.riffle.signal.ZoneTable.Support;

/** The vibration figures a channel assessment carries. */
class VibrationStepTest {
    private static final double FS = 5120;
    private static final VibrationParams GROUP2_RIGID = VibrationParams.defaults()
            .withTable(new ZoneTable(Group.TWO, Support.RIGID));

    /** Velocity sine: peak 1.0 mm/s at 24.7 Hz in the first quarter, 3.0 mm/s after; seeded noise. */
    private static Channel steppedVelocity() {
        int n = (int) FS * 40;
        Random rnd = new Random(4L);
        float[] x = new float[n];
        for (int i = 0; i < n; i++) {
            double amp = i < n / 4 ? 1.0 : 3.0;
            x[i] = (float) (amp * Math.sin(2 * Math.PI * 24.7 * i / FS) + 0.01 * rnd.nextGaussian());
        }
        return new Channel("fan DE velocity", "mm/s", x);
    }

    /**
     * Zone and alarm, analytic: whole-channel RMS = √((1² · ¼ + 3² · ¾)/2) = 1.87 mm/s (zone B of group 2
     * rigid, 1.4 < v ≤ 2.8, from memory — verify); baseline RMS = 1/√2 = 0.707 mm/s; alarm (common
     * practice) = 0.707 + 0.25 × 2.8 = 1.41 mm/s, below the 3.5 cap. 1 % tolerance as in SeverityTest.
     */
    @Test
    void velocityZoneAndAlarmFromTheBaseline() {
        Channel c = steppedVelocity();
        VibrationFigures f = VibrationStep.figures(c, FS, Baseline.firstQuarter(c.size()), GROUP2_RIGID)
                .orElseThrow();
        double want = Math.sqrt((0.25 + 9 * 0.75) / 2);
        assertEquals(want, f.velocityRmsMmS(), 0.01 * want);
        assertEquals("B", f.zone());
        assertEquals("ISO 10816-3/20816-3 group 2, rigid (boundaries from memory - verify against the standard)",
                f.table());
        String alarm = String.format(Locale.ROOT, "alarm %.3g mm/s", 1 / Math.sqrt(2) + 0.7);
        assertTrue(f.remark().contains("baseline 0.707 mm/s; " + alarm), f.remark());
        assertTrue(f.remark().contains("above the alarm"), f.remark());
        assertEquals(24.7, f.peaks().get(0).frequencyHz(), 0.05);
        assertEquals("1x", f.lines().get(0).name());
        assertTrue(f.lines().get(0).present());
    }

    @Test
    void bearingLinesComeFromTheEnvelope() {
        double fs = 12_800;
        int n = (int) fs * 8;
        Random rnd = new Random(8L);
        float[] x = new float[n];
        for (int i = 0; i < n; i++) {
            x[i] = (float) (0.3 * rnd.nextGaussian());
        }
        double period = 1 / 96.0;
        for (double t = 0.001; t * fs < n; t += period * (1 + 0.01 * (2 * rnd.nextDouble() - 1))) {
            int start = (int) Math.ceil(t * fs);
            for (int i = start; i < Math.min(n, start + 128); i++) {
                double dt = i / fs - t;
                x[i] += (float) (Math.exp(-dt / 0.001) * Math.sin(2 * Math.PI * 3000 * dt));
            }
        }
        VibrationParams p = GROUP2_RIGID.withRpm(1800).withBearing(new BearingGeometry(8, 1, 5, 0));
        VibrationFigures f = VibrationStep.figures(new Channel("gearbox DE", "m/s\u00b2", x), fs,
                Baseline.firstQuarter(n), p).orElseThrow();
        VibrationFigures.Line bpfo = f.lines().stream().filter(l -> l.name().equals("BPFO (envelope)"))
                .findFirst().orElseThrow();
        assertTrue(bpfo.present(), f.lines().toString());
        assertEquals(7, f.lines().size(), "1x 2x 3x from the spectrum, four bearing lines from the envelope");
    }

    @Test
    void aSlowOverallTrendSaysTheRateIsTooLow() {
        float[] x = new float[600];
        Arrays.fill(x, 2.0f);
        VibrationFigures f = VibrationStep.figures(new Channel("vib overall", "mm/s", x), 1.0,
                Baseline.firstQuarter(600), GROUP2_RIGID).orElseThrow();
        assertTrue(Double.isNaN(f.velocityRmsMmS()));
        assertEquals("", f.zone());
        assertEquals("sample rate 1 Hz too low for the band 10-1000 Hz (needs at least 2560 Hz); if it logs "
                + "overall RMS values, compare them with the table directly", f.remark());
        assertTrue(f.peaks().isEmpty() && f.lines().isEmpty());
    }

    @Test
    void nonVibrationChannelsHaveNoFigures() {
        assertEquals(Optional.empty(), VibrationStep.figures(new Channel("p", "bar", new float[1000]), FS,
                Baseline.firstQuarter(1000), GROUP2_RIGID));
        assertEquals(Optional.empty(), VibrationStep.figures(new Channel("x", "", new float[1000]), FS,
                Baseline.firstQuarter(1000), GROUP2_RIGID));
        assertFalse(VibrationStep.figures(new Channel("d", "\u00b5m", new float[1000]), FS,
                Baseline.firstQuarter(1000), GROUP2_RIGID).isEmpty(), "displacement is a vibration unit");
    }

    @Test
    void settingsThatDoNotFitTheChannelAreARemarkNotAFailure() {
        VibrationFigures f = VibrationStep.figures(new Channel("v", "mm/s", new float[1000]), FS,
                Baseline.firstQuarter(1000), GROUP2_RIGID.withWelch(new WelchParams(4096)))
                .orElseThrow();
        assertEquals("not analysed: segment length 4096 does not fit 1000 samples (at least 8 needed)", f.remark());
    }

    @Test
    void withoutATableTheRemarkSaysWhatIsMissing() {
        Channel c = steppedVelocity();
        VibrationFigures f = VibrationStep.figures(c, FS, Baseline.firstQuarter(c.size()), VibrationParams.defaults())
                .orElseThrow();
        assertEquals("", f.zone());
        assertTrue(f.remark().startsWith("name the machine group and support for a zone; Band 10-1000 Hz ("),
                f.remark());
    }
}
