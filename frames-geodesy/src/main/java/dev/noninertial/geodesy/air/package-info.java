/**
 * Air and drag near the Earth: the U.S. Standard Atmosphere 1976 ({@link
 * dev.noninertial.geodesy.air.Atmosphere1976}) or an atmosphere of the user's own ({@link
 * dev.noninertial.geodesy.air.Atmosphere}), drag coefficient tables against Mach number
 * ({@link dev.noninertial.geodesy.air.DragCurve}), wind in local-level axes ({@link
 * dev.noninertial.geodesy.air.WindProfile}) and the drag specific force for any frame of an
 * Earth tree ({@link dev.noninertial.geodesy.air.AirDrag}, made by
 * {@code EarthFrames.dragIn}). The airspeed is always the velocity relative to the air, which
 * turns with the Earth.
 *
 * <p>Results are for simulation and analysis only, not for aiming, firing or safety-area
 * decisions; defer to local codes, standards and licensed practice.
 */
package dev.noninertial.geodesy.air;
