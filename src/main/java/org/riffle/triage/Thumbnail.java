package org.riffle.triage;

import java.util.Arrays;
import java.util.Locale;
import java.util.Objects;

/**
 * A recurrence-plot thumbnail of one window of a channel: a width × height grid over the window's
 * N × N recurrence matrix (delay vectors of the baseline's embedding, the baseline's radius ε, the
 * Theiler band left out). Cell (x, y) covers the vectors j with ⌊j·width/N⌋ = x and i with
 * ⌊i·height/N⌋ = y, counted from the window's first sample; y = 0 holds the first vectors, so it is
 * drawn at the bottom, the customary orientation (Marwan, Romano, Thiel &amp; Kurths 2007, Physics
 * Reports 438:237, section 3).
 *
 * <p>A cell is set when it holds a recurrence and its share of recurrent pairs is at least the whole
 * plot's (its recurrence rate). A cell of a thumbnail stands for hundreds of pairs, so at an ordinary
 * rate of a few per cent nearly every cell holds some recurrence: set for any, a baseline's thumbnail
 * was a black square. Against the plot's own rate the denser parts show, diagonal lines and blocks
 * among them, and a sparse plot (a rate far below the cells' smallest share) still shows every cell
 * with a recurrence. This is a display rule of ours, not a published measure.
 *
 * <p>Immutable: the counts are copied in and never handed out.
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
    private final int[] recurrences;
    private final int[] pairs;
    /** Recurrences and pairs of the whole grid. */
    private final long allRecurrences;
    private final long allPairs;

    /**
     * A thumbnail of rows [fromRow, toRow) at radius ε.
     *
     * @param recurrences per cell, row-major ({@code [y * width + x]}), width × height of them
     * @param pairs per cell, the pairs it covers outside the Theiler band, in the same order
     * @throws IllegalArgumentException when the rows are empty or the grid does not match the cells
     */
    public Thumbnail(Span span, int fromRow, int toRow, double fromSeconds, double toSeconds, double radius,
                     int width, int height, int[] recurrences, int[] pairs) {
        this.span = Objects.requireNonNull(span, "span");
        if (fromRow < 0 || toRow <= fromRow) {
            throw new IllegalArgumentException("thumbnail rows " + fromRow + ":" + toRow + " are empty or negative");
        }
        if (width < 1 || height < 1 || recurrences.length != width * height || pairs.length != width * height) {
            throw new IllegalArgumentException("thumbnail " + width + " × " + height + " with " + recurrences.length
                    + " and " + pairs.length + " cells");
        }
        this.fromRow = fromRow;
        this.toRow = toRow;
        this.fromSeconds = fromSeconds;
        this.toSeconds = toSeconds;
        this.radius = radius;
        this.width = width;
        this.height = height;
        this.recurrences = recurrences.clone();
        this.pairs = pairs.clone();
        long r = 0;
        long q = 0;
        for (int k = 0; k < recurrences.length; k++) {
            r += recurrences[k];
            q += pairs[k];
        }
        this.allRecurrences = r;
        this.allPairs = q;
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

    /**
     * True when cell (x, y) is set: it holds a recurrence, and its recurrences over its pairs are at least
     * the whole grid's (compared as r·Q ≥ R·q, in whole numbers).
     */
    public boolean at(int x, int y) {
        int k = index(x, y);
        return recurrences[k] > 0 && (long) recurrences[k] * allPairs >= allRecurrences * pairs[k];
    }

    /** The recurrences in cell (x, y), both triangles. */
    public int recurrences(int x, int y) {
        return recurrences[index(x, y)];
    }

    /** The pairs cell (x, y) covers outside the Theiler band. */
    public int pairs(int x, int y) {
        return pairs[index(x, y)];
    }

    private int index(int x, int y) {
        if (x < 0 || x >= width || y < 0 || y >= height) {
            throw new IndexOutOfBoundsException("cell " + x + "," + y + " outside " + width + " × " + height);
        }
        return y * width + x;
    }

    /** Number of cells set. */
    public int setCells() {
        int n = 0;
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                n += at(x, y) ? 1 : 0;
            }
        }
        return n;
    }

    /**
     * The same window on a grid {@code fx} times narrower and {@code fy} times lower: a coarse cell holds
     * the recurrences and pairs of its fine cells. Exact, not an approximation: ⌊⌊j·w/N⌋ / f⌋ =
     * ⌊j·(w/f)/N⌋ for whole f dividing w, so the coarse grid is the thumbnail that would be computed at
     * that size.
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
        int[] r = new int[w * h];
        int[] q = new int[w * h];
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                r[(y / fy) * w + x / fx] += recurrences[y * width + x];
                q[(y / fy) * w + x / fx] += pairs[y * width + x];
            }
        }
        return new Thumbnail(span, fromRow, toRow, fromSeconds, toSeconds, radius, w, h, r, q);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Thumbnail t && span == t.span && fromRow == t.fromRow && toRow == t.toRow
                && Double.compare(fromSeconds, t.fromSeconds) == 0 && Double.compare(toSeconds, t.toSeconds) == 0
                && Double.compare(radius, t.radius) == 0 && width == t.width && height == t.height
                && Arrays.equals(recurrences, t.recurrences) && Arrays.equals(pairs, t.pairs);
    }

    @Override
    public int hashCode() {
        return Objects.hash(span, fromRow, toRow, fromSeconds, toSeconds, radius, width, height)
                * 31 + Arrays.hashCode(recurrences) * 17 + Arrays.hashCode(pairs);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "Thumbnail[%s rows %d-%d, radius %s, %d × %d, %d set]", span.word(),
                fromRow, toRow, Double.toString(radius), width, height, setCells());
    }
}
