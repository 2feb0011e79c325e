package org.riffle.tui;

import java.util.Locale;
import java.util.Map;

/**
 * How the screen draws: the ASCII form or Unicode, colour or none, and how many worker threads the
 * analysis may use. Immutable.
 *
 * @param ascii draw with ASCII only (ramp {@code _.-:=+*#} for sparklines, {@code +-|} for lines)
 * @param color use colour as a second cue beside the symbols and words (never the only one)
 * @param threads worker threads for the analysis, at least 1
 */
public record ScreenOptions(boolean ascii, boolean color, int threads) {
    public ScreenOptions {
        if (threads < 1) {
            throw new IllegalArgumentException("threads " + threads + " must be at least 1");
        }
    }

    /**
     * True when standard input and output are both a terminal (the screen needs both). Here rather than
     * in {@link TriageScreen}, whose loading pulls in the terminal classes before the log is read.
     */
    public static boolean hasTerminal() {
        return System.console() != null;
    }

    /**
     * Options from the environment: ASCII unless the locale ({@code LC_ALL}, else {@code LC_CTYPE},
     * else {@code LANG}) names UTF-8, or when {@code asciiRequested}; no colour when {@code NO_COLOR}
     * is set to anything non-empty (no-color.org); the analysis on every core (a frame costs a few ms of
     * one, and the analysis threads yield to nothing else, so leaving a core idle only made the analysis
     * of a long log slower: 11.4 s against 10 s for the 1M-row log, key presses redrawn within 20 ms
     * either way).
     */
    public static ScreenOptions fromEnvironment(Map<String, String> env, boolean asciiRequested) {
        boolean ascii = asciiRequested || !utf8Locale(env);
        String noColor = env.get("NO_COLOR");
        boolean color = noColor == null || noColor.isEmpty();
        int cores = Runtime.getRuntime().availableProcessors();
        return new ScreenOptions(ascii, color, Math.max(1, cores));
    }

    /** True when the locale the environment names uses UTF-8. */
    static boolean utf8Locale(Map<String, String> env) {
        for (String key : new String[] {"LC_ALL", "LC_CTYPE", "LANG"}) {
            String v = env.get(key);
            if (v != null && !v.isEmpty()) {
                String u = v.toUpperCase(Locale.ROOT).replace("-", "");
                return u.contains("UTF8");
            }
        }
        return false;
    }
}
