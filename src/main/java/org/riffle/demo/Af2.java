package org.riffle.demo;

import java.time.OffsetDateTime;
import java.time.ZoneOffset;

/**
 * The facts of the invented scenario: supply fan AF-2 of the north ventilation station of the Kestrel
 * Hill road tunnel. A 90 kW, 4-pole induction motor (machine group 2 of ISO 10816-3, rigid foundation)
 * drives the axial fan through a single-stage spur gearbox (pinion 31 teeth, wheel 48 teeth). The
 * gearbox input (high-speed) shaft runs in the bearing that develops an outer-race defect.
 * Constants only.
 */
final class Af2 {
    /** Motor rated power in kW. */
    static final double MOTOR_KW = 90;
    /** Synchronous speed of the 4-pole motor on 50 Hz, r/min. */
    static final double SYNC_RPM = 1500;
    /** Slip at rated load, r/min. */
    static final double RATED_SLIP_RPM = 27;
    /** Pinion (input) teeth. */
    static final int PINION_TEETH = 31;
    /** Wheel (output, fan side) teeth. */
    static final int WHEEL_TEETH = 48;
    /** The gearbox input-shaft drive-end bearing (invented geometry). */
    static final BearingGeometry BEARING = new BearingGeometry(8, 22.0, 100.0, 0.0);
    /** Motor speed during the vibration recording, r/min. */
    static final double RECORDING_RPM = 1481;
    /** Full scale of the recording (sample value ±1) in m/s². */
    static final double FULL_SCALE_MS2 = 50;
    /** The structural resonance the bearing impacts excite, Hz. */
    static final double RESONANCE_HZ = 1800;
    /** Start of the process log (local time, CET). */
    static final OffsetDateTime LOG_START = OffsetDateTime.of(2026, 2, 16, 0, 0, 0, 0, ZoneOffset.ofHours(1));

    private Af2() {
    }

    /** Fan (output) shaft speed for a motor speed, r/min. */
    static double fanRpm(double motorRpm) {
        return motorRpm * PINION_TEETH / WHEEL_TEETH;
    }

    /** Motor speed at a shaft load, r/min (slip proportional to load). */
    static double motorRpm(double shaftKw) {
        return SYNC_RPM - RATED_SLIP_RPM * shaftKw / MOTOR_KW;
    }
}
