package org.riffle.log;

import java.nio.file.Path;

/**
 * Input the user can fix: a missing, unreadable or malformed log. The message is fit to print on one
 * line: the file, then the line and column where they apply, then what is wrong and what to do next.
 * Control characters in the file name or the quoted input are neutralised ({@link Printable#clean}),
 * so a hostile file name cannot drive the terminal the message is printed on.
 *
 * <p>Immutable. Lines and columns are 1-based; 0 means "does not apply".
 */
public final class LogException extends Exception {
    private static final long serialVersionUID = 1L;

    private final String file;
    private final long line;
    private final long column;
    private final String reason;

    /**
     * @param file the file the problem is in (as the user named it), or {@code null}
     * @param line 1-based line, or 0 when it does not apply
     * @param column 1-based column, or 0 when it does not apply
     * @param reason what is wrong and, where possible, what to do next
     */
    public LogException(String file, long line, long column, String reason) {
        super(format(file, line, column, reason));
        this.file = file;
        this.line = line;
        this.column = column;
        this.reason = reason;
    }

    /** A problem with a whole file, not a place in it. */
    public LogException(Path file, String reason) {
        this(file == null ? null : file.toString(), 0, 0, reason);
    }

    /** A problem at a line of a file; column unknown. */
    public LogException(Path file, long line, String reason) {
        this(file == null ? null : file.toString(), line, 0, reason);
    }

    /** A problem at a line and column of a file. */
    public LogException(Path file, long line, long column, String reason) {
        this(file == null ? null : file.toString(), line, column, reason);
    }

    private static String format(String file, long line, long column, String reason) {
        StringBuilder sb = new StringBuilder();
        if (file != null) {
            sb.append(Printable.clean(file));
            if (line > 0) {
                sb.append(':').append(line);
                if (column > 0) {
                    sb.append(':').append(column);
                }
            }
            sb.append(": ");
        }
        sb.append(Printable.clean(reason));
        return sb.toString();
    }

    /** The file as the user named it, or {@code null}. */
    public String file() {
        return file;
    }

    /** 1-based line, or 0. */
    public long line() {
        return line;
    }

    /** 1-based column, or 0. */
    public long column() {
        return column;
    }

    /** The reason without the place. */
    public String reason() {
        return reason;
    }
}
