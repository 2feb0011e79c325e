package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The hand-written timestamp parser against {@code java.time} (JSR-310 in Java SE 17, the proleptic
 * ISO calendar): random instants from 1970 to 2100, written in every layout by {@link DateTimeFormatter},
 * must read back to the same epoch nanoseconds; impossible dates must be refused where java.time refuses
 * them too.
 */
class StampsTest {
    private static final long SPAN = LocalDateTime.of(2100, 1, 1, 0, 0).toEpochSecond(ZoneOffset.UTC);

    private static long nanos(LocalDateTime t) {
        return t.toEpochSecond(ZoneOffset.UTC) * 1_000_000_000L + t.getNano();
    }

    @Test
    void everyLayoutReadsBackToTheSameInstant() {
        SplittableRandom rnd = new SplittableRandom(42L);
        String[][] layouts = {
            {"yyyy-MM-dd'T'HH:mm:ss.SSS", "YMD"}, {"yyyy-MM-dd HH:mm:ss", "YMD"}, {"yyyy-MM-dd HH:mm", "YMD"},
            {"yyyy/MM/dd HH:mm:ss", "YMD"}, {"dd.MM.yyyy HH:mm:ss", "DMY"}, {"d.M.yyyy H:mm:ss,SSSSSS", "DMY"},
            {"dd/MM/yyyy HH:mm:ss", "DMY"}, {"MM/dd/yyyy hh:mm:ss a", "MDY"}, {"MM-dd-yyyy HH:mm:ss.SSSSSSSSS", "MDY"},
            {"yyyy-MM-dd", "YMD"},
        };
        for (int k = 0; k < 50_000; k++) {
            LocalDateTime t = LocalDateTime.ofEpochSecond(rnd.nextLong(SPAN), rnd.nextInt(1_000_000_000),
                    ZoneOffset.UTC);
            String[] layout = layouts[k % layouts.length];
            DateTimeFormatter f = DateTimeFormatter.ofPattern(layout[0], Locale.ROOT);
            String text = f.format(t);
            boolean dateOnly = !layout[0].contains("H") && !layout[0].contains("h");
            LocalDateTime expected = dateOnly ? LocalDate.parse(text, f).atStartOfDay() : LocalDateTime.parse(text, f);
            assertEquals(nanos(expected), Stamps.parse(text, Stamps.Order.valueOf(layout[1])), text);
        }
    }

    @Test
    void offsetsGiveTheUtcInstant() {
        SplittableRandom rnd = new SplittableRandom(43L);
        DateTimeFormatter[] fs = {DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss.SSSXXX"),
            DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ssxx"), DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ssx")};
        for (int k = 0; k < 20_000; k++) {
            ZoneOffset z = ZoneOffset.ofTotalSeconds((rnd.nextInt(57) - 28) * 1800);
            OffsetDateTime t = OffsetDateTime.of(LocalDateTime.ofEpochSecond(rnd.nextLong(SPAN), 0, ZoneOffset.UTC)
                    .plus(rnd.nextInt(1000), ChronoUnit.MILLIS), z);
            DateTimeFormatter f = fs[k % fs.length];
            if (f == fs[2] && z.getTotalSeconds() % 3600 != 0) {
                continue;
            }
            String text = f.format(t);
            OffsetDateTime back = OffsetDateTime.parse(text, f);
            long want = back.toEpochSecond() * 1_000_000_000L + back.getNano();
            assertEquals(want, Stamps.parse(text, Stamps.Order.YMD), text);
        }
    }

    @Test
    void theDayCacheNeverChangesAResult() {
        SplittableRandom rnd = new SplittableRandom(44L);
        Stamps.DayCache cache = new Stamps.DayCache();
        String[] days = {"1.3.2026", "11.3.2026", "01.03.2026", "1.3.20261", "2026-03-01", "2026-03-011", "2026-02-30"};
        for (int k = 0; k < 20_000; k++) {
            String text = days[rnd.nextInt(days.length)] + (rnd.nextBoolean() ? "" : " " + rnd.nextInt(24) + ":"
                    + String.format("%02d", rnd.nextInt(60)) + (rnd.nextBoolean() ? "" : "x"));
            byte[] b = text.getBytes(java.nio.charset.StandardCharsets.US_ASCII);
            for (Stamps.Order o : Stamps.Order.values()) {
                assertEquals(Stamps.parse(b, 0, b.length, o), Stamps.parse(b, 0, b.length, o, cache), text + " " + o);
            }
        }
    }

    @Test
    void splitTimeOfDayAndAmPm() {
        assertEquals(0L, Stamps.timeOfDay("12:00:00 AM"));
        assertEquals(12 * 3600 * 1_000_000_000L, Stamps.timeOfDay("12:00:00 PM"));
        assertEquals((13 * 3600 + 5 * 60 + 7) * 1_000_000_000L + 250_000_000L, Stamps.timeOfDay("1:05:07.25 pm"));
        assertEquals((23 * 3600 + 59 * 60) * 1_000_000_000L, Stamps.timeOfDay("23:59"));
    }

    @Test
    void impossibleDatesAndTimesAreRefused() {
        for (String s : new String[] {"2026-02-29 00:00:00", "2026-13-01 00:00", "2026-04-31", "2026-01-01 24:00:00",
            "2026-01-01 12:60:00", "2026-01-01T12:00:00+25:00", "2026-01-01 12:00:00.1234567890",
            "2026-01-01 12:00:00 XM", "2026-1-1x", "20260101", "12:00", "2026-01-01T", "01.02.26"}) {
            assertEquals(Stamps.FAIL, Stamps.parse(s, Stamps.Order.YMD), s);
        }
        assertEquals(Stamps.FAIL, Stamps.parse("31/04/2026", Stamps.Order.DMY));
        assertEquals(Stamps.FAIL, Stamps.parse("13/01/2026", Stamps.Order.MDY));
        assertEquals(Stamps.FAIL, Stamps.parse("01.02.2026", Stamps.Order.MDY), "dots are never month first");
        // java.time agrees that 2024-02-29 exists (leap year: divisible by 4, not a century)
        assertEquals(nanos(LocalDateTime.of(2024, 2, 29, 0, 0)), Stamps.parse("2024-02-29", Stamps.Order.YMD));
        assertEquals(Stamps.FAIL, Stamps.parse("2100-02-29", Stamps.Order.YMD), "2100 is not a leap year");
    }
}
