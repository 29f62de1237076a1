package dev.noninertial.geodesy;

/**
 * Axis order of a local-level frame at a point near the Earth.
 *
 * <p>Both are right-handed. The "up" direction is the outward ellipsoid normal through the
 * point (geodetic vertical), north is the horizontal direction toward the north pole along the
 * meridian, east completes the set.
 *
 * <p>An enum constant: immutable and thread-safe.
 */
public enum LocalAxes {
    /** x east, y north, z up (along the outward ellipsoid normal). */
    ENU,
    /** x north, y east, z down (along the inward ellipsoid normal). */
    NED
}
