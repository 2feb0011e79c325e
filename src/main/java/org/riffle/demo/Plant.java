package org.riffle.demo;

import java.util.Random;

/**
 * A deliberately simple model of fan AF-2 and its surroundings, stepped every 10 s: traffic-driven
 * air-flow demand at a controlled supply pressure, shaft power from the air power, motor current,
 * first-order thermal lags, overall gearbox vibration, and, from the fault onset, a growing gearbox
 * bearing defect plus a pressure ripple that turns from irregular to periodic while keeping its mean
 * and spread. Every noise source has its own seeded {@link Random}. Mutable; confined to one thread.
 */
final class Plant {
    static final double STEP_S = 10;
    private static final double PRESSURE_SET_PA = 780;
    private static final double RIPPLE_STD_PA = 11;
    private static final double RIPPLE_PERIOD_S = 84;
    private static final double AR_RIPPLE = 0.55;

    private final Random trafficNoise;
    private final Random ripple;
    private final Random periodicNoise;
    private final Random meter;

    private double trafficWalk;
    private double arRipple;
    private double winding;
    private double oil;
    private double bearing;
    private boolean started;

    // outputs of the last step
    double pressure;
    double flow;
    double current;
    double motorRpm;
    double vibration;

    Plant(long seed) {
        trafficNoise = new Random(seed + 1);
        ripple = new Random(seed + 2);
        periodicNoise = new Random(seed + 3);
        meter = new Random(seed + 4);
    }

    double winding() {
        return winding;
    }

    double oil() {
        return oil;
    }

    double bearing() {
        return bearing;
    }

    /**
     * Advances to time {@code t} seconds from the log start.
     *
     * @param fault defect severity 0..1 (0 = healthy)
     * @param periodic share 0..1 of the pressure ripple's variance that is periodic
     */
    void step(double t, double fault, double periodic) {
        double hours = t / 3600;
        trafficWalk = 0.985 * trafficWalk + StrictMath.sqrt(1 - 0.985 * 0.985) * 0.05 * trafficNoise.nextGaussian();
        double traffic = Math.max(0, traffic(hours % 24) + trafficWalk);
        double ambient = 9.5 + 2.5 * StrictMath.sin(2 * StrictMath.PI * (hours - 10) / 24) + 0.5 * hours / 48;

        arRipple = AR_RIPPLE * arRipple
                + StrictMath.sqrt(1 - AR_RIPPLE * AR_RIPPLE) * RIPPLE_STD_PA * ripple.nextGaussian();
        double wave = RIPPLE_STD_PA * (StrictMath.sqrt(0.9 * 2)
                * StrictMath.sin(2 * StrictMath.PI * t / RIPPLE_PERIOD_S + 0.7)
                + StrictMath.sqrt(0.1) * periodicNoise.nextGaussian());
        double rip = StrictMath.sqrt(1 - periodic) * arRipple + StrictMath.sqrt(periodic) * wave;

        double q = 28 + 26 * traffic;
        double p = PRESSURE_SET_PA + 4 * (traffic - 0.45) + rip;
        double shaftKw = p * q / 1000 / 0.78 / 0.97;
        flow = q + 0.35 * meter.nextGaussian();
        pressure = p;
        double loadAmps = shaftKw * 1000 / (StrictMath.sqrt(3) * 400 * 0.94);
        current = StrictMath.sqrt(48 * 48 + loadAmps * loadAmps) + 0.5 * meter.nextGaussian();
        motorRpm = Af2.motorRpm(shaftKw) + 0.3 * meter.nextGaussian();

        double windingTarget = ambient + 8 + 62 * (current / 160) * (current / 160);
        double oilTarget = ambient + 22 + 0.5 * shaftKw;
        double bearingTarget = oilTarget + 5 + 0.06 * shaftKw + 8 * fault;
        if (!started) {
            winding = windingTarget;
            oil = oilTarget;
            bearing = bearingTarget;
            started = true;
        }
        winding += (windingTarget - winding) * lag(40 * 60);
        oil += (oilTarget - oil) * lag(80 * 60);
        bearing += (bearingTarget - bearing) * lag(25 * 60);
        vibration = (1.0 + 0.006 * shaftKw + 2.3 * StrictMath.pow(fault, 1.2)) * (1 + 0.035 * meter.nextGaussian());
    }

    /** Share of the approach to a first-order target in one step of a lag with time constant {@code tauS}. */
    private static double lag(double tauS) {
        return 1 - StrictMath.exp(-STEP_S / tauS);
    }

    /** Daily traffic profile 0..~1 by hour of day: a night low, morning and evening peaks. */
    static double traffic(double hourOfDay) {
        return 0.12 + 0.55 * bump(hourOfDay, 7.75, 1.3) + 0.65 * bump(hourOfDay, 17.25, 1.8)
                + 0.25 * bump(hourOfDay, 12.5, 3.0);
    }

    private static double bump(double x, double centre, double width) {
        double z = (x - centre) / width;
        return StrictMath.exp(-0.5 * z * z);
    }
}
