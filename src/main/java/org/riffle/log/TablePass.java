package org.riffle.log;

import java.io.IOException;
import java.nio.charset.Charset;
import java.util.Arrays;

/**
 * The one streaming pass over the rows of a delimited log. A line without a double quote is split at
 * byte level and its cells parsed in place (the fast path); a line with one is decoded and split by
 * {@link Splitter} (Commons CSV), its fields encoded back and fed to the same cell parsers, so both
 * paths give identical values by construction.
 *
 * <p>Ragged rows: a row with fewer fields than the header keeps its cells and counts the rest as
 * missing samples; up to one such row per thousand (at least one: a last line cut short by a power
 * loss) is accepted with a warning, more is refused as an inconsistent table. A row with more non-empty
 * fields than the header is refused at once: its cells cannot be placed. A row whose time does not read
 * is dropped with a warning under the same allowance (its samples have no place in time).
 *
 * <p>Mutable; confined to the reading thread.
 */
final class TablePass {
    private final String file;
    private final Layout layout;
    private final byte[] roles;
    private final int ncols;
    private final byte delim;
    private final boolean whitespace;
    private final boolean decimalComma;
    private final Charset charset;
    private final Stamps.Order order;
    private final boolean allGeneral;
    private final int rowCap;
    private final int keepRows;
    private final int blockCapacity;
    /** Set once the rows no longer fit {@link #rowCap}: the pass then keeps the reduced form. */
    Reducer reducer;
    final Columns cols;
    RowLines rowLines = new RowLines();
    final Damage damage = new Damage();
    private final Stamps.DayCache days = new Stamps.DayCache();

    private int cell;
    private long stamp;
    private long day;
    private long tod;
    private double number;
    private long line;
    private byte[] lineBuf;
    private int lineStart;
    private long t0 = Stamps.FAIL;
    private double x0 = Double.NaN;
    private String badTimeText;
    /** The decoded text of the row the general path is splitting. */
    private String generalText = "";
    /** Per column, the bytes of its last text cell (a state column repeats a few words) and their verdict. */
    private final byte[][] lastText;
    private final boolean[] lastTextMissing;

    /**
     * A pass that keeps every row while at most {@code rowCap} fit, then reduces ({@link Reducer}) to
     * {@code keepRows} rows at full resolution and block statistics of at most {@code blockCapacity} blocks.
     */
    TablePass(String file, Layout layout, Charset charset, int capacity, boolean allGeneral, int rowCap,
              int keepRows, int blockCapacity) {
        this.file = file;
        this.layout = layout;
        this.roles = layout.roles();
        this.ncols = layout.columns();
        char d = layout.dialect().delimiter();
        this.delim = (byte) d;
        this.whitespace = d == Dialect.WHITESPACE;
        this.decimalComma = layout.dialect().decimalComma();
        this.charset = charset;
        this.order = layout.order();
        this.allGeneral = allGeneral;
        this.rowCap = rowCap;
        this.keepRows = keepRows;
        this.blockCapacity = blockCapacity;
        boolean[] stored = new boolean[ncols];
        for (int j = 0; j < ncols; j++) {
            stored[j] = roles[j] == Layout.VALUE;
        }
        this.cols = new Columns(stored, layout.hasTime(), Math.min(capacity, rowCap));
        this.lastText = new byte[ncols][];
        this.lastTextMissing = new boolean[ncols];
    }

    /** The columns the pass stores (those with numbers), ascending. */
    int[] valueColumns() {
        int n = 0;
        for (float[] v : cols.values) {
            n += v == null ? 0 : 1;
        }
        int[] out = new int[n];
        for (int j = 0, k = 0; j < cols.values.length; j++) {
            if (cols.values[j] != null) {
                out[k++] = j;
            }
        }
        return out;
    }

    /** Ends the pass: a reduced one puts its latest rows back in file order. */
    void finish() {
        if (reducer != null) {
            rowLines = reducer.finish();
        }
    }

