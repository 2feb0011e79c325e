package org.riffle.triage;

import java.util.Objects;

/**
 * A method parameter as it was used, ready to print: {@code name = value}. Immutable.
 *
 * @param name e.g. {@code "embedding dimension"}
 * @param value e.g. {@code "3 (false nearest neighbours)"}
 */
public record Param(String name, String value) {
    public Param {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(value, "value");
    }

    @Override
    public String toString() {
        return name + " = " + value;
    }
}
