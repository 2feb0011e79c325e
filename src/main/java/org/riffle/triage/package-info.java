/**
 * Judges each channel of a recording against a baseline and orchestrates the engines on a thread pool.
 * {@link org.riffle.triage.Analyzer} learns a {@link org.riffle.triage.BaselineModel} (plain values the
 * note package can store between visits) and judges a recording against it: per window the reservoir
 * novelty, the RQA measures and the plain level, spread and kurtosis, each against its own baseline
 * distribution, combined into one score, calibrated alert level and three-level judgement
 * ({@link org.riffle.triage.Level}); per channel a health figure, level and since-time
 * ({@link org.riffle.triage.Health}). Its records ({@link org.riffle.triage.Assessment},
 * {@link org.riffle.triage.ChannelAssessment}, {@link org.riffle.triage.WindowRow},
 * {@link org.riffle.triage.Measure}, {@link org.riffle.triage.Param}) are what the faces read.
 */
package org.riffle.triage;
