package org.riffle.tui;

import java.util.ArrayList;
import java.util.List;
import org.riffle.triage.Level;
import org.riffle.tui.Canvas.Style;

/**
 * Every key ({@link Action}), then what the symbols, words and columns mean. Scrolls when the window
 * is too short to show it all.
 *
 * <p>Stateless; called on the UI thread.
 */
final class HelpView {
    private HelpView() {
    }

    /** The help text, one entry per line; a line starting with {@code #} is a heading. */
    static List<String> lines() {
        List<String> out = new ArrayList<>();
        out.add("#Keys");
        for (Action a : Action.values()) {
            out.add(Text.fit(a.keys(), 18, '~') + " " + a.meaning());
        }
        out.add("#Marks and words (never colour alone)");
        for (Level l : Level.values()) {
            out.add(Text.fit("'" + l.mark() + "' " + l.word(), 18, '~') + " " + meaning(l));
        }
        out.add(Text.fit("'*'", 18, '~') + " the channel has a comment");
        out.add(Text.fit("'>'", 18, '~') + " the selected channel");
        out.add("#Columns of the channel list");
        out.add(Text.fit("whole log", 18, '~') + " each cell: bar to the middle of its slice's sample range");
        out.add(Text.fit("level", 18, '~') + " RMS velocity in mm/s for vibration channels, else the mean");
        out.add(Text.fit("Z", 18, '~') + " severity zone A-D where a table applies (site limits first)");
        out.add(Text.fit("DET, LAM", 18, '~') + " recurrence measures: now/baseline");
        out.add(Text.fit("HI", 18, '~') + " health figure 0-100 (100 = like the baseline)");
        out.add(Text.fit("state", 18, '~') + " the level word, or the analysis step and its progress");
        out.add(Text.fit("since", 18, '~') + " start of the first sustained departure");
        out.add("#Detail view");
        out.add("trace: each column spans the samples it covers; '=' marks the baseline, '^' the cursor.");
        out.add("DET, LAM, novelty: windowed trends under the trace, same time axis; level row per window.");
        return out;
    }

    private static String meaning(Level l) {
        return switch (l) {
            case STEADY -> "consistent with the baseline";
            case WATCH -> "departs in some measure, not strongly or not sustained";
            case DEPARTED -> "departs clearly and for a sustained stretch";
        };
    }

    static void paint(Canvas c, ScreenState s) {
        c.field(0, 1, "Help - riffle screen keys and symbols", c.cols(), Style.BOLD);
        List<String> lines = lines();
        int room = c.rows() - 3;
        s.helpTop = Math.max(0, Math.min(s.helpTop, lines.size() - room));
        for (int i = 0; i < room && s.helpTop + i < lines.size(); i++) {
            String l = lines.get(s.helpTop + i);
            boolean heading = l.startsWith("#");
            c.field(0, 2 + i, heading ? l.substring(1) : "  " + l, c.cols(), heading ? Style.BOLD : Style.PLAIN);
        }
    }
}
