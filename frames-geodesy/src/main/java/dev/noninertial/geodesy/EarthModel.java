package dev.noninertial.geodesy;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;

/**
 * A full normal Earth: an {@link Ellipsoid}, the geocentric gravitational constant GM, the
 * rotation rate w, and the normal gravity field they define (the ellipsoid is an equipotential
 * surface of the normal potential, Heiskanen and Moritz, Physical Geodesy, ch. 2; NIMA TR8350.2
 * ch. 4).
 *
 * <p>All derived constants (normal gravity at equator and pole, Somigliana's k, m) are computed
 * from the four defining constants with the closed forms, not copied from tables.
 *
 * <h2>Conventions</h2>
 * SI units; angles in radians. Cartesian vectors are resolved in Earth-fixed (ECEF) axes (z
 * toward the north pole, x toward longitude 0). "Gravity" is what a plumb line and a gravimeter
 * at rest on the Earth see: gravitation plus the centrifugal term of the Earth's rotation.
 * "Gravitation" is the attraction of the masses alone.
 *
 * <h2>Which one to integrate</h2>
 * In a frame fixed to the rotating Earth the kinematics engine adds the centrifugal (and
 * Coriolis) terms itself; the real specific force to integrate there is
 * {@link #gravitation(Vector3D)}, not gravity. Passing gravity counts the centrifugal term twice.
 * In an inertial frame gravitation is the only gravitational force too.
 *
 * <p>Immutable and thread-safe.
 */
public final class EarthModel implements Serializable {

    private static final long serialVersionUID = 1L;

    /**
     * Lower limit of the normal field (m): a point is accepted while the semi-minor axis u of the
     * confocal ellipsoid through it is at least b - 20 km, i.e. down to roughly 20 km below the
     * ellipsoid. Below the surface the closed form is its analytic continuation (as everywhere in
     * practice for points a few hundred metres down).
     */
    public static final double MIN_HEIGHT = -20e3;

    /**
     * WGS84: ellipsoid {@link Ellipsoid#WGS84}, GM = 3.986004418e14 m^3/s^2 (with atmosphere),
     * w = 7.292115e-5 rad/s (NIMA TR8350.2, 3rd ed., Table 3.1).
     */
    public static final EarthModel WGS84 = of(Ellipsoid.WGS84, 3.986004418e14, 7.292115e-5);

    /**
     * GRS80: ellipsoid {@link Ellipsoid#GRS80}, GM = 3.986005e14 m^3/s^2, w = 7.292115e-5 rad/s
     * (Moritz, Geodetic Reference System 1980).
     */
    public static final EarthModel GRS80 = of(Ellipsoid.GRS80, 3.986005e14, 7.292115e-5);

    /** Shape (a, f). */
    private final Ellipsoid ellipsoid;
    /** Geocentric gravitational constant GM (m^3/s^2). */
    private final double gm;
    /** Rotation rate (rad/s). */
    private final double omega;
    // derived
    /** Semi-major axis (m), derived from the shape. */
    private final double a;
    /** Semi-minor axis (m), derived. */
    private final double b;
    /** First eccentricity squared, derived. */
    private final double e2;
    /** Linear eccentricity E (m), derived. */
    private final double linear;     // E
    /** E squared (m^2), derived. */
    private final double linear2;    // E^2
    /** Normal-potential auxiliary q0 at u = b, derived. */
    private final double q0;
    /** m = w^2 a^2 b / GM, derived. */
    private final double m;
    /** Normal gravity at the equator (m/s^2), derived. */
    private final double gammaE;
    /** Normal gravity at the poles (m/s^2), derived. */
    private final double gammaP;
    /** Somigliana constant k, derived. */
    private final double k;

    private EarthModel(Ellipsoid ellipsoid, double gm, double omega) {
        this.ellipsoid = ellipsoid;
        this.gm = gm;
        this.omega = omega;
        this.a = ellipsoid.semiMajorAxis();
        this.b = ellipsoid.semiMinorAxis();
        this.e2 = ellipsoid.eccentricitySquared();
        this.linear2 = a * a * e2;
        this.linear = Math.sqrt(linear2);
        double ep = linear / b;
        this.q0 = q(ep);
        // q0' of TR8350.2 Eq. 4-4 equals -(u^2 + E^2)/E dq/du at u = b, i.e. (1 + ep^2) Q'(ep)
        double q0prime = (1.0 + ep * ep) * qDerivative(ep);
        this.m = omega * omega * a * a * b / gm;
        this.gammaE = gm / (a * b) * (1.0 - m - m * ep * q0prime / (6.0 * q0));
        this.gammaP = gm / (a * a) * (1.0 + m * ep * q0prime / (3.0 * q0));
        this.k = b * gammaP / (a * gammaE) - 1.0;
    }

