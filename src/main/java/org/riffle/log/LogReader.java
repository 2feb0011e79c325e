package org.riffle.log;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;

/**
 * Reads a log file into a {@link Recording}. The entry point of the {@code log} package: opens the
 * file (or standard input for {@code -}), unpacks gzip (by its magic bytes), and hands WAV recordings
 * (a RIFF header) to the WAV reader and everything else to the delimited-text reader.
 *
 * <p>Stateless and thread-safe; each call reads its file once, in one streaming pass.
 */
public final class LogReader {
    private LogReader() {
    }

    /**
     * Reads {@code file} ({@code "-"} for standard input) as the options say, detecting the rest.
     *
     * @throws LogException when the file is missing, unreadable or not a log riffle can read
     */
    public static Recording read(Path file, ReadOptions options) throws LogException {
        if (file.toString().equals("-")) {
            return read(System.in, "-", options);
        }
        return read(Source.open(file), options, false);
    }

    /**
     * Reads a log from an open stream (standard input, a pipe); {@code name} names it in messages. The
     * stream is read to its end but not closed.
     *
     * @throws LogException when the data is not a log riffle can read
     */
    public static Recording read(InputStream in, String name, ReadOptions options) throws LogException {
        return read(Source.of(new NonClosing(in), name, -1), options, false);
    }

    /** Reads with every text line sent through the general (Commons CSV) path: for tests of the fast path. */
    static Recording readAllGeneral(Path file, ReadOptions options) throws LogException {
        return read(Source.open(file), options, true);
    }

    private static Recording read(Source src, ReadOptions options, boolean allGeneral) throws LogException {
        try (src) {
            byte[] magic = Source.peek(src.in, 4);
            if (magic.length == 4 && magic[0] == 'R' && magic[1] == 'I' && magic[2] == 'F' && magic[3] == 'F') {
                return WavReader.read(src, options);
            }
            return TextReader.read(src, options, allGeneral);
        } catch (IOException e) {
            throw new LogException(src.name, 0, 0, e instanceof Source.Damaged ? e.getMessage()
                    : "cannot read: " + e.getMessage());
        }
    }

    /** Keeps standard input open when the source is closed. */
    private static final class NonClosing extends FilterInputStream {
        NonClosing(InputStream in) {
            super(in);
        }

        @Override
        public void close() {
            // the caller owns the stream
        }
    }
}
