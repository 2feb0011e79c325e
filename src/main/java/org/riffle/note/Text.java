package org.riffle.note;

import java.text.Normalizer;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.riffle.log.Printable;

/**
 * Text hygiene for everything that reaches a note, a draft or a baseline file: neutralising control
 * characters and escape sequences that came from input, an ASCII-only transliteration, and word
 * wrapping. Widths are counted in code points (one column each).
 *
 * <p>Stateless and thread-safe.
 */
final class Text {
    private static final Map<Integer, String> ASCII = Map.ofEntries(
            Map.entry(0x00B0, "deg"), Map.entry(0x00B5, "u"), Map.entry(0x03BC, "u"),
            Map.entry(0x00DF, "ss"), Map.entry(0x00E6, "ae"), Map.entry(0x00C6, "AE"),
            Map.entry(0x00F8, "o"), Map.entry(0x00D8, "O"), Map.entry(0x0153, "oe"),
            Map.entry(0x00D7, "x"), Map.entry(0x00B7, "."), Map.entry(0x2013, "-"), Map.entry(0x2014, "-"),
            Map.entry(0x2212, "-"), Map.entry(0x2018, "'"), Map.entry(0x2019, "'"), Map.entry(0x201C, "\""),
            Map.entry(0x201D, "\""), Map.entry(0x2026, "..."), Map.entry(0x2264, "<="),
            Map.entry(0x2265, ">="), Map.entry(0x00B1, "+/-"), Map.entry(0x2044, "/"),
            Map.entry(0x03A9, "Ohm"), Map.entry(0x2126, "Ohm"), Map.entry(0x20AC, "EUR"),
            Map.entry(0x00A7, "S."), Map.entry(0x00E5, "a"), Map.entry(0x0131, "i"), Map.entry(0x0142, "l"),
            Map.entry(0x0141, "L"), Map.entry(0x00F0, "d"), Map.entry(0x00FE, "th"), Map.entry(0x2022, "*"),
            Map.entry(0x03B1, "alpha"), Map.entry(0x03B2, "beta"), Map.entry(0x03B5, "eps"),
            Map.entry(0x03C4, "tau"), Map.entry(0x03BB, "lambda"), Map.entry(0x03C6, "phi"),
            Map.entry(0x03C1, "rho"), Map.entry(0x03C3, "sigma"), Map.entry(0x03C9, "omega"),
            Map.entry(0x0394, "Delta"), Map.entry(0x2192, "->"), Map.entry(0x2190, "<-"), Map.entry(0x2248, "~"),
            Map.entry(0x221A, "sqrt"), Map.entry(0x221E, "inf"), Map.entry(0x2260, "!="),
            Map.entry((int) Fmt.GLUE, String.valueOf(Fmt.GLUE)));

    private Text() {
    }

    /** One line of input made harmless: the shared neutraliser, {@link Printable#clean}. */
    static String clean(String s) {
        return Printable.clean(s);
    }

    /** Several lines of typed text made harmless: {@link Printable#cleanLines}. */
    static String cleanLines(String s) {
        return Printable.cleanLines(s);
    }

    /**
     * An ASCII-only spelling of {@code s}: compatibility decomposition with accents dropped
     * ({@code ä} → {@code a}, {@code ³} → {@code 3}), a small table for common symbols
     * ({@code °} → {@code deg}, {@code µ} → {@code u}), and {@code ?} for anything left.
     */
    static String ascii(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        s.codePoints().forEach(cp -> {
            if (cp < 0x80) {
                sb.append((char) cp);
                return;
            }
            String mapped = ASCII.get(cp);
            if (mapped != null) {
                sb.append(mapped);
                return;
            }
            String d = Normalizer.normalize(new String(Character.toChars(cp)), Normalizer.Form.NFKD);
            StringBuilder part = new StringBuilder();
            d.codePoints().forEach(c -> {
                if (c < 0x80) {
                    part.append((char) c);
                } else if (ASCII.containsKey(c)) {
                    part.append(ASCII.get(c));
                } else if (Character.getType(c) != Character.NON_SPACING_MARK) {
                    part.append('?');
                }
            });
            sb.append(part.length() == 0 ? "?" : part);
        });
        return sb.toString();
    }

    /** Number of columns {@code s} takes (code points). */
    static int width(String s) {
        return s.codePointCount(0, s.length());
    }

    /**
     * Word-wraps one paragraph to {@code width} columns: the first line starts with {@code first},
     * the others with {@code rest}. A word longer than a line is broken. Runs of spaces collapse.
     */
    static List<String> wrap(String paragraph, int width, String first, String rest) {
        List<String> out = new ArrayList<>();
        StringBuilder line = new StringBuilder(first);
        int used = width(first);
        int indent = used;
        boolean empty = true;
        for (String word : paragraph.trim().split(" +")) {
            if (word.isEmpty()) {
                continue;
            }
            int w = width(word);
            if (!empty && used + 1 + w > width) {
                out.add(line.toString());
                line = new StringBuilder(rest);
                used = width(rest);
                indent = used;
                empty = true;
            }
            if (!empty) {
                line.append(' ');
                used++;
            }
            while (used + w > width && width - indent > 0) {
                int room = Math.max(1, width - used);
                int cut = word.offsetByCodePoints(0, room);
                line.append(word, 0, cut);
                out.add(line.toString());
                word = word.substring(cut);
                w = width(word);
                line = new StringBuilder(rest);
                used = width(rest);
                indent = used;
            }
            line.append(word);
            used += w;
            empty = false;
        }
        out.add(line.toString());
        return out;
    }
}