    /**
     * A normal Earth from its defining constants.
     *
     * @param ellipsoid the level ellipsoid; flattening at least 1e-6 (the closed forms divide by
     *        the linear eccentricity)
     * @param gm geocentric gravitational constant GM (m^3/s^2), positive
     * @param rotationRate rotation rate w (rad/s), in [0, 2e-3]
     * @return the model
     * @throws IllegalArgumentException if a value is NaN or out of range, or if the constants give
     *         a non-positive normal gravity at the equator (rotation too fast to hold the surface)
     */
    public static EarthModel of(Ellipsoid ellipsoid, double gm, double rotationRate) {
        Arguments.nonNull("ellipsoid", ellipsoid);
        if (!(ellipsoid.flattening() >= 1e-6)) {
            throw new IllegalArgumentException("ellipsoid flattening must be in [1e-6, "
                    + Ellipsoid.MAX_FLATTENING + "] for a normal gravity field, got " + ellipsoid.flattening());
        }
        Arguments.positive("gm (m^3/s^2)", gm);
        Arguments.inRange("rotationRate (rad/s)", rotationRate, 0.0, 2e-3);
        EarthModel model = new EarthModel(ellipsoid, gm, rotationRate);
        if (!(model.gammaE > 0.0 && model.gammaP > 0.0)) {
            throw new IllegalArgumentException("rotationRate " + rotationRate + " rad/s is too fast for gm " + gm
                    + " m^3/s^2 on " + ellipsoid + ": normal gravity at the equator would be " + model.gammaE
                    + " m/s^2, must be positive");
        }
        return model;
    }

    /**
     * Returns the level ellipsoid.
     *
     * @return the level ellipsoid
     */
    public Ellipsoid ellipsoid() {
        return ellipsoid;
    }

    /**
     * Returns geocentric gravitational constant GM (m^3/s^2).
     *
     * @return geocentric gravitational constant GM (m^3/s^2)
     */
    public double gm() {
        return gm;
    }

    /**
     * Returns rotation rate w of the Earth-fixed frame relative to inertial space (rad/s).
     *
     * @return rotation rate w of the Earth-fixed frame relative to inertial space (rad/s)
     */
    public double rotationRate() {
        return omega;
    }

    /**
     * Returns normal gravity on the equator (m/s^2), from the closed form (TR8350.2 Eq. 4-4 form).
     *
     * @return normal gravity on the equator (m/s^2), from the closed form (TR8350.2 Eq. 4-4 form)
     */
    public double equatorialGravity() {
        return gammaE;
    }

    /**
     * Returns normal gravity at the poles (m/s^2), from the closed form.
     *
     * @return normal gravity at the poles (m/s^2), from the closed form
     */
    public double polarGravity() {
        return gammaP;
    }

    /**
     * Returns somigliana's constant k = b gp / (a ge) - 1.
     *
     * @return Somigliana's constant k = b gp / (a ge) - 1
     */
    public double somiglianaConstant() {
        return k;
    }

    /**
     * Returns the ratio m = w^2 a^2 b / GM of centrifugal to gravitational effect at the equator.
     *
     * @return the ratio m = w^2 a^2 b / GM of centrifugal to gravitational effect at the equator
     */
    public double centrifugalRatio() {
        return m;
    }

    // ------------------------------------------------------------------ normal gravity magnitude

    /**
     * Normal gravity on the ellipsoid by Somigliana's closed form (TR8350.2 Eq. 4-1):
     * {@code g = ge (1 + k sin^2 lat) / sqrt(1 - e^2 sin^2 lat)}.
     *
     * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
     * @return magnitude of normal gravity on the ellipsoid (m/s^2)
     * @throws IllegalArgumentException if the latitude is out of range or NaN
     */
    public double normalGravityOnEllipsoid(double latitude) {
        Ellipsoid.checkLatitude(latitude);
        double s2 = Math.sin(latitude);
        s2 *= s2;
        return gammaE * (1.0 + k * s2) / Math.sqrt(1.0 - e2 * s2);
    }

