/**
 * The Earth as a rotating platform: reference ellipsoids, geodetic coordinates, Earth frames and
 * the gravity field of the ellipsoid.
 *
 * <p>{@link dev.noninertial.geodesy.Ellipsoid} (WGS84, GRS80) converts between Cartesian and
 * geodetic coordinates ({@link dev.noninertial.geodesy.LatLonHeight}) everywhere, poles and
 * centre included, and gives radii of curvature and the ellipsoid normal.
 * {@link dev.noninertial.geodesy.EarthModel} adds the rotation rate and the normal gravity field
 * (Somigliana's formula, the height series and the exact closed form), and the gravitation to
 * integrate in an Earth-fixed frame. {@link dev.noninertial.geodesy.EarthFrames} builds, for one
 * epoch, the Earth-centred inertial root, the Earth-fixed frame turning under it at the IERS 2010
 * Earth rotation angle ({@link dev.noninertial.geodesy.EarthRotationAngle}), local-level frames
 * ({@link dev.noninertial.geodesy.LocalAxes} ENU or NED) fixed at a site or carried along a
 * {@link dev.noninertial.geodesy.GeodeticPath}, and body frames from an
 * {@link dev.noninertial.geodesy.AttitudeProfile}, all with analytic rates. Earth rate, transport
 * rate, Coriolis parameter and the Eotvos correction come with them;
 * {@link dev.noninertial.geodesy.GeodeticJacobians} and
 * {@link dev.noninertial.geodesy.GeodeticUncertainty} carry covariances between Cartesian and
 * geodetic coordinates.
 *
 * <h2>Conventions</h2>
 * SI units; angles in radians unless a method says degrees ({@code ofDegrees}); geodetic latitude
 * and ellipsoidal height. The Earth-fixed frame (ECEF) has z towards the north pole and x towards
 * longitude 0; the orientation of a frame maps its parent's components to its own
 * ({@code v_F = R v_B}), as everywhere in the library. Precession, nutation, polar motion and
 * UT1-UTC are not modelled.
 *
 * <h2>Gravity or gravitation</h2>
 * Normal gravity (what a plumb line shows) already contains the centrifugal term of the Earth's
 * rotation. When integrating in an Earth-fixed or local-level frame, pass <b>gravitation</b>
 * ({@link dev.noninertial.geodesy.EarthFrames#gravitationIn(dev.noninertial.frames.ReferenceFrame)}),
 * since the solver adds the centrifugal term itself.
 *
 * <p>Results are for simulation and analysis; they are not fit for primary navigation, aiming
 * weapons or any decision on which safety depends. Defer to local codes and licensed practice.
 */
package dev.noninertial.geodesy;
