package org.riffle.triage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.riffle.log.Channel;
import org.riffle.log.Recording;
import org.riffle.log.SourceFacts;
import org.riffle.log.TimeBase;

class AnalyzerTest {
    static Recording threeChannels(int n) {
        double[] a = Scenarios.logistic(n, 3.8, 0.02, 1);
        double[] b = Scenarios.withStep(Scenarios.ar1(n, 0.9, 1, 2), n / 2, 8);
        double[] c = Scenarios.sineNoise(n, 50, 0.3, 3);
        return new Recording(new SourceFacts("three.csv", 0, "synthetic", "UTF-8", List.of(), List.of()),
                TimeBase.regular(n, 2.0, null), List.of(channel("a", a), channel("b", b), channel("c", c)),
                List.of(), List.of());
    }

    static Channel channel(String name, double[] x) {
        float[] f = new float[x.length];
        for (int i = 0; i < x.length; i++) {
            f[i] = (float) x[i];
        }
        return new Channel(name, "bar", f);
    }

    private static TriageParams small(int threads) {
        return TriageParams.defaults().withThreads(threads);
    }

    @Test
    void resultsDoNotDependOnTheNumberOfThreads() {
        Recording r = threeChannels(4000);
        Assessment one = new Analyzer(small(1)).assess(r, TriageListener.NONE);
        Assessment two = new Analyzer(small(2)).assess(r, TriageListener.NONE);
        assertEquals(one.channels(), two.channels());
    }

    @Test
    void aStoredModelJudgesExactlyAsLearningInPlace() {
        Recording r = threeChannels(4000);
        Analyzer an = new Analyzer(small(2));
        Assessment direct = an.assess(r, TriageListener.NONE);
        BaselineModel model = an.learn(r, direct.baseline());
        Assessment viaModel = an.assess(r, model, TriageListener.NONE);
        assertEquals(direct.channels(), viaModel.channels());
    }

    @Test
    void reusingTheBaselineWindowsGivesTheSameTrendForABaselineOffTheGrid() {
        // the baseline starts between two window starts and ends mid-log: the windows measured while
        // learning are reused in place and must equal those a stored model measures afresh
        Recording r = threeChannels(4000);
        Analyzer an = new Analyzer(new TriageParams(1040, 3011, 2));
        Assessment direct = an.assess(r, TriageListener.NONE);
        Assessment viaModel = an.assess(r, an.learn(r, direct.baseline()), TriageListener.NONE);
        assertEquals(direct.channels(), viaModel.channels());
        assertTrue(direct.channels().stream().allMatch(c -> c.trend().stream().anyMatch(w -> !Double.isNaN(w.det()))),
                "every channel has recurrence measures");
    }

    @Test
    void aLevelStepIsDepartedWithItsStartAndTheOthersAreSteady() {
        Assessment a = new Analyzer(small(2)).assess(threeChannels(4000), TriageListener.NONE);
        Health b = a.channels().get(1).health();
        assertEquals(Level.DEPARTED, b.level());
        assertTrue(b.sinceIndex() >= 2000 - 125 && b.sinceIndex() <= 2000 + 3 * 62, "since " + b.sinceIndex());
        assertEquals(b.sinceIndex() / 2.0, b.sinceSeconds(), 1e-12, "seconds at 2 Hz");
        assertTrue(b.figure() < 75, "health " + b.figure());
        assertEquals(Level.STEADY, a.channels().get(0).health().level());
        assertEquals(100.0, a.channels().get(2).health().figure());
    }

    @Test
    void flatShortAndGappyChannelsGetNoEstimateWithTheReason() {
        int n = 4000;
        double[] flat = new double[n];
        java.util.Arrays.fill(flat, 5.0);
        double[] gappy = Scenarios.ar1(n, 0.5, 1, 4);
        for (int i = 0; i < n; i += 3) {
            gappy[i] = Double.NaN;
        }
        Recording r = new Recording(new SourceFacts("bad.csv", 0, "synthetic", "UTF-8", List.of(), List.of()),
                TimeBase.regular(n, 1.0, null), List.of(channel("flat", flat), channel("gappy", gappy)),
                List.of(), List.of());
        Assessment a = new Analyzer(small(1)).assess(r, TriageListener.NONE);
        assertEquals("flat: the baseline is constant at 5.0, nothing to judge against",
                a.channels().get(0).health().noEstimateReason());
        assertEquals("too many gaps: 334 of 1000 baseline samples missing (33 %, at most 20 % allowed)",
                a.channels().get(1).health().noEstimateReason());
        assertFalse(a.channels().get(0).health().estimated());
        Recording shortLog = Scenarios.recording("short", Scenarios.ar1(300, 0.5, 1, 5));
        Assessment s = new Analyzer(small(1)).assess(shortLog, TriageListener.NONE);
        assertEquals("too short: the baseline (75 samples) holds 0 windows of 100 samples, at least 8 are needed",
                s.channels().get(0).health().noEstimateReason());
    }