    /**
     * Magnitude of normal gravity at a geodetic position, by Somigliana's formula corrected for
     * height with the second-order series of TR8350.2 Eq. 4-3:
     * {@code g_h = g [1 - 2 (1 + f + m - 2 f sin^2 lat) h / a + 3 h^2 / a^2]}. The series is what
     * gravimetry and navigation use near the surface; its truncation error grows with height
     * (measured against the exact field {@link #normalGravityVector(Vector3D)} on the site's
     * <a href="../../../../accuracy.html#geodesy">accuracy page</a>, section Normal gravity).
     * Heights are limited to [-20 km, 100 km].
     *
     * @param position geodetic position (rad, m)
     * @return magnitude of normal gravity (m/s^2)
     * @throws IllegalArgumentException if the height is outside [-20 km, 100 km]
     */
    public double normalGravity(LatLonHeight position) {
        Arguments.nonNull("position", position);
        double h = Arguments.inRange("position.height (m)", position.height(), MIN_HEIGHT, 100e3);
        double s2 = Math.sin(position.latitude());
        s2 *= s2;
        double f = ellipsoid.flattening();
        double g0 = gammaE * (1.0 + k * s2) / Math.sqrt(1.0 - e2 * s2);
        return g0 * (1.0 - 2.0 / a * (1.0 + f + m - 2.0 * f * s2) * h + 3.0 * h * h / (a * a));
    }

    // ------------------------------------------------------------------ exact normal field

    /**
     * The normal gravity potential {@code W = V + Phi} at an Earth-fixed point: gravitational
     * plus centrifugal potential, in closed form in ellipsoidal coordinates (u, beta)
     * (Heiskanen and Moritz, Physical Geodesy, Eq. 2-126):
     * {@code W = GM/E atan(E/u) + w^2 a^2 q(u)/(2 q0) (sin^2 beta - 1/3) + w^2 (u^2 + E^2) cos^2 beta / 2}.
     * On the ellipsoid it equals the constant {@code U0 = GM/E atan(E/b) + w^2 a^2 / 3}.
     *
     * <p>Beyond {@value #POINT_MASS_DISTANCE} m from the centre the gravitational part is the point
     * mass's (its flattening term is below rounding there); positions so far from the axis that
     * the centrifugal part overflows (about 1.9e158 m) are refused.
     *
     * @param position Earth-fixed position (m), ECEF axes, not deeper than about 20 km below the ellipsoid
     * @return potential (m^2/s^2), positive
     * @throws IllegalArgumentException if the position is not finite, too deep or too far
     */
    public double normalPotential(Vector3D position) {
        Arguments.finite("position", position);
        double px = position.getX();
        double py = position.getY();
        double pz = position.getZ();
        double big = Math.max(Math.abs(px), Math.max(Math.abs(py), Math.abs(pz)));
        if (big > POINT_MASS_DISTANCE) {
            // point mass plus centrifugal potential (flattening term below rounding, see field)
            double scale = Math.scalb(1.0, Math.getExponent(big));
            double sx = px / scale;
            double sy = py / scale;
            double sz = pz / scale;
            double r = Math.sqrt(sx * sx + sy * sy + sz * sz) * scale;
            double w = gm / r + 0.5 * omega * omega * (sx * sx + sy * sy) * scale * scale;
            if (!Double.isFinite(w)) {
                throw new IllegalArgumentException("position " + position + " m is too far from the axis: the"
                        + " centrifugal potential w^2 p^2 / 2 exceeds the largest double");
            }
            return w;
        }
        double[] c = ellipsoidal(position);
        double u = c[0];
        double sb2 = c[1];
        double cb2 = c[2];
        double x = linear / u;
        return gm / linear * Math.atan(x) + 0.5 * omega * omega * a * a * q(x) / q0 * (sb2 - 1.0 / 3.0)
                + 0.5 * omega * omega * (u * u + linear2) * cb2;
    }

    /**
     * The exact normal gravity vector (gradient of {@link #normalPotential(Vector3D)}): what a
     * plumb line sees at rest on the normal Earth, gravitation plus centrifugal term. On the
     * ellipsoid it is normal to the surface and its magnitude is Somigliana's formula.
     *
     * <p>Do not pass this as the force to integrate in an Earth-fixed frame: use
     * {@link #gravitation(Vector3D)} there (see the class comment).
     *
     * @param position Earth-fixed position (m), ECEF axes, height above about -20 km
     * @return normal gravity (m/s^2), resolved in ECEF axes (pointing roughly to the centre)
     * @throws IllegalArgumentException if the position is not finite or too deep
     */
    public Vector3D normalGravityVector(Vector3D position) {
        Arguments.finite("position", position);
        double[] g = new double[3];
        fieldAt(position.getX(), position.getY(), position.getZ(), true, g, 0);
        return new Vector3D(g[0], g[1], g[2]);
    }

    /** Beyond this distance from the centre (m) the field is the point mass's (see {@link #gravitation}). */
    static final double POINT_MASS_DISTANCE = 1e100;

