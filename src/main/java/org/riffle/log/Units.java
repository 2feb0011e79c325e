package org.riffle.log;

import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Names and units from a header: {@code flow [m³/h]} always carries a unit; {@code flow (m³/h)} does
 * when the text in parentheses looks like a unit (it holds a symbol such as {@code /}, {@code °},
 * {@code %}, a digit or a superscript, or is a common unit word), so {@code pressure (inlet)} stays a
 * name. Units-row cells lose surrounding brackets.
 *
 * <p>Stateless and thread-safe.
 */
final class Units {
    private static final Pattern SYMBOL = Pattern.compile(".*[/°%0-9²³µμ·*^‰Ω].*");
    private static final Set<String> WORDS = Set.of("s", "ms", "us", "min", "h", "hz", "khz", "rpm", "v", "mv", "kv",
            "a", "ma", "ka", "w", "kw", "mw", "va", "kva", "var", "bar", "mbar", "pa", "kpa", "hpa", "mpa", "psi",
            "psig", "inh2o", "mmh2o", "m", "mm", "cm", "km", "um", "in", "ft", "g", "kg", "t", "n", "nm", "knm",
            "k", "c", "degc", "degf", "f", "l", "lpm", "gpm", "cfm", "ppm", "db", "dba", "ips", "mils", "pct",
            "ohm", "kwh", "mwh", "j", "kj", "lux", "rh");

    private Units() {
    }

    /** A header cell split into name and unit. */
    record Split(String name, String unit) {
    }

    static Split split(String header) {
        String h = header.strip();
        Split square = bracketed(h, '[', ']');
        if (square != null) {
            return square;
        }
        Split round = bracketed(h, '(', ')');
        if (round != null && looksLikeUnit(round.unit())) {
            return round;
        }
        return new Split(h, "");
    }

    /**
     * {@code NAME OPEN UNIT CLOSE} with the unit last, free of either bracket, and a name that is not
     * blank; null otherwise. A scan, not a regular expression: a lazy name followed by a bracketed group
     * backtracks in time that grows with the square of a long header cell (a fuzzed 760 KB cell took
     * minutes).
     */
    private static Split bracketed(String h, char open, char close) {
        int end = h.length() - 1;
        if (end < 1 || h.charAt(end) != close) {
            return null;
        }
        int start = h.lastIndexOf(open, end - 1);
        if (start < 0 || h.lastIndexOf(close, end - 1) > start) {
            return null;
        }
        String name = h.substring(0, start);
        return name.isBlank() ? null : new Split(name.strip(), h.substring(start + 1, end).strip());
    }

    static boolean looksLikeUnit(String u) {
        return !u.isEmpty() && u.length() <= 16
                && (SYMBOL.matcher(u).matches() || WORDS.contains(u.toLowerCase(Locale.ROOT)));
    }

    /** A units-row cell without surrounding brackets or parentheses. */
    static String strip(String cell) {
        String u = cell.strip();
        if (u.length() >= 2 && (u.charAt(0) == '[' && u.endsWith("]") || u.charAt(0) == '(' && u.endsWith(")"))) {
            u = u.substring(1, u.length() - 1).strip();
        }
        return u;
    }

    /** Fills empty names with {@code colN} (1-based) and makes repeated names unique with {@code #2}, {@code #3}. */
    static void uniqueNames(String[] names) {
        Set<String> seen = new HashSet<>();
        for (int j = 0; j < names.length; j++) {
            if (names[j] == null || names[j].isBlank()) {
                names[j] = "col" + (j + 1);
            }
            String base = names[j];
            int n = 1;
            while (!seen.add(names[j].toLowerCase(Locale.ROOT))) {
                names[j] = base + " #" + (++n);
            }
        }
    }
}
