package org.riffle.tui;

import com.googlecode.lanterna.input.KeyStroke;
import java.util.function.Consumer;

/**
 * A one-line text editor on the status line: a label, the text, a cursor. Enter accepts, Esc cancels,
 * Left/Right/Home/End move, Backspace/Delete erase. Ctrl-U clears the line.
 *
 * <p>Confined to the UI thread.
 */
final class Prompt {
    /** What a key did to the prompt. */
    enum Outcome {
        EDITING, ACCEPTED, CANCELLED
    }

    final String label;
    private final StringBuilder text;
    private final Consumer<String> onAccept;
    private int cursor;

    Prompt(String label, String initial, Consumer<String> onAccept) {
        this.label = label;
        this.text = new StringBuilder(initial);
        this.onAccept = onAccept;
        this.cursor = text.length();
    }

    String text() {
        return text.toString();
    }

    int cursor() {
        return cursor;
    }

    /** Applies {@code k}; on Enter calls the accept action with the text. */
    Outcome key(KeyStroke k) {
        switch (k.getKeyType()) {
            case Enter -> {
                onAccept.accept(text.toString().strip());
                return Outcome.ACCEPTED;
            }
            case Escape -> {
                return Outcome.CANCELLED;
            }
            case Backspace -> {
                if (cursor > 0) {
                    text.deleteCharAt(--cursor);
                }
            }
            case Delete -> {
                if (cursor < text.length()) {
                    text.deleteCharAt(cursor);
                }
            }
            case ArrowLeft -> cursor = Math.max(0, cursor - 1);
            case ArrowRight -> cursor = Math.min(text.length(), cursor + 1);
            case Home -> cursor = 0;
            case End -> cursor = text.length();
            case Character -> typed(k);
            default -> {
            }
        }
        return Outcome.EDITING;
    }

    private void typed(KeyStroke k) {
        char c = k.getCharacter();
        if (k.isCtrlDown()) {
            if (c == 'u') {
                text.setLength(0);
                cursor = 0;
            }
            return;
        }
        if (c >= ' ' && c != 0x7f && text.length() < 2000) {
            text.insert(cursor++, c);
        }
    }
}
