package dev.noninertial.geodesy;

import java.io.Serializable;
import java.time.Instant;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.motion.Motions;

/**
 * The frames of a spinning Earth, ready with no data files, no network and no set-up call:
 * an Earth-centred inertial root, the Earth-fixed frame spinning under it, local-level frames
 * fixed at a site or carried by a vehicle, and body frames on top of them.
 *
 * <pre>{@code
 * EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-03-20T12:00:00Z"));
 * ReferenceFrame ecef = earth.earthFixed();
 * ReferenceFrame enu = earth.localLevel(LatLonHeight.ofDegrees(47.5, 8.2, 420.0), LocalAxes.ENU);
 * }</pre>
 *
 * <h2>Conventions</h2>
 * Time {@code t} of every frame is in seconds from the epoch given here. The inertial root
 * ({@link #inertial()}) has its origin at the Earth's centre and its z axis along the Earth's
 * rotation axis; the Earth-fixed frame ({@link #earthFixed()}, ECEF: z to the north pole, x to
 * longitude 0) is turned about that common z axis by the angle
 * {@code theta(t) = ERA(epoch) + w t}, where ERA is the IERS 2010 Earth rotation angle
 * ({@link EarthRotationAngle}) of the epoch read as UT1 and {@code w} the model's rotation rate.
 * Positive {@code theta} turns the Earth-fixed axes eastward (right-hand rule about z). The x
 * axis of the inertial root therefore points to the Celestial Intermediate Origin of the epoch's
 * date (not to the equinox).
 *
 * <h2>What is not modelled, and what it costs</h2>
 * <ul>
 *   <li>Rate mismatch: the angle runs at the model rate (WGS84: 7.292115e-5 rad/s), while the
 *       IERS angle runs at {@link EarthRotationAngle#RATE} = 7.2921151467e-5 rad/s; the linear
 *       angle falls behind the IERS angle by 1.467e-12 rad/s, i.e. 1.27e-7 rad per day (0.81 m
 *       on the equator) and 4.63e-5 rad per year (295 m on the equator). For long runs, make a
 *       new {@code EarthFrames} at a later epoch rather than integrating far from the epoch.</li>
 *   <li>Precession and nutation: the rotation axis is taken as fixed in inertial space. In
 *       reality it moves by about 20 arcseconds per year (1e-4 rad) against the stars, with
 *       nutation terms up to about 17 arcseconds in longitude (8e-5 rad); as a rate the effect is of order
 *       1e-12 rad/s, negligible for the fictitious accelerations but not for pointing at stars.</li>
 *   <li>Polar motion: the Earth-fixed frame is taken as the frame of the rotation axis; the real
 *       pole wanders by about 0.3 arcseconds (1.5e-6 rad, about 10 m on the surface).</li>
 *   <li>UT1 - UTC: the epoch is read as UT1; an UTC epoch is up to 0.9 s off (6.6e-5 rad).</li>
 * </ul>
 * So this is a kinematic model of the spinning Earth for inertial, Coriolis and centrifugal
 * effects, not a celestial reference system for astrometry or precise orbit determination.
 *
 * <p>Immutable and thread-safe.
 */
public final class EarthFrames implements Serializable {

    /** NED axes placed in ENU axes: rows north (0, 1, 0), east (1, 0, 0), down (0, 0, -1). */
    private static final Motion ENU_TO_NED = Motions.stationary(Vector3D.ZERO,
            Orientations.fromMatrix(new double[][] {{0, 1, 0}, {1, 0, 0}, {0, 0, -1}}));

    private static final long serialVersionUID = 1L;

    /** Earth model: shape, GM, rotation rate. */
    private final EarthModel model;
    /** UT1 instant of t = 0. */
    private final Instant epoch;
    /** IERS 2010 Earth rotation angle at the epoch (rad). */
    private final double angleAtEpoch;
    /** Earth-centred inertial root. */
    private final ReferenceFrame inertial;
    /** Earth-fixed frame spinning under the inertial root. */
    private final ReferenceFrame earthFixed;

