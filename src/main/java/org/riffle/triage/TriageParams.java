package org.riffle.triage;

import java.util.Objects;
import org.riffle.recurrence.RqaParams;
import org.riffle.reservoir.EsnParams;
import org.riffle.signal.VibrationParams;

/**
 * What the triage is asked to do. Immutable; derive changed copies with the {@code with...} methods.
 *
 * @param baselineFrom first baseline row, or -1 for the default (first 25 %)
 * @param baselineTo end of the baseline rows (exclusive), or -1 for the default
 * @param threads worker threads, at least 1 (results do not depend on it)
 * @param window trend window in samples (at least 2), 0 for automatic (baseline rows / 16, clamped to
 *     100..500)
 * @param step trend step in samples, 0 for automatic: half the window, or the whole window when half
 *     steps would give the log more than {@link #HALF_STEP_WINDOWS} windows
 * @param reservoir reservoir settings; with {@code search} its radius, leak and ridge are only the start
 * @param search true to choose spectral radius, leak and ridge by the automatic search on the baseline
 * @param quantile calibration quantile of the baseline windows' scores (0.5 to 0.9999), default 0.99
 * @param sustained consecutive windows above the alert level that make a departure sustained (1 to 50)
 * @param rqa recurrence settings; automatic m and τ and the threshold policy are resolved on the baseline
 * @param vibration what the user said about the machine (group, support, speed, bearing) for the
 *     vibration figures of velocity and acceleration channels
 */
public record TriageParams(int baselineFrom, int baselineTo, int threads, int window, int step,
                           EsnParams reservoir, boolean search, double quantile, int sustained, RqaParams rqa,
                           VibrationParams vibration) {
    /** Default calibration quantile. */
    public static final double DEFAULT_QUANTILE = 0.99;
    /**
     * Most trend windows a log gets from automatic half-window steps; a longer log is stepped a whole
     * window at a time, which halves the recurrence work of long logs and still gives more than 500
     * windows, more than a screen can show.
     */
    public static final int HALF_STEP_WINDOWS = 1000;
    /** Default number of windows for a sustained departure. */
    public static final int DEFAULT_SUSTAINED = 3;

    public TriageParams {
        Objects.requireNonNull(reservoir, "reservoir");
        Objects.requireNonNull(rqa, "rqa");
        Objects.requireNonNull(vibration, "vibration");
        if (threads < 1) {
            throw new IllegalArgumentException("threads " + threads + " must be at least 1");
        }
        if ((baselineFrom < 0) != (baselineTo < 0)) {
            throw new IllegalArgumentException("baseline " + baselineFrom + ":" + baselineTo
                    + " needs both ends or neither");
        }
        if (baselineFrom >= 0 && baselineTo <= baselineFrom) {
            throw new IllegalArgumentException("baseline " + baselineFrom + ":" + baselineTo + " is empty");
        }
        if (window < 0 || step < 0 || (window > 0 && window < 2)) {
            throw new IllegalArgumentException("window " + window + " must be at least 2 and step " + step
                    + " at least 1");
        }
        if (window > 0 && step > window) {
            throw new IllegalArgumentException("step " + step + " exceeds the window " + window);
        }
        if (!(quantile >= 0.5 && quantile <= 0.9999)) {
            throw new IllegalArgumentException("calibration quantile " + quantile + " must be in [0.5, 0.9999]");
        }
        if (sustained < 1 || sustained > 50) {
            throw new IllegalArgumentException("sustained run " + sustained + " must be 1 to 50 windows");
        }
    }

    /** Baseline rows and threads as given, everything else default. */
    public TriageParams(int baselineFrom, int baselineTo, int threads) {
        this(baselineFrom, baselineTo, threads, 0, 0, EsnParams.defaults(), true, DEFAULT_QUANTILE,
                DEFAULT_SUSTAINED, RqaParams.defaults(), VibrationParams.defaults());
    }

    /** Defaults: first 25 % as baseline, one thread per core, automatic windows and search. */
    public static TriageParams defaults() {
        return new TriageParams(-1, -1, Runtime.getRuntime().availableProcessors());
    }

    public TriageParams withBaseline(int from, int to) {
        return new TriageParams(from, to, threads, window, step, reservoir, search, quantile, sustained,
                rqa, vibration);
    }

    public TriageParams withThreads(int n) {
        return new TriageParams(baselineFrom, baselineTo, n, window, step, reservoir, search, quantile, sustained,
                rqa, vibration);
    }

    public TriageParams withWindow(int w, int s) {
        return new TriageParams(baselineFrom, baselineTo, threads, w, s, reservoir, search, quantile, sustained,
                rqa, vibration);
    }

    public TriageParams withReservoir(EsnParams p) {
        return new TriageParams(baselineFrom, baselineTo, threads, window, step, p, search, quantile, sustained,
                rqa, vibration);
    }

    public TriageParams withSearch(boolean on) {
        return new TriageParams(baselineFrom, baselineTo, threads, window, step, reservoir, on, quantile, sustained,
                rqa, vibration);
    }

    public TriageParams withQuantile(double q) {
        return new TriageParams(baselineFrom, baselineTo, threads, window, step, reservoir, search, q, sustained,
                rqa, vibration);
    }

    public TriageParams withRqa(RqaParams p) {
        return new TriageParams(baselineFrom, baselineTo, threads, window, step, reservoir, search, quantile,
                sustained, p, vibration);
    }

    public TriageParams withVibration(VibrationParams p) {
        return new TriageParams(baselineFrom, baselineTo, threads, window, step, reservoir, search, quantile,
                sustained, rqa, p);
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

    /** The trend window for a baseline of {@code baselineRows} rows. */
    public int windowFor(int baselineRows) {
        return window > 0 ? window : Math.max(100, Math.min(500, baselineRows / 16));
    }

    /** The trend step for a baseline of {@code baselineRows} rows in a log of {@code rows} rows. */
    public int stepFor(int baselineRows, int rows) {
        if (step > 0) {
            return step;
        }
        int w = windowFor(baselineRows);
        int half = Math.max(1, w / 2);
        return rows / half > HALF_STEP_WINDOWS ? w : half;
    }
}
