package org.riffle.log;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Checks a time column as read and infers its nominal rate; it changes nothing. The rate is 1 / the
 * median step. A step above {@link #GAP_FACTOR} times the median is a gap (1.5: halfway between one
 * step and two, so a single lost sample is reported while timing jitter of up to half a step is not);
 * a zero step is a duplicate; a negative one a backward step (clock set back, logger restart, the
 * autumn daylight-saving change in local time). At most {@link #MAX_LISTED} issues are listed; the
 * notes give the totals.
 *
 * <p>The median is found with Hoare's selection algorithm (Hoare 1961, CACM 4(7):321, "Algorithm 65:
 * find") on a copy of the steps, in linear expected time. Stateless and thread-safe.
 */
final class TimeAudit {
    /** A step above this many median steps is a gap. */
    static final double GAP_FACTOR = 1.5;
    /** Most issues listed in a recording. */
    static final int MAX_LISTED = 10_000;

    private TimeAudit() {
    }

    /** The audit of one time column. */
    record Result(double rateHz, double medianStep, List<TimeIssue> issues, List<String> notes) {
    }

    static Result audit(double[] t, RowLines lines) {
        return audit(t, t.length, lines, -1);
    }

    /**
     * As {@link #audit(double[], RowLines)} for the first {@code n} times of {@code t}, leaving out the
     * step into row {@code join} (where a reduced
     * log's two windows meet; -1 for none): it is no step of the clock.
     */
    static Result audit(double[] t, int n, RowLines lines, int join) {
        List<String> notes = new ArrayList<>();
        if (n < 2) {
            notes.add("only " + n + " row: the sample rate cannot be inferred (1 Hz shown)");
            return new Result(1, Double.NaN, List.of(), notes);
        }
        double[] steps = new double[n - 1];
        int positive = 0;
        for (int i = 1; i < n; i++) {
            double s = t[i] - t[i - 1];
            if (s > 0 && i != join) {
                steps[positive++] = s;
            }
        }
        if (positive == 0) {
            notes.add("no time step is positive: the sample rate cannot be inferred (1 Hz shown)");
            return new Result(1, Double.NaN, issues(t, n, lines, Double.POSITIVE_INFINITY, join, notes), notes);
        }
        double median = median(steps, positive);
        List<TimeIssue> issues = issues(t, n, lines, GAP_FACTOR * median, join, notes);
        return new Result(1 / median, median, issues, notes);
    }

    private static List<TimeIssue> issues(double[] t, int n, RowLines lines, double gapAbove, int join,
                                          List<String> notes) {
        List<TimeIssue> out = new ArrayList<>();
        int[] count = new int[TimeIssue.Kind.values().length];
        for (int i = 1; i < n; i++) {
            if (i == join) {
                continue;
            }
            double s = t[i] - t[i - 1];
            TimeIssue.Kind k = s < 0 ? TimeIssue.Kind.BACKWARD : s == 0 ? TimeIssue.Kind.DUPLICATE
                    : s > gapAbove ? TimeIssue.Kind.GAP : null;
            if (k != null) {
                count[k.ordinal()]++;
                if (out.size() < MAX_LISTED) {
                    out.add(new TimeIssue(k, i, lines.line(i), s));
                }
            }
        }
        int total = count[0] + count[1] + count[2];
        if (total > 0) {
            List<String> parts = new ArrayList<>();
            if (count[0] > 0) {
                parts.add(String.format(Locale.ROOT, "%d %s (steps above %.3g s)", count[0],
                        count[0] == 1 ? "gap" : "gaps", gapAbove));
            }
            if (count[1] > 0) {
                parts.add(count[1] + (count[1] == 1 ? " duplicate timestamp" : " duplicate timestamps"));
            }
            if (count[2] > 0) {
                parts.add(count[2] + (count[2] == 1 ? " backward step" : " backward steps"));
            }
            notes.add("time: " + String.join(", ", parts) + (total > MAX_LISTED ? "; the first " + MAX_LISTED
                    + " are listed" : ""));
        }
        return out;
    }

    /** The median of {@code a[0, n)} (the mean of the two middle values when n is even); reorders a. */
    static double median(double[] a, int n) {
        double hi = select(a, 0, n - 1, n / 2);
        if ((n & 1) == 1) {
            return hi;
        }
        double lo = a[0];
        for (int i = 1; i < n / 2; i++) {
            lo = Math.max(lo, a[i]);
        }
        return (lo + hi) / 2;
    }

    /** Puts the k-th smallest of a[lo..hi] at a[k], smaller ones before it; returns it. */
    private static double select(double[] a, int lo, int hi, int k) {
        while (lo < hi) {
            double pivot = a[lo + (hi - lo) / 2];
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (a[i] < pivot) {
                    i++;
                }
                while (a[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    double x = a[i];
                    a[i] = a[j];
                    a[j] = x;
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                break;
            }
        }
        return a[k];
    }
}
