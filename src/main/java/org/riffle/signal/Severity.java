package org.riffle.signal;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.riffle.signal.Unit.Quantity;

/**
 * The overall RMS velocity in the severity band of ISO 10816-3 / 20816-3 (10–1000 Hz; 2–1000 Hz for
 * machines below 600 r/min) and its zone, or why there is none. Immutable.
 *
 * <p>Computed from the Welch density: a velocity channel is converted to mm/s; an acceleration channel is
 * integrated in the frequency domain, V(f) = A(f)/(2πf), which for densities is a gain 1/(2πf)²; both are
 * then high- and low-passed at the band edges by summing only the bins inside the band (DOMAIN.md §3).
 * A waveform needs a sample rate of at least 2.56 × the band's upper edge (common practice), and bins
 * no wider than half the lower edge.
 *
 * @param velocityRmsMmS RMS velocity in mm/s over the band, {@code NaN} when not computed
 * @param band the band used (with why), {@code null} only when the unit is not vibration
 * @param table the zone table used, empty when the user named no machine group and support
 * @param zone the zone, empty when not computed or no table
 * @param remark why there is no value or zone, {@code ""} when there is both
 */
public record Severity(double velocityRmsMmS, Band band, Optional<ZoneTable> table, Optional<ZoneTable.Zone> zone,
                       String remark) {
    /** Upper edge of the band in Hz. */
    public static final double BAND_TOP_HZ = 1000;
    /** Sample rate needed per Hz of the upper edge (common practice). */
    public static final double RATE_FACTOR = 2.56;

    public Severity {
        Objects.requireNonNull(table, "table");
        Objects.requireNonNull(zone, "zone");
        Objects.requireNonNull(remark, "remark");
    }

    /** The standard's band for a shaft speed (or unknown speed). */
    public static Band band(Optional<ShaftSpeed> shaft) {
        if (shaft.isEmpty()) {
            return new Band(10, BAND_TOP_HZ, "speed unknown: taken as at least 600 r/min");
        }
        double rpm = shaft.get().rpm();
        String speed = String.format(Locale.ROOT, "%.0f r/min %s", rpm, shaft.get().given() ? "given" : "estimated");
        return rpm < 600 ? new Band(2, BAND_TOP_HZ, speed + ", below 600 r/min")
                : new Band(10, BAND_TOP_HZ, speed + ", at least 600 r/min");
    }

    /** The severity of a channel in {@code unit} whose spectrum is {@code s}. */
    public static Severity of(Spectrum s, Unit unit, Optional<ShaftSpeed> shaft, Optional<ZoneTable> table) {
        Band band = band(shaft);
        Optional<Spectrum> v = velocityMmS(s, unit);
        if (v.isEmpty()) {
            return new Severity(Double.NaN, null, table, Optional.empty(), "severity needs a velocity or "
                    + "acceleration unit, not '" + unit.text() + "'");
        }
        if (s.sampleRateHz() < RATE_FACTOR * band.hiHz()) {
            return none(band, table, String.format(Locale.ROOT, "sample rate %s Hz too low for the band %s "
                    + "(needs at least %.0f Hz)", Band.hz(s.sampleRateHz()), band.label(), RATE_FACTOR * band.hiHz()));
        }
        if (s.segments() == 0) {
            return none(band, table, "every segment holds missing samples");
        }
        if (s.binHz() > band.loHz() / 2) {
            return none(band, table, String.format(Locale.ROOT, "bins of %s Hz too coarse for the band's lower "
                    + "edge %s Hz (needs segments of at least %.0f samples)", Band.hz(s.binHz()), Band.hz(band.loHz()),
                    Math.ceil(2 * s.sampleRateHz() / band.loHz())));
        }
        double rms = v.get().bandRms(band.loHz(), band.hiHz());
        if (table.isEmpty()) {
            return new Severity(rms, band, table, Optional.empty(), "no zone: name the machine group and support");
        }
        return new Severity(rms, band, table, Optional.of(table.get().zone(rms)), "");
    }

    private static Severity none(Band band, Optional<ZoneTable> table, String why) {
        return new Severity(Double.NaN, band, table, Optional.empty(), why);
    }

    /**
     * {@code s} as a velocity density in (mm/s)²/Hz: scaled for velocity units, divided by (2πf)² for
     * acceleration units (0 at 0 Hz); empty for other units.
     */
    public static Optional<Spectrum> velocityMmS(Spectrum s, Unit unit) {
        double toMm = unit.scale() * 1000;
        if (unit.quantity() == Quantity.VELOCITY) {
            return Optional.of(s.weighted(f -> toMm * toMm));
        }
        if (unit.quantity() == Quantity.ACCELERATION) {
            return Optional.of(s.weighted(f -> f <= 0 ? 0 : Math.pow(toMm / (2 * Math.PI * f), 2)));
        }
        return Optional.empty();
    }

    /** True when there is a velocity figure. */
    public boolean computed() {
        return !Double.isNaN(velocityRmsMmS);
    }
}
