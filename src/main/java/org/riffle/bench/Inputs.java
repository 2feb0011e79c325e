package org.riffle.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The generated input files, written once per work folder and shared by the benchmarks that read
 * them. Deterministic: the same size gives the same bytes. Stateless.
 */
final class Inputs {
    /** Seed of the bench CSV. */
    static final long SEED = 20_260_301L;

    private Inputs() {
    }

    /** The bench CSV of {@link ReadBench#writeCsv} with {@code rows} rows and 8 channels, written once. */
    static Path csv(Path workDir, int rows) throws IOException {
        Path f = workDir.resolve("bench-" + rows + "x" + ReadBench.CHANNELS + ".csv");
        if (!Files.exists(f)) {
            Path tmp = workDir.resolve(f.getFileName() + ".part");
            ReadBench.writeCsv(tmp, rows, ReadBench.CHANNELS, SEED);
            Files.move(tmp, f);
        }
        return f;
    }
}