    private EarthFrames(EarthModel model, Instant epoch) {
        this.model = model;
        this.epoch = epoch;
        this.angleAtEpoch = EarthRotationAngle.at(epoch);
        this.inertial = ReferenceFrame.inertialRoot("ECI");
        this.earthFixed = inertial.attach("ECEF", Motions.spin(Vector3D.PLUS_K, angleAtEpoch, model.rotationRate()));
    }

    /**
     * The Earth frames of a model, with time counted from an epoch.
     *
     * @param model the Earth model (shape, rotation rate, gravity)
     * @param epochUt1 the instant of t = 0, read as UT1, in [1900-01-01, 2100-01-01)
     * @return the frames
     * @throws IllegalArgumentException if the epoch is outside the supported span
     */
    public static EarthFrames of(EarthModel model, Instant epochUt1) {
        Arguments.nonNull("model", model);
        Arguments.nonNull("epochUt1", epochUt1);
        return new EarthFrames(model, epochUt1);
    }

    /** @return the Earth model */
    public EarthModel model() {
        return model;
    }

    /** @return the epoch (t = 0), UT1 */
    public Instant epoch() {
        return epoch;
    }

    /** @return the Earth rotation angle at the epoch (rad), in [0, 2 pi) */
    public double angleAtEpoch() {
        return angleAtEpoch;
    }

    /**
     * The angle of the Earth-fixed frame in the inertial root, {@code ERA(epoch) + w t}.
     *
     * @param t time (s from the epoch)
     * @return angle about z (rad), not reduced
     */
    public double rotationAngle(double t) {
        Arguments.finite("t", t);
        return angleAtEpoch + model.rotationRate() * t;
    }

    /** @return the Earth-centred inertial root ("ECI"), z along the rotation axis */
    public ReferenceFrame inertial() {
        return inertial;
    }

    /** @return the Earth-fixed frame ("ECEF"), spinning about z under {@link #inertial()} */
    public ReferenceFrame earthFixed() {
        return earthFixed;
    }

    /**
     * A local-level frame fixed to the Earth at a site: origin at the site, axes east-north-up
     * or north-east-down (see {@link LocalAxes}; "up" is the ellipsoid normal).
     *
     * @param site geodetic position (rad, m) of the origin
     * @param axes axis order
     * @return a new frame attached to {@link #earthFixed()}
     */
    public ReferenceFrame localLevel(LatLonHeight site, LocalAxes axes) {
        Arguments.nonNull("site", site);
        Arguments.nonNull("axes", axes);
        return localLevel(String.format(Locale.ROOT, "%s at %.6f deg, %.6f deg, %.1f m", axes,
                site.latitudeDegrees(), site.longitudeDegrees(), site.height()), site, axes);
    }

    /**
     * A named local-level frame fixed to the Earth at a site.
     *
     * @param name readable name of the frame
     * @param site geodetic position (rad, m) of the origin
     * @param axes axis order
     * @return a new frame attached to {@link #earthFixed()}
     */
    public ReferenceFrame localLevel(String name, LatLonHeight site, LocalAxes axes) {
        Arguments.nonNull("site", site);
        Arguments.nonNull("axes", axes);
        Ellipsoid shape = model.ellipsoid();
        return earthFixed.attach(name, Motions.stationary(shape.toCartesian(site),
                Orientations.fromMatrix(Ellipsoid.localRows(site.latitude(), site.longitude(), axes))));
    }

    /**
     * A local-level frame carried by a vehicle: its origin follows the path, its axes stay level
     * (z along the ellipsoid normal) and north-aligned. Its angular velocity relative to
     * {@link #earthFixed()} is the transport rate, relative to {@link #inertial()} the Earth rate
     * plus the transport rate; all rates are analytic.
     *
     * @param name readable name of the frame
     * @param path the vehicle's track (time in s from the epoch)
     * @param axes axis order
     * @return a new frame attached to {@link #earthFixed()}
     */
    public ReferenceFrame carriedLevel(String name, GeodeticPath path, LocalAxes axes) {
        Arguments.nonNull("path", path);
        Arguments.nonNull("axes", axes);
        return earthFixed.attach(name, new CarriedLevelMotion(model.ellipsoid(), path, axes));
    }

