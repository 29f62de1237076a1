/**
 * Strapdown navigation in a local-level frame on the spinning Earth, from the delta-velocity
 * and delta-angle increments of an inertial sensor, with every term of the mechanization named.
 *
 * <ul>
 *   <li>{@link dev.noninertial.geodesy.navigation.NavigationState}: time, geodetic position,
 *       velocity in local-level axes (NED or ENU), attitude of the body relative to the level
 *       frame.</li>
 *   <li>{@link dev.noninertial.geodesy.navigation.LevelNavigator}: advances a state by one pair
 *       of increments, or a whole run of them, and reports the named terms of a step
 *       ({@link dev.noninertial.geodesy.navigation.StepTerms}).</li>
 *   <li>{@link dev.noninertial.geodesy.navigation.ErrorBudget}: the same increments navigated
 *       with one {@link dev.noninertial.geodesy.navigation.NavigationTerm} left out at a time,
 *       and the position and attitude deviation each omission causes.</li>
 * </ul>
 *
 * <p>Conventions: SI units (m, s, rad). The level frame is north-pointing; its "down" is the
 * inward ellipsoid normal. The attitude of the body relative to the level frame is a rotation
 * {@code R} with {@code v_body = R v_level} (the library's convention). An accelerometer measures
 * specific force {@code f = a_inertial - gravitation}; a gyro measures the angular rate of the
 * body relative to inertial space, both in body axes.
 *
 * <p><b>Caution:</b> for simulation and analysis, not for primary navigation. Navigation that
 * people rely on is governed by the applicable standards and licensed practice.
 */
package dev.noninertial.geodesy.navigation;
