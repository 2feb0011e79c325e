package org.riffle.reservoir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

class OneStepTrainerTest {
    @Test
    void aLongSeriesIsSearchedOnStretchesSpreadEvenlyAndJoinedByAMissingSample() {
        double[] u = new double[100_000];
        for (int i = 0; i < u.length; i++) {
            u[i] = i;
        }
        SearchSpace space = SearchSpace.defaults();
        double[] e = OneStepTrainer.excerpt(u, space);
        int len = space.searchRows() / space.folds() + space.maxWashout();
        assertEquals(space.folds() * (len + 1) - 1, e.length);
        for (int b = 0; b < space.folds(); b++) {
            double first = e[b * (len + 1)];
            assertEquals(Math.floor((double) b * (u.length - len) / (space.folds() - 1)), first, "stretch " + b);
            for (int t = 1; t < len; t++) {
                assertEquals(first + t, e[b * (len + 1) + t], "stretch " + b + " is contiguous");
            }
            if (b < space.folds() - 1) {
                assertTrue(Double.isNaN(e[b * (len + 1) + len]), "a missing sample restarts the reservoir");
            }
        }
        assertEquals(u.length - 1, e[e.length - 1], "the last stretch ends at the series' end");
        double[] shortSeries = Arrays.copyOf(u, 9000);
        assertSame(shortSeries, OneStepTrainer.excerpt(shortSeries, space), "a short series is searched whole");
    }

    /**
     * Searched on stretches of a long Mackey–Glass series, its readout fitted on every other row (τ = 17, a 0.2, b 0.1, n 10; Jaeger &amp; Haas
     * 2004, Science 304:78, report far smaller errors on it with larger reservoirs, from memory), the
     * chosen network still predicts the next sample of the rest of the series with NRMSE ≤ 1e-3, the
     * bound {@code BenchmarkTasksTest} holds a search on the whole of a short series to.
     */
    @Test
    void theSearchOnStretchesStillFindsAGoodNetwork() {
        // 60,000 steps: the search runs on stretches and the readout is fitted on every other row
        double[] s = Series.mackeyGlass(62_000, 17, 0.2, 0.1, 10);
        double[] u = Series.normalise(s, 60_000);
        OneStepFit fit = OneStepTrainer.train(Arrays.copyOf(u, 60_000), EsnParams.defaults(),
                SearchSpace.defaults(), null);
        assertTrue(fit.searchSteps() > 0 && fit.searchSteps() < 20_000, "searched on " + fit.searchSteps());
        double nrmse = Series.oneStepNrmse(fit.esn(), u, 60_000);
        assertTrue(nrmse <= 1e-3, "Mackey-Glass one-step NRMSE " + nrmse);
    }
}
