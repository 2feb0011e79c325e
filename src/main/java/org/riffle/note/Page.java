package org.riffle.note;

import java.util.ArrayList;
import java.util.List;

/**
 * Lays out a note: headings, labelled fields with hanging indents, paragraphs, tables; every piece of
 * text is neutralised ({@link Text#clean}), made ASCII when asked, and wrapped at the note width.
 *
 * <p>Confined to one thread.
 */
final class Page {
    private final int width;
    private final boolean ascii;
    private final List<String> lines = new ArrayList<>();

    Page(int width, boolean ascii) {
        this.width = width;
        this.ascii = ascii;
    }

    /** Text as it will be printed: neutralised, and ASCII when asked. */
    String out(String s) {
        String c = Text.clean(s);
        return ascii ? Text.ascii(c) : c;
    }

    /** A heading: a blank line, the title in capitals, a rule under it. */
    Page heading(String title) {
        if (!lines.isEmpty()) {
            lines.add("");
        }
        String t = out(title);
        lines.add(t);
        lines.add("-".repeat(Text.width(t)));
        return this;
    }

    /** A line as given (neutralised), cut at the width if ever needed. */
    Page line(String s) {
        return verbatim(out(s), 0);
    }

    /** An empty line. */
    Page blank() {
        lines.add("");
        return this;
    }

    /** A paragraph indented by {@code indent} spaces, wrapped. */
    Page para(int indent, String text) {
        String pad = " ".repeat(indent);
        lines.addAll(Text.wrap(out(text), width, pad, pad));
        return this;
    }

    /** A bullet item: {@code - text}, wrapped under its text. */
    Page bullet(int indent, String text) {
        String pad = " ".repeat(indent);
        lines.addAll(Text.wrap(out(text), width, pad + "- ", pad + "  "));
        return this;
    }

    /**
     * A labelled field: {@code indent} spaces, the label and a colon padded to {@code labelWidth},
     * then the value wrapped under itself.
     */
    Page field(int indent, int labelWidth, String label, String value) {
        String head = " ".repeat(indent) + label(label, labelWidth);
        lines.addAll(Text.wrap(out(value), width, head, " ".repeat(Text.width(head))));
        return this;
    }

    /**
     * Typed text of several lines (a comment) as a labelled field: each line of it wrapped under the
     * value column; line breaks are kept.
     */
    Page typed(int indent, int labelWidth, String label, String text) {
        String head = " ".repeat(indent) + label(label, labelWidth);
        String hang = " ".repeat(Text.width(head));
        String cleaned = Text.cleanLines(text.strip());
        boolean first = true;
        for (String l : cleaned.split("\n", -1)) {
            String shown = ascii ? Text.ascii(l) : l;
            if (shown.isBlank()) {
                lines.add(first ? head.stripTrailing() : "");
            } else {
                lines.addAll(Text.wrap(shown, width, first ? head : hang, hang));
            }
            first = false;
        }
        return this;
    }

    /** A table row: cells right-aligned to {@code widths} after a left-aligned first cell. */
    Page row(int indent, int[] widths, String... cells) {
        StringBuilder sb = new StringBuilder(" ".repeat(indent));
        for (int i = 0; i < cells.length; i++) {
            String c = out(cells[i]);
            sb.append(i == 0 ? pad(c, widths[0]) : " " + padLeft(c, widths[i]));
        }
        return verbatim(sb.toString().stripTrailing(), indent + 2);
    }

    /** Adds {@code s} unchanged when it fits, else word-wrapped with a hanging indent. */
    private Page verbatim(String s, int hang) {
        if (Text.width(s) <= width) {
            lines.add(s);
        } else {
            lines.addAll(Text.wrap(s, width, "", " ".repeat(hang)));
        }
        return this;
    }

    /** The page as text: lines joined with LF, trailing spaces removed, one final LF. */
    String text() {
        StringBuilder sb = new StringBuilder();
        for (String l : lines) {
            sb.append(l.replace(Fmt.GLUE, ' ').stripTrailing()).append('\n');
        }
        return sb.toString();
    }

    private String label(String label, int w) {
        return label.isEmpty() ? " ".repeat(w) : pad(out(label) + ":", w);
    }

    static String pad(String s, int w) {
        int n = Text.width(s);
        return n >= w ? s + " " : s + " ".repeat(w - n);
    }

    private static String padLeft(String s, int w) {
        int n = Text.width(s);
        return n >= w ? s : " ".repeat(w - n) + s;
    }
}
