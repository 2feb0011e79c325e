/**
 * Reading equipment logs into an immutable {@link org.riffle.log.Recording}: delimited text (dialect,
 * encoding, preamble, header, units and timestamp sniffing; one streaming byte-level pass with Commons
 * CSV for quoted lines), gzip and WAV. Time faults are reported as {@link org.riffle.log.TimeIssue}s,
 * never repaired; input the user can fix is a {@link org.riffle.log.LogException} with file, line and
 * column. Knows nothing of analysis or screens.
 *
 * <p>Public: {@link org.riffle.log.LogReader} (the entry point), {@link org.riffle.log.ReadOptions},
 * the {@code Recording} model ({@code Channel}, {@code TextChannel}, {@code TimeBase}, {@code TimeIssue},
 * {@code SourceFacts}, {@code Dialect}) and {@code LogException}; everything else is package-private.
 */
package org.riffle.log;
