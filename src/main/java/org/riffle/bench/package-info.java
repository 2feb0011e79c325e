/**
 * Benchmarks of the engines as plain main methods (no harness): each prints its timing against the
 * speed target named in its issue.
 */
package org.riffle.bench;
