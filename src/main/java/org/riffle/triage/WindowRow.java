package org.riffle.triage;

/**
 * One window of a channel's windowed trend: its place, its RQA measures, its plain level and spread,
 * its reservoir novelty, its departure score and the judgement. Sample indices are 0-based, end
 * exclusive. Measures that were not computed are {@code NaN}. Immutable.
 *
 * @param novelty one-step prediction RMS error in the window divided by the baseline's held-out RMS error
 * @param departure the window's largest departure over all measures divided by the alert level (above 1
 *     means flagged); {@code NaN} when not judged
 * @param div 1 / Lmax, NaN when not computed
 * @param vmax longest vertical line, NaN when not computed
 * @param level the window's judgement; {@code null} when the channel has no estimate (then departure
 *     and novelty are NaN too)
 */
public record WindowRow(int startIndex, int endIndex, double startSeconds, double endSeconds,
                        double rr, double det, double l, double lmax, double entr, double lam, double tt,
                        double div, double vmax, double mean, double std, double novelty, double departure,
                        Level level) {
    /** A row without DIV, Vmax and departure score. */
    public WindowRow(int startIndex, int endIndex, double startSeconds, double endSeconds,
                     double rr, double det, double l, double lmax, double entr, double lam, double tt,
                     double mean, double std, double novelty, Level level) {
        this(startIndex, endIndex, startSeconds, endSeconds, rr, det, l, lmax, entr, lam, tt, Double.NaN, Double.NaN,
                mean, std, novelty, Double.NaN, level);
    }

    /** True when the window was judged ({@link #level()} is not {@code null}). */
    public boolean judged() {
        return level != null;
    }

    /** 1 when the judgement is anything but steady, else 0 (the {@code flag} column); 0 when not judged. */
    public int flag() {
        return level == null || level == Level.STEADY ? 0 : 1;
    }
}
