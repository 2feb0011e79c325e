package org.riffle.note;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.StringLength;
import org.junit.jupiter.api.Test;

class TextTest {
    @Test
    void controlCharactersBecomeVisibleAndInert() {
        assertEquals("a^[[31mb^Gc^?d<U+009B>e<U+202E>f<U+2028>g^M^J^I", Text.clean(
                "a\u001b[31mb\u0007c\u007fd\u009be\u202ef\u2028g\r\n\t"));
        assertEquals("keeps \u00b0C, \u00b5m, m\u00b3/h and \ud83d\ude00", Text.clean(
                "keeps \u00b0C, \u00b5m, m\u00b3/h and \ud83d\ude00"));
        assertEquals("lone <U+D800>", Text.clean("lone \ud800"));
    }

    @Test
    void typedTextKeepsItsLineBreaksOnly() {
        assertEquals("one\ntwo\nthree four^[x", Text.cleanLines("one\r\ntwo\rthree\tfour\u001bx"));
    }

    @Test
    void asciiSpellsCommonUnitsReadably() {
        // A no-break space is kept: it is the note's glue, printed as a plain space by Page.
        assertEquals("degC, um, m3/h, Strasse, Sudhalle, 1/2, x, +/-, 5\u00a0%, <=, ?", Text.ascii(
                "\u00b0C, \u00b5m, m\u00b3/h, Stra\u00dfe, S\u00fcdhalle, \u00bd, \u00d7, \u00b1, 5\u00a0%, \u2264, \u2603"));
    }

    @Test
    void asciiSpellsTheMethodSymbolsTheTradeUses() {
        assertEquals("m = 4, tau = 12, eps = 0.1 -> radius, alpha 0.5, lambda1 ~ 0.9, x2, sigma^2",
                Text.ascii("m = 4, \u03c4 = 12, \u03b5 = 0.1 \u2192 radius, \u03b1 0.5, \u03bb1 \u2248 0.9, \u00d72,"
                        + " \u03c3^2"));
    }

    @Test
    void wrapBreaksAtSpacesWithAHangingIndent() {
        assertEquals(List.of("  - alpha beta", "    gamma delta"),
                Text.wrap("alpha beta gamma delta", 15, "  - ", "    "));
        assertEquals(List.of("ab", "cd", "ef"), Text.wrap("abcdef", 2, "", ""), "a long word is cut");
        assertEquals(List.of("x:"), Text.wrap("   ", 10, "x:", "  "));
    }

    @Property(tries = 300, seed = "20260314")
    void wrappedLinesFitAndKeepEveryWord(@ForAll @StringLength(max = 200) String raw,
                                         @ForAll @IntRange(min = 8, max = 90) int width) {
        String text = Text.clean(raw).replace('\u00a0', ' ');
        List<String> lines = Text.wrap(text, width, "  ", "    ");
        StringBuilder joined = new StringBuilder();
        for (String l : lines) {
            if (Text.width(l) > width) {
                throw new AssertionError("line wider than " + width + ": '" + l + "'");
            }
            joined.append(l.strip());
        }
        // Unicode white space on both sides: wrap may drop an en quad at a line end just as strip() does.
        assertEquals(text.replaceAll("(?U)\\s+", ""), joined.toString().replaceAll("(?U)\\s+", ""));
    }

    @Test
    void escapeRoundTripsAndRefusesDamage() {
        String s = "a\\b\nc\rd\te\u001bf\u200eg\ud83d\ude00\udc00";
        assertEquals(s, Escape.decode(Escape.encode(s)));
        assertEquals("a\\\\b\\nc\\rd\\te\\u001bf\\u200eg\ud83d\ude00\\udc00", Escape.encode(s));
        assertEquals("an unknown escape '\\x'",
                assertThrows(IllegalArgumentException.class, () -> Escape.decode("\\x")).getMessage());
        assertEquals("a cut-off \\u escape",
                assertThrows(IllegalArgumentException.class, () -> Escape.decode("\\u12")).getMessage());
        assertEquals("a bad \\u escape '+fff'",
                assertThrows(IllegalArgumentException.class, () -> Escape.decode("\\u+fff")).getMessage());
    }

    @Test
    void numbersAreLocaleFreeWithFourSignificantDigits() {
        assertEquals("0.01814", Fmt.num(0.018139));
        assertEquals("41.26", Fmt.num(41.2649));
        assertEquals("1.5e-6", Fmt.num(1.5e-6));
        assertEquals("1.235e7", Fmt.num(12_345_678));
        assertEquals("-999900", Fmt.num(-999_949.9));
        assertEquals("n/a", Fmt.num(Double.NaN));
        assertEquals("+5.25", Fmt.signed(5.25));
        assertEquals("1\u00a0h\u00a023\u00a0min\u00a019\u00a0s", Fmt.duration(5 * 3600 / 5 + 23 * 60 + 19));
    }
}
