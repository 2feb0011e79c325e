package org.riffle.tui;

import org.riffle.tui.Canvas.Style;

/**
 * The asset form drawn over the lower part of any view: asset, machine group, support type, shaft
 * speed and bearing geometry, one line each, the chosen one marked.
 *
 * <p>Stateless; called on the UI thread.
 */
final class AssetForm {
    private AssetForm() {
    }

    static void paint(Canvas c, ScreenState s) {
        int n = AssetFacts.LABELS.size();
        int top = c.rows() - 3 - n;
        c.field(0, top, "Asset and machine: Up/Down choose, Enter edit, Esc done (changes recompute)", c.cols(),
                Style.REVERSE);
        AssetFacts a = s.remarks.asset();
        for (int i = 0; i < n; i++) {
            boolean sel = i == s.assetField;
            String v = a.field(i);
            c.field(0, top + 1 + i, (sel ? "> " : "  ") + Text.fit(AssetFacts.LABELS.get(i), 26, '~') + " "
                    + (v.isEmpty() ? "-" : v), c.cols(), sel ? Style.REVERSE : Style.PLAIN);
        }
        c.field(0, top + 1 + n, "", c.cols(), Style.PLAIN);
    }
}
