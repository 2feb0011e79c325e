package org.riffle.recurrence;

/**
 * The cells of a width × height thumbnail that some recurrence falls in; both triangles are marked
 * from the upper one. Cell (x, y) covers vectors j with ⌊j·width/N⌋ = x and i with ⌊i·height/N⌋ = y.
 *
 * <p>Confined to one thread; thumbnails of bands are joined with {@link #or}.
 */
final class PlotMarks {
    final int width;
    final int height;
    final boolean[] cells;
    private final long n;

    PlotMarks(int width, int height, int vectors) {
        this.width = width;
        this.height = height;
        this.cells = new boolean[width * height];
        this.n = Math.max(1, vectors);
    }

    /** Marks cell (i, j) and its mirror (j, i). */
    void mark(int i, int j) {
        cells[(int) (i * height / n) * width + (int) (j * width / n)] = true;
        cells[(int) (j * height / n) * width + (int) (i * width / n)] = true;
    }

    /** Adds the marks of {@code other}. */
    void or(PlotMarks other) {
        for (int k = 0; k < cells.length; k++) {
            cells[k] |= other.cells[k];
        }
    }
}
