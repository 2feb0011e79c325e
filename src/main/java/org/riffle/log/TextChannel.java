package org.riffle.log;

import java.util.List;
import java.util.Objects;

/**
 * A column that is mostly text (status words, quality flags). Kept for display and left out of the
 * numeric analysis. Immutable.
 *
 * @param name column name as read
 * @param distinct the distinct values seen, in order of first appearance (capped by the reader)
 */
public record TextChannel(String name, List<String> distinct) {
    public TextChannel {
        Objects.requireNonNull(name, "name");
        distinct = List.copyOf(distinct);
    }
}
