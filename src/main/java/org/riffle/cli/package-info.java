/**
 * picocli commands: wiring only. The only package that imports picocli.
 */
package org.riffle.cli;
