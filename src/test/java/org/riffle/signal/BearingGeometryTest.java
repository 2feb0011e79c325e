package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * Bearing defect frequencies. Worked example (textbook formula, recomputed; DOMAIN.md §3): n = 8,
 * d/D = 0.2, φ = 0, 1800 r/min → FTF 12, BPFO 96, BPFI 144, BSF 72 Hz. These are exact in decimal
 * arithmetic, so the tolerance 1e-9 Hz only absorbs binary round-off.
 */
class BearingGeometryTest {
    @Test
    void textbookWorkedExample() {
        BearingGeometry g = new BearingGeometry(8, 1.0, 5.0, 0);
        double f = 1800 / 60.0;
        assertEquals(12, g.ftf(f), 1e-9);
        assertEquals(96, g.bpfo(f), 1e-9);
        assertEquals(144, g.bpfi(f), 1e-9);
        assertEquals(72, g.bsf(f), 1e-9);
    }

    /** analytic: with a contact angle, k = (d/D)·cos φ; at 60° cos φ = 0.5, so k = 0.1 here. */
    @Test
    void contactAngleEntersThroughItsCosine() {
        BearingGeometry g = BearingGeometry.parse("8, 1, 5, 60");
        assertEquals(8 * 30 / 2.0 * 0.9, g.bpfo(30), 1e-9);
        assertEquals(8 * 30 / 2.0 * 1.1, g.bpfi(30), 1e-9);
        assertEquals(2.5 * 30 * (1 - 0.01), g.bsf(30), 1e-9);
    }

    @Test
    void badGeometryIsRefusedWithItsValues() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> BearingGeometry.parse("8,5,1"));
        assertEquals("element diameter 5.0 and pitch diameter 1.0: need 0 < d < D", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> BearingGeometry.parse("eight,1,5"));
        assertEquals("bearing 'eight,1,5' is not N,d,D[,ANGLE] (elements, element and pitch diameter, contact "
                + "angle in degrees), e.g. 8,7.9,39.7,0", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new BearingGeometry(2, 1, 5, 0));
        assertEquals("a bearing with 2 rolling elements: need at least 3", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new BearingGeometry(8, 1, 5, 90));
        assertEquals("contact angle 90.0 degrees is not in [0, 90)", e.getMessage());
    }
}
