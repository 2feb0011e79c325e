package org.riffle.tui;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** Every character's bytes against the JDK's own UTF-8 and US-ASCII encoders (the reference). */
class CellBytesTest {
    @Test
    void everyCharacterOfTheBasicPlaneAsTheJdkEncodesIt() {
        for (int i = 0; i <= 0xFFFF; i++) {
            char c = (char) i;
            String s = String.valueOf(c);
            if (Character.isSurrogate(c)) {
                assertNull(CellBytes.of(c, StandardCharsets.UTF_8), "a lone surrogate is left to Lanterna: " + i);
                continue;
            }
            assertArrayEquals(s.getBytes(StandardCharsets.UTF_8), CellBytes.of(c, StandardCharsets.UTF_8), "U+" + Integer.toHexString(i));
            if (c < 0x80) {
                assertArrayEquals(s.getBytes(StandardCharsets.US_ASCII), CellBytes.of(c, StandardCharsets.US_ASCII), "ASCII " + i);
            } else {
                assertNull(CellBytes.of(c, StandardCharsets.US_ASCII), "non-ASCII on an ASCII terminal is left to Lanterna: " + i);
            }
        }
    }
}
