package org.riffle.signal;

import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

/**
 * A one-sided Welch power spectral density on the grid f_k = k·fs/fftLength, k = 0..fftLength/2, with
 * the scalings stated:
 * <ul>
 * <li>{@link #density(int)}: power spectral density in unit²/Hz (scipy's {@code scaling='density'}:
 * |X_k|² / (fs·Σw²), doubled except at 0 and Nyquist); its integral Σ density·df is the signal's
 * mean-removed power (Parseval).</li>
 * <li>{@link #amplitudeRms(int)}: RMS amplitude spectrum in the channel's unit, √(density·ENBW) with
 * ENBW = fs·Σw²/(Σw)² the window's equivalent noise bandwidth (scipy's {@code scaling='spectrum'},
 * square-rooted): a bin-centred sine of peak amplitude a reads a/√2.</li>
 * </ul>
 * Immutable: the density array is owned and never handed out.
 */
public final class Spectrum {
    private final double sampleRateHz;
    private final int segmentLength;
    private final int fftLength;
    private final int segments;
    private final int skippedSegments;
    private final double enbwHz;
    private final double[] density;

    Spectrum(double sampleRateHz, int segmentLength, int fftLength, int segments, int skippedSegments,
             double enbwHz, double[] density) {
        this.sampleRateHz = sampleRateHz;
        this.segmentLength = segmentLength;
        this.fftLength = fftLength;
        this.segments = segments;
        this.skippedSegments = skippedSegments;
        this.enbwHz = enbwHz;
        this.density = density;
    }

    /** Number of bins (fftLength/2 + 1). */
    public int size() {
        return density.length;
    }

    /** Bin spacing in Hz. */
    public double binHz() {
        return sampleRateHz / fftLength;
    }

    public double sampleRateHz() {
        return sampleRateHz;
    }

    /** Samples per segment. */
    public int segmentLength() {
        return segmentLength;
    }

    /** FFT length: the segment length, or the next power of two when the segment is not one. */
    public int fftLength() {
        return fftLength;
    }

    /** Segments averaged. */
    public int segments() {
        return segments;
    }

    /** Segments left out because they held missing samples. */
    public int skippedSegments() {
        return skippedSegments;
    }

    /** Equivalent noise bandwidth of the window in Hz. */
    public double enbwHz() {
        return enbwHz;
    }

    /** Frequency of bin {@code k} in Hz. */
    public double frequency(int k) {
        return k * binHz();
    }

    /** Power spectral density of bin {@code k} in unit²/Hz. */
    public double density(int k) {
        return density[k];
    }

    /** RMS amplitude of bin {@code k} in the channel's unit. */
    public double amplitudeRms(int k) {
        return Math.sqrt(density[k] * enbwHz);
    }

    /** The bin nearest to {@code hz}, clamped to the grid. */
    public int bin(double hz) {
        long k = Math.round(hz / binHz());
        return (int) Math.max(0, Math.min(size() - 1, k));
    }

    /**
     * RMS over the band [loHz, hiHz]: √(Σ density·df) over the bins whose frequency lies in the band
     * (both ends included). A line within a bin or two of an edge is partly cut by the window's lobe.
     */
    public double bandRms(double loHz, double hiHz) {
        int from = Math.max(0, (int) Math.ceil(loHz / binHz() - 1e-9));
        int to = Math.min(size() - 1, (int) Math.floor(hiHz / binHz() + 1e-9));
        double sum = 0;
        for (int k = from; k <= to; k++) {
            sum += density[k];
        }
        return Math.sqrt(sum * binHz());
    }

    /** The {@code count} strongest peaks above {@code minHz}, strongest first (see {@link Peaks}). */
    public List<Peak> peaks(int count, double minHz) {
        return Peaks.strongest(this, count, minHz);
    }

    /** The line at bin {@code k}: interpolated frequency and RMS amplitude (power summed over its lobe). */
    public Peak lineAt(int k) {
        return Peaks.line(this, k);
    }

    /** This spectrum with each bin's density multiplied by {@code gain.applyAsDouble(f_k)}. */
    public Spectrum weighted(DoubleUnaryOperator gain) {
        double[] d = new double[density.length];
        for (int k = 0; k < d.length; k++) {
            d[k] = density[k] * gain.applyAsDouble(frequency(k));
        }
        return new Spectrum(sampleRateHz, segmentLength, fftLength, segments, skippedSegments, enbwHz, d);
    }

    /** How this was computed, one line, ready to print. */
    public String description() {
        String pad = fftLength == segmentLength ? "" : ", zero-padded to " + fftLength;
        String skip = skippedSegments == 0 ? "" : ", " + skippedSegments + " with missing samples left out";
        return String.format(Locale.ROOT, "Welch: Hann (periodic), 50 %% overlap, segment %d samples%s, "
                + "bin %.4g Hz, %d segments averaged%s, one-sided", segmentLength, pad, binHz(), segments, skip);
    }
}
