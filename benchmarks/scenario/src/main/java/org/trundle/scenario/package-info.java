/**
 * The scenario model: a scenario document (JSON, or YAML with the same keys) describes one run of the
 * library — ball, surface, contact law, gravity, start, duration, solver settings — and, optionally,
 * a sweep over some of its values. {@link org.trundle.scenario.ScenarioFiles} reads documents
 * strictly, {@link org.trundle.scenario.Scenario#parse} checks one and builds the
 * {@link org.trundle.core.Simulation}, {@link org.trundle.scenario.SweepSpec} reads the sweep and
 * makes the scenario at each parameter point, and {@link org.trundle.scenario.Outcome} names how a
 * run ended. Every value is in SI units (degrees for keys ending in {@code _deg}); a bad value is a
 * {@link org.trundle.scenario.ScenarioException} naming the key and the value.
 *
 * <p>Used by the command-line runner, the pictures and anything else that reads scenarios; depends
 * only on the library modules and Jackson.
 */
package org.trundle.scenario;
