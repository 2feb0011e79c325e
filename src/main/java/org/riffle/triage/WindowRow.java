package org.riffle.triage;

/**
 * One window of a channel's windowed trend: its place, its RQA measures, its plain level and spread,
 * its reservoir novelty, and the judgement. Sample indices are 0-based, end exclusive. Measures that
 * were not computed are {@code NaN}. Immutable.
 */
public record WindowRow(int startIndex, int endIndex, double startSeconds, double endSeconds,
                        double rr, double det, double l, double lmax, double entr, double lam, double tt,
                        double mean, double std, double novelty, Level level) {
}
