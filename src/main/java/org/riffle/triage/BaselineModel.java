package org.riffle.triage;

import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.riffle.recurrence.RqaParams;

/**
 * Everything learned from a healthy baseline, per channel, as plain values (numbers, text, arrays of
 * numbers) so that it can be written to and read back from a text file between visits and used instead
 * of learning again ({@link Analyzer#assess(org.riffle.log.Recording, BaselineModel, TriageListener)}).
 * The reservoir itself is not stored: it is rebuilt from its seed and settings, and its fingerprint
 * checks that the rebuild is the one the readout was trained on.
 *
 * <p>Immutable: lists and arrays are copied in and out.
 *
 * @param source where the baseline came from, ready to print (file and rows)
 * @param baseline the baseline rows in {@code source}
 * @param window trend window in samples
 * @param step trend step in samples
 * @param quantile calibration quantile
 * @param sustained windows in a row that make a departure sustained
 * @param channels one model per numeric channel of the baseline log, in its order
 * @param rqaNorm RQA distance: {@code "euclidean"} or {@code "max"}
 * @param minLine RQA l_min
 * @param minVert RQA v_min
 * @param theiler RQA Theiler window
 */
public record BaselineModel(String source, Baseline baseline, int window, int step, double quantile, int sustained,
                            List<ChannelModel> channels, String rqaNorm, int minLine, int minVert, int theiler) {
    public BaselineModel {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(baseline, "baseline");
        Objects.requireNonNull(rqaNorm, "rqaNorm");
        channels = List.copyOf(channels);
        if (window < 2 || step < 1 || step > window) {
            throw new IllegalArgumentException("window " + window + " and step " + step + " do not make a trend");
        }
        rqaSettings(rqaNorm, minLine, minVert, theiler);
    }

    /** A model with riffle's default RQA line and norm settings. */
    public BaselineModel(String source, Baseline baseline, int window, int step, double quantile, int sustained,
                         List<ChannelModel> channels) {
        this(source, baseline, window, step, quantile, sustained, channels,
                RqaParams.defaults().norm().word(), RqaParams.defaults().minLine(), RqaParams.defaults().minVert(),
                RqaParams.defaults().theiler());
    }

    /** The RQA settings of this model (embedding and threshold are per channel). */
    RqaParams rqa() {
        return rqaSettings(rqaNorm, minLine, minVert, theiler);
    }

    private static RqaParams rqaSettings(String norm, int minLine, int minVert, int theiler) {
        RqaParams.Norm n = null;
        for (RqaParams.Norm candidate : RqaParams.Norm.values()) {
            if (candidate.word().equals(norm)) {
                n = candidate;
            }
        }
        if (n == null) {
            throw new IllegalArgumentException("RQA norm '" + norm + "' is not one riffle knows");
        }
        return RqaParams.defaults().withNorm(n).withMinLines(minLine, minVert).withTheiler(theiler);
    }

    /** The model of the channel named {@code name} (exact match). */
    public Optional<ChannelModel> channel(String name) {
        return channels.stream().filter(c -> c.name().equals(name)).findFirst();
    }

    /**
     * One channel's baseline.
     *
     * @param name channel name
     * @param unit channel unit
     * @param noEstimateReason why nothing could be learned, {@code ""} when learned
     * @param mean baseline mean (normalisation), channel unit
     * @param std baseline sample standard deviation (normalisation), channel unit
     * @param decimation analysis-rate decimation factor D (1 = every sample)
     * @param analysisRateHz analysis rate in Hz (sample rate / D)
     * @param embeddingDimension RQA embedding dimension m, 0 when RQA was not computed
     * @param embeddingDelay RQA delay τ in samples, 0 when RQA was not computed
     * @param rqaRadius RQA threshold ε fixed from the baseline, NaN when RQA was not computed
     * @param rqaSettings the RQA parameters as used, ready to print, {@code ""} when not computed
     * @param reservoir the trained reservoir, empty when the novelty could not be learned
     * @param measures each measure's baseline distribution over the baseline windows
     * @param alertLevel the calibrated alert level of the window score
     * @param notes what could not be learned and why, one line each
     */
    public record ChannelModel(String name, String unit, String noEstimateReason, double mean, double std,
                               int decimation, double analysisRateHz, int embeddingDimension, int embeddingDelay,
                               double rqaRadius, String rqaSettings, Optional<ReservoirModel> reservoir,
                               List<MeasureModel> measures,
                               double alertLevel, List<String> notes) {
        public ChannelModel {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(unit, "unit");
            Objects.requireNonNull(noEstimateReason, "noEstimateReason");
            Objects.requireNonNull(rqaSettings, "rqaSettings");
            Objects.requireNonNull(reservoir, "reservoir");
            measures = List.copyOf(measures);
            notes = List.copyOf(notes);
            if (decimation < 1) {
                throw new IllegalArgumentException("decimation " + decimation + " of " + name + " below 1");
            }
        }

        /** A channel nothing could be learned for. */
        static ChannelModel none(String name, String unit, String reason) {
            return new ChannelModel(name, unit, reason, Double.NaN, Double.NaN, 1, Double.NaN, 0, 0, Double.NaN, "",
                    Optional.empty(), List.of(), Double.NaN, List.of());
        }

        /** True when there is a baseline to judge against. */
        public boolean learned() {
            return noEstimateReason.isEmpty();
        }
    }

    /**
     * The trained echo state network of a channel: its settings (enough to rebuild the reservoir from the
     * seed), its readout and its reference error.
     *
     * @param seed reservoir seed
     * @param units reservoir size
     * @param connections recurrent connections per unit
     * @param spectralRadius spectral radius of W
     * @param leak leak rate
     * @param inputScaling input weight scale
     * @param biasScaling bias weight scale
     * @param ridge ridge penalty per sample
     * @param washout washout in analysis samples
     * @param weights readout weights (bias, input, states)
     * @param fingerprint {@code Reservoir.fingerprint()} of the reservoir the readout was trained on
     * @param heldOutMse mean squared held-out one-step error on the baseline (normalised units²)
     * @param validationNrmse held-out NRMSE on the baseline
     * @param search how the settings were chosen, ready to print
     */
    public record ReservoirModel(long seed, int units, int connections, double spectralRadius, double leak,
                                 double inputScaling, double biasScaling, double ridge, int washout,
                                 double[] weights, long fingerprint, double heldOutMse, double validationNrmse,
                                 String search) {
        public ReservoirModel {
            Objects.requireNonNull(search, "search");
            weights = weights.clone();
            if (weights.length != units + 2) {
                throw new IllegalArgumentException(weights.length + " readout weights for " + units
                        + " units: need units + 2");
            }
        }

        @Override
        public double[] weights() {
            return weights.clone();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof ReservoirModel r && seed == r.seed && units == r.units
                    && connections == r.connections && Double.compare(spectralRadius, r.spectralRadius) == 0
                    && Double.compare(leak, r.leak) == 0 && Double.compare(inputScaling, r.inputScaling) == 0
                    && Double.compare(biasScaling, r.biasScaling) == 0 && Double.compare(ridge, r.ridge) == 0
                    && washout == r.washout && Arrays.equals(weights, r.weights) && fingerprint == r.fingerprint
                    && Double.compare(heldOutMse, r.heldOutMse) == 0
                    && Double.compare(validationNrmse, r.validationNrmse) == 0 && search.equals(r.search);
        }

        @Override
        public int hashCode() {
            return Long.hashCode(fingerprint) * 31 + Arrays.hashCode(weights);
        }

        @Override
        public String toString() {
            return "ReservoirModel[seed=" + seed + ", units=" + units + ", radius=" + spectralRadius + ", leak="
                    + leak + ", ridge=" + ridge + ", washout=" + washout + ", fingerprint=" + fingerprint + "]";
        }
    }

    /**
     * One measure's distribution over the baseline windows.
     *
     * @param name measure name ({@code "novelty"}, {@code "RR"}, {@code "DET"}, {@code "LAM"},
     *     {@code "mean"}, {@code "std"}, {@code "kurtosis"})
     * @param center median of the baseline windows (of the logarithm for {@code novelty})
     * @param spread robust spread: 1.4826 × median absolute deviation, floored (see README)
     * @param values the baseline windows' values, in window order
     */
    public record MeasureModel(String name, double center, double spread, double[] values) {
        public MeasureModel {
            Objects.requireNonNull(name, "name");
            values = values.clone();
        }

        @Override
        public double[] values() {
            return values.clone();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof MeasureModel m && name.equals(m.name) && Double.compare(center, m.center) == 0
                    && Double.compare(spread, m.spread) == 0 && Arrays.equals(values, m.values);
        }

        @Override
        public int hashCode() {
            return name.hashCode() * 31 + Arrays.hashCode(values);
        }

        @Override
        public String toString() {
            return "MeasureModel[" + name + ", center=" + center + ", spread=" + spread + ", "
                    + values.length + " windows]";
        }
    }
}
