/**
 * What inertial sensors fixed in a frame read: ideal specific force and angular rate
 * ({@link dev.noninertial.frames.sensing.IdealSensor}), their exact increments over intervals
 * ({@link dev.noninertial.frames.sensing.SensorIncrements}), and a seeded model of the errors of
 * real sensors ({@link dev.noninertial.frames.sensing.SensorImperfections}).
 *
 * <p><b>Sign rule.</b> An accelerometer measures specific force, {@code f = a_inertial - gravitation}:
 * at rest on the Earth it reads minus normal gravity (upward, about 9.8 m/s^2). A gyro measures the
 * angular rate of its frame relative to inertial space (the tree's root), never relative to the
 * Earth. Both are resolved in the sensor frame's axes.
 *
 * <p>Results are for simulation and analysis, not for primary navigation, lifting or
 * human-centrifuge decisions; those are governed by local codes, standards and licensed practice.
 */
package dev.noninertial.frames.sensing;
