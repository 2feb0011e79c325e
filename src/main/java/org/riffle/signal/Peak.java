package org.riffle.signal;

/**
 * A spectral peak: the interpolated frequency and the RMS amplitude of the line in the channel's
 * unit. Immutable.
 *
 * @param frequencyHz interpolated line frequency in Hz
 * @param amplitudeRms RMS amplitude of the line (a sine of peak amplitude a gives a/√2)
 * @param bin index of the strongest bin of the line
 */
public record Peak(double frequencyHz, double amplitudeRms, int bin) {
}
