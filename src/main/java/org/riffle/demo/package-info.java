/**
 * The invented demo scenario and its deterministic fixture generator: the north ventilation station of
 * the (invented) Kestrel Hill road tunnel, axial supply fan AF-2 with its motor and gearbox. Imports only
 * the JDK; the same code gives the same bytes on any Java 17+ virtual machine.
 */
package org.riffle.demo;
