/**
 * Worked scenarios in invented places, run by the README's main command
 * ({@code mvn -q -DskipTests package exec:java -pl frames-examples -am}).
 *
 * <p>{@link dev.noninertial.examples.ScenarioRunner} prints, as tables with units: the Earth's
 * rotation at an invented site with the gravity-versus-gravitation pitfall; the four inertial
 * accelerations at the crane hook of an invented ship that rolls, pitches and heaves under way;
 * and a long-range drag-free trajectory with and without the Earth's rotation. With
 * {@code --out DIR} each table is also written as CSV. The scenarios show how the library is
 * meant to be used and double as a smoke test; they are not a reference for any real site, vessel
 * or weapon.
 *
 * <p>Results are for simulation and analysis only, not for aiming, lifting or medical decisions;
 * defer to local codes and licensed practice.
 */
package dev.noninertial.examples;
