/**
 * Echo state network: seeded sparse reservoir, state harvesting, ridge-regression readout and novelty scoring.
 */
package org.riffle.reservoir;