    /**
     * The exact normal field at an Earth-fixed point, written into an array (allocation-free):
     * the gradient of the normal potential, with or without its centrifugal part. Without it the
     * gravitational part alone is differentiated, so gravitation far from the Earth is not the
     * small difference of two large numbers (at 1e13 m the centrifugal term is 5e4 m/s^2 and
     * gravitation 4e-12 m/s^2).
     */
    private void fieldAt(double px, double py, double pz, boolean withCentrifugal, double[] out, int offset) {
        double w2 = omega * omega;
        double spin = withCentrifugal ? w2 : 0.0;
        double big = Math.max(Math.abs(px), Math.max(Math.abs(py), Math.abs(pz)));
        if (big > POINT_MASS_DISTANCE) {
            // the flattening term falls off as (a/r)^2 relative to the point mass: below 1e-186
            // here, far below rounding; the point mass is computed on scaled components
            double scale = Math.scalb(1.0, Math.getExponent(big));
            double sx = px / scale;
            double sy = py / scale;
            double sz = pz / scale;
            double sr = Math.sqrt(sx * sx + sy * sy + sz * sz);
            double r = sr * scale;
            double pull = gm / r / r / sr; // multiplies the scaled components: GM r_vec / r^3
            out[offset] = -pull * sx + spin * px;
            out[offset + 1] = -pull * sy + spin * py;
            out[offset + 2] = -pull * sz;
            return;
        }
        double p2 = px * px + py * py;
        double d = p2 + pz * pz - linear2;
        // hypot: d * d would overflow beyond about 1e77 m
        double u2 = 0.5 * (d + Math.hypot(d, 2.0 * linear * pz));
        double u = Math.sqrt(u2);
        if (!(u >= b + MIN_HEIGHT)) {
            throw new IllegalArgumentException("position (x, y, z) = (" + px + ", " + py + ", " + pz + ") m is deeper than "
                    + (-MIN_HEIGHT) + " m below the ellipsoid (ellipsoidal coordinate u = " + u + " m, must be >= "
                    + (b + MIN_HEIGHT) + " m): the normal field is not defined inside the masses");
        }
        double u2e2 = u2 + linear2;
        double cb2 = p2 / u2e2;
        double sb2 = pz * pz / u2;
        double x = linear / u;
        // dq/du = Q'(x) dx/du with x = E/u
        double dqdu = -qDerivative(x) * linear / (u * u);
        double dUdu = -gm / u2e2 + 0.5 * w2 * a * a * dqdu / q0 * (sb2 - 1.0 / 3.0) + spin * u * cb2;
        double kb = w2 * a * a * q(x) / q0 - spin * u2e2;   // dU/dbeta = sin(beta) cos(beta) kb
        double metric = u * u + linear2 * sb2;             // |dr/dbeta|^2 = (u^2 + E^2) |dr/du|^2
        double ca = dUdu * u2e2 / metric;                  // multiplies dr/du
        double cb = kb / metric;                           // multiplies dr/dbeta / (sin cos)
        double sinBeta = pz / u;
        double radial = ca * u / u2e2 - cb * sb2;
        out[offset] = radial * px;
        out[offset + 1] = radial * py;
        out[offset + 2] = ca * sinBeta + cb * u * sinBeta * cb2;
    }

    /**
     * Gravitation (attraction of the normal Earth's masses only): normal gravity minus the
     * centrifugal term {@code w^2 (x, y, 0)}.
     *
     * <p><b>This is the specific force to integrate</b> for a body in an Earth-fixed frame (the
     * engine adds centrifugal and Coriolis terms itself) and in an inertial frame (after
     * re-resolving the vector in inertial axes). Passing {@link #normalGravityVector(Vector3D)}
     * in an Earth-fixed frame would count the centrifugal term twice.
     *
     * <p>The gravitational potential alone is differentiated (no centrifugal part is added and
     * then taken away), so the field stays accurate at any distance: it tends to the point
     * mass's {@code -GM r / |r|^3}, and beyond {@value #POINT_MASS_DISTANCE} m, where the
     * flattening term is below rounding, it is computed as that point mass (underflowing to zero
     * beyond about 1e161 m).
     *
     * @param position Earth-fixed position (m), ECEF axes, height above about -20 km
     * @return gravitation (m/s^2), resolved in ECEF axes
     * @throws IllegalArgumentException if the position is not finite or too deep
     */
    public Vector3D gravitation(Vector3D position) {
        Arguments.finite("position", position);
        double[] g = new double[3];
        fieldAt(position.getX(), position.getY(), position.getZ(), false, g, 0);
        return new Vector3D(g[0], g[1], g[2]);
    }

