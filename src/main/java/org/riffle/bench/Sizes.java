package org.riffle.bench;

/**
 * The input sizes of one harness run: the sizes, or small ones for {@code --quick} (to check
 * the harness itself in seconds; its timings are not held to the targets). Immutable.
 *
 * @param quick true for the small sizes
 * @param rows rows of the 8-channel CSV (read, report, screen)
 * @param rqaVectors RQA sizes N
 * @param trendSamples samples of the windowed trend channel
 * @param trainSamples reservoir training samples
 * @param runSteps reservoir run steps
 * @param welchSamples samples of the Welch channel
 */
record Sizes(boolean quick, int rows, int[] rqaVectors, int trendSamples, int trainSamples, int runSteps,
             int welchSamples) {
    Sizes {
        rqaVectors = rqaVectors.clone();
    }

    /** The sizes of issue 9. */
    static Sizes full() {
        return new Sizes(false, 1_000_000, new int[] {2_000, 10_000, 20_000, 100_000}, 1_000_000, 20_000,
                1_000_000, 1_000_000);
    }

    /** Small sizes that exercise every benchmark in seconds. */
    static Sizes small() {
        return new Sizes(true, 20_000, new int[] {500, 1_000}, 20_000, 3_000, 20_000, 20_000);
    }

    @Override
    public int[] rqaVectors() {
        return rqaVectors.clone();
    }

    /** {@code 1000000} as {@code "1M"}, {@code 20000} as {@code "20k"}, else the plain number. */
    static String count(int n) {
        if (n >= 1_000_000 && n % 1_000_000 == 0) {
            return n / 1_000_000 + "M";
        }
        if (n >= 1_000 && n % 1_000 == 0) {
            return n / 1_000 + "k";
        }
        return Integer.toString(n);
    }
}
