package org.riffle.note;

import java.nio.file.Path;
import java.util.Map;

/**
 * Where riffle keeps its own files, after the XDG base directory specification: baselines under the
 * data folder ({@code $XDG_DATA_HOME/riffle/baselines}, default {@code ~/.local/share/riffle/baselines},
 * or {@code $RIFFLE_BASELINE_DIR} when set), drafts that cannot sit beside their log under the state
 * folder ({@code $XDG_STATE_HOME/riffle/drafts}, default {@code ~/.local/state/riffle/drafts}). A
 * relative XDG value is ignored, as the specification says.
 *
 * <p>Stateless and thread-safe.
 */
final class Folders {
    /** Environment variable naming the baseline folder directly. */
    static final String BASELINE_ENV = "RIFFLE_BASELINE_DIR";

    private Folders() {
    }

    /** The baseline folder for this environment. */
    static Path baselines(Map<String, String> env, Path home) {
        String direct = env.get(BASELINE_ENV);
        if (direct != null && !direct.isBlank()) {
            return Path.of(direct);
        }
        return xdg(env, "XDG_DATA_HOME", home.resolve(".local").resolve("share")).resolve("riffle")
                .resolve("baselines");
    }

    /** The folder for drafts of logs whose own folder is not writable. */
    static Path drafts(Map<String, String> env, Path home) {
        return xdg(env, "XDG_STATE_HOME", home.resolve(".local").resolve("state")).resolve("riffle")
                .resolve("drafts");
    }

    /** The user's home folder. */
    static Path home() {
        return Path.of(System.getProperty("user.home"));
    }

    private static Path xdg(Map<String, String> env, String name, Path fallback) {
        String v = env.get(name);
        if (v != null && !v.isBlank() && Path.of(v).isAbsolute()) {
            return Path.of(v);
        }
        return fallback;
    }
}