    /**
     * {@link #gravitation(Vector3D)} on primitives, for hot paths: the same formula (one copy),
     * written into {@code out[offset, offset + 3)}; allocates nothing.
     *
     * @param x Earth-fixed x (m)
     * @param y Earth-fixed y (m)
     * @param z Earth-fixed z (m)
     * @param out receives gravitation (m/s^2), ECEF axes
     * @param offset index of the x component
     * @throws IllegalArgumentException if the position is not finite or too deep, or the range does not fit
     */
    public void gravitation(double x, double y, double z, double[] out, int offset) {
        Arguments.nonNull("out", out);
        Arguments.finite("x", x);
        Arguments.finite("y", y);
        Arguments.finite("z", z);
        Arguments.fromIndexSize("out", out, "offset", offset, 3);
        fieldAt(x, y, z, false, out, offset);
    }

    /**
     * The centrifugal acceleration of a point at rest in the Earth-fixed frame,
     * {@code -w x (w x r) = w^2 (x, y, 0)}: the part of gravity that is not gravitation.
     *
     * @param position Earth-fixed position (m), ECEF axes
     * @return centrifugal acceleration (m/s^2), resolved in ECEF axes
     * @throws IllegalArgumentException if the position is not finite
     */
    public Vector3D centrifugal(Vector3D position) {
        Arguments.finite("position", position);
        double w2 = omega * omega;
        return new Vector3D(w2 * position.getX(), w2 * position.getY(), 0.0);
    }

    /**
     * The Coriolis acceleration of a point moving in the Earth-fixed frame,
     * {@code -2 w x v} with {@code w = (0, 0, w)}.
     *
     * @param velocity velocity seen in the Earth-fixed frame (m/s), ECEF axes
     * @return Coriolis acceleration (m/s^2), resolved in ECEF axes
     * @throws IllegalArgumentException if the velocity is not finite
     */
    public Vector3D coriolis(Vector3D velocity) {
        Arguments.finite("velocity", velocity);
        return new Vector3D(2.0 * omega * velocity.getY(), -2.0 * omega * velocity.getX(), 0.0);
    }

    /**
     * Exact normal gravity at a geodetic position, resolved in local-level axes.
     *
     * @param position geodetic position (rad, m), height above about -20 km
     * @param axes ENU (x east, y north, z up) or NED (x north, y east, z down)
     * @return normal gravity (m/s^2) in the chosen local axes; mostly along "down"
     */
    public Vector3D normalGravityIn(LatLonHeight position, LocalAxes axes) {
        Arguments.nonNull("position", position);
        Arguments.nonNull("axes", axes);
        double[] g = new double[3];
        normalGravityIn(position.latitude(), position.height(), axes, g, 0);
        return new Vector3D(g[0], g[1], g[2]);
    }

    /**
     * Exact normal gravity in local-level axes, written into an array without allocating: the
     * primitive form of {@link #normalGravityIn(LatLonHeight, LocalAxes)} for hot paths (the
     * field is symmetric about the polar axis, so the longitude plays no part). The point is
     * carried to Earth-fixed axes at longitude 0 by {@link Ellipsoid#toCartesian(double, double,
     * double, double[], int)}, the closed form of {@link #normalGravityVector(Vector3D)} is
     * evaluated there and resolved in the local axes (rows of {@link Ellipsoid#localOrientation}).
     *
     * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
     * @param height ellipsoidal height (m), above about -20 km
     * @param axes ENU (x east, y north, z up) or NED (x north, y east, z down)
     * @param out receives the three components (m/s^2) in the chosen local axes
     * @param offset index of the first component in {@code out}
     * @throws IllegalArgumentException if the latitude is out of range or the point too deep
     */
    public void normalGravityIn(double latitude, double height, LocalAxes axes, double[] out, int offset) {
        Ellipsoid.checkLatitude(latitude);
        Arguments.finite("height", height);
        Arguments.nonNull("axes", axes);
        Arguments.fromIndexSize("out", out, "offset", offset, 3);
        ellipsoid.toCartesian(latitude, 0.0, height, out, offset);
        fieldAt(out[offset], 0.0, out[offset + 2], true, out, offset);
        double gx = out[offset];
        double gz = out[offset + 2];
        double s = Math.sin(latitude);
        double c = Math.cos(latitude);
        // at longitude 0: north (-s, 0, c), east (0, 1, 0), up (c, 0, s); the y component is 0
        double north = -s * gx + c * gz;
        double up = c * gx + s * gz;
        if (axes == LocalAxes.ENU) {
            out[offset] = 0.0;
            out[offset + 1] = north;
            out[offset + 2] = up;
        } else {
            out[offset] = north;
            out[offset + 1] = 0.0;
            out[offset + 2] = -up;
        }
    }

