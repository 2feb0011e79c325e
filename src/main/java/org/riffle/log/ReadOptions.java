package org.riffle.log;

import java.nio.charset.Charset;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.OptionalLong;

/**
 * How to read a log where sniffing alone cannot tell, or where the user overrides it. Every field is
 * optional: empty means "detect". Immutable; use the {@code with...} methods to derive a changed copy.
 *
 * @param delimiter field delimiter (',', ';', '\t', '|', or ' ' for whitespace-aligned columns)
 * @param decimalComma true when numbers use a decimal comma
 * @param charset text encoding
 * @param dateOrder order of day and month in numeric dates when ambiguous
 * @param timeColumn name (or 1-based number as text) of the time column; "none" when there is none
 * @param sampleRateHz sample rate in Hz to use when there is no time column
 * @param sensitivity WAV only: engineering units per full scale (a full-scale sample reads as this value)
 * @param sensitivityUnit WAV only: the unit the sensitivity yields
 * @param skipRows number of lines before the table (header or first data row), overriding detection
 * @param unitsRow whether the row under the names holds units, overriding detection
 * @param memoryBytes the bytes the samples of one log may take before it is read in reduced form
 *     ({@link Reduction}); empty: a share of the heap free when reading starts ({@link MemoryBudget})
 */
public record ReadOptions(Optional<Character> delimiter, Optional<Boolean> decimalComma,
                          Optional<Charset> charset, Optional<DateOrder> dateOrder,
                          Optional<String> timeColumn, OptionalDouble sampleRateHz,
                          OptionalDouble sensitivity, Optional<String> sensitivityUnit,
                          OptionalInt skipRows, Optional<Boolean> unitsRow, OptionalLong memoryBytes) {

    /** Day/month order in numeric dates. */
    public enum DateOrder {
        /** day before month, e.g. 03.04.2026 is 3 April. */
        DAY_FIRST,
        /** month before day, e.g. 03/04/2026 is 4 March. */
        MONTH_FIRST
    }

    /** Checks the values that can be wrong on their own. */
    public ReadOptions {
        if (delimiter.isPresent() && ",;\t| ".indexOf(delimiter.get()) < 0) {
            throw new IllegalArgumentException("delimiter '" + delimiter.get()
                    + "' is not one of: comma, semicolon, tab, |, whitespace");
        }
        if (sampleRateHz.isPresent() && !(sampleRateHz.getAsDouble() > 0 && sampleRateHz.getAsDouble() < 1e12)) {
            throw new IllegalArgumentException("sample rate " + sampleRateHz.getAsDouble() + " Hz is not positive");
        }
        if (sensitivity.isPresent() != sensitivityUnit.isPresent()) {
            throw new IllegalArgumentException("a sensitivity needs its unit and a unit its sensitivity");
        }
        if (sensitivity.isPresent() && !(Double.isFinite(sensitivity.getAsDouble())
                && sensitivity.getAsDouble() != 0)) {
            throw new IllegalArgumentException("sensitivity " + sensitivity.getAsDouble() + " is not finite and non-zero");
        }
        if (skipRows.isPresent() && skipRows.getAsInt() < 0) {
            throw new IllegalArgumentException("skip rows " + skipRows.getAsInt() + " is negative");
        }
        if (memoryBytes.isPresent() && memoryBytes.getAsLong() <= 0) {
            throw new IllegalArgumentException("memory budget " + memoryBytes.getAsLong() + " bytes is not positive");
        }
    }

    /** The options without a memory budget (detect it from the heap). */
    public ReadOptions(Optional<Character> delimiter, Optional<Boolean> decimalComma,
                       Optional<Charset> charset, Optional<DateOrder> dateOrder,
                       Optional<String> timeColumn, OptionalDouble sampleRateHz,
                       OptionalDouble sensitivity, Optional<String> sensitivityUnit,
                       OptionalInt skipRows, Optional<Boolean> unitsRow) {
        this(delimiter, decimalComma, charset, dateOrder, timeColumn, sampleRateHz, sensitivity, sensitivityUnit,
                skipRows, unitsRow, OptionalLong.empty());
    }

    /** The options as first published (without skip rows and units row). */
    public ReadOptions(Optional<Character> delimiter, Optional<Boolean> decimalComma,
                       Optional<Charset> charset, Optional<DateOrder> dateOrder,
                       Optional<String> timeColumn, OptionalDouble sampleRateHz,
                       OptionalDouble sensitivity, Optional<String> sensitivityUnit) {
        this(delimiter, decimalComma, charset, dateOrder, timeColumn, sampleRateHz, sensitivity, sensitivityUnit,
                OptionalInt.empty(), Optional.empty());
    }

    /** Detect everything. */
    public static ReadOptions defaults() {
        return new ReadOptions(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(),
                Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), Optional.empty());
    }

    public ReadOptions withDelimiter(char d) {
        return new ReadOptions(Optional.of(d), decimalComma, charset, dateOrder, timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit, skipRows, unitsRow, memoryBytes);
    }

    public ReadOptions withDecimalComma(boolean comma) {
        return new ReadOptions(delimiter, Optional.of(comma), charset, dateOrder, timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit, skipRows, unitsRow, memoryBytes);
    }

    public ReadOptions withCharset(Charset cs) {
        return new ReadOptions(delimiter, decimalComma, Optional.of(cs), dateOrder, timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit, skipRows, unitsRow, memoryBytes);
    }

    public ReadOptions withDateOrder(DateOrder order) {
        return new ReadOptions(delimiter, decimalComma, charset, Optional.of(order), timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit, skipRows, unitsRow, memoryBytes);
    }

    public ReadOptions withTimeColumn(String column) {
        return new ReadOptions(delimiter, decimalComma, charset, dateOrder, Optional.of(column), sampleRateHz,
                sensitivity, sensitivityUnit, skipRows, unitsRow, memoryBytes);
    }

    public ReadOptions withSampleRate(double hz) {
        return new ReadOptions(delimiter, decimalComma, charset, dateOrder, timeColumn, OptionalDouble.of(hz),
                sensitivity, sensitivityUnit, skipRows, unitsRow, memoryBytes);
    }

    public ReadOptions withSensitivity(double perFullScale, String unit) {
        return new ReadOptions(delimiter, decimalComma, charset, dateOrder, timeColumn, sampleRateHz,
                OptionalDouble.of(perFullScale), Optional.of(unit), skipRows, unitsRow, memoryBytes);
    }

    /** Lines to skip before the table (header or first data row). */
    public ReadOptions withSkipRows(int rows) {
        return new ReadOptions(delimiter, decimalComma, charset, dateOrder, timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit, OptionalInt.of(rows), unitsRow, memoryBytes);
    }

    /** Whether the row under the names holds units. */
    public ReadOptions withUnitsRow(boolean present) {
        return new ReadOptions(delimiter, decimalComma, charset, dateOrder, timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit, skipRows, Optional.of(present), memoryBytes);
    }

    /** The bytes the samples may take before the log is read in reduced form (tests, small machines). */
    public ReadOptions withMemoryBytes(long bytes) {
        return new ReadOptions(delimiter, decimalComma, charset, dateOrder, timeColumn, sampleRateHz,
                sensitivity, sensitivityUnit, skipRows, unitsRow, OptionalLong.of(bytes));
    }
}
