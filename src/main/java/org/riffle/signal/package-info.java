/**
 * Descriptive statistics, windows, decimation, spectrum, severity zones and fault frequencies over primitive arrays. Pure functions; no files, no screens.
 */
package org.riffle.signal;
