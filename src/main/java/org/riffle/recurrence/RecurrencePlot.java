package org.riffle.recurrence;

/**
 * A recurrence-plot thumbnail: a width × height grid over the N × N recurrence matrix, holding for each
 * cell the number of recurrences that fall in it and the number of pairs it covers, both outside the
 * Theiler band. Cell (x, y) covers the vectors j with ⌊j·width/N⌋ = x and i with ⌊i·height/N⌋ = y;
 * y = 0 holds the first vectors (draw it at the bottom for the customary orientation).
 *
 * <p>Immutable.
 */
public final class RecurrencePlot {
    private final int width;
    private final int height;
    private final int[] recurrences;
    private final int[] pairs;
    private final double radius;

    RecurrencePlot(int width, int height, int[] recurrences, int vectors, int theiler, double radius) {
        this.width = width;
        this.height = height;
        this.recurrences = recurrences.clone();
        this.pairs = pairs(width, height, vectors, theiler);
        this.radius = radius;
    }

    /**
     * The pairs (i, j) of each cell with |i − j| ≥ w: the cell's rows times its columns, less the band.
     * The rows of cell y are [⌈y·N/h⌉, ⌈(y+1)·N/h⌉), the inverse of ⌊i·h/N⌋ = y.
     */
    private static int[] pairs(int width, int height, int n, int w) {
        int[] out = new int[width * height];
        for (int y = 0; y < height; y++) {
            int r0 = first(y, n, height);
            int r1 = first(y + 1, n, height);
            for (int x = 0; x < width; x++) {
                int c0 = first(x, n, width);
                int c1 = first(x + 1, n, width);
                long band = 0;
                for (int i = r0; i < r1; i++) {
                    band += Math.max(0, Math.min(i + w - 1, c1 - 1) - Math.max(i - w + 1, c0) + 1);
                }
                out[y * width + x] = (int) ((long) (r1 - r0) * (c1 - c0) - band);
            }
        }
        return out;
    }

    /** The first vector of cell {@code k} of {@code cells} over {@code n}: ⌈k·n/cells⌉. */
    private static int first(int k, int n, int cells) {
        return (int) (((long) k * n + cells - 1) / cells);
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
        return recurrences(x, y) > 0;
    }

    /** The number of recurrences in cell (x, y), both triangles. */
    public int recurrences(int x, int y) {
        return recurrences[index(x, y)];
    }

    /** The number of pairs (i, j) cell (x, y) covers outside the Theiler band. */
    public int pairs(int x, int y) {
        return pairs[index(x, y)];
    }

    private int index(int x, int y) {
        if (x < 0 || x >= width || y < 0 || y >= height) {
            throw new IndexOutOfBoundsException("cell " + x + "," + y + " outside " + width + " × " + height);
        }
        return y * width + x;
    }

    /** The grid as text, top row last-vector first, {@code on}/{@code off} per cell with a recurrence or none. */
    public String toText(char on, char off) {
        StringBuilder sb = new StringBuilder();
        for (int y = height - 1; y >= 0; y--) {
            for (int x = 0; x < width; x++) {
                sb.append(recurrences[y * width + x] > 0 ? on : off);
            }
            sb.append('\n');
        }
        return sb.toString();
    }
}
