package org.riffle.recurrence;

import java.util.ArrayList;
import java.util.List;

/**
 * Rows [rowFrom, rowTo) of one segment's upper triangle: a unit of work. Immutable.
 */
record Piece(Segment seg, int rowFrom, int rowTo) {

    /** Bands hold at least this many cells, so small triangles are not split needlessly. */
    static final long MIN_BAND_CELLS = 4096;

    /**
     * Splits a segment's rows into at most {@code parts} bands of about equal cell counts (at least
     * {@code minCells} each), top to bottom.
     */
    static List<Piece> bands(Segment seg, int theiler, int parts, long minCells) {
        int rows = seg.rows(theiler);
        List<Piece> out = new ArrayList<>();
        if (rows == 0) {
            return out;
        }
        long total = seg.upperCells(theiler);
        int k = (int) Math.max(1, Math.min(parts, Math.min(rows, total / Math.max(1, minCells) + 1)));
        int start = 0;
        for (int c = 1; c <= k; c++) {
            int end = c == k ? rows : firstRowWith(seg, theiler, total * c / k, start);
            if (end > start) {
                out.add(new Piece(seg, start, end));
                start = end;
            }
        }
        return out;
    }

    /** Groups whole segments into at most {@code parts} tasks of about equal cell counts, in order. */
    static List<List<Piece>> groups(List<Segment> segs, int theiler, int parts) {
        long total = 0;
        for (Segment s : segs) {
            total += s.upperCells(theiler);
        }
        List<List<Piece>> out = new ArrayList<>();
        List<Piece> group = new ArrayList<>();
        if (total == 0) {
            return out;
        }
        long done = 0;
        int next = 1;
        for (Segment s : segs) {
            group.add(new Piece(s, 0, s.rows(theiler)));
            done += s.upperCells(theiler);
            if (done * parts >= total * next) {
                out.add(group);
                group = new ArrayList<>();
                while (done * parts >= total * next) {
                    next++;
                }
            }
        }
        if (!group.isEmpty()) {
            out.add(group);
        }
        return out;
    }

    /** The first row r ≥ start with cellsBefore(r) ≥ cells. */
    private static int firstRowWith(Segment seg, int theiler, long cells, int start) {
        int lo = start;
        int hi = seg.rows(theiler);
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (seg.cellsBefore(mid, theiler) >= cells) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        return lo;
    }
}
