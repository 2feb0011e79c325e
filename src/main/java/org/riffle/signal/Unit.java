package org.riffle.signal;

import java.util.Objects;

/**
 * A unit as written in a log, recognised into a quantity and a linear map to that quantity's SI base
 * unit: base = value·scale + offset (the offset is non-zero only for °C and °F). A unit riffle does
 * not know keeps its text, has quantity {@link Quantity#UNKNOWN} and converts to nothing. Immutable.
 *
 * <p>Recognised (case and spacing ignored, brackets stripped, µ/μ/u, ²/^2/2 and ³/3 alike): mm/s, m/s,
 * in/s, ips; m/s², mm/s², g; µm, mm, mil; bar, mbar, Pa, kPa, MPa, psi; °C, degC, °F, degF, K; A, mA;
 * V, mV; m³/h, m³/s, l/s, l/min, gpm (US gallons); rpm, r/min, 1/min, cpm, Hz; %.
 *
 * @param text the unit as written
 * @param quantity what it measures
 * @param scale factor to the SI base unit ({@code NaN} when unknown)
 * @param offset offset to the SI base unit (0 except for temperatures)
 */
public record Unit(String text, Quantity quantity, double scale, double offset) {
    /** What a unit measures, with the SI base unit conversions go through. */
    public enum Quantity {
        VELOCITY("m/s"), ACCELERATION("m/s²"), DISPLACEMENT("m"), PRESSURE("Pa"), TEMPERATURE("K"),
        CURRENT("A"), VOLTAGE("V"), FLOW("m³/s"), FREQUENCY("Hz"), RATIO("1"), UNKNOWN("");

        private final String base;

        Quantity(String base) {
            this.base = base;
        }

        /** The SI base unit of this quantity, {@code ""} for unknown. */
        public String base() {
            return base;
        }
    }

    public Unit {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(quantity, "quantity");
    }

    /** Recognises {@code text}; never fails (an unknown unit is kept as text). */
    public static Unit parse(String text) {
        return UnitTable.lookup(text);
    }

    /** True when riffle knows this unit. */
    public boolean known() {
        return quantity != Quantity.UNKNOWN;
    }

    /** {@code value} in this unit expressed in the quantity's SI base unit. */
    public double toBase(double value) {
        return value * scale + offset;
    }

    /**
     * {@code value} in this unit expressed in {@code target}.
     *
     * @throws IllegalArgumentException when either unit is unknown or they measure different things
     */
    public double convert(double value, Unit target) {
        if (!known() || quantity != target.quantity) {
            throw new IllegalArgumentException("cannot convert '" + text + "' (" + quantity + ") to '"
                    + target.text + "' (" + target.quantity + ")");
        }
        return (toBase(value) - target.offset) / target.scale;
    }
}
