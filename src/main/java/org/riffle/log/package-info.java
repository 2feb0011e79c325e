/**
 * Reading equipment logs into an immutable {@link org.riffle.log.Recording}: dialect, header, unit and timestamp sniffing; delimited text, gzip, WAV. Knows nothing of analysis or screens.
 */
package org.riffle.log;
