package org.riffle.signal;

import java.util.Locale;

/**
 * Rolling-bearing geometry and its defect frequencies, with shaft frequency f (Hz) and k = (d/D)·cos φ
 * (the textbook kinematic formulas, as listed in DOMAIN.md §3): FTF = f/2·(1 − k); BPFO = n·f/2·(1 − k); BPFI = n·f/2·(1 + k);
 * BSF = D/(2d)·f·(1 − k²). Real lines sit 1–2 % off through slip (Randall &amp; Antoni 2011, Mech. Syst.
 * Signal Process. 25:485). Immutable.
 *
 * @param elements number of rolling elements n
 * @param elementDiameter rolling-element diameter d (any length unit, the same as D)
 * @param pitchDiameter pitch diameter D
 * @param contactAngleDeg contact angle φ in degrees
 */
public record BearingGeometry(int elements, double elementDiameter, double pitchDiameter, double contactAngleDeg) {
    public BearingGeometry {
        if (elements < 3) {
            throw new IllegalArgumentException("a bearing with " + elements + " rolling elements: need at least 3");
        }
        if (!(elementDiameter > 0) || !(pitchDiameter > elementDiameter) || Double.isInfinite(pitchDiameter)) {
            throw new IllegalArgumentException("element diameter " + elementDiameter + " and pitch diameter "
                    + pitchDiameter + ": need 0 < d < D");
        }
        if (!(contactAngleDeg >= 0 && contactAngleDeg < 90)) {
            throw new IllegalArgumentException("contact angle " + contactAngleDeg + " degrees is not in [0, 90)");
        }
    }

    /**
     * Parses {@code N,d,D[,ANGLE]}: elements, element diameter, pitch diameter (same unit), contact angle
     * in degrees (0 when left out).
     *
     * @throws IllegalArgumentException with a message fit to print
     */
    public static BearingGeometry parse(String text) {
        String[] p = text.split(",");
        String usage = "bearing '" + text + "' is not N,d,D[,ANGLE] (elements, element and pitch diameter, "
                + "contact angle in degrees), e.g. 8,7.9,39.7,0";
        if (p.length < 3 || p.length > 4) {
            throw new IllegalArgumentException(usage);
        }
        try {
            return new BearingGeometry(Integer.parseInt(p[0].strip()), Double.parseDouble(p[1].strip()),
                    Double.parseDouble(p[2].strip()), p.length == 4 ? Double.parseDouble(p[3].strip()) : 0);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(usage, e);
        }
    }

    private double k() {
        return elementDiameter / pitchDiameter * Math.cos(Math.toRadians(contactAngleDeg));
    }

    /** Fundamental train (cage) frequency in Hz at shaft frequency {@code shaftHz}. */
    public double ftf(double shaftHz) {
        return shaftHz / 2 * (1 - k());
    }

    /** Ball pass frequency, outer race, in Hz. */
    public double bpfo(double shaftHz) {
        return elements * shaftHz / 2 * (1 - k());
    }

    /** Ball pass frequency, inner race, in Hz. */
    public double bpfi(double shaftHz) {
        return elements * shaftHz / 2 * (1 + k());
    }

    /** Ball (rolling element) spin frequency in Hz. */
    public double bsf(double shaftHz) {
        double k = k();
        return pitchDiameter / (2 * elementDiameter) * shaftHz * (1 - k * k);
    }

    /** E.g. {@code "8 elements, d 7.9, D 39.7, contact angle 0 deg"}. */
    public String describe() {
        return String.format(Locale.ROOT, "%d elements, d %.4g, D %.4g, contact angle %.3g deg", elements,
                elementDiameter, pitchDiameter, contactAngleDeg);
    }
}
