package org.riffle.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import java.util.Optional;

/**
 * Turns a key stroke into an {@link Action} for the view in front. Arrow keys and the usual vi keys
 * both work; Ctrl-C arrives as a key (the terminal is put in a mode where it raises no signal) and
 * means {@link Action#INTERRUPT}.
 *
 * <p>Stateless.
 */
final class KeyMap {
    private KeyMap() {
    }

    /** The action of {@code k} in {@code view}, empty when the key does nothing there. */
    static Optional<Action> map(KeyStroke k, View view) {
        if (k.getKeyType() == KeyType.Character) {
            return character(k.getCharacter(), k.isCtrlDown(), view);
        }
        boolean detail = view == View.DETAIL;
        Action a = switch (k.getKeyType()) {
            case ArrowUp -> Action.UP;
            case ArrowDown -> Action.DOWN;
            case ArrowLeft -> detail ? Action.LEFT : null;
            case ArrowRight -> detail ? Action.RIGHT : Action.OPEN;
            case PageUp -> Action.PAGE_UP;
            case PageDown -> Action.PAGE_DOWN;
            case Home -> Action.FIRST;
            case End -> Action.LAST;
            case Enter -> detail ? null : Action.OPEN;
            case Escape, Backspace -> Action.BACK;
            case Tab -> Action.NEXT_PANEL;
            case EOF -> Action.INTERRUPT;
            default -> null;
        };
        return Optional.ofNullable(a);
    }

    private static Optional<Action> character(char c, boolean ctrl, View view) {
        if (ctrl) {
            return Optional.ofNullable(switch (Character.toLowerCase(c)) {
                case 'c' -> Action.INTERRUPT;
                case 'l' -> Action.REDRAW;
                case 'b' -> Action.PAGE_UP;
                case 'f' -> Action.PAGE_DOWN;
                default -> null;
            });
        }
        boolean detail = view == View.DETAIL;
        Action a = switch (c) {
            case 'k' -> Action.UP;
            case 'j' -> Action.DOWN;
            case 'g' -> Action.FIRST;
            case 'G' -> Action.LAST;
            case 'l' -> detail ? Action.RIGHT : Action.OPEN;
            case 'h' -> detail ? Action.LEFT : null;
            case 'H', '<' -> Action.FAR_LEFT;
            case 'L', '>' -> Action.FAR_RIGHT;
            case '+', '=' -> Action.ZOOM_IN;
            case '-' -> Action.ZOOM_OUT;
            case '0' -> Action.ZOOM_ALL;
            case 'b' -> Action.BASELINE;
            case 'a' -> Action.ASSET;
            case 'c' -> Action.COMMENT;
            case 'C' -> Action.GENERAL_COMMENT;
            case 's' -> Action.SAVE;
            case 'x' -> Action.CANCEL_WORK;
            case '?' -> Action.HELP;
            case 'q' -> Action.QUIT;
            default -> null;
        };
        return Optional.ofNullable(a);
    }
}
