/**
 * The benchmark harness behind {@code riffle bench}: deterministic large inputs generated on the
 * spot into a work folder, warm-up then measured runs of the same code paths the commands use, the
 * medians printed as a table against the issues' targets. {@link org.riffle.bench.BenchRunner} runs
 * them; {@code Benchmarks} lists them; each engine's workloads sit in its own {@code *Bench} class.
 * Not part of the analysis; only the command line imports it.
 */
package org.riffle.bench;
