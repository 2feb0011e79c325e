package org.riffle.bench;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.riffle.recurrence.Rqa;
import org.riffle.recurrence.RqaParams;
import org.riffle.recurrence.RqaResult;

/**
 * RQA of a large N in a fresh JVM whose heap is capped (issue 3: N = 100,000 completes within a
 * 512 MB heap): the child builds the bench signal, times the analysis itself (given radius, or the
 * exact target-rate search included) and prints the milliseconds; the harness also records the child's
 * peak resident set. The given radius is the 5 % radius of the first 20,000 vectors (found untimed), so
 * RR is about 5 %. Confined to the harness thread.
 */
final class LargeRqaBench implements Benchmark {
    private final int vectors;
    private final boolean search;
    private final int heapMegabytes;
    private final int threads;
    private Path dir;

    LargeRqaBench(int vectors, boolean search, int heapMegabytes, int threads) {
        this.vectors = vectors;
        this.search = search;
        this.heapMegabytes = heapMegabytes;
        this.threads = threads;
    }

    @Override
    public String name() {
        return "RQA N = " + Sizes.count(vectors) + ", " + (search ? "target-rate search" : "given radius")
                + " (child JVM, -Xmx" + heapMegabytes + "m)";
    }

    @Override
    public List<Metric> metrics() {
        return List.of(Metric.wallMillis(Double.NaN), new Metric("peak RSS", "MB", Double.NaN));
    }

    @Override
    public int maxWarmups() {
        return 0;
    }

    @Override
    public int maxRuns() {
        return 1;
    }

    @Override
    public void setUp(Path workDir) {
        dir = workDir;
    }

    @Override
    public double[] runOnce() throws Exception {
        List<String> args = new ArrayList<>(List.of(Integer.toString(vectors), search ? "search" : "radius",
                Integer.toString(threads)));
        ChildJvm.Run r = ChildJvm.run(List.of("-Xmx" + heapMegabytes + "m"), LargeRqaBench.class.getName(), args,
                dir, 600);
        String[] out = r.stdout().strip().split("\\s+");
        return new double[] {Double.parseDouble(out[0]), r.peakMegabytes()};
    }

    /** Child entry: {@code N search|radius threads}; prints the analysis time in ms and RR. */
    public static void main(String[] args) {
        int n = Integer.parseInt(args[0]);
        boolean search = args[1].equals("search");
        Rqa rqa = new Rqa(Integer.parseInt(args[2]));
        int span = RqaBench.PARAMS.embedding().span();
        double[] x = RqaBench.signal(n + span, 1);
        RqaParams p = RqaBench.PARAMS;
        if (!search) {
            double eps = rqa.analyse(x, 0, Math.min(x.length, 20_000 + span), p).radius();
            p = p.withThreshold(RqaParams.Threshold.radius(eps));
        }
        long t0 = System.nanoTime();
        RqaResult r = rqa.analyse(x, 0, x.length, p);
        double ms = (System.nanoTime() - t0) / 1e6;
        System.out.println(String.format(Locale.ROOT, "%.1f %.5f", ms, r.rr()));
    }
}
