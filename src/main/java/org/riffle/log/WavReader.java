package org.riffle.log;

import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Reads a WAV recording (RIFF, little-endian; Microsoft "Multimedia Programming Interface and Data
 * Specifications 1.0", 1991, and the WAVE_FORMAT_EXTENSIBLE addendum): PCM 8 (unsigned), 16, 24 and
 * 32-bit, IEEE float 32 and 64-bit, plain or extensible, any number of channels. Each channel becomes a
 * {@link Channel} at the header's sample rate, in fractions of full scale (a signed integer sample over
 * 2<sup>bits-1</sup>; float samples as stored) with unit {@value #FULL_SCALE}, or multiplied by the
 * user's sensitivity (engineering units per full scale) and given the user's unit.
 *
 * <p>Stateless and thread-safe.
 */
final class WavReader {
    /** The unit of a sample as a fraction of full scale. */
    static final String FULL_SCALE = "FS";
    private static final int PCM = 1;
    private static final int FLOAT = 3;
    private static final int EXTENSIBLE = 0xFFFE;
    private static final long UNKNOWN = 0xFFFFFFFFL;

    private WavReader() {
    }

    /** The fmt chunk, checked. */
    record Format(int tag, int channels, long rate, int blockAlign, int bits) {
        String describe() {
            return "wav " + (tag == FLOAT ? "float " : "pcm ") + bits + "-bit, " + channels
                    + (channels == 1 ? " channel, " : " channels, ") + rate + " Hz";
        }
    }

    static Recording read(Source src, ReadOptions opt) throws LogException {
        Riff in = new Riff(src.in, src.name);
        try {
            byte[] riff = in.bytes(12, "RIFF header");
            String form = new String(riff, 8, 4, StandardCharsets.ISO_8859_1);
            if (!form.equals("WAVE")) {
                throw in.bad("a RIFF file of type '" + form + "', not WAVE audio");
            }
            Format f = null;
            while (true) {
                byte[] h = in.chunkHeader();
                if (h == null) {
                    throw in.bad(f == null ? "no fmt chunk: not a complete WAV file" : "no data chunk: no samples");
                }
                String id = new String(h, 0, 4, StandardCharsets.ISO_8859_1);
                long size = Riff.u32(h, 4);
                if (id.equals("fmt ")) {
                    f = format(in, in.bytes((int) Math.min(size, 1 << 16), "fmt chunk"), size);
                    in.skip(size - Math.min(size, 1 << 16), "fmt chunk");
                    in.pad(size);
                } else if (id.equals("data")) {
                    if (f == null) {
                        throw in.bad("data chunk before the fmt chunk: the header is broken");
                    }
                    return samples(src, in, f, size, opt);
                } else {
                    in.skip(size, "'" + id.strip() + "' chunk");
                    in.pad(size);
                }
            }
        } catch (EOFException e) {
            throw in.bad("the file ends inside its header");
        } catch (IOException e) {
            throw new LogException(src.name, 0, 0, e instanceof Source.Damaged ? e.getMessage()
                    : "cannot read: " + e.getMessage());
        }
    }

    private static Format format(Riff in, byte[] b, long size) throws LogException {
        if (size < 16) {
            throw in.bad("fmt chunk of " + size + " bytes, fewer than 16: the header is broken");
        }
        int tag = Riff.u16(b, 0);
        int channels = Riff.u16(b, 2);
        long rate = Riff.u32(b, 4);
        int align = Riff.u16(b, 12);
        int bits = Riff.u16(b, 14);
        if (tag == EXTENSIBLE) {
            if (size < 40) {
                throw in.bad("extensible fmt chunk of " + size + " bytes, fewer than 40: the header is broken");
            }
            tag = Riff.u16(b, 24);
        }
        boolean pcm = tag == PCM && (bits == 8 || bits == 16 || bits == 24 || bits == 32);
        boolean flt = tag == FLOAT && (bits == 32 || bits == 64);
        if (!pcm && !flt) {
            throw in.bad(String.format(Locale.ROOT, "format 0x%04X with %d bits is not supported: riffle reads"
                    + " PCM 8/16/24/32-bit and float 32/64-bit", tag, bits));
        }
        if (channels == 0 || rate == 0 || align != channels * (bits / 8)) {
            throw in.bad("inconsistent fmt chunk: " + channels + " channels of " + bits + " bits at " + rate
                    + " Hz with " + align + " bytes a frame");
        }
        return new Format(tag, channels, rate, align, bits);
    }

    private static Recording samples(Source src, Riff in, Format f, long size, ReadOptions opt)
            throws IOException, LogException {
        List<String> warnings = new ArrayList<>();
        long declared = size == UNKNOWN ? Long.MAX_VALUE : size / f.blockAlign();
        long cap = declared;
        if (src.sizeBytes < 0 || src.gzipped) {
            cap = Math.min(declared, 1 << 20);
        } else {
            cap = Math.min(declared, src.sizeBytes / f.blockAlign());
        }
        long budget = MemoryBudget.of(opt);
        int blockCap = Blocks.capacityFor(budget, f.channels());
        long blockBytes = (long) blockCap * f.channels() * Blocks.BYTES_PER_BLOCK;
        int rowCap = MemoryBudget.rowCap(budget, blockBytes, f.channels(), Integer.MAX_VALUE - 16);
        if (src.sizeBytes >= 0 && !src.gzipped && cap > rowCap) {
            int keep = MemoryBudget.keepCap(budget, blockBytes, f.channels(), rowCap);
            return reduced(src, in, f, cap, opt, new Plan(budget, blockCap, keep));
        }
        if (cap > Integer.MAX_VALUE - 16) {
            throw in.bad("more than " + (Integer.MAX_VALUE - 16) + " frames: too long for riffle");
        }
        WavSamples data = new WavSamples(f, (int) cap);
        long frames = data.readFrom(in.stream(), declared);
        if (frames == 0) {
            throw in.bad("the data chunk holds no samples");
        }
        if (declared != Long.MAX_VALUE && frames < declared) {
            warnings.add("the data chunk declares " + declared + " frames but the file holds " + frames
                    + ": the recording was cut short");
        }
        double scale = opt.sensitivity().orElse(1);
        String unit = opt.sensitivityUnit().orElse(FULL_SCALE);
        List<Channel> channels = new ArrayList<>();
        for (int c = 0; c < f.channels(); c++) {
            float[] v = data.channel(c, scale);
            channels.add(Channel.adopt("ch" + (c + 1), unit, v, v.length));
        }
        SourceFacts facts = new SourceFacts(src.name, src.sizeBytes, f.describe() + (src.gzipped ? ", gzip" : ""),
                "", List.of(), warnings);
        return new Recording(facts, TimeBase.regular((int) frames, f.rate(), null), channels, List.of(),
                List.of());
    }

    /** How a recording too large for memory is read: the budget, the blocks per channel, the frames kept. */
    private record Plan(long budget, int blockCap, int keep) {
    }

    /**
     * A recording whose frames do not fit the memory riffle may use, read in one pass into the reduced
     * form of {@link Reduction}: the first and the last frames at full resolution (the number known from
     * the file's size), block statistics of every frame. Only a file of known size is read this way; gzip
     * and standard input are read whole.
     */
    private static Recording reduced(Source src, Riff in, Format f, long total, ReadOptions opt, Plan plan)
            throws IOException, LogException {
        int head = plan.keep() / 2;
        int tail = plan.keep() - head;
        long tailFrom = total - tail;
        int[] columns = new int[f.channels()];
        for (int c = 0; c < columns.length; c++) {
            columns[c] = c;
        }
        Blocks blocks = new Blocks(columns, plan.blockCap());
        float[][] kept = new float[f.channels()][plan.keep()];
        double scale = opt.sensitivity().orElse(1);
        long frames = new WavSamples(f, 0).stream(in.stream(), total, (values, count, first) -> {
            for (int i = 0; i < count; i++) {
                long r = first + i;
                int at = r < head ? (int) r : r >= tailFrom ? head + (int) (r - tailFrom) : -1;
                for (int c = 0; c < values.length; c++) {
                    if (scale != 1) {
                        values[c][i] = (float) (values[c][i] * scale);
                    }
                    if (at >= 0) {
                        kept[c][at] = values[c][i];
                    }
                }
                blocks.add(values, i);
            }
        });
        if (frames < total) {
            throw in.bad("the data chunk ends after " + frames + " of the " + total + " frames the file's size"
                    + " promises");
        }
        String unit = opt.sensitivityUnit().orElse(FULL_SCALE);
        List<Channel> channels = new ArrayList<>();
        List<BlockStats> stats = new ArrayList<>();
        for (int c = 0; c < f.channels(); c++) {
            channels.add(Channel.adopt("ch" + (c + 1), unit, kept[c], kept[c].length));
            stats.add(blocks.snapshot(c, "ch" + (c + 1)));
        }
        double[] at = new double[plan.keep()];
        for (int i = 0; i < at.length; i++) {
            at[i] = (i < head ? i : tailFrom + (i - head)) / (double) f.rate();
        }
        Reduction reduction = new Reduction(total, total * 4L * f.channels(), plan.budget(),
                MemoryBudget.wholeHeap(total, f.channels()), MemoryBudget.heap(), head, tailFrom, stats);
        SourceFacts facts = new SourceFacts(src.name, src.sizeBytes, f.describe(), "", List.of(), List.of(),
                Optional.empty(), Optional.of(reduction));
        return new Recording(facts, TimeBase.adoptExplicit(at, at.length, f.rate(), null), channels, List.of(), List.of());
    }

    /** A cursor over the RIFF stream that reports broken headers by file. */
    static final class Riff {
        private final InputStream in;
        private final String name;

        Riff(InputStream in, String name) {
            this.in = in;
            this.name = name;
        }

        InputStream stream() {
            return in;
        }

        LogException bad(String what) {
            return new LogException(name, 0, 0, "WAV: " + what);
        }

        byte[] bytes(int n, String what) throws IOException, LogException {
            byte[] b = in.readNBytes(n);
            if (b.length < n) {
                throw bad("the file ends inside its " + what);
            }
            return b;
        }

        /** The next 8-byte chunk header, or null at the end of the file. */
        byte[] chunkHeader() throws IOException, LogException {
            byte[] b = in.readNBytes(8);
            if (b.length == 0) {
                return null;
            }
            if (b.length < 8) {
                throw bad("the file ends inside a chunk header");
            }
            return b;
        }

        void skip(long n, String what) throws IOException, LogException {
            long left = n;
            while (left > 0) {
                long k = in.skip(left);
                if (k <= 0) {
                    if (in.read() < 0) {
                        throw bad("the " + what + " runs past the end of the file");
                    }
                    k = 1;
                }
                left -= k;
            }
        }

        /** Skips the pad byte after an odd-sized chunk (absent at the end of some files). */
        void pad(long size) throws IOException {
            if ((size & 1) == 1) {
                in.read();
            }
        }

        static int u16(byte[] b, int i) {
            return (b[i] & 0xFF) | (b[i + 1] & 0xFF) << 8;
        }

        static long u32(byte[] b, int i) {
            return (u16(b, i) | (long) u16(b, i + 2) << 16) & 0xFFFFFFFFL;
        }
    }
}
