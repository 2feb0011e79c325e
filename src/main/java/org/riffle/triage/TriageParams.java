package org.riffle.triage;

/**
 * What the triage is asked to do: which baseline rows, how many worker threads. Engine parameters
 * join here as the engines arrive. Immutable.
 *
 * @param baselineFrom first baseline row, or -1 for the default (first 25 %)
 * @param baselineTo end of the baseline rows (exclusive), or -1 for the default
 * @param threads worker threads, at least 1
 */
public record TriageParams(int baselineFrom, int baselineTo, int threads) {
    public TriageParams {
        if (threads < 1) {
            throw new IllegalArgumentException("threads " + threads + " must be at least 1");
        }
        if ((baselineFrom < 0) != (baselineTo < 0)) {
            throw new IllegalArgumentException("baseline " + baselineFrom + ":" + baselineTo
                    + " needs both ends or neither");
        }
    }

    /** Defaults: first 25 % as baseline, one thread per core. */
    public static TriageParams defaults() {
        return new TriageParams(-1, -1, Runtime.getRuntime().availableProcessors());
    }

    /** The baseline these parameters select on a log of {@code rows} rows. */
    public Baseline baselineFor(int rows) {
        if (baselineFrom < 0) {
            return Baseline.firstQuarter(rows);
        }
        if (baselineTo > rows) {
            throw new IllegalArgumentException("baseline " + baselineFrom + ":" + baselineTo
                    + " ends after the last row " + rows);
        }
        return new Baseline(baselineFrom, baselineTo, "rows " + baselineFrom + "-" + baselineTo);
    }
}
