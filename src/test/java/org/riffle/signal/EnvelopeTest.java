package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Envelope spectrum of synthetic outer-race impulses (the signal model of Randall &amp; Antoni 2011,
 * Mech. Syst. Signal Process. 25:485, §2: impulses at BPFO with 1 % random jitter for slip, each
 * ringing a structural resonance, under a strong shaft line and noise).
 */
class EnvelopeTest {
    static final double FS = 12_800;
    static final double SHAFT_HZ = 30;
    static final double RESONANCE_HZ = 3_000;
    /** n = 8, d/D = 0.2, φ = 0, 1800 r/min (DOMAIN.md §3 worked example). */
    static final BearingGeometry BEARING = new BearingGeometry(8, 1, 5, 0);

    /** Seeded synthetic signal: shaft line 2.0, impulses of 1.0 ringing at 3 kHz (τ = 1 ms), noise 0.3. */
    static double[] outerRaceFault(int n, long seed) {
        Random rnd = new Random(seed);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 2.0 * Math.sin(2 * Math.PI * SHAFT_HZ * i / FS) + 0.3 * rnd.nextGaussian();
        }
        double period = 1 / BEARING.bpfo(SHAFT_HZ);
        for (double t = 0.001; t * FS < n; t += period * (1 + 0.01 * (2 * rnd.nextDouble() - 1))) {
            int start = (int) Math.ceil(t * FS);
            for (int i = start; i < Math.min(n, start + (int) (0.01 * FS)); i++) {
                double dt = i / FS - t;
                x[i] += Math.exp(-dt / 0.001) * Math.sin(2 * Math.PI * RESONANCE_HZ * dt);
            }
        }
        return x;
    }

    @Test
    void outerRaceImpulsesShowTheirLineInTheEnvelopeSpectrum() {
        double[] x = outerRaceFault((int) FS * 10, 5L);
        Band band = Envelope.chooseBand(x, 0, x.length, FS);
        assertTrue(band.loHz() <= RESONANCE_HZ && RESONANCE_HZ <= band.hiHz(), "band " + band + " holds 3 kHz");
        Spectrum env = Envelope.spectrum(x, 0, x.length, FS, band, WelchParams.auto());
        FaultLine bpfo = FaultLines.check(env, "envelope", "BPFO", 96, 0.02);
        assertTrue(bpfo.present(), bpfo.toString());
        assertEquals(96, bpfo.foundHz(), 96 * 0.02, "within the slip tolerance");
        assertTrue(bpfo.amplitudeRms() > 10 * bpfo.floorRms(), bpfo.toString());
        assertFalse(FaultLines.check(env, "envelope", "BPFI", 144, 0.02).present(), "no inner-race fault was made");
        assertFalse(FaultLines.check(env, "envelope", "BSF", 72, 0.02).present(), "no rolling-element fault");
    }

    @Test
    void withoutImpulsesNoBearingLineIsPresent() {
        Random rnd = new Random(9L);
        double[] x = new double[(int) FS * 10];
        for (int i = 0; i < x.length; i++) {
            x[i] = 2.0 * Math.sin(2 * Math.PI * SHAFT_HZ * i / FS) + 0.3 * rnd.nextGaussian();
        }
        Spectrum env = Envelope.spectrum(x, 0, x.length, FS, new Band(2400, 4000, "given"), WelchParams.auto());
        for (FaultLine l : FaultLines.bearing(env, "envelope", BEARING, SHAFT_HZ, 0.02)) {
            assertFalse(l.present(), l.toString());
        }
    }

    /** analytic: the band-limited analytic signal of cos(ωt) in band is e^{iωt}, envelope 1; out of band, 0. */
    @Test
    void bandLimitedAnalyticSignalOfACosine() {
        int n = 4096;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.cos(2 * Math.PI * 64.0 * i / n);
        }
        double[][] in = Envelope.analytic(x, 0, n, n, 50, 80);
        double[][] out = Envelope.analytic(x, 0, n, n, 100, 200);
        for (int i = 0; i < n; i++) {
            assertEquals(1, Math.hypot(in[0][i], in[1][i]), 1e-9);
            assertEquals(0, Math.hypot(out[0][i], out[1][i]), 1e-9);
        }
    }
}
