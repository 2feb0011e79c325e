/**
 * Judges each channel of a recording against a baseline and orchestrates the engines on a thread pool. Its records are what the faces read.
 */
package org.riffle.triage;
