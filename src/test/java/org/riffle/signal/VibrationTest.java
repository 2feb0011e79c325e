package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.riffle.signal.ZoneTable.Group;
import org.riffle.signal.ZoneTable.Support;

/** The one-call analysis: shaft speed, lines, envelope, notes. */
class VibrationTest {
    private static final double FS = EnvelopeTest.FS;

    /** Shaft lines of 4.0, 1.5, 0.8 mm/s peak at 1x, 2x, 3x of 24.6 Hz, seeded noise. */
    private static double[] shaft(int n) {
        Random rnd = new Random(1L);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / FS;
            x[i] = 4.0 * Math.sin(2 * Math.PI * 24.6 * t) + 1.5 * Math.sin(2 * Math.PI * 49.2 * t + 1)
                    + 0.8 * Math.sin(2 * Math.PI * 73.8 * t + 2) + 0.05 * rnd.nextGaussian();
        }
        return x;
    }

    @Test
    void shaftSpeedIsEstimatedFromTheDominantLineAndSaysHow() {
        double[] x = shaft((int) FS * 8);
        VibrationReport r = Vibration.analyse(x, 0, x.length, FS, Unit.parse("mm/s"), VibrationParams.defaults());
        ShaftSpeed s = r.shaft().orElseThrow();
        assertFalse(s.given());
        assertEquals(24.6, s.hz(), 0.1 * r.spectrum().binHz(), "a tenth of a bin");
        assertTrue(s.how().startsWith("estimated: strongest velocity line between"), s.how());
        assertEquals("1x", r.lines().get(0).name());
        assertTrue(r.lines().get(0).present() && r.lines().get(1).present() && r.lines().get(2).present(),
                r.lines().toString());
        assertEquals(4.0 / Math.sqrt(2), r.lines().get(0).amplitudeRms(), 0.01 * 4.0 / Math.sqrt(2));
        double want = Math.sqrt((16 + 2.25 + 0.64) / 2);
        assertEquals(want, r.severity().velocityRmsMmS(), 0.01 * want, "RMS of the three lines");
        assertEquals("speed unknown: taken as at least 600 r/min", Severity.band(Optional.empty()).how());
    }

    @Test
    void givenSpeedAndBearingGiveEightLinesInEachSpectrum() {
        double[] x = EnvelopeTest.outerRaceFault((int) FS * 10, 5L);
        VibrationParams p = VibrationParams.defaults().withRpm(1800).withBearing(EnvelopeTest.BEARING)
                .withTable(new ZoneTable(Group.ONE, Support.RIGID));
        VibrationReport r = Vibration.analyse(x, 0, x.length, FS, Unit.parse("m/s2"), p);
        assertTrue(r.shaft().orElseThrow().given());
        assertEquals(14, r.lines().size(), "3 orders + 4 bearing lines in the spectrum, the same in the envelope");
        FaultLine bpfo = r.lines().stream().filter(l -> l.where().equals("envelope") && l.name().equals("BPFO"))
                .findFirst().orElseThrow();
        assertTrue(bpfo.present(), bpfo.toString());
        assertTrue(r.envelopeBand().isPresent() && r.severity().zone().isPresent());
        assertTrue(r.envelope().orElseThrow().binHz() <= 1, "envelope bins of at most 1 Hz");
        assertEquals(8192, Vibration.envelopeWelch(WelchParams.auto(), 1 << 20, 5120).segmentLength());
        assertEquals(2048, Vibration.envelopeWelch(WelchParams.auto(), 10_000, 5120).segmentLength(), "auto less");
        assertEquals(4096, Vibration.envelopeWelch(new WelchParams(4096), 1 << 20, FS).segmentLength(), "given");
    }

    @Test
    void missingSamplesMoveTheEnvelopeToTheLongestCleanRun() {
        double[] x = EnvelopeTest.outerRaceFault((int) FS * 6, 6L);
        x[1000] = Double.NaN;
        VibrationReport r = Vibration.analyse(x, 0, x.length, FS, Unit.parse("g"),
                VibrationParams.defaults().withRpm(1800).withBearing(EnvelopeTest.BEARING));
        assertEquals("envelope on samples 1001-76800, the longest run without missing samples", r.notes().get(0));
        assertArrayEquals(new int[] {2, 7}, Vibration.longestRun(new double[] {0, Double.NaN, 0, 1, 2, 3, 4,
            Double.NaN}, 0, 8));
    }

    @Test
    void tooFewSamplesOrABandAboveNyquistAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Vibration.analyse(new double[10], 0, 10, FS, Unit.parse("g"), VibrationParams.defaults()));
        assertEquals("10 samples are too few for a spectrum (at least 32)", e.getMessage());
        double[] x = shaft(20_000);
        e = assertThrows(IllegalArgumentException.class, () -> Vibration.analyse(x, 0, x.length, FS,
                Unit.parse("g"), VibrationParams.defaults().withRpm(1500).withBearing(EnvelopeTest.BEARING)
                        .withEnvelopeBand(Band.parse("5000:7000"))));
        assertEquals("envelope band 5000-7000 Hz reaches above half the sample rate (6400.0 Hz)", e.getMessage());
    }

    /** The shaft line is found even when dozens of stronger lines lie above the search range. */
    @Test
    void shaftLineIsFoundBelowManyStrongerHighLines() {
        int n = (int) FS * 8;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / FS;
            x[i] = 0.5 * Math.sin(2 * Math.PI * 31.0 * t);
            for (int h = 0; h < 80; h++) {
                x[i] += 5 * Math.sin(2 * Math.PI * (600 + 37.3 * h) * t + h);
            }
        }
        ShaftSpeed s = ShaftSpeed.estimate(Welch.estimate(x, FS, WelchParams.auto())).orElseThrow();
        assertEquals(31.0, s.hz(), 0.1);
    }
}
