package org.riffle.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.screen.Screen;
import java.io.IOException;

/**
 * Draws the whole state into Lanterna's back buffer and sends only the cells that changed (a delta
 * refresh); a resize or Ctrl-L sends everything. Below 80 × 24 it draws the caution and the request
 * to enlarge the window, nothing else.
 *
 * <p>Confined to the UI thread.
 */
final class Renderer {
    private final Screen screen;
    private final Glyphs glyphs;
    private final boolean color;

    Renderer(Screen screen, ScreenOptions options) {
        this.screen = screen;
        this.glyphs = options.ascii() ? Glyphs.ASCII : Glyphs.UNICODE;
        this.color = options.color();
    }

    /** Draws {@code c}'s state; {@code full} forces a complete refresh. */
    void render(Controller ctl, boolean full) throws IOException {
        TerminalSize resized = screen.doResizeIfNecessary();
        TerminalSize size = screen.getTerminalSize();
        screen.clear();
        Canvas canvas = new Canvas(screen, size, glyphs, color);
        ScreenState s = ctl.s;
        if (size.getColumns() < Chrome.MIN_COLS || size.getRows() < Chrome.MIN_ROWS) {
            Chrome.tooSmall(canvas);
        } else {
            paint(canvas, ctl, s);
        }
        screen.setCursorPosition(null);
        screen.refresh(full || resized != null ? Screen.RefreshType.COMPLETE : Screen.RefreshType.DELTA);
    }

    private void paint(Canvas canvas, Controller ctl, ScreenState s) {
        int visible = ListView.visibleRows(canvas.rows());
        ctl.nav.pageRows = visible;
        ctl.nav.plotColumns = canvas.cols() - DetailView.GUTTER;
        if (s.selected < s.top) {
            s.top = s.selected;
        } else if (s.selected >= s.top + visible) {
            s.top = s.selected - visible + 1;
        }
        s.top = Math.max(0, Math.min(s.top, Math.max(0, s.rows.size() - visible)));
        Chrome.caution(canvas);
        switch (s.view) {
            case LIST -> ListView.paint(canvas, s);
            case DETAIL -> DetailView.paint(canvas, s);
            case HELP -> HelpView.paint(canvas, s);
        }
        if (s.mode == ScreenState.Mode.ASSET_FORM) {
            AssetForm.paint(canvas, s);
        }
        Chrome.status(canvas, s);
    }
}
