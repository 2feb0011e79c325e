package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Welch PSD and the FFT Hilbert transform against golden values from scipy 1.17.1 / numpy 2.4.6
 * (scipy.signal.welch and scipy.signal.hilbert), produced by {@code reference/welch_scipy.py} and
 * committed with it. The input is the committed {@code welch_input.csv}.
 *
 * <p>Tolerance: relative 1e-9 of the largest value of each case. Both sides compute the same sums in
 * double precision by different FFT algorithms; their round-off differs near 1e-15 relative, so 1e-9
 * only absorbs that while catching any scaling, window, overlap or detrend difference (those move
 * values by percent).
 */
class WelchReferenceTest {
    private static final double FS = 1000.0;
    private static double[] input;
    private static Map<String, List<double[]>> golden;

    @BeforeAll
    static void load() throws IOException {
        List<Double> xs = new ArrayList<>();
        for (String line : lines("welch_input.csv")) {
            if (!line.startsWith("#") && !line.isBlank()) {
                xs.add(Double.parseDouble(line));
            }
        }
        input = xs.stream().mapToDouble(Double::doubleValue).toArray();
        golden = new LinkedHashMap<>();
        for (String line : lines("welch_golden.csv")) {
            if (line.startsWith("#") || line.startsWith("case") || line.isBlank()) {
                continue;
            }
            String[] f = line.split(",");
            golden.computeIfAbsent(f[0], k -> new ArrayList<>())
                    .add(new double[] {Double.parseDouble(f[2]), Double.parseDouble(f[3])});
        }
    }

    private static List<String> lines(String name) throws IOException {
        try (InputStream in = WelchReferenceTest.class.getResourceAsStream("/reference/" + name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
        }
    }

    private static void assertCase(String name, Spectrum s, boolean rmsSpectrum) {
        List<double[]> want = golden.get(name);
        assertEquals(want.size(), s.size(), name + " bin count");
        double max = want.stream().mapToDouble(r -> r[1]).max().orElseThrow();
        for (int k = 0; k < want.size(); k++) {
            assertEquals(want.get(k)[0], s.frequency(k), 1e-9, name + " frequency of bin " + k);
            double got = rmsSpectrum ? Math.pow(s.amplitudeRms(k), 2) : s.density(k);
            assertEquals(want.get(k)[1], got, 1e-9 * max, name + " bin " + k);
        }
    }

    @Test
    void inputHasTheLengthTheScriptWrote() {
        assertEquals(6000, input.length);
    }

    @Test
    void densityWith256SampleSegmentsMatchesScipy() {
        assertCase("density_256", Welch.estimate(input, FS, new WelchParams(256)), false);
    }

    @Test
    void squaredRmsSpectrumMatchesScipysSpectrumScaling() {
        assertCase("spectrum_256", Welch.estimate(input, FS, new WelchParams(256)), true);
    }

    @Test
    void segmentOf200ZeroPaddedTo256MatchesScipyWithNfft256() {
        Spectrum s = Welch.estimate(input, FS, new WelchParams(200));
        assertEquals(256, s.fftLength());
        assertCase("density_200_nfft256", s, false);
    }

    @Test
    void densityWith1024SampleSegmentsMatchesScipy() {
        assertCase("density_1024", Welch.estimate(input, FS, new WelchParams(1024)), false);
    }

    @Test
    void fullBandEnvelopeMatchesScipyHilbert() {
        double[][] a = Envelope.analytic(input, 0, 4096, FS, 0, FS / 2);
        List<double[]> want = golden.get("hilbert_4096");
        assertEquals(4096, want.size());
        for (int i = 0; i < 4096; i++) {
            double env = Math.hypot(a[0][i], a[1][i]);
            assertEquals(want.get(i)[1], env, 1e-9, "envelope sample " + i);
        }
    }
}
