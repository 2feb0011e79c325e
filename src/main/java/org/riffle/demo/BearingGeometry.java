package org.riffle.demo;

/**
 * Rolling-bearing geometry and its defect frequencies (kinematic formulas, no slip): with shaft
 * frequency f, k = (d/D)·cos φ: FTF = f/2·(1−k), BPFO = n·f/2·(1−k), BPFI = n·f/2·(1+k),
 * BSF = D/(2d)·f·(1−k²). Source: the standard textbook formulas, e.g. Randall &amp; Antoni 2011,
 * Mech. Syst. Signal Process. 25:485. Immutable.
 *
 * @param elements number of rolling elements n
 * @param elementDiameterMm rolling-element diameter d in mm
 * @param pitchDiameterMm pitch diameter D in mm
 * @param contactAngleDeg contact angle φ in degrees
 */
record BearingGeometry(int elements, double elementDiameterMm, double pitchDiameterMm, double contactAngleDeg) {
    BearingGeometry {
        if (elements < 3) {
            throw new IllegalArgumentException("a bearing needs at least 3 rolling elements, got " + elements);
        }
        if (!(elementDiameterMm > 0) || !(pitchDiameterMm > elementDiameterMm)) {
            throw new IllegalArgumentException("element diameter " + elementDiameterMm
                    + " mm must be positive and below the pitch diameter " + pitchDiameterMm + " mm");
        }
    }

    private double k() {
        return elementDiameterMm / pitchDiameterMm * StrictMath.cos(StrictMath.toRadians(contactAngleDeg));
    }

    /** Fundamental train (cage) frequency in Hz for a shaft at {@code shaftHz}. */
    double ftf(double shaftHz) {
        return shaftHz / 2 * (1 - k());
    }

    /** Ball pass frequency, outer race, in Hz. */
    double bpfo(double shaftHz) {
        return elements * shaftHz / 2 * (1 - k());
    }

    /** Ball pass frequency, inner race, in Hz. */
    double bpfi(double shaftHz) {
        return elements * shaftHz / 2 * (1 + k());
    }

    /** Ball (rolling element) spin frequency in Hz. */
    double bsf(double shaftHz) {
        double k = k();
        return pitchDiameterMm / (2 * elementDiameterMm) * shaftHz * (1 - k * k);
    }
}
