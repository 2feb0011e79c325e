/**
 * Delay embedding and the estimation of its delay (average mutual information, autocorrelation) and dimension (false nearest neighbours, Cao).
 */
package org.riffle.embed;