    /** Reads every line from {@code in}, skipping those before the data. */
    void run(LineReader in) throws IOException, LogException {
        long dataLine = layout.dataLine();
        while (in.next()) {
            line = in.lineNumber();
            if (line < dataLine) {
                continue;
            }
            byte[] b = in.buffer();
            int s = in.start();
            int e = in.end();
            if (isBlankOrComment(b, s, e)) {
                continue;
            }
            if (reducer == null && !cols.ensureRoom(rowCap)) {
                reducer = new Reducer(cols, rowLines, valueColumns(), blockCapacity, keepRows);
            }
            beginRow(b, s);
            if (allGeneral || in.quoted()) {
                generalRow(in, b, s, e);
            } else if (whitespace) {
                fastWhitespaceRow(b, s, e);
            } else {
                fastRow(b, s, e);
            }
            endRow();
        }
    }

    private static boolean isBlankOrComment(byte[] b, int s, int e) {
        if (s == e || b[s] == '#' || (b[s] == '/' && e - s > 1 && b[s + 1] == '/')) {
            return true;
        }
        for (int i = s; i < e; i++) {
            if (b[i] != ' ' && b[i] != '\t') {
                return false;
            }
        }
        return true;
    }

    private void beginRow(byte[] b, int s) {
        cell = 0;
        stamp = Stamps.FAIL;
        day = Stamps.FAIL;
        tod = Stamps.FAIL;
        number = Double.NaN;
        lineBuf = b;
        lineStart = s;
        if (damage.badTimeRows == 0) {
            badTimeText = null;
        }
    }

    /** Splits at the delimiter; one call of {@link #cell} in the loop keeps the JIT's inlined copy single. */
    private void fastRow(byte[] b, int s, int e) throws LogException {
        byte d = delim;
        int from = s;
        while (true) {
            int i = from;
            while (i < e && b[i] != d) {
                i++;
            }
            cell(b, from, i);
            if (i == e) {
                return;
            }
            from = i + 1;
        }
    }

    private void fastWhitespaceRow(byte[] b, int s, int e) throws LogException {
        int i = s;
        while (true) {
            while (i < e && (b[i] == ' ' || b[i] == '\t')) {
                i++;
            }
            if (i == e) {
                return;
            }
            int from = i;
            while (i < e && b[i] != ' ' && b[i] != '\t') {
                i++;
            }
            cell(b, from, i);
        }
    }

    /** The Commons CSV path: decode, join lines while a quoted field is open, split, feed the cells. */
    private void generalRow(LineReader in, byte[] b, int s, int e) throws IOException, LogException {
        String text = new String(b, s, e - s, charset);
        long first = line;
        while ((Splitter.quotes(text) & 1) == 1) {
            if (!in.next() || text.length() > LineReader.MAX_LINE) {
                throw new LogException(file, first, 0, "a quoted field opened here is never closed");
            }
            text = text + "\n" + new String(in.buffer(), in.start(), in.end() - in.start(), charset);
        }
        lineBuf = null;
        generalText = text;
        for (String f : Splitter.split(text, whitespace ? Dialect.WHITESPACE : (char) delim)) {
            byte[] fb = f.getBytes(charset);
            cell(fb, 0, fb.length);
        }
        line = first;
    }

    private void cell(byte[] b, int s, int e) throws LogException {
        int j = cell++;
        if (j >= ncols) {
            extra(j, b, s, e);
            return;
        }
        switch (roles[j]) {
            case Layout.VALUE:
                float v = Numbers.parse(b, s, e, decimalComma);
                if (v != v) {
                    nonNumeric(j, b, s, e);
                }
                cols.values[j][cols.rows] = v;
                break;
            case Layout.STAMP:
                stamp = Stamps.parse(b, s, e, order, days);
                noteBadTime(stamp == Stamps.FAIL, b, s, e);
                break;
            case Layout.DATE:
                day = Stamps.parse(b, s, e, order, days);
                noteBadTime(day == Stamps.FAIL, b, s, e);
                break;
            case Layout.TIME_OF_DAY:
                tod = Stamps.timeOfDay(b, s, e);
                noteBadTime(tod == Stamps.FAIL, b, s, e);
                break;
            default:
                number = Numbers.parseDouble(b, s, e, decimalComma) * layout.timeScale();
                noteBadTime(Double.isNaN(number), b, s, e);
                break;
        }
    }

    private void noteBadTime(boolean bad, byte[] b, int s, int e) {
        if (bad && damage.badTimeRows == 0 && badTimeText == null) {
            badTimeText = new String(b, s, e - s, charset).strip();
        }
    }

