/**
 * Delay embedding and the estimation of its delay (average mutual information, autocorrelation) and
 * dimension (false nearest neighbours, Cao). Public: {@link org.riffle.embed.Embedding},
 * {@link org.riffle.embed.EmbeddingSearch}, {@link org.riffle.embed.EmbeddingEstimator} and its result
 * {@link org.riffle.embed.EmbeddingEstimate}.
 */
package org.riffle.embed;
