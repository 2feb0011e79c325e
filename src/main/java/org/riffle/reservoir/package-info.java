/**
 * Echo state network: a seeded sparse reservoir rescaled to an exact spectral radius, state harvesting
 * with washout and gap resets, a closed-form ridge readout (bias unpenalised), and a one-step predictor
 * trained with a small search on time-blocked folds of a baseline. Public: {@link
 * org.riffle.reservoir.EsnParams}, {@link org.riffle.reservoir.Reservoir}, {@link org.riffle.reservoir.Esn},
 * {@link org.riffle.reservoir.SearchSpace}, {@link org.riffle.reservoir.OneStepTrainer} and its result
 * {@link org.riffle.reservoir.OneStepFit}, {@link org.riffle.reservoir.Decimator}. Pure functions over
 * primitive arrays; no files, no screens; everything seeded.
 */
package org.riffle.reservoir;