    @Test
    void anOversampledChannelIsAnalysedAtALowerRateAndSaysSo() {
        // a 5 Hz oscillation sampled at 2 kHz: the autocorrelation's first zero is a quarter period
        // (100 samples, analytic), so D = 100/8 = 12, capped at baseline rows / 2000 = 5
        int n = 40_000;
        double[] x = Scenarios.sineNoise(n, 400, 0.05, 9);
        float[] f = new float[n];
        for (int i = 0; i < n; i++) {
            f[i] = (float) x[i];
        }
        Recording r = new Recording(new SourceFacts("fast.csv", 0, "synthetic", "UTF-8", List.of(), List.of()),
                TimeBase.regular(n, 2000.0, null), List.of(new Channel("fast", "mm/s", f)), List.of(), List.of());
        ChannelAssessment c = new Analyzer(small(1)).assess(r, TriageListener.NONE).channels().get(0);
        Param rate = c.parameters().stream().filter(p -> p.name().equals("analysis rate")).findFirst().orElseThrow();
        assertEquals("400 Hz (1/5 of the sample rate, anti-aliased FIR decimation)", rate.value());
        assertEquals(Level.STEADY, c.health().level());
    }

    @Test
    void aChannelMissingFromTheModelIsSaidSo() {
        Recording r = threeChannels(4000);
        Analyzer an = new Analyzer(small(1));
        BaselineModel m = an.learn(Scenarios.recording("other", Scenarios.ar1(4000, 0.5, 1, 6)),
                new Baseline(0, 4000, "all"));
        Assessment a = an.assess(r, m, TriageListener.NONE);
        assertEquals("no baseline: the baseline model has no channel named 'a'",
                a.channels().get(0).health().noEstimateReason());
    }

    @Test
    void listenerSeesProgressAndPartialThenCompleteResults() {
        List<String> events = Collections.synchronizedList(new ArrayList<>());
        new Analyzer(small(2)).assess(threeChannels(3000), new TriageListener() {
            @Override
            public void progress(int channelIndex, String stage, double fraction) {
                events.add("p" + channelIndex + ":" + stage);
            }

            @Override
            public void updated(int channelIndex, ChannelAssessment assessment) {
                events.add("u" + channelIndex + ":" + assessment.complete());
            }
        });
        for (int i = 0; i < 3; i++) {
            int partial = events.indexOf("u" + i + ":false");
            int done = events.indexOf("u" + i + ":true");
            assertTrue(partial >= 0 && done > partial, events.toString());
            assertTrue(events.contains("p" + i + ":reservoir") && events.contains("p" + i + ":done"), events.toString());
        }
    }

    @Test
    void cancellingStopsTheWorkPromptly() throws Exception {
        Recording big = threeChannels(200_000);
        Future<Assessment> f = new Analyzer(small(2)).start(big, TriageListener.NONE);
        Thread.sleep(200);
        long t0 = System.nanoTime();
        f.cancel(true);
        assertThrows(CancellationException.class, () -> f.get(10, TimeUnit.SECONDS));
        assertTrue(System.nanoTime() - t0 < 5_000_000_000L);
    }

    @Test
    void interruptingTheCallerCancels() {
        Thread.currentThread().interrupt();
        CancellationException e = assertThrows(CancellationException.class,
                () -> new Analyzer(small(1)).assess(threeChannels(4000), TriageListener.NONE));
        assertEquals("triage cancelled", e.getMessage());
        assertTrue(Thread.interrupted(), "interrupt flag kept");
    }
}
