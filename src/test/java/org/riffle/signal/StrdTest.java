package org.riffle.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.riffle.signal.Close.assertClose;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Mean, sample standard deviation and lag-1 autocorrelation against the certified values of the NIST
 * Statistical Reference Datasets, univariate summary statistics (NIST/ITL, StRD; datasets NumAcc1–4,
 * Michelso, Lew). Certified values as published to 15 significant digits; the data and the certified
 * values are written from memory, and the data recompute the certified values exactly in rational
 * arithmetic (checked with Python's fractions), which confirms both.
 *
 * <p>Tolerances. The certified values belong to the decimal data; a double holds each datum with an
 * error of up to ½ ulp(x). So the mean may be off by about ulp(mean), the standard deviation by about
 * ulp(x_max) (every deviation is off by up to one ulp of the datum), and the autocorrelation by about
 * ulp(x_max)/std relative. The tolerances are 4× those bounds plus 8 ulps of the value itself for the
 * arithmetic; for NumAcc4 (x ≈ 1e7, ulp 1.9e-9, std 0.1) that leaves about 8 correct digits of the
 * standard deviation, which is what double data of that kind can carry.
 */
class StrdTest {
    static double[] load(String name) throws IOException {
        Path p = Path.of("src/test/resources/org/riffle/signal/strd", name + ".dat");
        return Files.readAllLines(p, StandardCharsets.US_ASCII).stream()
                .filter(l -> !l.startsWith("#") && !l.isBlank())
                .mapToDouble(Double::parseDouble).toArray();
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
        // dataset, n, certified mean,     certified std,           certified lag-1 autocorrelation
        "NumAcc1,   3, 10000002.0,          1.0,                    -0.5",
        "NumAcc2, 1001, 1.2,                0.1,                    -0.999",
        "NumAcc3, 1001, 1000000.2,          0.1,                    -0.999",
        "NumAcc4, 1001, 10000000.2,         0.1,                    -0.999",
        "Michelso, 100, 299.852400000000,   0.0790105478190518,      0.535199668621283",
        "Lew,      200, -177.435000000000,  277.332168044316,       -0.307304800605679",
    })
    void certifiedValues(String name, int n, double mean, double std, double r1) throws IOException {
        double[] x = load(name);
        assertEquals(n, x.length, name + " observations");
        double xmax = 0;
        for (double v : x) {
            xmax = Math.max(xmax, Math.abs(v));
        }
        Summary s = Summary.of(x);
        assertEquals(n, s.count());
        assertClose(name + " mean", mean, s.mean(), 4 * Math.ulp(mean) + 8 * Math.ulp(mean));
        assertClose(name + " std", std, s.std(), 4 * Math.ulp(xmax) + 8 * Math.ulp(std));
        assertClose(name + " lag-1 autocorrelation", r1, Autocorrelation.lag1(x),
                4 * Math.ulp(xmax) / std + 8 * Math.ulp(r1));
    }
}
