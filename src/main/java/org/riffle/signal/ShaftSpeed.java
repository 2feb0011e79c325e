package org.riffle.signal;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * The shaft speed used for order and bearing lines, and how it was found. Immutable.
 *
 * @param hz shaft frequency in Hz (r/min ÷ 60)
 * @param how how it was found, ready to print
 * @param given true when the user gave it
 */
public record ShaftSpeed(double hz, String how, boolean given) {
    /** Estimation looks for the shaft line between these frequencies (120–15 000 r/min, the standard's range). */
    public static final double MIN_HZ = 2;
    /** Upper end of the search, in Hz. */
    public static final double MAX_HZ = 250;

    public ShaftSpeed {
        Objects.requireNonNull(how, "how");
        if (!(hz > 0) || Double.isInfinite(hz)) {
            throw new IllegalArgumentException("shaft frequency " + hz + " Hz is not positive and finite");
        }
    }

    /** Speed in r/min. */
    public double rpm() {
        return hz * 60;
    }

    /** The speed the user gave, in r/min. */
    public static ShaftSpeed given(double rpm) {
        return new ShaftSpeed(rpm / 60, "given", true);
    }

    /**
     * An estimate from {@code velocity}, a spectrum in velocity (or weighted to velocity): the strongest
     * line between {@link #MIN_HZ} and {@link #MAX_HZ} (or 1/2.56 of the sample rate) is taken as 1x,
     * since the shaft line usually dominates the low-order velocity spectrum (common practice). Says so,
     * and says when a line at half that frequency also stands above the floor (then 1x may be lower).
     */
    public static Optional<ShaftSpeed> estimate(Spectrum velocity) {
        double top = Math.min(MAX_HZ, velocity.sampleRateHz() / 2.56);
        double bottom = Math.max(MIN_HZ, 3 * velocity.binHz());
        if (velocity.segments() == 0 || top <= bottom) {
            return Optional.empty();
        }
        Optional<Peak> strongest = Peaks.strongestIn(velocity, bottom, top);
        if (strongest.isEmpty()) {
            return Optional.empty();
        }
        Peak best = strongest.get();
        String how = String.format(Locale.ROOT, "estimated: strongest velocity line between %.3g and %.3g Hz taken "
                + "as 1x; give the speed to be sure", bottom, top);
        FaultLine half = FaultLines.check(velocity, "spectrum", "1/2", best.frequencyHz() / 2, 0.01);
        if (half.present()) {
            how += String.format(Locale.ROOT, " (a line at %.4g Hz also stands out: 1x may be that)", half.foundHz());
        }
        return Optional.of(new ShaftSpeed(best.frequencyHz(), how, false));
    }
}
