package org.riffle.signal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * Finds spectral lines and measures them.
 *
 * <p>Amplitude: the power summed over the line's main lobe (±2 segment bins for the Hann window,
 * ±2·fftLength/segmentLength grid bins when zero-padded), square-rooted. The Hann main lobe holds all
 * but ~0.05 % of a sine's power wherever the sine falls between bins (analytic: |W(x)| ∝
 * |sin πx / (x(1 − x²))|), so the RMS amplitude needs no scalloping correction.
 *
 * <p>Frequency: without padding, the exact two-bin ratio for the periodic Hann window, δ = (2α − 1)/(1 +
 * α) with α the magnitude ratio of the larger neighbour to the peak bin (Grandke 1983, IEEE Trans.
 * Instrum. Meas. 32:350); with padding, a parabola through the logarithms of the three top bins.
 *
 * <p>Stateless.
 */
final class Peaks {
    private Peaks() {
    }

    /** Half-width of the window's main lobe in grid bins. */
    static int lobeHalfWidth(Spectrum s) {
        return (int) Math.ceil(2.0 * s.fftLength() / s.segmentLength());
    }

    /** The line whose strongest bin is {@code k}. */
    static Peak line(Spectrum s, int k) {
        int h = lobeHalfWidth(s);
        double sum = 0;
        for (int j = Math.max(0, k - h); j <= Math.min(s.size() - 1, k + h); j++) {
            sum += s.density(j);
        }
        double amplitude = Math.sqrt(sum * s.binHz());
        return new Peak(interpolate(s, k) * s.binHz(), amplitude, k);
    }

    /** Interpolated position of the line at bin {@code k}, in (fractional) bins. */
    static double interpolate(Spectrum s, int k) {
        if (k <= 0 || k >= s.size() - 1) {
            return k;
        }
        double left = s.density(k - 1);
        double mid = s.density(k);
        double right = s.density(k + 1);
        if (!(mid > 0)) {
            return k;
        }
        if (s.fftLength() == s.segmentLength()) {
            int side = right >= left ? 1 : -1;
            double alpha = Math.sqrt((side > 0 ? right : left) / mid);
            double delta = (2 * alpha - 1) / (1 + alpha);
            return k + side * Math.max(0, Math.min(0.5, delta));
        }
        if (!(left > 0) || !(right > 0)) {
            return k;
        }
        double a = Math.log(left);
        double b = Math.log(mid);
        double c = Math.log(right);
        double den = a - 2 * b + c;
        if (!(den < 0)) {
            return k;
        }
        return k + Math.max(-0.5, Math.min(0.5, 0.5 * (a - c) / den));
    }

    /** The strongest line (by lobe power) whose top bin is a local maximum within [loHz, hiHz]. */
    static Optional<Peak> strongestIn(Spectrum s, double loHz, double hiHz) {
        Peak best = null;
        int from = Math.max(1, (int) Math.ceil(loHz / s.binHz()));
        int to = Math.min(s.size() - 2, (int) Math.floor(hiHz / s.binHz()));
        for (int k = from; k <= to; k++) {
            double d = s.density(k);
            if (d > s.density(k - 1) && d >= s.density(k + 1)) {
                Peak p = line(s, k);
                if (best == null || p.amplitudeRms() > best.amplitudeRms()) {
                    best = p;
                }
            }
        }
        return Optional.ofNullable(best);
    }

    /**
     * The {@code count} strongest lines at or above {@code minHz}: local maxima of the density, ranked by
     * their lobe power, each at least one lobe width from a stronger one. Strongest first.
     */
    static List<Peak> strongest(Spectrum s, int count, double minHz) {
        int h = lobeHalfWidth(s);
        int from = Math.max(1, (int) Math.ceil(minHz / s.binHz()));
        List<Peak> candidates = new ArrayList<>();
        for (int k = from; k < s.size() - 1; k++) {
            double d = s.density(k);
            if (d > s.density(k - 1) && d >= s.density(k + 1)) {
                candidates.add(line(s, k));
            }
        }
        candidates.sort(Comparator.comparingDouble(Peak::amplitudeRms).reversed()
                .thenComparingInt(Peak::bin));
        List<Peak> out = new ArrayList<>();
        for (Peak p : candidates) {
            if (out.size() >= count) {
                break;
            }
            boolean clear = true;
            for (Peak q : out) {
                if (Math.abs(q.bin() - p.bin()) <= h) {
                    clear = false;
                    break;
                }
            }
            if (clear) {
                out.add(p);
            }
        }
        return out;
    }
}
