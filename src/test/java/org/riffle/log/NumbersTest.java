package org.riffle.log;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Number cells against the JDK's {@link Float#parseFloat}, which the Java SE 17 API specifies as
 * correctly rounded (IEEE 754 round to nearest, ties to even): the reader must give the same float bit
 * for bit, including decimals built to sit within a hair of a midpoint between two floats, where a
 * careless double-then-float conversion rounds twice and goes wrong. One deliberate difference: a
 * number beyond the float range is a missing sample ({@code NaN}), not an infinity.
 */
class NumbersTest {
    private static void assertSameAsJdk(String s) {
        float jdk = Float.parseFloat(s);
        float want = Float.isInfinite(jdk) ? Float.NaN : jdk;
        assertEquals(Float.floatToIntBits(want), Float.floatToIntBits(Numbers.parse(s, false)), s);
        assertEquals(Float.floatToIntBits(want), Float.floatToIntBits(Numbers.parse(s.replace('.', ','), true)),
                s + " with a decimal comma");
    }

    @Test
    void randomDecimalsMatchTheJdk() {
        SplittableRandom rnd = new SplittableRandom(20260301L);
        for (int k = 0; k < 200_000; k++) {
            int digits = 1 + rnd.nextInt(19);
            StringBuilder sb = new StringBuilder(rnd.nextInt(4) == 0 ? "-" : "");
            for (int d = 0; d < digits; d++) {
                sb.append((char) ('0' + rnd.nextInt(10)));
            }
            int point = rnd.nextInt(digits + 1);
            sb.insert(sb.length() - digits + point, '.');
            if (rnd.nextInt(5) == 0) {
                sb.append('e').append(rnd.nextInt(80) - 40);
            }
            String s = sb.toString();
            if (s.equals(".") || s.equals("-.") || s.startsWith(".e") || s.startsWith("-.e")) {
                continue;
            }
            assertSameAsJdk(s);
        }
    }

    @Test
    void decimalsNearAMidpointBetweenTwoFloatsMatchTheJdk() {
        SplittableRandom rnd = new SplittableRandom(7L);
        for (int k = 0; k < 20_000; k++) {
            float f = Float.intBitsToFloat(0x3000_0000 + rnd.nextInt(0x2000_0000));
            BigDecimal mid = new BigDecimal(f).add(new BigDecimal(Math.nextUp(f))).divide(BigDecimal.valueOf(2));
            BigDecimal hair = new BigDecimal(Math.ulp(f)).movePointLeft(12 + rnd.nextInt(6));
            for (BigDecimal x : new BigDecimal[] {mid, mid.add(hair), mid.subtract(hair)}) {
                assertSameAsJdk(x.round(new java.math.MathContext(12 + rnd.nextInt(14))).toPlainString());
            }
        }
    }

    @Test
    void groupedThousandsAndSurroundingSpaces() {
        assertEquals(1234567.5f, Numbers.parse("1,234,567.5", false));
        assertEquals(1234567.5f, Numbers.parse("1.234.567,5", true));
        assertEquals(1234.5f, Numbers.parse("1'234.5", false));
        assertEquals(1234.5f, Numbers.parse("1\u00a0234,5", true));
        assertEquals(-12.25f, Numbers.parse("  -12.25 ", false));
        assertEquals(0.5f, Numbers.parse("+.5", false));
    }

    @Test
    void nonNumbersAndOverflowAreNaN() {
        for (String s : new String[] {"", " ", "-", ".", "NaN", "#N/A", "---", "ERR", "OVF", "Good", "1.2.3", "1e",
            "0x1A", "Infinity", "1e39", "12:00", "1,5"}) {
            assertTrue(Float.isNaN(Numbers.parse(s, false)), s);
        }
        assertTrue(Numbers.isMissingToken(" #n/a "));
        assertTrue(Numbers.isMissingToken("ovf"));
        assertTrue(!Numbers.isMissingToken("Good"));
    }

    @Test
    void doublesForTimeColumnsKeepEpochMilliseconds() {
        byte[] b = "1772352000250".getBytes(java.nio.charset.StandardCharsets.US_ASCII);
        assertEquals(1772352000250.0, Numbers.parseDouble(b, 0, b.length, false));
        byte[] c = "12,5".getBytes(java.nio.charset.StandardCharsets.US_ASCII);
        assertEquals(12.5, Numbers.parseDouble(c, 0, c.length, true));
    }

    /**
     * Found by {@code ReaderFuzzTest}: a cell of a quarter of a million digits followed by a letter
     * backtracked through the number pattern in time quadratic in its length (minutes). Now linear:
     * well under a second, and still the JDK's answer for long numbers that are numbers.
     */
    @Test
    void aVeryLongCellIsJudgedInLinearTime() {
        String digits = "7".repeat(150_000) + "0".repeat(100_000);
        assertTimeoutPreemptively(Duration.ofSeconds(5), () -> {
            assertTrue(Float.isNaN(Numbers.parse(digits + "x", false)), "digits then a letter");
            assertTrue(Float.isNaN(Numbers.parse(digits + ".5e", false)), "a dangling exponent");
            assertTrue(Float.isNaN(Numbers.parse(digits, false)), "beyond the float range: missing");
            assertTrue(Float.isNaN(Numbers.parse("1." + digits + "e", true)), "decimal comma, dangling exponent");
        });
        assertSameAsJdk("0." + "0".repeat(5_000) + "1e5010");
        assertSameAsJdk("1" + "0".repeat(30) + ".e-30");
        assertSameAsJdk(".5" + "0".repeat(40));
    }

    /** The fast path's early answers (a word, a date, a time) never differ from the general fallback. */
    @Test
    void theFastPathAgreesWithTheFallbackOnMixedText() {
        String alphabet = "0123456789.,eE+-:/T x\t'aZ%";
        SplittableRandom r = new SplittableRandom(20261202);
        for (int k = 0; k < 200_000; k++) {
            StringBuilder sb = new StringBuilder();
            int len = 1 + r.nextInt(9);
            for (int i = 0; i < len; i++) {
                sb.append(alphabet.charAt(r.nextInt(alphabet.length())));
            }
            byte[] b = sb.toString().getBytes(StandardCharsets.UTF_8);
            for (boolean comma : new boolean[] {false, true}) {
                float fast = Numbers.parse(b, 0, b.length, comma);
                float general = Numbers.slow(b, 0, b.length, comma);
                assertEquals(Float.floatToIntBits(general), Float.floatToIntBits(fast),
                        "'" + sb + "', decimal comma " + comma + ": " + fast + " vs " + general);
            }
        }
    }
}
