package org.riffle.tui;

import java.util.Objects;

/**
 * What the technician enters about the machine for the vibration figures: machine group, support
 * type, shaft speed and bearing geometry, each as typed (blank when not known; never invented).
 * Immutable.
 *
 * @param machineGroup machine group of the severity table, e.g. {@code "2"}
 * @param support support type, {@code "rigid"} or {@code "flexible"}
 * @param shaftRpm shaft speed in revolutions per minute, as typed
 * @param bearing bearing geometry as typed: rolling elements, element and pitch diameters, contact angle
 */
record MachineFacts(String machineGroup, String support, String shaftRpm, String bearing) {
    MachineFacts {
        Objects.requireNonNull(machineGroup, "machineGroup");
        Objects.requireNonNull(support, "support");
        Objects.requireNonNull(shaftRpm, "shaftRpm");
        Objects.requireNonNull(bearing, "bearing");
    }

    static MachineFacts none() {
        return new MachineFacts("", "", "", "");
    }
}
