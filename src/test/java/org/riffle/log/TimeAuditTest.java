package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The time audit: its median against a full sort (the obvious oracle), and its gap rule. */
class TimeAuditTest {
    @Test
    void medianBySelectionEqualsMedianBySorting() {
        SplittableRandom rnd = new SplittableRandom(11L);
        for (int k = 0; k < 2000; k++) {
            int n = 1 + rnd.nextInt(300);
            double[] a = new double[n];
            for (int i = 0; i < n; i++) {
                a[i] = rnd.nextInt(4) == 0 ? 1.0 : rnd.nextInt(50) / 10.0;
            }
            double[] s = a.clone();
            Arrays.sort(s);
            double want = n % 2 == 1 ? s[n / 2] : (s[n / 2 - 1] + s[n / 2]) / 2;
            assertEquals(want, TimeAudit.median(a, n), 0.0, Arrays.toString(s));
        }
    }

    @Test
    void aStepAboveOneAndAHalfMediansIsAGapAndNothingIsChanged() {
        double[] t = {0, 1, 2, 3.5, 4.5, 6.0001, 7, 7, 6.5};
        double[] copy = t.clone();
        RowLines lines = new RowLines();
        for (int i = 0; i < t.length; i++) {
            lines.note(i, 10 + i + (i > 4 ? 1 : 0));
        }
        TimeAudit.Result r = TimeAudit.audit(t, lines);
        // positive steps 1, 1, 1.5, 1, 1.5001, 0.9999: median 1, so 1.5 is no gap and 1.5001 is one
        assertEquals(1.0, r.medianStep(), 1e-12);
        assertEquals(List.of(new TimeIssue(TimeIssue.Kind.GAP, 5, 16, 1.5001 + 0 * 1e-12),
                new TimeIssue(TimeIssue.Kind.DUPLICATE, 7, 18, 0.0),
                new TimeIssue(TimeIssue.Kind.BACKWARD, 8, 19, -0.5)), rounded(r.issues()));
        assertEquals(Arrays.toString(copy), Arrays.toString(t), "the times are not touched");
    }

    private static List<TimeIssue> rounded(List<TimeIssue> issues) {
        return issues.stream().map(i -> new TimeIssue(i.kind(), i.row(), i.line(),
                Math.round(i.stepSeconds() * 1e9) / 1e9)).toList();
    }

    @Test
    void oneRowOrNoForwardStepGivesANoteNotAFailure() {
        RowLines lines = new RowLines();
        lines.note(0, 2);
        assertEquals(1.0, TimeAudit.audit(new double[] {5}, lines).rateHz());
        TimeAudit.Result same = TimeAudit.audit(new double[] {5, 5, 5}, lines);
        assertEquals(List.of("no time step is positive: the sample rate cannot be inferred (1 Hz shown)",
                "time: 2 duplicate timestamps"), same.notes());
    }
}
