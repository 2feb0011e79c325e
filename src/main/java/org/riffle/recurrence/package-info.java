/**
 * Recurrence quantification analysis: a streamed engine with O(N) memory, the RQA measures, windowed
 * trends and recurrence-plot thumbnails. Public: the engine {@link org.riffle.recurrence.Rqa}, its
 * parameters {@link org.riffle.recurrence.RqaParams}, and its results
 * {@link org.riffle.recurrence.RqaResult}, {@link org.riffle.recurrence.Trend} and
 * {@link org.riffle.recurrence.RecurrencePlot}; everything else is package-private.
 */
package org.riffle.recurrence;
