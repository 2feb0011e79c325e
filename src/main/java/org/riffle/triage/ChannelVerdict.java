package org.riffle.triage;

import java.util.Arrays;
import org.riffle.log.TimeBase;

/**
 * A channel's judgement from its windows' scores and levels, as documented in the README:
 * <ul>
 * <li>current score S̃ = median score of the last {@code sustained} judged windows;</li>
 * <li>health = 100 when S̃ ≤ T, else 100 · T / S̃ (T the alert level): 100 means indistinguishable from
 *     the baseline, strictly falling as the departure grows, 50 at twice the alert level;</li>
 * <li>level: departed when the last judged window is departed; watch when any of the last
 *     {@code sustained} judged windows is above T, or a sustained departure occurred after the baseline,
 *     or more than 10 % of the windows after the baseline are above T; steady otherwise;</li>
 * <li>since: the first window of the first sustained departure outside the baseline.</li>
 * </ul>
 * Stateless.
 */
final class ChannelVerdict {
    /** Share of flagged windows after the baseline that makes a channel "watch" by itself. */
    static final double FLAGGED_SHARE_WATCH = 0.10;

    private ChannelVerdict() {
    }

    static Health judge(double[] scores, Level[] levels, boolean[] inBaseline, Windows w, double alert,
                        int sustained, TimeBase time) {
        int[] judged = java.util.stream.IntStream.range(0, scores.length).filter(i -> !Double.isNaN(scores[i]))
                .toArray();
        if (judged.length == 0) {
            return Health.none("no window could be judged (too many missing samples)");
        }
        int tail = Math.min(sustained, judged.length);
        double[] last = new double[tail];
        boolean recentAbove = false;
        for (int i = 0; i < tail; i++) {
            int k = judged[judged.length - tail + i];
            last[i] = scores[k];
            recentAbove |= scores[k] > alert;
        }
        double current = Judge.median(last);
        double figure = current <= alert ? 100 : 100 * alert / current;
        int since = -1;
        int outside = 0;
        int flagged = 0;
        for (int k : judged) {
            if (inBaseline[k]) {
                continue;
            }
            outside++;
            flagged += scores[k] > alert ? 1 : 0;
            if (since < 0 && levels[k] == Level.DEPARTED) {
                since = k - (sustained - 1);
            }
        }
        Level level;
        if (levels[judged[judged.length - 1]] == Level.DEPARTED) {
            level = Level.DEPARTED;
        } else if (recentAbove || since >= 0 || (outside > 0 && flagged > FLAGGED_SHARE_WATCH * outside)) {
            level = Level.WATCH;
        } else {
            level = Level.STEADY;
        }
        int sinceIndex = since >= 0 ? w.start(Math.max(0, since)) : -1;
        double sinceSeconds = sinceIndex >= 0 ? time.seconds(sinceIndex) : Double.NaN;
        return new Health(figure, level, sinceIndex, sinceSeconds, "");
    }

    /** Flagged share of the windows outside the baseline (for reports), NaN when none. */
    static double flaggedShare(double[] scores, boolean[] inBaseline, double alert) {
        int[] counts = new int[2];
        for (int k = 0; k < scores.length; k++) {
            if (!inBaseline[k] && !Double.isNaN(scores[k])) {
                counts[0]++;
                counts[1] += scores[k] > alert ? 1 : 0;
            }
        }
        return counts[0] == 0 ? Double.NaN : (double) counts[1] / counts[0];
    }

    static boolean[] none(int n) {
        boolean[] b = new boolean[n];
        Arrays.fill(b, false);
        return b;
    }
}
