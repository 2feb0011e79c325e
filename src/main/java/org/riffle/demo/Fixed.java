package org.riffle.demo;

/**
 * Fixed-point decimal text of a double, by integer arithmetic only, so the fixtures do not depend on
 * the JDK's float-to-text algorithm (which changed in JDK 19). Stateless.
 */
final class Fixed {
    private static final long[] POW10 = {1, 10, 100, 1_000, 10_000, 100_000, 1_000_000};

    private Fixed() {
    }

    /** Appends {@code v} rounded half-up to {@code decimals} (0..6) places, point as separator, no exponent. */
    static StringBuilder append(StringBuilder sb, double v, int decimals) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("cannot format " + v);
        }
        long scale = POW10[decimals];
        long r = Math.round(v * scale);
        if (r < 0) {
            sb.append('-');
            r = -r;
        }
        sb.append(r / scale);
        if (decimals > 0) {
            String frac = Long.toString(r % scale);
            sb.append('.');
            for (int i = frac.length(); i < decimals; i++) {
                sb.append('0');
            }
            sb.append(frac);
        }
        return sb;
    }

    /** {@code v} as text with {@code decimals} places. */
    static String format(double v, int decimals) {
        return append(new StringBuilder(), v, decimals).toString();
    }
}
