/**
 * Recurrence quantification analysis: a streamed engine with O(N) memory, the RQA measures, windowed trends and recurrence-plot thumbnails.
 */
package org.riffle.recurrence;
