package org.riffle.cli;

import java.nio.charset.Charset;
import java.nio.charset.IllegalCharsetNameException;
import java.nio.charset.UnsupportedCharsetException;
import java.util.Locale;
import org.riffle.log.ReadOptions;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The options that override how a log is read, shared by every command that reads one
 * ({@code @Mixin ReadOptionsMixin read;} then {@code read.toReadOptions()}). Unset options mean
 * "detect". A bad value is a usage error (exit status 2).
 *
 * <p>Mutable (picocli fills it); confined to the command's thread.
 */
final class ReadOptionsMixin {
    @Spec(Spec.Target.MIXEE)
    private CommandSpec spec;

    @Option(names = "--delimiter", paramLabel = "D",
            description = "Field delimiter: comma, semicolon, tab, bar, whitespace (or the character itself)."
                    + " Default: detected.")
    private String delimiter;

    @Option(names = "--decimal-comma", negatable = true,
            description = "Numbers use a decimal comma (--no-decimal-comma: a point). Default: detected.")
    private Boolean decimalComma;

    @Option(names = "--encoding", paramLabel = "CHARSET",
            description = "Text encoding, e.g. UTF-8 or windows-1252. Default: UTF-8 if valid, else windows-1252.")
    private String encoding;

    @ArgGroup(exclusive = true)
    private DateOrderGroup dateOrder;

    @Option(names = "--time-column", paramLabel = "COLUMN",
            description = "The time column by name or 1-based number, or 'none'. Default: detected.")
    private String timeColumn;

    @Option(names = "--rate", paramLabel = "HZ",
            description = "Sample rate in Hz for a log without a time column. Default: from the preamble, else"
                    + " samples are numbered.")
    private Double rate;

    @Option(names = "--skip-rows", paramLabel = "N",
            description = "Lines before the table (header or first data row). Default: detected.")
    private Integer skipRows;

    @Option(names = "--units-row", negatable = true,
            description = "The row under the names holds units (--no-units-row: it is data). Default: detected.")
    private Boolean unitsRow;

    @Option(names = "--sensitivity", paramLabel = "VALUE",
            description = "WAV: engineering units per full scale (needs --sensitivity-unit). Default: samples in"
                    + " fractions of full scale (FS).")
    private Double sensitivity;

    @Option(names = "--sensitivity-unit", paramLabel = "UNIT",
            description = "WAV: the unit the sensitivity yields, e.g. g or mm/s.")
    private String sensitivityUnit;

    /** Day-first and month-first exclude each other. */
    static final class DateOrderGroup {
        @Option(names = "--day-first", description = "Read dates like 03/04/2026 as 3 April.")
        boolean dayFirst;

        @Option(names = "--month-first", description = "Read dates like 03/04/2026 as 4 March.")
        boolean monthFirst;
    }

    /** The options as the log reader takes them. */
    ReadOptions toReadOptions() {
        ReadOptions o = ReadOptions.defaults();
        try {
            if (delimiter != null) {
                o = o.withDelimiter(delimiterChar(delimiter));
            }
            if (decimalComma != null) {
                o = o.withDecimalComma(decimalComma);
            }
            if (encoding != null) {
                o = o.withCharset(Charset.forName(encoding));
            }
            if (dateOrder != null) {
                o = o.withDateOrder(dateOrder.dayFirst ? ReadOptions.DateOrder.DAY_FIRST
                        : ReadOptions.DateOrder.MONTH_FIRST);
            }
            if (timeColumn != null) {
                o = o.withTimeColumn(timeColumn);
            }
            if (rate != null) {
                o = o.withSampleRate(rate);
            }
            if (skipRows != null) {
                o = o.withSkipRows(skipRows);
            }
            if (unitsRow != null) {
                o = o.withUnitsRow(unitsRow);
            }
            if (sensitivity != null || sensitivityUnit != null) {
                if (sensitivity == null || sensitivityUnit == null) {
                    throw new IllegalArgumentException("--sensitivity and --sensitivity-unit go together");
                }
                o = o.withSensitivity(sensitivity, sensitivityUnit);
            }
        } catch (IllegalCharsetNameException | UnsupportedCharsetException e) {
            throw new ParameterException(spec.commandLine(), "unknown encoding '" + encoding + "'");
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage());
        }
        return o;
    }

    static char delimiterChar(String d) {
        switch (d.toLowerCase(Locale.ROOT)) {
            case "comma":
            case ",":
                return ',';
            case "semicolon":
            case ";":
                return ';';
            case "tab":
            case "\t":
            case "\\t":
                return '\t';
            case "bar":
            case "pipe":
            case "|":
                return '|';
            case "whitespace":
            case "space":
            case " ":
                return ' ';
            default:
                throw new IllegalArgumentException("--delimiter '" + d
                        + "' is not one of: comma, semicolon, tab, bar, whitespace");
        }
    }
}