    // ------------------------------------------------------------------ rates

    /**
     * Coriolis parameter {@code f = 2 w sin(lat)} of oceanography and meteorology.
     *
     * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
     * @return f (rad/s), positive in the northern hemisphere
     */
    public double coriolisParameter(double latitude) {
        Ellipsoid.checkLatitude(latitude);
        return 2.0 * omega * Math.sin(latitude);
    }

    /**
     * Earth rotation rate resolved in local-level axes: ENU {@code (0, w cos lat, w sin lat)},
     * NED {@code (w cos lat, 0, -w sin lat)}.
     *
     * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
     * @param axes local axis order
     * @return angular velocity of the Earth-fixed frame relative to inertial space (rad/s), in local axes
     */
    public Vector3D earthRateIn(double latitude, LocalAxes axes) {
        double[] w = new double[3];
        earthRateIn(latitude, axes, w, 0);
        return new Vector3D(w[0], w[1], w[2]);
    }

    /**
     * Earth rotation rate in local-level axes, written into an array without allocating: the
     * primitive form of {@link #earthRateIn(double, LocalAxes)} (same formula).
     *
     * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
     * @param axes local axis order
     * @param out receives the three components (rad/s)
     * @param offset index of the first component in {@code out}
     * @throws IllegalArgumentException if the latitude is out of range
     */
    public void earthRateIn(double latitude, LocalAxes axes, double[] out, int offset) {
        Ellipsoid.checkLatitude(latitude);
        Arguments.nonNull("axes", axes);
        Arguments.fromIndexSize("out", out, "offset", offset, 3);
        double c = omega * Math.cos(latitude);
        double s = omega * Math.sin(latitude);
        if (axes == LocalAxes.ENU) {
            out[offset] = 0.0;
            out[offset + 1] = c;
            out[offset + 2] = s;
        } else {
            out[offset] = c;
            out[offset + 1] = 0.0;
            out[offset + 2] = -s;
        }
    }

    /**
     * Transport rate: angular velocity of a north-aligned local-level frame carried at a ground
     * velocity over the ellipsoid, relative to the Earth-fixed frame. With vN, vE the north and
     * east components of {@code groundVelocity}, NED: {@code (vE/(RN+h), -vN/(RM+h), -vE tan(lat)/(RN+h))};
     * ENU: {@code (-vN/(RM+h), vE/(RN+h), vE tan(lat)/(RN+h))}. The vertical component does not
     * enter (a climbing frame keeps its axes). Undefined at the poles (the north direction is),
     * where it is refused.
     *
     * @param position geodetic position (rad, m), |lat| &lt; pi/2
     * @param groundVelocity velocity relative to the Earth (m/s), resolved in {@code axes}
     * @param axes local axis order of {@code groundVelocity} and of the result
     * @return transport rate (rad/s), resolved in {@code axes}
     * @throws IllegalArgumentException at a pole or for a non-finite velocity
     */
    public Vector3D transportRate(LatLonHeight position, Vector3D groundVelocity, LocalAxes axes) {
        Arguments.nonNull("position", position);
        Arguments.finite("groundVelocity", groundVelocity);
        Arguments.nonNull("axes", axes);
        double lat = refusePole(position);
        double[] v = {groundVelocity.getX(), groundVelocity.getY(), groundVelocity.getZ()};
        double[] w = new double[3];
        transportRate(lat, position.height(), v, 0, axes, w, 0);
        return new Vector3D(w[0], w[1], w[2]);
    }

