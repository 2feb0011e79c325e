package org.riffle.demo;

import java.nio.charset.StandardCharsets;
import java.time.format.DateTimeFormatter;
import java.util.HashSet;
import java.util.Random;
import java.util.Set;

/**
 * Writes {@code af2-process.csv}: the station data logger's export, 10 s interval over two days, CRLF
 * line ends, UTF-8 without byte-order mark. A preamble, a header with units as {@code name [unit]},
 * ISO 8601 timestamps with offset, eight numeric channels and a RUN/STOP status column. Realistic
 * touches: a few {@code NaN} and {@code ---} tokens, a logger restart that leaves a gap and shifts the
 * logger's clock grid by 4 s, and in the last two minutes the fan isolated for the inspection: status
 * STOP, and every instrument loop, powered from the isolated panel, reads {@code ---}. From 60 % of the
 * log a gearbox bearing defect grows. Stateless.
 */
final class ProcessLog {
    static final String FILE = "af2-process.csv";
    static final long SEED = 20_260_216L;
    /** Rows of the full 10 s grid over two days. */
    static final int GRID_ROWS = 17_280;
    /** First grid row lost to the logger restart, and how many are lost (17 min). */
    static final int GAP_FROM = 7_258;
    static final int GAP_ROWS = 102;
    /** The logger's clock grid after the restart is 4 s later. */
    static final int RESTART_SHIFT_S = 4;
    /** Grid row where the bearing defect starts (60 % of the log). */
    static final int FAULT_ROW = GRID_ROWS * 6 / 10;
    /** Rows over which the pressure ripple turns periodic (3 h). */
    static final int RIPPLE_TURN_ROWS = 1_080;
    /** Last rows: fan isolated (STOP), instrument loops unpowered. */
    static final int STOP_ROWS = 12;
    static final String HEADER = "time,supply pressure [Pa],air flow [m3/s],motor current [A],"
            + "motor winding temp [°C],gearbox oil temp [°C],gearbox DE bearing temp [°C],fan speed [rpm],"
            + "gearbox vibration RMS [mm/s],status";
    private static final DateTimeFormatter ISO = DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ssXXX");

    private ProcessLog() {
    }

    /** The file's bytes. */
    static byte[] bytes() {
        StringBuilder sb = new StringBuilder(1 << 21);
        line(sb, "# device KH-N-LOG2 process data logger, firmware 3.4");
        line(sb, "# serial 2207-4418");
        line(sb, "# site Kestrel Hill road tunnel, north ventilation station, supply fan AF-2");
        line(sb, "# interval 10 s");
        line(sb, "# exported " + ISO.format(Af2.LOG_START.plusSeconds(GRID_ROWS * 10L + 65)));
        line(sb, HEADER);
        Random gaps = new Random(SEED + 10);
        Set<Integer> nanCurrent = pick(gaps, 7);
        Set<Integer> dashOil = pick(gaps, 5);
        Random meter = new Random(SEED + 11);
        Plant plant = new Plant(SEED);
        for (int i = 0; i < GRID_ROWS; i++) {
            plant.step(i * Plant.STEP_S, fault(i), periodicShare(i));
            if (i >= GAP_FROM && i < GAP_FROM + GAP_ROWS) {
                continue; // the logger was restarting: the plant ran on, nothing was written
            }
            long shift = i >= GAP_FROM + GAP_ROWS ? RESTART_SHIFT_S : 0;
            sb.append(ISO.format(Af2.LOG_START.plusSeconds(i * 10L + shift)));
            if (i >= GRID_ROWS - STOP_ROWS) {
                line(sb, ",---".repeat(8) + ",STOP");
                continue;
            }
            value(sb, plant.pressure, 1);
            value(sb, plant.flow, 2);
            if (nanCurrent.contains(i)) {
                sb.append(",NaN");
            } else {
                value(sb, plant.current, 1);
            }
            value(sb, plant.winding() + 0.08 * meter.nextGaussian(), 1);
            if (dashOil.contains(i)) {
                sb.append(",---");
            } else {
                value(sb, plant.oil() + 0.08 * meter.nextGaussian(), 1);
            }
            value(sb, plant.bearing() + 0.08 * meter.nextGaussian(), 1);
            value(sb, Af2.fanRpm(plant.motorRpm), 1);
            value(sb, plant.vibration, 2);
            line(sb, ",RUN");
        }
        return sb.toString().getBytes(StandardCharsets.UTF_8);
    }

    /** Defect severity 0..1 at grid row {@code i}: zero before the onset, then growing faster than linearly. */
    static double fault(int i) {
        if (i < FAULT_ROW) {
            return 0;
        }
        return StrictMath.pow((double) (i - FAULT_ROW) / (GRID_ROWS - FAULT_ROW), 1.7);
    }

    /** Share of the pressure ripple's variance that is periodic: a smooth step over 3 h from the onset. */
    static double periodicShare(int i) {
        double x = Math.min(1, Math.max(0, (double) (i - FAULT_ROW) / RIPPLE_TURN_ROWS));
        return x * x * (3 - 2 * x);
    }

    private static Set<Integer> pick(Random r, int count) {
        Set<Integer> rows = new HashSet<>();
        while (rows.size() < count) {
            rows.add(200 + r.nextInt(GRID_ROWS - 400));
        }
        return rows;
    }

    private static void value(StringBuilder sb, double v, int decimals) {
        Fixed.append(sb.append(','), v, decimals);
    }

    private static void line(StringBuilder sb, String s) {
        sb.append(s).append("\r\n");
    }
}
