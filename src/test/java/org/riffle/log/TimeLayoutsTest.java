package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.riffle.log.DialectsTest.assertChannel;
import static org.riffle.log.DialectsTest.assertSeconds;
import static org.riffle.log.DialectsTest.read;

import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The time layouts of {@code fixtures/dialects/}: offsets and comma fractions, split date and time,
 * epoch milliseconds, slash dates (refused when ambiguous, read as told), AM/PM, and the reporting of
 * gaps, duplicates and backward steps. Expected instants are the written fields converted by hand
 * (analytic), cross-checked with {@link Instant#parse}.
 */
class TimeLayoutsTest {
    @Test
    void isoOffsetsAcrossTheSpringDaylightSavingChange() throws LogException {
        Recording r = read("iso-offset-comma-fraction.csv");
        // 01:59:59,5+01:00 is 00:59:59.5Z; 03:00:00+02:00 is 01:00:00Z: half a second later
        assertEquals(Instant.parse("2026-03-29T00:59:59.500Z"), r.time().origin().orElseThrow());
        assertSeconds(r, 0, 0.5, 1.0);
        assertChannel(r, "pressure", "bar", 2.0f, 2.5f, 3.0f);
        assertEquals(List.of(), r.timeIssues());
    }

    @Test
    void splitDateAndTimeColumnsAcrossMidnight() throws LogException {
        Recording r = read("split-date-time.csv");
        assertEquals(Instant.parse("2026-02-28T23:59:58Z"), r.time().origin().orElseThrow());
        assertSeconds(r, 0, 1, 2);
        assertChannel(r, "Strom", "A", 12.5f, 12.75f, 13f);
        assertChannel(r, "Drehzahl", "1/min", 1480f, 1481f, 1482f);
        assertEquals(2, r.channels().size(), "date and time columns are not channels");
    }

    @Test
    void epochMilliseconds() throws LogException {
        Recording r = read("epoch-ms.csv");
        assertEquals(Instant.parse("2026-03-01T08:00:00Z"), r.time().origin().orElseThrow());
        assertSeconds(r, 0, 0.25, 0.5);
        assertChannel(r, "level", "m", 2.5f, 2.75f, 3f);
    }

    @Test
    void ambiguousSlashDatesAreRefusedNamingTheOptions() {
        LogException e = assertThrows(LogException.class, () -> read("slash-dates.csv"));
        assertEquals("fixtures/dialects/slash-dates.csv:2: dates like '03/04/2026 10:00:00' can be day first or"
                + " month first; give --day-first or --month-first", e.getMessage());
    }

    @Test
    void slashDatesReadAsTold() throws LogException {
        Recording dayFirst = read("slash-dates.csv", ReadOptions.defaults().withDateOrder(
                ReadOptions.DateOrder.DAY_FIRST));
        assertEquals(Instant.parse("2026-04-03T10:00:00Z"), dayFirst.time().origin().orElseThrow());
        // day first: 3 April, then 3 April, then 3 May (30 days + 2 minutes later)
        assertSeconds(dayFirst, 0, 60, 30 * 86400 + 120);
        Recording monthFirst = read("slash-dates.csv", ReadOptions.defaults().withDateOrder(
                ReadOptions.DateOrder.MONTH_FIRST));
        assertEquals(Instant.parse("2026-03-04T10:00:00Z"), monthFirst.time().origin().orElseThrow());
        assertSeconds(monthFirst, 0, 60, 86400 + 120);
    }

    @Test
    void aDayAboveTwelveSettlesDayFirst() throws LogException {
        Recording r = read("slash-dates-day-first.csv");
        assertEquals(Instant.parse("2026-03-12T23:59:00Z"), r.time().origin().orElseThrow());
        assertSeconds(r, 0, 60, 120);
    }

    @Test
    void monthFirstWithAmPm() throws LogException {
        Recording r = read("us-am-pm.csv", ReadOptions.defaults().withDateOrder(ReadOptions.DateOrder.MONTH_FIRST));
        assertEquals(Instant.parse("2026-03-01T11:59:59Z"), r.time().origin().orElseThrow());
        assertSeconds(r, 0, 1, 2);
        assertChannel(r, "Motor current", "A", 10.5f, 10.75f, 11f);
    }

    @Test
    void gapsDuplicatesAndBackwardStepsAreReportedNotFixed() throws LogException {
        Recording r = read("gaps-duplicates-backward.csv");
        assertSeconds(r, 0, 1, 2, 5, 6, 6, 4, 5, 6);
        assertChannel(r, "flow", "", 1, 2, 3, 4, 5, 6, 7, 8, 9);
        // steps 1,1,3,1,0,-2,1,1: positive median 1 s, so 1 Hz; a gap is a step above 1.5 s
        assertEquals(1.0, r.time().rateHz());
        assertEquals(List.of(new TimeIssue(TimeIssue.Kind.GAP, 3, 5, 3.0),
                new TimeIssue(TimeIssue.Kind.DUPLICATE, 5, 7, 0.0),
                new TimeIssue(TimeIssue.Kind.BACKWARD, 6, 8, -2.0)), r.timeIssues());
    }
}