    /**
     * A body frame on a parent frame whose axes are local-level axes (a local-level or carried
     * frame, or a frame on one that keeps its axes, such as a heaving deck), turned by heading,
     * pitch and roll, origin at the parent's origin. The heading sense is the same whatever the
     * parent's axis order, so {@code parentAxes} must say which it is: heading is clockwise from
     * north about the down direction, pitch nose up, roll right side down, with body axes x
     * forward, y right, z down (the z-y-x sequence of {@link AttitudeSample} applied to NED axes;
     * over an ENU parent the fixed ENU-to-NED turn is applied first). For the raw z-y-x turn about
     * any parent's own axes, attach {@link AttitudeProfile#toMotion()} yourself.
     *
     * @param name readable name of the body frame
     * @param parent the frame the body hangs on; its axes are local-level axes in {@code parentAxes}
     * @param attitude heading, pitch, roll and their rates over time
     * @param parentAxes axis order of {@code parent}
     * @return a new frame attached to {@code parent}
     */
    public ReferenceFrame body(String name, ReferenceFrame parent, AttitudeProfile attitude, LocalAxes parentAxes) {
        Arguments.nonNull("parent", parent);
        Arguments.nonNull("attitude", attitude);
        Arguments.nonNull("parentAxes", parentAxes);
        Motion turn = attitude.toMotion();
        return parent.attach(name, parentAxes == LocalAxes.NED ? turn : ENU_TO_NED.then(turn));
    }

    /**
     * The normal Earth's gravitation as a force to integrate in {@code frame}, any frame of this
     * Earth's tree (inertial, Earth-fixed, local-level, carried, body): at time {@code t} the
     * point's position is carried to Earth-fixed axes, {@link EarthModel#gravitation(Vector3D)} is
     * evaluated there, and the vector is resolved back in {@code frame}'s axes.
     *
     * <p><b>Gravitation, not gravity:</b> the integrator adds the frame's centrifugal and Coriolis
     * terms itself, so in an Earth-fixed or local-level frame this force together with the
     * engine's terms reproduces normal gravity (what a plumb line shows); passing normal gravity
     * there would count the centrifugal term twice. The same force is right in the inertial root.
     *
     * @param frame the integration frame, in the tree of {@link #inertial()}
     * @return gravitation per unit mass (m/s^2), resolved in {@code frame}'s axes
     * @throws IllegalArgumentException if {@code frame} belongs to another tree
     */
    public SpecificForce gravitationIn(ReferenceFrame frame) {
        Arguments.nonNull("frame", frame);
        if (frame.root() != inertial) {
            throw new IllegalArgumentException("frame '" + frame.path() + "' is not in the tree of this Earth ('"
                    + inertial.path() + "'): build it from this EarthFrames");
        }
        return new GravitationForce(model, frame, earthFixed);
    }

    /** Gravitation evaluated in Earth-fixed axes and resolved in the integration frame. */
    private record GravitationForce(EarthModel model, ReferenceFrame frame, ReferenceFrame earthFixed)
            implements SpecificForce, Serializable {

        private static final long serialVersionUID = 1L;

        @Override
        public Vector3D at(double time, PointState state) {
            Placement p = frame.placementIn(earthFixed, time);
            return p.vectorFromBase(model.gravitation(p.positionToBase(state.position())));
        }

        @Override
        public String toString() {
            return "gravitation of " + model + " in " + frame.path();
        }
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "EarthFrames{%s, epoch %s UT1, ERA(epoch)=%.12f rad}", model, epoch,
                angleAtEpoch);
    }
}
