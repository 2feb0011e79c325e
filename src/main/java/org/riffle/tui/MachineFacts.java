package org.riffle.tui;

import java.util.Objects;
import org.riffle.signal.BearingGeometry;
import org.riffle.signal.VibrationParams;
import org.riffle.signal.ZoneTable;

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

    /**
     * The vibration parameters these facts give (blank fields keep the defaults).
     *
     * @throws IllegalArgumentException with a message fit to show when a field cannot be read
     */
    VibrationParams toParams() {
        VibrationParams p = VibrationParams.defaults();
        if (machineGroup.isBlank() != support.isBlank()) {
            throw new IllegalArgumentException("give both machine group and support for a severity zone");
        }
        if (!machineGroup.isBlank()) {
            p = p.withTable(new ZoneTable(ZoneTable.parseGroup(machineGroup), ZoneTable.parseSupport(support)));
        }
        if (!shaftRpm.isBlank()) {
            try {
                p = p.withRpm(Double.parseDouble(shaftRpm.strip()));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("shaft speed '" + shaftRpm + "' is not a number of r/min", e);
            }
        }
        if (!bearing.isBlank()) {
            p = p.withBearing(BearingGeometry.parse(bearing));
        }
        return p;
    }
}
