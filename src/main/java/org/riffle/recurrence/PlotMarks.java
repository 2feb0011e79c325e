package org.riffle.recurrence;

/**
 * The number of recurrences in each cell of a width × height thumbnail; both triangles are counted
 * from the upper one. Cell (x, y) covers vectors j with ⌊j·width/N⌋ = x and i with ⌊i·height/N⌋ = y.
 *
 * <p>Confined to one thread; thumbnails of bands are joined with {@link #add}.
 */
final class PlotMarks {
    final int width;
    final int height;
    final int[] counts;
    private final long n;

    PlotMarks(int width, int height, int vectors) {
        this.width = width;
        this.height = height;
        this.counts = new int[width * height];
        this.n = Math.max(1, vectors);
    }

    /** Counts recurrence (i, j) and its mirror (j, i). */
    void mark(int i, int j) {
        counts[(int) (i * height / n) * width + (int) (j * width / n)]++;
        counts[(int) (j * height / n) * width + (int) (i * width / n)]++;
    }

    /** Adds the counts of {@code other}. */
    void add(PlotMarks other) {
        for (int k = 0; k < counts.length; k++) {
            counts[k] += other.counts[k];
        }
    }
}