    /**
     * Transport rate written into an array without allocating: the primitive form of
     * {@link #transportRate(LatLonHeight, Vector3D, LocalAxes)} (same formula, same refusal at the
     * poles), with the radii of curvature of {@link Ellipsoid#radiiOfCurvature}. The velocity and the result are resolved in the same
     * stated axes; the vertical component does not enter.
     *
     * @param latitude geodetic latitude (rad), strictly inside (-pi/2, pi/2)
     * @param height ellipsoidal height (m)
     * @param groundVelocity holds the velocity relative to the Earth (m/s), resolved in {@code axes}
     * @param velocityOffset index of its first component in {@code groundVelocity}
     * @param axes local axis order of the velocity and of the result
     * @param out receives the three components (rad/s); must not overlap the velocity
     * @param offset index of the first component in {@code out}
     * @throws IllegalArgumentException at a pole or for non-finite values
     */
    public void transportRate(double latitude, double height, double[] groundVelocity, int velocityOffset,
                              LocalAxes axes, double[] out, int offset) {
        Ellipsoid.checkLatitude(latitude);
        Arguments.finite("height", height);
        Arguments.nonNull("axes", axes);
        Arguments.fromIndexSize("groundVelocity", groundVelocity, "velocityOffset", velocityOffset, 3);
        Arguments.fromIndexSize("out", out, "offset", offset, 3);
        double north = groundVelocity[velocityOffset + (axes == LocalAxes.ENU ? 1 : 0)];
        double east = groundVelocity[velocityOffset + (axes == LocalAxes.ENU ? 0 : 1)];
        Arguments.finite("groundVelocity north component (m/s)", north);
        Arguments.finite("groundVelocity east component (m/s)", east);
        Arguments.finite("height (m)", height);
        if (!(Math.abs(latitude) < 0.5 * Math.PI)) {
            throw new IllegalArgumentException("latitude must be strictly inside (-90, 90) deg for a "
                    + "north-aligned frame, got " + Math.toDegrees(latitude) + " deg");
        }
        ellipsoid.radiiOfCurvature(latitude, out, offset);
        double rm = out[offset] + height;
        double rn = out[offset + 1] + height;
        double aboutEast = -north / rm;
        double aboutNorth = east / rn;
        double aboutUp = east * Math.tan(latitude) / rn;
        if (axes == LocalAxes.ENU) {
            out[offset] = aboutEast;
            out[offset + 1] = aboutNorth;
            out[offset + 2] = aboutUp;
        } else {
            out[offset] = aboutNorth;
            out[offset + 1] = aboutEast;
            out[offset + 2] = -aboutUp;
        }
    }

    /**
     * Eotvos correction for a gravimeter moving over the ellipsoid at constant height, exact
     * for the normal Earth: {@code 2 w vE cos(lat) + vE^2/(RN+h) + vN^2/(RM+h)} with vN, vE the
     * north and east components of {@code groundVelocity}, the amount by which motion lowers the
     * measured vertical specific force (add it to the reading). The common gravimetry rule of
     * thumb {@code 7.503 V cos(lat) sin(heading) + 0.004154 V^2} mGal (V in knots) is the same
     * with one spherical radius. The velocity is a vector in stated axes so that north and east
     * cannot be swapped silently (a swap changes the result by more than an order of magnitude).
     *
     * @param position geodetic position (rad, m), |lat| &lt; pi/2 (refused at a pole, like
     *        {@link #transportRate(LatLonHeight, Vector3D, LocalAxes)})
     * @param groundVelocity velocity relative to the Earth (m/s), resolved in {@code axes}, with a
     *        zero vertical component (the formula holds at constant height)
     * @param axes local axis order of {@code groundVelocity}
     * @return correction (m/s^2); {@code Units.toMilligals} converts it to mGal
     * @throws IllegalArgumentException at a pole, for a non-finite velocity or a non-zero vertical
     *         component
     */
    public double eotvosCorrection(LatLonHeight position, Vector3D groundVelocity, LocalAxes axes) {
        Arguments.nonNull("position", position);
        Arguments.finite("groundVelocity", groundVelocity);
        Arguments.nonNull("axes", axes);
        if (groundVelocity.getZ() != 0.0) {
            throw new IllegalArgumentException("groundVelocity must be horizontal (zero "
                    + (axes == LocalAxes.ENU ? "up" : "down") + " component) for the constant-height Eotvos "
                    + "correction, got " + groundVelocity + " m/s in " + axes + " axes");
        }
        double lat = refusePole(position);
        double north = northComponent(groundVelocity, axes);
        double east = eastComponent(groundVelocity, axes);
        double rm = ellipsoid.meridianRadius(lat) + position.height();
        double rn = ellipsoid.primeVerticalRadius(lat) + position.height();
        return 2.0 * omega * east * Math.cos(lat) + east * east / rn + north * north / rm;
    }

    /** The latitude of a position where a north-aligned frame exists (not at a pole). */
    private static double refusePole(LatLonHeight position) {
        double lat = position.latitude();
        if (Math.abs(lat) == 0.5 * Math.PI) {
            throw new IllegalArgumentException("position.latitude must be strictly inside (-90, 90) deg for a "
                    + "north-aligned frame, got " + Math.toDegrees(lat) + " deg");
        }
        return lat;
    }

    /** North component of a vector resolved in local axes. */
    static double northComponent(Vector3D v, LocalAxes axes) {
        return axes == LocalAxes.ENU ? v.getY() : v.getX();
    }

    /** East component of a vector resolved in local axes. */
    static double eastComponent(Vector3D v, LocalAxes axes) {
        return axes == LocalAxes.ENU ? v.getX() : v.getY();
    }

    // ------------------------------------------------------------------ ellipsoidal coordinates

