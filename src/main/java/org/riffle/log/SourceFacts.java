package org.riffle.log;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Where a recording came from and how it was read: the file as named, its size, the dialect that was
 * detected or given, the encoding, the preamble lines before the table, and the warnings collected.
 * Immutable.
 *
 * @param file the file as the user named it ({@code "-"} for standard input)
 * @param sizeBytes size of the file on disk, -1 when unknown (standard input)
 * @param format a short description of the format read, e.g. {@code "csv ';' decimal ','"} or {@code "wav pcm 16-bit"}
 * @param encoding the character encoding used, {@code ""} for binary formats
 * @param preamble lines before the table (device, serial, interval, comments), as read
 * @param warnings things the reader noticed and the user should know, each one line
 * @param dialect the layout of a delimited text log; empty for binary formats (WAV)
 * @param reduction present when the log was too large for memory and was read in reduced form: the
 *     recording then holds only the rows it names, and every face says so with {@link Reduction#message()}
 */
public record SourceFacts(String file, long sizeBytes, String format, String encoding,
                          List<String> preamble, List<String> warnings, Optional<Dialect> dialect,
                          Optional<Reduction> reduction) {
    public SourceFacts {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(format, "format");
        Objects.requireNonNull(encoding, "encoding");
        Objects.requireNonNull(dialect, "dialect");
        Objects.requireNonNull(reduction, "reduction");
        preamble = List.copyOf(preamble);
        warnings = List.copyOf(warnings);
    }

    /** Facts of a log read whole. */
    public SourceFacts(String file, long sizeBytes, String format, String encoding,
                       List<String> preamble, List<String> warnings, Optional<Dialect> dialect) {
        this(file, sizeBytes, format, encoding, preamble, warnings, dialect, Optional.empty());
    }

    /** Facts without a dialect (binary formats, tests). */
    public SourceFacts(String file, long sizeBytes, String format, String encoding, List<String> preamble,
                       List<String> warnings) {
        this(file, sizeBytes, format, encoding, preamble, warnings, Optional.empty());
    }
}
