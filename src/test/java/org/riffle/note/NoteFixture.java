package org.riffle.note;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;

/**
 * The invented log the note tests read: booster pump P-3 of a made-up pumping station, 4000 rows at
 * 10 s (about 11 hours) of four channels: suction and discharge pressure, motor current and bearing
 * temperature, with a 15-minute process swing and correlated noise; from row 2800 the discharge
 * pressure sags and loses its swing while the current rises and the bearing warms. Long enough for
 * the real analysis (windows, recurrence, reservoir) on the default first-quarter baseline.
 * Generated here, deterministically (seeded {@link Random}, {@link Locale#ROOT} formatting);
 * {@code NoteFixtureTest} proves the committed file equals this output.
 */
final class NoteFixture {
    /** Where the committed fixture lives, relative to the project folder. */
    static final Path FILE = Path.of("src/test/resources/org/riffle/note/booster-p3.csv");
    /** As GNU coreutils 9.1 {@code sha256sum} printed it for the committed fixture (run once by hand). */
    static final String SHA256 = "9be6f054592f051b1bc7b75b495ab52d872e61ea1fca23fef47d9038b9fb470a";
    /** As {@code stat -c %s} printed it. */
    static final long SIZE = 176_072;
    static final long SEED = 20260314L;
    static final int ROWS = 4000;
    static final int FAULT_ROW = 2800;

    private NoteFixture() {
    }

    /** The fixture's bytes. */
    static byte[] generate() {
        Random r = new Random(SEED);
        StringBuilder sb = new StringBuilder();
        sb.append("time,suction [bar],discharge [bar],motor current [A],bearing temp [\u00b0C]\n");
        double a = 0;
        double b = 0;
        for (int i = 0; i < ROWS; i++) {
            double late = Math.max(0, (i - FAULT_ROW) / (double) (ROWS - FAULT_ROW));
            double swing = Math.sin(2 * Math.PI * i / 90.0);
            a = 0.8 * a + 0.01 * r.nextGaussian();
            b = 0.9 * b + 0.02 * r.nextGaussian();
            int s = i * 10;
            sb.append(String.format(Locale.ROOT, "2026-03-14 %02d:%02d:%02d,%.3f,%.3f,%.2f,%.2f\n",
                    s / 3600, s / 60 % 60, s % 60,
                    1.20 + a,
                    6.40 + 0.08 * (1 - late) * swing - 0.60 * late + b,
                    41.0 + 0.4 * Math.sin(2 * Math.PI * i / 90.0 + 1) + 1.5 * late + 0.15 * r.nextGaussian(),
                    48.0 + 0.3 * Math.sin(2 * Math.PI * i / 90.0 + 2) + 9.0 * late * late + 0.05 * r.nextGaussian()));
        }
        return sb.toString().getBytes(StandardCharsets.UTF_8);
    }
}
