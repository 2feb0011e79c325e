package org.riffle.signal;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.Objects;

/**
 * A frequency band [loHz, hiHz] and how it was chosen. Immutable.
 *
 * @param loHz lower edge in Hz, ≥ 0
 * @param hiHz upper edge in Hz, above the lower
 * @param how how it was chosen, ready to print (e.g. {@code "given"})
 */
public record Band(double loHz, double hiHz, String how) {
    public Band {
        Objects.requireNonNull(how, "how");
        if (!(loHz >= 0) || !(hiHz > loHz) || Double.isInfinite(hiHz)) {
            throw new IllegalArgumentException("band " + loHz + "-" + hiHz + " Hz is not 0 <= low < high");
        }
    }

    /**
     * Parses {@code LO:HI} in Hz, e.g. {@code 10:1000}.
     *
     * @throws IllegalArgumentException with a message fit to print when the text is not such a band
     */
    public static Band parse(String text) {
        String[] parts = text.trim().split(":");
        if (parts.length != 2) {
            throw new IllegalArgumentException("band '" + text + "' is not LO:HI in Hz, e.g. 500:2000");
        }
        try {
            return new Band(Double.parseDouble(parts[0].trim()), Double.parseDouble(parts[1].trim()), "given");
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("band '" + text + "' is not LO:HI in Hz, e.g. 500:2000", e);
        }
    }

    /** E.g. {@code "10-1000 Hz"}. */
    public String label() {
        return hz(loHz) + "-" + hz(hiHz) + " Hz";
    }

    /** A frequency to four significant digits, trailing zeros dropped, e.g. {@code 10}, {@code 12.5}. */
    public static String hz(double v) {
        return new BigDecimal(String.format(Locale.ROOT, "%.4g", v)).stripTrailingZeros().toPlainString();
    }
}
