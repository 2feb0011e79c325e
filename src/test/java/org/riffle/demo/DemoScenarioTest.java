package org.riffle.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The scenario does what its README promises: the fault shows where it should and nowhere else, and the
 * recording's header says what the README says. Plain moment arithmetic in the test (no riffle engine),
 * so a change in the engines cannot hide a change in the fixtures.
 */
class DemoScenarioTest {
    private static final int PRESSURE = 0;
    private static final int FLOW = 1;
    private static final int WINDING = 3;
    private static final int OIL = 4;
    private static final int BEARING = 5;
    private static final int VIBRATION = 7;
    private static List<double[]> rows;

    @BeforeAll
    static void parse() {
        rows = new ArrayList<>();
        String[] lines = new String(ProcessLog.bytes(), StandardCharsets.UTF_8).split("\r\n");
        for (int i = 6; i < lines.length; i++) {
            String[] f = lines[i].split(",");
            double[] v = new double[8];
            for (int c = 0; c < 8; c++) {
                v[c] = f[c + 1].equals("---") ? Double.NaN : Double.parseDouble(f[c + 1]);
            }
            rows.add(v);
        }
    }

    /** Mean, standard deviation and lag-1 autocorrelation of one column over rows [from, to). */
    private static double[] stats(int col, int from, int to) {
        double s = 0;
        int n = 0;
        for (int i = from; i < to; i++) {
            s += rows.get(i)[col];
            n++;
        }
        double mean = s / n;
        double ss = 0;
        double lag = 0;
        for (int i = from; i < to; i++) {
            double d = rows.get(i)[col] - mean;
            ss += d * d;
            if (i + 1 < to) {
                lag += d * (rows.get(i + 1)[col] - mean);
            }
        }
        return new double[] {mean, Math.sqrt(ss / (n - 1)), lag / ss};
    }

    private static double meanExcess(int from, int to) {
        double s = 0;
        int n = 0;
        for (int i = from; i < to; i++) {
            double d = rows.get(i)[BEARING] - rows.get(i)[OIL];
            if (!Double.isNaN(d)) {
                s += d;
                n++;
            }
        }
        return s / n;
    }

    @Test
    void pressureRippleTurnsRegularWhileMeanAndSpreadStay() {
        double[] before = stats(PRESSURE, 1_000, 4_000);
        double[] after = stats(PRESSURE, 13_000, 16_000);
        assertEquals(before[0], after[0], 2.0, "mean within 2 Pa");
        assertEquals(1.0, after[1] / before[1], 0.08, "spread within 8 %");
        // AR(1) ripple r1 = 0.55; 90 % periodic with period 8.4 samples: 0.9·cos(2π/8.4) ≈ 0.66
        assertEquals(0.55, before[2], 0.04, "irregular ripple before");
        assertEquals(0.66, after[2], 0.04, "periodic ripple after");
    }

    @Test
    void vibrationAndBearingTemperatureCreepUpAfterTheOnset() {
        double[] early = stats(VIBRATION, 1_000, 9_000);
        double[] late = stats(VIBRATION, rows.size() - 400, rows.size() - 14);
        assertTrue(early[0] < 1.4 && late[0] > 3.0, "vibration " + early[0] + " -> " + late[0] + " mm/s");
        // the bearing's rise over the oil temperature removes the daily load cycle: 5 + 0.06·P °C healthy,
        // up to 8 °C more at the end of the log
        double early2 = meanExcess(1_000, 9_000);
        double late2 = meanExcess(rows.size() - 400, rows.size() - 14);
        assertTrue(late2 - early2 > 4, "bearing over oil " + early2 + " -> " + late2 + " °C");
    }

    @Test
    void healthyChannelsKeepTheirDailyBehaviour() {
        // same hours of the day on both days (rows 1000..4000 vs the same clock hours a day later,
        // shifted by the 102 rows lost to the restart): flow and winding temperature agree
        for (int col : new int[] {FLOW, WINDING}) {
            double[] day1 = stats(col, 1_000, 4_000);
            double[] day2 = stats(col, 1_000 + 8_640 - 102, 4_000 + 8_640 - 102);
            assertEquals(day1[0], day2[0], 0.08 * Math.abs(day1[0]), "column " + col + " mean");
        }
    }

    @Test
    void recordingHeaderMatchesTheReadme() {
        ByteBuffer b = ByteBuffer.wrap(VibrationRecording.bytes()).order(ByteOrder.LITTLE_ENDIAN);
        assertEquals(b.capacity() - 8, b.getInt(4), "RIFF size");
        assertEquals(1, b.getShort(20), "PCM");
        assertEquals(2, b.getShort(22), "channels");
        assertEquals(5120, b.getInt(24), "rate");
        assertEquals(16, b.getShort(34), "bits");
        int data = b.capacity() - 5120 * 60 * 4;
        assertEquals("data", new String(VibrationRecording.bytes(), data - 8, 4, StandardCharsets.US_ASCII));
        // impacts grow: the drive-end channel's kurtosis (Pearson) rises from near a sine mix to impulsive
        assertTrue(kurtosis(b, data, 0, 5) < 2.5 && kurtosis(b, data, 55, 60) > 5,
                kurtosis(b, data, 0, 5) + " -> " + kurtosis(b, data, 55, 60));
    }

    private static double kurtosis(ByteBuffer b, int data, int fromS, int toS) {
        double s2 = 0;
        double s4 = 0;
        double s1 = 0;
        int n = (toS - fromS) * 5120;
        for (int i = fromS * 5120; i < toS * 5120; i++) {
            s1 += b.getShort(data + 4 * i);
        }
        double mean = s1 / n;
        for (int i = fromS * 5120; i < toS * 5120; i++) {
            double d = b.getShort(data + 4 * i) - mean;
            s2 += d * d;
            s4 += d * d * d * d;
        }
        return s4 / n / (s2 / n * s2 / n);
    }
}
