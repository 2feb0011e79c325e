package org.riffle.recurrence;

/**
 * A recurrence-plot thumbnail: a width × height grid over the N × N recurrence matrix, a cell set when
 * any recurrence (outside the Theiler band) falls in it. Cell (x, y) covers the vectors j with
 * ⌊j·width/N⌋ = x and i with ⌊i·height/N⌋ = y; y = 0 holds the first vectors (draw it at the bottom for
 * the customary orientation).
 *
 * <p>Immutable.
 */
public final class RecurrencePlot {
    private final int width;
    private final int height;
    private final boolean[] cells;
    private final double radius;

    RecurrencePlot(int width, int height, boolean[] cells, double radius) {
        this.width = width;
        this.height = height;
        this.cells = cells.clone();
        this.radius = radius;
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }

    /** The radius ε the plot was drawn with. */
    public double radius() {
        return radius;
    }

    /** True when some recurrence falls in cell (x, y). */
    public boolean at(int x, int y) {
        if (x < 0 || x >= width || y < 0 || y >= height) {
            throw new IndexOutOfBoundsException("cell " + x + "," + y + " outside " + width + " × " + height);
        }
        return cells[y * width + x];
    }

    /** The grid as text, top row last-vector first, {@code on}/{@code off} per cell, one line a row. */
    public String toText(char on, char off) {
        StringBuilder sb = new StringBuilder();
        for (int y = height - 1; y >= 0; y--) {
            for (int x = 0; x < width; x++) {
                sb.append(cells[y * width + x] ? on : off);
            }
            sb.append('\n');
        }
        return sb.toString();
    }
}
