package org.riffle.tui;

/**
 * Moves the selection through the channel list and the time window and cursor of the detail view.
 * Keeps everything inside the log: the selection within the rows, the window within the samples, the
 * cursor within the window.
 *
 * <p>Confined to the UI thread.
 */
final class Navigation {
    /** Fewest samples a zoomed window shows. */
    static final int MIN_WINDOW = 8;

    private final ScreenState s;
    /** Channel lines on a page and plot columns, as last drawn. */
    int pageRows = 10;
    int plotColumns = 70;

    Navigation(ScreenState s) {
        this.s = s;
    }

    void move(Action a) {
        if (s.rows.isEmpty()) {
            return;
        }
        int before = s.row().source();
        int n = s.rows.size();
        s.selected = switch (a) {
            case UP -> s.selected - 1;
            case DOWN -> s.selected + 1;
            case PAGE_UP -> s.selected - pageRows;
            case PAGE_DOWN -> s.selected + pageRows;
            case FIRST -> 0;
            case LAST -> n - 1;
            default -> s.selected;
        };
        s.selected = Math.max(0, Math.min(n - 1, s.selected));
        if (s.view == View.DETAIL && s.row().source() != before) {
            s.resetWindow();
        }
    }

    /** On opening the detail view: a window over the whole log unless one is set for this log. */
    void enterDetail() {
        int n = s.source().recording.rows();
        if (s.from < 0 || s.to > n || s.cursor >= n) {
            s.resetWindow();
        }
    }

    void time(Action a) {
        if (s.view != View.DETAIL || s.rows.isEmpty()) {
            return;
        }
        int n = s.source().recording.rows();
        int width = s.to - s.from;
        int step = Math.max(1, width / Math.max(1, plotColumns));
        switch (a) {
            case LEFT -> s.cursor -= step;
            case RIGHT -> s.cursor += step;
            case FAR_LEFT -> shift(-width / 2, n, true);
            case FAR_RIGHT -> shift(width / 2, n, true);
            case ZOOM_IN -> zoom(Math.max(Math.min(MIN_WINDOW, n), width / 2), n);
            case ZOOM_OUT -> zoom(Math.min(n, width * 2), n);
            case ZOOM_ALL -> zoom(n, n);
            default -> {
            }
        }
        s.cursor = Math.max(0, Math.min(n - 1, s.cursor));
        if (s.cursor < s.from) {
            shift(s.cursor - s.from, n, false);
        } else if (s.cursor >= s.to) {
            shift(s.cursor - s.to + 1, n, false);
        }
    }

    private void shift(int by, int n, boolean withCursor) {
        int width = s.to - s.from;
        int from = Math.max(0, Math.min(n - width, s.from + by));
        if (withCursor) {
            s.cursor += from - s.from;
        }
        s.from = from;
        s.to = from + width;
    }

    private void zoom(int width, int n) {
        int w = Math.max(1, Math.min(n, width));
        int from = Math.max(0, Math.min(n - w, s.cursor - w / 2));
        s.from = from;
        s.to = from + w;
    }
}
