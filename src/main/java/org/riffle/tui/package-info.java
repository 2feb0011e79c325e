/**
 * The Lanterna terminal screens, layout and key handling. The only package that imports Lanterna.
 */
package org.riffle.tui;
