package org.riffle.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class BearingGeometryTest {
    /**
     * Worked example (textbook formula, recomputed by hand; DOMAIN.md §3): n = 8, d/D = 0.2, φ = 0,
     * 1800 r/min (30 Hz) gives FTF 12, BPFO 96, BPFI 144, BSF 72 Hz. Tolerance 1e-9 Hz: the formulas
     * are a handful of exact-ish double operations.
     */
    @Test
    void textbookWorkedExample() {
        BearingGeometry b = new BearingGeometry(8, 20.0, 100.0, 0.0);
        assertEquals(12.0, b.ftf(30), 1e-9);
        assertEquals(96.0, b.bpfo(30), 1e-9);
        assertEquals(144.0, b.bpfi(30), 1e-9);
        assertEquals(72.0, b.bsf(30), 1e-9);
    }

    /** Analytic: BPFO + BPFI = n·f for any geometry (the (1−k) and (1+k) terms cancel). */
    @Test
    void outerAndInnerRacePassFrequenciesSumToElementsTimesShaft() {
        BearingGeometry b = Af2.BEARING;
        double f = Af2.RECORDING_RPM / 60;
        assertEquals(b.elements() * f, b.bpfo(f) + b.bpfi(f), 1e-9);
    }

    @Test
    void rejectsAnElementLargerThanThePitchCircle() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BearingGeometry(8, 120.0, 100.0, 0.0));
        assertEquals("element diameter 120.0 mm must be positive and below the pitch diameter 100.0 mm",
                e.getMessage());
    }
}
