package org.riffle.note;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;

/**
 * The invented log the note tests read: booster pump P-3 of a made-up pumping station, twenty
 * minutes at 10 s, four channels, the discharge pressure sagging and the bearing warming in the last
 * third. Generated here, deterministically (seeded {@link Random}, {@link Locale#ROOT} formatting);
 * {@code NoteFixtureTest} proves the committed file equals this output.
 */
final class NoteFixture {
    /** Where the committed fixture lives, relative to the project folder. */
    static final Path FILE = Path.of("src/test/resources/org/riffle/note/booster-p3.csv");
    static final long SEED = 20260314L;
    static final int ROWS = 120;

    private NoteFixture() {
    }

    /** The fixture's bytes. */
    static byte[] generate() {
        Random r = new Random(SEED);
        StringBuilder sb = new StringBuilder();
        sb.append("time,suction [bar],discharge [bar],motor current [A],bearing temp [\u00b0C]\n");
        for (int i = 0; i < ROWS; i++) {
            double late = Math.max(0, (i - 80) / 40.0);
            int s = i * 10;
            sb.append(String.format(Locale.ROOT, "2026-03-14 08:%02d:%02d,%.3f,%.3f,%.2f,%.1f\n",
                    s / 60, s % 60,
                    1.20 + 0.02 * r.nextGaussian(),
                    6.40 - 0.60 * late + 0.05 * r.nextGaussian(),
                    41.0 + 1.5 * late + 0.3 * r.nextGaussian(),
                    48.0 + 9.0 * late + 0.2 * r.nextGaussian()));
        }
        return sb.toString().getBytes(StandardCharsets.UTF_8);
    }
}
