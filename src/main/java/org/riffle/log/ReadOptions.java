package org.riffle.log;

import java.nio.charset.Charset;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * How to read a log where sniffing alone cannot tell, or where the user overrides it. Every field is
 * optional: empty means "detect". Immutable; use the {@code with...} methods to derive a changed copy.
 *
 * @param delimiter field delimiter (',', ';', '\t', or ' ' for whitespace-aligned columns)
 * @param decimalComma true when numbers use a decimal comma
 * @param charset text encoding
 * @param dateOrder order of day and month in numeric dates when ambiguous
 * @param timeColumn name (or 1-based number as text) of the time column; "none" when there is none
 * @param sampleRateHz sample rate to use when there is no time column
 * @param sensitivity WAV only: engineering units per full scale (e.g. volts-per-unit folded in)
 * @param sensitivityUnit WAV only: the unit the sensitivity yields
 */
public record ReadOptions(Optional<Character> delimiter, Optional<Boolean> decimalComma,
                          Optional<Charset> charset, Optional<DateOrder> dateOrder,
                          Optional<String> timeColumn, OptionalDouble sampleRateHz,
                          OptionalDouble sensitivity, Optional<String> sensitivityUnit) {

    /** Day/month order in numeric dates. */
    public enum DateOrder {
        /** day before month, e.g. 03.04.2026 is 3 April. */
        DAY_FIRST,
        /** month before day, e.g. 03/04/2026 is 4 March. */
        MONTH_FIRST
    }

    /** Detect everything. */
    public static ReadOptions defaults() {
        return new ReadOptions(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(),
                Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), Optional.empty());
    }

    public ReadOptions withDelimiter(char d) {
        return new ReadOptions(Optional.of(d), decimalComma, charset, dateOrder, timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit);
    }

    public ReadOptions withDecimalComma(boolean comma) {
        return new ReadOptions(delimiter, Optional.of(comma), charset, dateOrder, timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit);
    }

    public ReadOptions withCharset(Charset cs) {
        return new ReadOptions(delimiter, decimalComma, Optional.of(cs), dateOrder, timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit);
    }

    public ReadOptions withDateOrder(DateOrder order) {
        return new ReadOptions(delimiter, decimalComma, charset, Optional.of(order), timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit);
    }

    public ReadOptions withTimeColumn(String column) {
        return new ReadOptions(delimiter, decimalComma, charset, dateOrder, Optional.of(column), sampleRateHz,
                sensitivity, sensitivityUnit);
    }

    public ReadOptions withSampleRate(double hz) {
        return new ReadOptions(delimiter, decimalComma, charset, dateOrder, timeColumn, OptionalDouble.of(hz),
                sensitivity, sensitivityUnit);
    }

    public ReadOptions withSensitivity(double perFullScale, String unit) {
        return new ReadOptions(delimiter, decimalComma, charset, dateOrder, timeColumn, sampleRateHz,
                OptionalDouble.of(perFullScale), Optional.of(unit));
    }
}