    /** {u, sin^2 beta, cos^2 beta} of an Earth-fixed point, with the depth check. */
    private double[] ellipsoidal(Vector3D position) {
        Arguments.finite("position", position);
        double x = position.getX();
        double y = position.getY();
        double z = position.getZ();
        double p2 = x * x + y * y;
        double d = p2 + z * z - linear2;
        // hypot: d * d would overflow beyond about 1e77 m
        double u2 = 0.5 * (d + Math.hypot(d, 2.0 * linear * z));
        double u = Math.sqrt(u2);
        if (!(u >= b + MIN_HEIGHT)) {
            throw new IllegalArgumentException("position " + position + " m is deeper than " + (-MIN_HEIGHT)
                    + " m below the ellipsoid (ellipsoidal coordinate u = " + u + " m, must be >= "
                    + (b + MIN_HEIGHT) + " m): the normal field is not defined inside the masses");
        }
        double u2e2 = u2 + linear2;
        double cb2 = p2 / u2e2;
        double sb2 = z * z / u2;
        return new double[] {u, sb2, cb2};
    }

    /** Q(x) = ((1 + 3/x^2) atan x - 3/x) / 2, by its alternating series for small x (no cancellation). */
    static double q(double x) {
        if (x > 0.25) {
            return 0.5 * ((1.0 + 3.0 / (x * x)) * Math.atan(x) - 3.0 / x);
        }
        double x2 = x * x;
        double term = x * x2;   // x^(2n+1), n = 1
        double sum = 0.0;
        double sign = 1.0;
        for (int n = 1; n < 40; n++) {
            double add = sign * n * term / ((2.0 * n + 1.0) * (2.0 * n + 3.0));
            sum += add;
            if (Math.abs(add) < 1e-18 * Math.abs(sum)) {
                break;
            }
            term *= x2;
            sign = -sign;
        }
        return 2.0 * sum;
    }

    /** dQ/dx, by the differentiated series for small x. */
    static double qDerivative(double x) {
        if (x > 0.25) {
            double at = Math.atan(x);
            return 0.5 * (-6.0 * at / (x * x * x) + (1.0 + 3.0 / (x * x)) / (1.0 + x * x) + 3.0 / (x * x));
        }
        double x2 = x * x;
        double term = x2;   // x^(2n), n = 1
        double sum = 0.0;
        double sign = 1.0;
        for (int n = 1; n < 40; n++) {
            double add = sign * n * term / (2.0 * n + 3.0);
            sum += add;
            if (Math.abs(add) < 1e-18 * Math.abs(sum)) {
                break;
            }
            term *= x2;
            sign = -sign;
        }
        return 2.0 * sum;
    }

    @Override
    public boolean equals(Object other) {
        if (!(other instanceof EarthModel)) {
            return false;
        }
        EarthModel o = (EarthModel) other;
        return ellipsoid.equals(o.ellipsoid) && Double.compare(gm, o.gm) == 0 && Double.compare(omega, o.omega) == 0;
    }

    @Override
    public int hashCode() {
        return (ellipsoid.hashCode() * 31 + Double.hashCode(gm)) * 31 + Double.hashCode(omega);
    }

    /**
     * Replaces this model in a stream by its defining constants.
     *
     * @return the proxy
     */
    private Object writeReplace() {
        return new Proxy(ellipsoid, gm, omega);
    }

    /**
     * Refuses a stream that bypasses the proxy (it could hold derived constants that disagree
     * with the defining ones).
     *
     * @param in the stream
     * @throws InvalidObjectException always
     */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw new InvalidObjectException("an EarthModel is read only through its serialization proxy");
    }

    /**
     * The serialized form: the defining constants; reading calls
     * {@link #of(Ellipsoid, double, double)}.
     *
     * @param ellipsoid the level ellipsoid
     * @param gm GM (m^3/s^2)
     * @param rotationRate w (rad/s)
     */
    private record Proxy(Ellipsoid ellipsoid, double gm, double rotationRate) implements Serializable {

        /**
         * Rebuilds the model with the checks of {@link EarthModel#of(Ellipsoid, double, double)}.
         *
         * @return the model
         * @throws InvalidObjectException if the constants are refused
         */
        private Object readResolve() throws InvalidObjectException {
            try {
                return of(ellipsoid, gm, rotationRate);
            } catch (IllegalArgumentException | NullPointerException e) {
                throw Arguments.refusedStream(EarthModel.class, e);
            }
        }
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "EarthModel{%s, GM=%.9e m^3/s^2, w=%.9e rad/s, ge=%.10f m/s^2, gp=%.10f m/s^2}",
                ellipsoid, gm, omega, gammaE, gammaP);
    }
}
