package org.riffle.triage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.riffle.log.Recording;

/**
 * Cancelling the analysis (closing the screen, interrupting the process) leaves no thread running:
 * after {@code cancel(true)} on the future of {@link Analyzer#start}, every {@code riffle-triage} and
 * {@code riffle-triage-worker} thread has ended within a bounded time. A future that merely reports
 * "cancelled" while its workers keep computing would pass a test on the future alone, so this one
 * looks at the live threads of the JVM.
 */
class CancelLeavesNoThreadTest {
    /** Bound on how long the workers may take to notice the interrupt; generous for a loaded 2-core machine. */
    private static final long BOUND_MS = 10_000;

    private static List<Thread> triageThreads() {
        return Thread.getAllStackTraces().keySet().stream()
                .filter(t -> t.isAlive() && t.getName().startsWith("riffle-triage")).toList();
    }

    private static long waitUntilNoTriageThread() throws InterruptedException {
        long t0 = System.nanoTime();
        while (!triageThreads().isEmpty() && System.nanoTime() - t0 < TimeUnit.MILLISECONDS.toNanos(BOUND_MS)) {
            Thread.sleep(10);
        }
        return TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - t0);
    }

    @Test
    void cancellingTheFutureEndsEveryWorkerThreadWithinTheBound() throws Exception {
        assertEquals(List.of(), triageThreads(), "a triage thread was left by an earlier test");
        Recording big = AnalyzerTest.threeChannels(200_000);
        CountDownLatch working = new CountDownLatch(2);
        Future<Assessment> f = new Analyzer(TriageParams.defaults().withThreads(2)).start(big, new TriageListener() {
            @Override
            public void progress(int channelIndex, String stage, double fraction) {
                working.countDown();
            }
        });
        assertTrue(working.await(60, TimeUnit.SECONDS), "the workers never reported progress");
        long workers = triageThreads().stream().filter(t -> t.getName().equals("riffle-triage-worker")).count();
        assertEquals(2, workers, "two workers should be busy before the cancel");

        f.cancel(true);
        assertThrows(CancellationException.class, () -> f.get(1, TimeUnit.SECONDS));
        long took = waitUntilNoTriageThread();
        List<Thread> left = triageThreads();
        assertTrue(left.isEmpty(), "still running " + took + " ms after cancel: " + left.stream()
                .map(t -> t.getName() + " at " + (t.getStackTrace().length > 0 ? t.getStackTrace()[0] : "?")).toList());
    }

    @Test
    void interruptingTheCallingThreadEndsEveryWorkerThreadWithinTheBound() throws Exception {
        Recording big = AnalyzerTest.threeChannels(200_000);
        CountDownLatch working = new CountDownLatch(1);
        Thread caller = new Thread(() -> {
            try {
                new Analyzer(TriageParams.defaults().withThreads(2)).assess(big, new TriageListener() {
                    @Override
                    public void progress(int channelIndex, String stage, double fraction) {
                        working.countDown();
                    }
                });
            } catch (CancellationException e) {
                // expected: the interrupt below
            }
        }, "riffle-triage-test-caller");
        caller.start();
        assertTrue(working.await(60, TimeUnit.SECONDS), "the workers never reported progress");
        caller.interrupt();
        caller.join(BOUND_MS);
        assertTrue(!caller.isAlive(), "assess did not return after the interrupt");
        long took = waitUntilNoTriageThread();
        assertEquals(List.of(), triageThreads(), "still running " + took + " ms after the interrupt");
    }
}
