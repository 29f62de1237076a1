package dev.noninertial.geodesy;

import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.time.Instant;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.dynamics.TrajectoryEvent;
import dev.noninertial.frames.motion.Motions;
import dev.noninertial.geodesy.air.AirDrag;
import dev.noninertial.geodesy.air.Atmosphere;
import dev.noninertial.geodesy.air.DragCurve;
import dev.noninertial.geodesy.air.WindProfile;

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
    /** False for the comparison Earth that does not turn ({@link #withoutRotation()}). */
    private final boolean rotating;

    private EarthFrames(EarthModel model, Instant epoch, boolean rotating) {
        this.model = model;
        this.epoch = epoch;
        this.rotating = rotating;
        this.angleAtEpoch = EarthRotationAngle.at(epoch);
        this.inertial = ReferenceFrame.inertialRoot(rotating ? "ECI" : "ECI (Earth not rotating)");
        this.earthFixed = inertial.attach("ECEF", Motions.spin(Vector3D.PLUS_K, angleAtEpoch, spinRate()));
    }

    /** Rate of the Earth-fixed frame in the inertial root (rad/s): the model's, or 0 without rotation. */
    private double spinRate() {
        return rotating ? model.rotationRate() : 0.0;
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
        return new EarthFrames(model, epochUt1, true);
    }

    /**
     * The same Earth that does not rotate, for comparison runs: the Earth-fixed frame stays at its
     * orientation of the epoch in the inertial root, while the model (shape, GM and the normal
     * gravity field, hence {@link #gravitationIn(ReferenceFrame) gravitation}) is unchanged. So a
     * case built the same way on both Earths and integrated with the same real forces differs
     * only by the inertial terms of the Earth's rotation (Coriolis, centrifugal; Euler is zero):
     * the difference of the two landing points is the rotation's effect. Frames made on this
     * object form a new tree; build the whole case on it again (local-level frames, forces).
     *
     * <p>Note that on the non-rotating Earth a body at rest on the ground feels gravitation
     * alone, not normal gravity (its weight lacks the centrifugal part, up to 0.034 m/s^2 on the
     * equator): that is part of the rotation's effect being isolated.
     *
     * @return the non-rotating twin (itself if already non-rotating)
     */
    public EarthFrames withoutRotation() {
        return rotating ? new EarthFrames(model, epoch, false) : this;
    }

    /**
     * Returns false for the comparison Earth of {@link #withoutRotation()}, true otherwise.
     *
     * @return false for the comparison Earth of {@link #withoutRotation()}, true otherwise
     */
    public boolean isRotating() {
        return rotating;
    }

    /**
     * Returns the Earth model.
     *
     * @return the Earth model
     */
    public EarthModel model() {
        return model;
    }

    /**
     * Returns the epoch (t = 0), UT1.
     *
     * @return the epoch (t = 0), UT1
     */
    public Instant epoch() {
        return epoch;
    }

    /**
     * Returns the Earth rotation angle at the epoch (rad), in [0, 2 pi).
     *
     * @return the Earth rotation angle at the epoch (rad), in [0, 2 pi)
     */
    public double angleAtEpoch() {
        return angleAtEpoch;
    }

    /**
     * The angle of the Earth-fixed frame in the inertial root, {@code ERA(epoch) + w t}
     * ({@code w = 0} for {@link #withoutRotation()}).
     *
     * @param t time (s from the epoch)
     * @return angle about z (rad), not reduced
     */
    public double rotationAngle(double t) {
        Arguments.finite("t", t);
        return angleAtEpoch + spinRate() * t;
    }

    /**
     * Returns the Earth-centred inertial root ("ECI"), z along the rotation axis.
     *
     * @return the Earth-centred inertial root ("ECI"), z along the rotation axis
     */
    public ReferenceFrame inertial() {
        return inertial;
    }

    /**
     * Returns the Earth-fixed frame ("ECEF"), spinning about z under {@link #inertial()}.
     *
     * @return the Earth-fixed frame ("ECEF"), spinning about z under {@link #inertial()}
     */
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
        Arguments.nonNull("name", name);
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
        Arguments.nonNull("name", name);
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
        Arguments.nonNull("name", name);
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
        checkTree("frame", frame);
        return new GravitationForce(model, frame, earthFixed);
    }

    /**
     * Air drag as a force to integrate in {@code frame}, any frame of this Earth's tree: the
     * airspeed is the velocity relative to the air that turns with {@link #earthFixed()}, plus
     * the wind (see {@link AirDrag}). Add gravitation separately.
     *
     * @param frame the integration frame, in the tree of {@link #inertial()}
     * @param air the atmosphere (density and speed of sound at the geodetic height)
     * @param dragCurve drag coefficient against Mach number (Mach outside the table is refused)
     * @param areaOverMass reference area over mass A/m (m^2/kg), positive
     * @param wind the air's velocity relative to the Earth, east-north-up at the point
     * @return drag per unit mass (m/s^2), resolved in {@code frame}'s axes
     * @throws IllegalArgumentException if {@code frame} belongs to another tree or
     *         {@code areaOverMass} is not positive and finite
     */
    public AirDrag dragIn(ReferenceFrame frame, Atmosphere air, DragCurve dragCurve, double areaOverMass,
                          WindProfile wind) {
        Arguments.nonNull("dragCurve", dragCurve);
        return AirDrag.of(this, frame, air, dragCurve, areaOverMass, wind);
    }

    /**
     * Air drag with a ballistic coefficient {@code B = m / (Cd A)} (kg/m^2), the same at every
     * Mach number (see {@link AirDrag#ofBallisticCoefficient}).
     *
     * @param frame the integration frame, in the tree of {@link #inertial()}
     * @param air the atmosphere
     * @param ballisticCoefficient B (kg/m^2), in [{@link Double#MIN_NORMAL}, {@link Double#MAX_VALUE}]
     * @param wind the air's velocity relative to the Earth, east-north-up at the point
     * @return drag per unit mass (m/s^2), resolved in {@code frame}'s axes
     * @throws IllegalArgumentException if {@code frame} belongs to another tree or {@code B} is
     *         outside that range
     */
    public AirDrag dragIn(ReferenceFrame frame, Atmosphere air, double ballisticCoefficient, WindProfile wind) {
        return AirDrag.ofBallisticCoefficient(this, frame, air, ballisticCoefficient, wind);
    }

    /**
     * The geodetic position (latitude, longitude, ellipsoidal height) of a framed state of this
     * Earth's tree, in one call: the position is carried to {@link #earthFixed()} at the state's
     * time and converted with {@link Ellipsoid#toGeodetic(Vector3D)}.
     *
     * @param state a point at a time, in any frame of this Earth's tree
     * @return its geodetic position (rad, m) on this Earth's ellipsoid
     * @throws IllegalArgumentException if the state's frame belongs to another tree
     */
    public LatLonHeight geodeticOf(FramedState state) {
        Arguments.nonNull("state", state);
        checkTree("state.frame()", state.frame());
        Placement p = state.frame().placementIn(earthFixed, state.time());
        return model.ellipsoid().toGeodetic(p.positionToBase(state.state().position()));
    }

    /**
     * Ground impact on this Earth: the point comes down through the geodetic height
     * {@code groundHeight} above the ellipsoid (falling crossings only). Stops the run; named
     * "ground impact". Unlike {@link TrajectoryEvent#groundImpact(Vector3D, double)} (a plane in
     * the integration frame) this follows the curved ellipsoid, in any frame of the tree.
     *
     * @param frame the integration frame, in the tree of {@link #inertial()}
     * @param groundHeight ellipsoidal height of the ground (m), finite
     * @return the event
     * @throws IllegalArgumentException if {@code frame} belongs to another tree or the height is
     *         not finite
     */
    public TrajectoryEvent groundImpactIn(ReferenceFrame frame, double groundHeight) {
        Arguments.nonNull("frame", frame);
        checkTree("frame", frame);
        double ground = Arguments.finite("groundHeight", groundHeight);
        Ellipsoid shape = model.ellipsoid();
        return TrajectoryEvent.of("ground impact", (time, s) -> shape.toGeodetic(
                frame.placementIn(earthFixed, time).positionToBase(s.position())).height() - ground)
                .fallingOnly().stopping();
    }

    private void checkTree(String name, ReferenceFrame frame) {
        if (frame.root() != inertial) {
            throw new IllegalArgumentException(name + " '" + frame.path() + "' is not in the tree of this Earth ('"
                    + inertial.path() + "'): build it from this EarthFrames");
        }
    }

    /** Per-thread scratch of the primitive gravitation: two placements and one vector. */
    private static final ThreadLocal<double[]> WORK =
            ThreadLocal.withInitial(() -> new double[2 * Placement.COMPONENTS + 3]);

    /**
     * Gravitation evaluated in Earth-fixed axes and resolved in the integration frame.
     *
     * @param model the Earth model giving the gravitation
     * @param frame the integration frame
     * @param earthFixed the Earth-fixed frame of the same tree
     */
    private record GravitationForce(EarthModel model, ReferenceFrame frame, ReferenceFrame earthFixed)
            implements SpecificForce, Serializable {

        private static final long serialVersionUID = 1L;

        /** Re-runs the checks of {@link EarthFrames#gravitationIn} (records deserialize through it). */
        GravitationForce {
            Arguments.nonNull("model", model);
            Arguments.nonNull("frame", frame);
            Arguments.nonNull("earthFixed", earthFixed);
            if (frame.root() != earthFixed.root()) {
                throw new IllegalArgumentException("frame '" + frame.path() + "' is not in the tree of earthFixed");
            }
        }

        @Override
        public Vector3D at(double time, PointState state) {
            Placement p = frame.placementIn(earthFixed, time);
            return p.vectorFromBase(model.gravitation(p.positionToBase(state.position())));
        }

        /**
         * Allocation-free form (after a thread's first call): the placement in Earth-fixed on
         * primitives, then {@link EarthModel#gravitation(double, double, double, double[], int)}.
         * Frames that do not hang below Earth-fixed (the inertial root) take the object path.
         */
        @Override
        public void at(double time, double[] state, int stateOffset, double[] target, int targetOffset) {
            SpecificForce.checkPrimitive(state, stateOffset, target, targetOffset);
            if (frame == earthFixed.root()) {
                SpecificForce.super.at(time, state, stateOffset, target, targetOffset);
                return;
            }
            double[] w = WORK.get();
            frame.placementIn(earthFixed, time, w, 0);
            double x = state[stateOffset];
            double y = state[stateOffset + 1];
            double z = state[stateOffset + 2];
            // r_B = o + R^T r, with R rows at 9..17 (v_F = R v_B)
            double ex = w[0] + w[9] * x + w[12] * y + w[15] * z;
            double ey = w[1] + w[10] * x + w[13] * y + w[16] * z;
            double ez = w[2] + w[11] * x + w[14] * y + w[17] * z;
            model.gravitation(ex, ey, ez, w, 48);
            double gx = w[48];
            double gy = w[49];
            double gz = w[50];
            target[targetOffset] = w[9] * gx + w[10] * gy + w[11] * gz;
            target[targetOffset + 1] = w[12] * gx + w[13] * gy + w[14] * gz;
            target[targetOffset + 2] = w[15] * gx + w[16] * gy + w[17] * gz;
        }

        @Override
        public String toString() {
            return "gravitation of " + model + " in " + frame.path();
        }
    }

    /**
     * Reads the fields and re-checks them against what {@link #of(EarthModel, Instant)} builds:
     * the stored angle must be the Earth rotation angle of the epoch, the inertial frame a root
     * and the Earth-fixed frame its child spinning at the model's rate from that angle. The frames
     * themselves are kept (not rebuilt), so frames attached to them in the same stream stay in
     * this Earth's tree.
     *
     * @param in the stream
     * @throws IOException if the stream fails or its fields disagree with each other
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            Arguments.nonNull("model", model);
            Arguments.nonNull("epochUt1", epoch);
            Arguments.nonNull("inertial", inertial);
            Arguments.nonNull("earthFixed", earthFixed);
            double angle = EarthRotationAngle.at(epoch);
            if (Double.compare(angle, angleAtEpoch) != 0) {
                throw new IllegalArgumentException("angleAtEpoch " + angleAtEpoch
                        + " rad disagrees with the Earth rotation angle " + angle + " rad of the epoch " + epoch);
            }
            if (!inertial.isInertialRoot() || earthFixed.parent().orElse(null) != inertial) {
                throw new IllegalArgumentException("earthFixed must be a child of the inertial root");
            }
            if (!Motions.spin(Vector3D.PLUS_K, angleAtEpoch, model.rotationRate()).equals(earthFixed.motion().get())) {
                throw new IllegalArgumentException("the motion of earthFixed (" + earthFixed.motion().get()
                        + ") is not the spin of the model from angleAtEpoch " + angleAtEpoch + " rad");
            }
        } catch (IllegalArgumentException | NullPointerException e) {
            throw Arguments.refusedStream(EarthFrames.class, e);
        }
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "EarthFrames{%s, epoch %s UT1, ERA(epoch)=%.12f rad%s}", model, epoch,
                angleAtEpoch, rotating ? "" : ", not rotating");
    }
}