    /**
     * A cell of a value column that is not a number: counted as text unless it is a missing-value
     * token. A cell with the same bytes as the column's last text cell has the same verdict and adds
     * nothing new to the distinct words, so it is only counted (no decoding, on every row of a state column).
     */
    private void nonNumeric(int j, byte[] b, int s, int e) {
        byte[] last = lastText[j];
        if (last != null && Arrays.equals(last, 0, last.length, b, s, e)) {
            if (!lastTextMissing[j]) {
                cols.text(j, null);
            }
            return;
        }
        newText(j, b, s, e);
    }

    /** A text cell unlike the column's last one: decoded and judged (kept apart from the hot path above). */
    private void newText(int j, byte[] b, int s, int e) {
        String t = new String(b, s, e - s, charset).strip();
        boolean missing = Numbers.isMissingToken(t);
        lastText[j] = Arrays.copyOfRange(b, s, e);
        lastTextMissing[j] = missing;
        if (!missing) {
            cols.text(j, t);
        }
    }

    private void extra(int j, byte[] b, int s, int e) throws LogException {
        for (int i = s; i < e; i++) {
            if (b[i] != ' ' && b[i] != '\t') {
                long at = line;
                long column;
                if (lineBuf != null) {
                    column = new String(lineBuf, lineStart, s - lineStart, charset).length() + 1;
                } else {
                    // the general path: find the field in the decoded text, which may span lines
                    int k = Splitter.fieldStart(generalText, whitespace ? Dialect.WHITESPACE : (char) delim, j);
                    int nl = k < 0 ? -1 : generalText.lastIndexOf('\n', k - 1);
                    at += k < 0 ? 0 : generalText.substring(0, Math.max(0, nl + 1)).chars().filter(c -> c == '\n')
                            .count();
                    column = k < 0 ? 0 : k - nl;
                }
                throw new LogException(file, at, column, "more fields than the " + ncols + " columns of the header;"
                        + " check the delimiter (--delimiter) or quote fields that hold it");
            }
        }
    }

    private void endRow() {
        int row = cols.rows;
        if (cell < ncols) {
            for (int j = cell; j < ncols; j++) {
                if (cols.values[j] != null) {
                    cols.values[j][row] = Float.NaN;
                }
            }
            damage.shortRow(line, cell);
        }
        if (cols.seconds != null) {
            double t = seconds();
            if (Double.isNaN(t)) {
                if (damage.badTimeRows++ == 0) {
                    damage.firstBadTimeLine = line;
                    damage.firstBadTime = badTimeText;
                }
                return;
            }
            cols.seconds[row] = t;
        }
        if (reducer != null) {
            reducer.commit(line);
        } else {
            rowLines.note(row, line);
            cols.rows = row + 1;
        }
    }

    /** Seconds of this row from the first row's time (elapsed columns: as written); NaN when unreadable. */
    private double seconds() {
        long ns;
        if (stamp != Stamps.FAIL) {
            ns = stamp;
        } else if (day != Stamps.FAIL && tod != Stamps.FAIL) {
            ns = day + tod;
        } else if (tod != Stamps.FAIL && !hasRole(Layout.DATE)) {
            ns = tod;
        } else if (!Double.isNaN(number)) {
            if (!layout.absoluteTime()) {
                return number;
            }
            if (Double.isNaN(x0)) {
                x0 = number;
            }
            return number - x0;
        } else {
            return Double.NaN;
        }
        if (t0 == Stamps.FAIL) {
            t0 = ns;
        }
        return (ns - t0) * 1e-9;
    }

    private boolean hasRole(byte role) {
        for (byte r : roles) {
            if (r == role) {
                return true;
            }
        }
        return false;
    }

    /** The first row's time: epoch nanoseconds for stamps; NaN-free only for absolute times. */
    long firstNanos() {
        return t0 != Stamps.FAIL ? t0 : Double.isNaN(x0) ? Stamps.FAIL : Math.round(x0 * 1e9);
    }

    /** The rows that could not be read in full, and the first of each kind. */
    static final class Damage {
        int shortRows;
        long firstShortLine;
        int firstShortFields;
        int badTimeRows;
        long firstBadTimeLine;
        String firstBadTime = "";

        void shortRow(long line, int fields) {
            if (shortRows++ == 0) {
                firstShortLine = line;
                firstShortFields = fields;
            }
        }
    }
}
