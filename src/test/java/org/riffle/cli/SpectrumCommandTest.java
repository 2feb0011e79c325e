package org.riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code riffle spectrum}: output shape, CSV columns, and the errors a user can make. */
class SpectrumCommandTest {
    @TempDir
    static Path dir;
    private static Path log;

    /** A 1 Hz log, 2000 rows: a sine of peak 2 with a 12.5 s period (0.08 Hz), a weaker one at 0.21 Hz. */
    @BeforeAll
    static void writeLog() throws IOException {
        StringBuilder b = new StringBuilder("time,level\n");
        for (int i = 0; i < 2000; i++) {
            double v = 2 * Math.sin(2 * Math.PI * 0.08 * i) + 0.5 * Math.sin(2 * Math.PI * 0.21 * i);
            b.append(String.format(Locale.ROOT, "2026-03-01 %02d:%02d:%02d,%.6f%n", i / 3600,
                    i / 60 % 60, i % 60, v));
        }
        log = dir.resolve("slow.csv");
        Files.writeString(log, b.toString(), StandardCharsets.UTF_8);
    }

    /** analytic: RMS of a sine of peak 2 is √2; 1 % as in WelchTest. */
    @Test
    void csvHasOneRowPerPeakStrongestFirst() {
        MainTest.Run r = MainTest.run("spectrum", log.toString(), "--channel", "level", "--csv", "--peaks", "2");
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals("rank,frequency_hz,amplitude_rms", lines.get(0));
        assertEquals(3, lines.size(), r.out());
        String[] top = lines.get(1).split(",");
        assertEquals(0.08, Double.parseDouble(top[1]), 0.001);
        assertEquals(Math.sqrt(2), Double.parseDouble(top[2]), 0.01 * Math.sqrt(2));
        assertEquals(0.21, Double.parseDouble(lines.get(2).split(",")[1]), 0.001);
    }

    @Test
    void textNamesTheScalingAndSaysWhyThereIsNoSeverity() {
        MainTest.Run r = MainTest.run("spectrum", log.toString(), "--channel", "LEVEL", "--band", "0.05:0.1");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("spectrum: Welch: Hann (periodic), 50 % overlap, segment 256 samples"), r.out());
        assertTrue(r.out().contains("amplitudes: RMS per line in (no unit) (a sine of peak a reads a/sqrt(2))"),
                r.out());
        assertTrue(r.out().contains("  0.05-0.1 Hz  1.41"), r.out());
        assertTrue(r.out().contains("no velocity figure: severity needs a velocity or acceleration unit, not ''"),
                r.out());
        assertTrue(r.out().contains("Screening aid only"), r.out());
    }

    @Test
    void anUnknownChannelNamesTheChannelsThereAre() {
        MainTest.Run r = MainTest.run("spectrum", log.toString(), "--channel", "flow");
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: " + log + ": no numeric channel 'flow'; channels: level", r.err().strip());
    }

    @Test
    void badVibrationOptionsAreUsageErrors() {
        MainTest.Run r = MainTest.run("spectrum", log.toString(), "--channel", "level", "--machine-group", "2");
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: give both --machine-group and --support for a severity zone"),
                r.err());
        r = MainTest.run("spectrum", log.toString(), "--channel", "level", "--bearing", "8,1");
        assertEquals(ExitCode.USAGE, r.status());
        assertTrue(r.err().startsWith("riffle: bearing '8,1' is not N,d,D[,ANGLE]"), r.err());
        r = MainTest.run("spectrum", log.toString(), "--channel", "level", "--segment", "4096");
        assertEquals(ExitCode.BAD_INPUT, r.status());
        assertEquals("riffle: " + log + ": channel level: segment length 4096 does not fit 2000 samples (at least "
                + "8 needed)", r.err().strip());
    }

    /**
     * End to end on the demo recording (fixtures/demo/README.md: motor 1481 r/min, outer-race impacts at
     * BPFO 77.01 Hz on channel 1). The demo is our own invention, so this checks the whole path, not the
     * method: the method's outside checks are in the signal package's tests.
     */
    @Test
    void demoRecordingShowsItsShaftLineAndBpfoInTheEnvelope() {
        String wav = "fixtures/demo/af2-vibration.wav";
        MainTest.Run r = MainTest.run("spectrum", wav, "--sensitivity", "50", "--sensitivity-unit", "m/s\u00b2",
                "--channel", "ch1", "--machine-group", "2", "--support", "rigid", "--bearing", "8,22,100,0");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("24.68 Hz (1481 r/min), estimated: strongest velocity line"), r.out());
        String bpfo = r.out().lines().filter(l -> l.startsWith("  BPFO  envelope")).findFirst().orElseThrow();
        assertTrue(bpfo.matches("  BPFO  envelope +77\\.01 +7[67]\\.\\d+ .* yes"), bpfo);
        assertTrue(r.out().contains(" of ISO 10816-3/20816-3 group 2, rigid: A/B 1.4, B/C 2.8, C/D 4.5 mm/s "
                + "(boundaries from memory - verify against the standard)"), r.out());
        assertTrue(r.out().contains("The machine maker's and the site's limits take precedence over this table."));
    }

    /** The whole text output and the help, as golden text (STYLE.md §10). */
    @Test
    void demoTextAndHelpMatchTheGoldenText() {
        MainTest.Run r = MainTest.run("spectrum", "fixtures/demo/af2-vibration.wav", "--sensitivity", "50",
                "--sensitivity-unit", "m/s\u00b2", "--channel", "ch2", "--rpm", "1481", "--machine-group", "2",
                "--support", "rigid", "--bearing", "8,22,100,0", "--band", "700:830", "--peaks", "5");
        assertEquals(0, r.status(), r.err());
        Golden.assertMatches("af2-vibration.spectrum.expected.txt", r.out());
        Golden.assertMatches("spectrum-help.expected.txt", MainTest.run("spectrum", "--help").out());
    }
}
