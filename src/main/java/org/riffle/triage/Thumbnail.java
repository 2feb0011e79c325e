package org.riffle.triage;

import java.util.Arrays;
import java.util.Locale;
import java.util.Objects;

/**
 * A recurrence-plot thumbnail of one window of a channel: a width × height grid over the window's
 * N × N recurrence matrix (delay vectors of the baseline's embedding, the baseline's radius ε, the
 * Theiler band left out), a cell set when any recurrence falls in it. Cell (x, y) covers the vectors j
 * with ⌊j·width/N⌋ = x and i with ⌊i·height/N⌋ = y, counted from the window's first sample; y = 0 holds
 * the first vectors, so it is drawn at the bottom, the customary orientation (Marwan, Romano, Thiel
 * &amp; Kurths 2007, Physics Reports 438:237, section 3).
 *
 * <p>Immutable: the cells are copied in and never handed out.
 */
public final class Thumbnail {
    /** Which part of the channel a thumbnail shows. */
    public enum Span {
        /** A trend window inside the baseline: what the channel looked like when it was healthy. */
        BASELINE("baseline"),
        /** The last trend window of the log: what the channel looks like now. */
        LATEST("latest");

        private final String word;

        Span(String word) {
            this.word = word;
        }

        /** The span as a word to print. */
        public String word() {
            return word;
        }
    }

    private final Span span;
    private final int fromRow;
    private final int toRow;
    private final double fromSeconds;
    private final double toSeconds;
    private final double radius;
    private final int width;
    private final int height;
    private final boolean[] cells;

    /**
     * A thumbnail of rows [fromRow, toRow) at radius ε.
     *
     * @param cells row-major, {@code cells[y * width + x]}, width × height of them
     * @throws IllegalArgumentException when the rows are empty or the grid does not match the cells
     */
    public Thumbnail(Span span, int fromRow, int toRow, double fromSeconds, double toSeconds, double radius,
                     int width, int height, boolean[] cells) {
        this.span = Objects.requireNonNull(span, "span");
        if (fromRow < 0 || toRow <= fromRow) {
            throw new IllegalArgumentException("thumbnail rows " + fromRow + ":" + toRow + " are empty or negative");
        }
        if (width < 1 || height < 1 || cells.length != width * height) {
            throw new IllegalArgumentException("thumbnail " + width + " × " + height + " with " + cells.length
                    + " cells");
        }
        this.fromRow = fromRow;
        this.toRow = toRow;
        this.fromSeconds = fromSeconds;
        this.toSeconds = toSeconds;
        this.radius = radius;
        this.width = width;
        this.height = height;
        this.cells = cells.clone();
    }

    public Span span() {
        return span;
    }

    /** First row (sample index) of the window, inclusive. */
    public int fromRow() {
        return fromRow;
    }

    /** Last row of the window, exclusive. */
    public int toRow() {
        return toRow;
    }

    /** Time of the first row, seconds of the time base. */
    public double fromSeconds() {
        return fromSeconds;
    }

    /** Time of the last row (toRow − 1), seconds of the time base. */
    public double toSeconds() {
        return toSeconds;
    }

    /** The radius ε, in the channel's unit. */
    public double radius() {
        return radius;
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }

    /** True when some recurrence falls in cell (x, y). */
    public boolean at(int x, int y) {
        if (x < 0 || x >= width || y < 0 || y >= height) {
            throw new IndexOutOfBoundsException("cell " + x + "," + y + " outside " + width + " × " + height);
        }
        return cells[y * width + x];
    }

    /** Number of cells set. */
    public int setCells() {
        int n = 0;
        for (boolean b : cells) {
            n += b ? 1 : 0;
        }
        return n;
    }

    /**
     * The same window on a grid {@code fx} times narrower and {@code fy} times lower: a coarse cell is set
     * when any of its fine cells is. Exact, not an approximation: ⌊⌊j·w/N⌋ / f⌋ = ⌊j·(w/f)/N⌋ for whole
     * f dividing w, so the coarse grid is the thumbnail that would be computed at that size.
     *
     * @throws IllegalArgumentException when a factor is below 1 or does not divide the grid
     */
    public Thumbnail coarser(int fx, int fy) {
        if (fx < 1 || fy < 1 || width % fx != 0 || height % fy != 0) {
            throw new IllegalArgumentException("factors " + fx + " × " + fy + " do not divide " + width + " × "
                    + height);
        }
        int w = width / fx;
        int h = height / fy;
        boolean[] out = new boolean[w * h];
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                out[(y / fy) * w + x / fx] |= cells[y * width + x];
            }
        }
        return new Thumbnail(span, fromRow, toRow, fromSeconds, toSeconds, radius, w, h, out);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Thumbnail t && span == t.span && fromRow == t.fromRow && toRow == t.toRow
                && Double.compare(fromSeconds, t.fromSeconds) == 0 && Double.compare(toSeconds, t.toSeconds) == 0
                && Double.compare(radius, t.radius) == 0 && width == t.width && height == t.height
                && Arrays.equals(cells, t.cells);
    }

    @Override
    public int hashCode() {
        return Objects.hash(span, fromRow, toRow, fromSeconds, toSeconds, radius, width, height)
                * 31 + Arrays.hashCode(cells);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "Thumbnail[%s rows %d-%d, radius %s, %d × %d, %d set]", span.word(),
                fromRow, toRow, Double.toString(radius), width, height, setCells());
    }
}
