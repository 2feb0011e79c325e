package org.riffle.embed;

import java.util.List;
import java.util.Objects;

/**
 * An embedding estimated from data, with how each part was chosen, the curves it was read from, the
 * search parameters and the sample range used.
 *
 * <p>Immutable.
 *
 * @param embedding the dimension m and delay τ chosen
 * @param delayMethod how τ was chosen, ready to print, e.g. {@code "AMI first minimum"} or {@code "given"}
 * @param dimensionMethod how m was chosen, e.g. {@code "false nearest neighbours"} or {@code "given"}
 * @param from first sample used (inclusive)
 * @param to end of the samples used (exclusive)
 * @param mutualInformation average mutual information I(τ) in nats for τ = 0, 1, …, max delay (empty
 *        when τ was given)
 * @param dimensionCurve for m = 1, 2, …: the false-neighbour fraction (FNN, which ends at the first m
 *        whose fraction is within the limit) or Cao's E1(m); empty when m was given
 * @param search the search parameters used
 */
public record EmbeddingEstimate(Embedding embedding, String delayMethod, String dimensionMethod, int from, int to,
                                List<Double> mutualInformation, List<Double> dimensionCurve,
                                EmbeddingSearch search) {
    public EmbeddingEstimate {
        Objects.requireNonNull(embedding, "embedding");
        Objects.requireNonNull(delayMethod, "delayMethod");
        Objects.requireNonNull(dimensionMethod, "dimensionMethod");
        Objects.requireNonNull(search, "search");
        mutualInformation = List.copyOf(mutualInformation);
        dimensionCurve = List.copyOf(dimensionCurve);
    }

    /** One line fit to print, e.g. {@code m = 3 (false nearest neighbours), τ = 8 (AMI first minimum)}. */
    public String describe() {
        return "m = " + embedding.dimension() + " (" + dimensionMethod + "), τ = " + embedding.delay() + " ("
                + delayMethod + ")";
    }
}
