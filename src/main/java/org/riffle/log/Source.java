package org.riffle.log;

import java.io.BufferedInputStream;
import java.io.Closeable;
import java.io.EOFException;
import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.GZIPInputStream;
import java.util.zip.ZipException;

/**
 * An opened log: its name as the user gave it, its size, and a buffered byte stream already unpacked
 * when the file was gzip-compressed (recognised by its magic bytes 1F 8B, whatever its name).
 *
 * <p>Mutable (it owns an open stream); confined to one thread; close it.
 */
final class Source implements Closeable {
    private static final int BUFFER = 1 << 16;

    final String name;
    final long sizeBytes;
    final boolean gzipped;
    final InputStream in;

    private Source(String name, long sizeBytes, boolean gzipped, InputStream in) {
        this.name = name;
        this.sizeBytes = sizeBytes;
        this.gzipped = gzipped;
        this.in = in;
    }

    /** A read failure with a message fit to print (truncated or corrupt compressed data). */
    static final class Damaged extends IOException {
        private static final long serialVersionUID = 1L;

        Damaged(String message) {
            super(message);
        }
    }

    /**
     * Opens {@code file}; refuses missing files, directories, named pipes and devices (anything but a
     * regular file, after following links), unreadable and empty files.
     */
    static Source open(Path file) throws LogException {
        String name = file.toString();
        if (!Files.exists(file)) {
            throw new LogException(name, 0, 0, "no such file");
        }
        if (Files.isDirectory(file)) {
            throw new LogException(name, 0, 0, "is a directory, not a log file");
        }
        if (!Files.isRegularFile(file)) {
            // A named pipe or a device: opening a pipe with no writer blocks for ever, and a device may
            // never end. Such data can still be read through standard input ('-'), where it is meant.
            throw new LogException(name, 0, 0, "not a regular file (a named pipe or a device);"
                    + " copy it to a file first, or give it on standard input: riffle ... - < " + name);
        }
        try {
            return of(Files.newInputStream(file), name, Files.size(file));
        } catch (AccessDeniedException e) {
            throw new LogException(name, 0, 0, "permission denied");
        } catch (IOException e) {
            throw new LogException(name, 0, 0, "cannot read: " + e.getMessage());
        }
    }

    /** Wraps an open stream (standard input, tests); {@code size} is -1 when unknown. */
    static Source of(InputStream raw, String name, long size) throws LogException {
        try {
            BufferedInputStream in = new BufferedInputStream(raw, BUFFER);
            byte[] magic = peek(in, 2);
            if (magic.length == 0) {
                in.close();
                throw new LogException(name, 0, 0, "empty file");
            }
            if (magic.length == 2 && magic[0] == (byte) 0x1F && magic[1] == (byte) 0x8B) {
                InputStream gz = new BufferedInputStream(new Guard(gunzip(in)), BUFFER);
                if (peek(gz, 1).length == 0) {
                    gz.close();
                    throw new LogException(name, 0, 0, "empty file (gzip holds no data)");
                }
                return new Source(name, size, true, gz);
            }
            return new Source(name, size, false, in);
        } catch (IOException e) {
            throw new LogException(name, 0, 0, e instanceof Damaged ? e.getMessage() : "cannot read: " + e.getMessage());
        }
    }

    private static InputStream gunzip(InputStream in) throws IOException {
        try {
            return new GZIPInputStream(in, BUFFER);
        } catch (EOFException e) {
            throw Guard.truncated();
        } catch (ZipException e) {
            throw Guard.corrupt(e);
        }
    }

    /** The next {@code n} bytes (fewer at the end), left unread. */
    static byte[] peek(InputStream in, int n) throws IOException {
        in.mark(n);
        byte[] b = in.readNBytes(n);
        in.reset();
        return b;
    }

    @Override
    public void close() throws IOException {
        in.close();
    }

    /** Turns the gzip stream's end-of-file and format errors into {@link Damaged} with a clear message. */
    private static final class Guard extends FilterInputStream {
        Guard(InputStream in) {
            super(in);
        }

        @Override
        public int read() throws IOException {
            try {
                return super.read();
            } catch (EOFException e) {
                throw truncated();
            } catch (ZipException e) {
                throw corrupt(e);
            }
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            try {
                return super.read(b, off, len);
            } catch (EOFException e) {
                throw truncated();
            } catch (ZipException e) {
                throw corrupt(e);
            }
        }

        private static Damaged truncated() {
            return new Damaged("gzip data ends early: the compressed file is truncated; copy it again");
        }

        private static Damaged corrupt(ZipException e) {
            return new Damaged("gzip data is corrupt (" + e.getMessage() + "); copy it again");
        }
    }
}
