package org.riffle.tui;

import java.util.List;
import java.util.Objects;

/**
 * What the technician enters about the machine: asset, machine group, support type, shaft speed and
 * bearing geometry, each as typed (blank when not known; never invented). Immutable.
 *
 * @param asset asset identity, e.g. a tag number
 * @param machineGroup machine group for the severity table, e.g. {@code "2"}
 * @param support support type, {@code "rigid"} or {@code "flexible"}
 * @param shaftRpm shaft speed in revolutions per minute, as typed
 * @param bearing bearing geometry as typed: elements, element and pitch diameters, contact angle
 */
public record AssetFacts(String asset, String machineGroup, String support, String shaftRpm, String bearing) {
    /** Field labels in form order. */
    static final List<String> LABELS = List.of("asset", "machine group (1 or 2)", "support (rigid/flexible)",
            "shaft speed (r/min)", "bearing (n d D angle)");

    public AssetFacts {
        Objects.requireNonNull(asset, "asset");
        Objects.requireNonNull(machineGroup, "machineGroup");
        Objects.requireNonNull(support, "support");
        Objects.requireNonNull(shaftRpm, "shaftRpm");
        Objects.requireNonNull(bearing, "bearing");
    }

    /** Nothing known. */
    public static AssetFacts none() {
        return new AssetFacts("", "", "", "", "");
    }

    /** Field {@code i} in {@link #LABELS} order. */
    String field(int i) {
        return List.of(asset, machineGroup, support, shaftRpm, bearing).get(i);
    }

    /** A copy with field {@code i} replaced. */
    AssetFacts with(int i, String value) {
        String v = value.strip();
        return new AssetFacts(i == 0 ? v : asset, i == 1 ? v : machineGroup, i == 2 ? v : support,
                i == 3 ? v : shaftRpm, i == 4 ? v : bearing);
    }
}
