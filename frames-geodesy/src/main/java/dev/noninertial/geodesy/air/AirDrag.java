package dev.noninertial.geodesy.air;

import java.io.Serializable;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * Aerodynamic drag of a point body as a real specific force, for integration in any frame of an
 * Earth tree (inertial, Earth-fixed, local-level, carried, body):
 * <pre>
 *   f = -(1/2) rho(h) Cd(M) (A/m) |u| u,    u = v_E - wind,    M = |u| / a(h)
 * </pre>
 * with {@code v_E} the body's velocity seen in the Earth-fixed frame, {@code wind} the air's
 * velocity relative to the Earth ({@link WindProfile}, east-north-up at the point, turned into
 * Earth-fixed axes), {@code h} the geodetic height of the point, {@code rho} and {@code a} the
 * density and speed of sound of the {@link Atmosphere} (such as {@link Atmosphere1976}), {@code Cd} from the
 * {@link DragCurve} and {@code A/m} the reference area over the mass.
 *
 * <pre>{@code
 * SpecificForce drag = earth.dragIn(enu, Atmosphere1976.standard(), DragCurve.constant(0.47),
 *         0.0314 / 2.0, WindProfile.steady(3.0, 0.0));
 * }</pre>
 *
 * <h2>The air turns with the Earth</h2>
 * The airspeed is the velocity relative to the air, and air in a calm is at rest in the
 * Earth-fixed frame. In an inertial frame a body at rest on the ground moves at
 * {@code w x r} (465 m/s on the equator), yet feels no drag; using the inertial velocity as the
 * airspeed is a common mistake. This force converts the state to the Earth-fixed frame with the
 * frame's full placement (origin, orientation, angular velocity) at the time, so the result is
 * the same physical force whichever frame of the tree is integrated in.
 *
 * <h2>Conventions</h2>
 * Input state and result are seen in and resolved in the integration frame given at
 * construction; time in s from the epoch of the {@link EarthFrames}; SI units. The result is
 * re-resolved from Earth-fixed axes with {@code R} of the frame's placement in the Earth-fixed
 * frame ({@code v_frame = R v_ECEF}, {@link Placement#vectorFromBase(Vector3D)}).
 *
 * <h2>Refusals</h2>
 * Heights outside the atmosphere ([-5 km, 86 km] for {@link Atmosphere1976}), Mach numbers
 * outside the drag table and heights outside a layered wind table are refused with an exception
 * that names the value and the range (the {@code TrajectorySolver} reports it with the time and
 * state). So are, naming the atmosphere and the height, a density from a user's atmosphere that
 * is negative or not finite and a speed of sound that is not positive and finite. Stop runs with a ground event and
 * limit the step ({@code withMaxStep}) so that trial steps do not probe far below ground.
 *
 * <p>Cost: per call one placement of the frame in the Earth-fixed frame, one geodetic
 * conversion, the atmosphere and the table, on primitives with a per-thread scratch array; it
 * allocates the geodetic position and the result. Its time and allocation are measured on the
 * <a href="../../../../../benchmarks.html#air">benchmark page</a> (section Air drag).
 *
 * <p>Results are for simulation and analysis only, not for aiming, firing or safety-area
 * decisions; defer to local codes, standards and licensed practice.
 *
 * <p>Immutable and thread-safe when the wind profile is.
 */
public final class AirDrag implements SpecificForce, Serializable {

    private static final long serialVersionUID = 1L;

    /** Per-thread scratch of one state (9 doubles): no array per call on the hot path. */
    private static final ThreadLocal<double[]> SCRATCH = ThreadLocal.withInitial(() -> new double[PointState.COMPONENTS]);

    /** Integration frame. */
    private final ReferenceFrame frame;
    /** Earth-fixed frame of the tree: the air at rest in a calm. */
    private final ReferenceFrame earthFixed;
    /** Shape for the geodetic height. */
    private final Ellipsoid ellipsoid;
    /** Air. */
    private final Atmosphere air;
    /** Cd(M). */
    private final DragCurve curve;
    /** Reference area over mass (m^2/kg). */
    private final double areaOverMass;
    /** Wind relative to the Earth. */
    private final WindProfile wind;

    private AirDrag(ReferenceFrame frame, ReferenceFrame earthFixed, Ellipsoid ellipsoid, Atmosphere air,
                    DragCurve curve, double areaOverMass, WindProfile wind) {
        this.frame = frame;
        this.earthFixed = earthFixed;
        this.ellipsoid = ellipsoid;
        this.air = air;
        this.curve = curve;
        this.areaOverMass = areaOverMass;
        this.wind = wind;
    }

    /**
     * Drag to integrate in a frame of an Earth tree ({@link EarthFrames#dragIn} is the same).
     *
     * @param earth the Earth frames; the air turns with {@link EarthFrames#earthFixed()}
     * @param frame the integration frame, in the tree of {@code earth}
     * @param air the atmosphere
     * @param curve drag coefficient against Mach number
     * @param areaOverMass reference area over mass A/m (m^2/kg), positive
     * @param wind the air's velocity relative to the Earth, east-north-up
     * @return the force
     * @throws IllegalArgumentException if {@code frame} is not in the tree of {@code earth} or
     *         {@code areaOverMass} is not positive and finite
     * @throws NullPointerException if an argument is null
     */
    public static AirDrag of(EarthFrames earth, ReferenceFrame frame, Atmosphere air, DragCurve curve,
                             double areaOverMass, WindProfile wind) {
        Arguments.nonNull("earth", earth);
        Arguments.nonNull("frame", frame);
        Arguments.nonNull("air", air);
        Arguments.nonNull("curve", curve);
        Arguments.positive("areaOverMass (m^2/kg)", areaOverMass);
        Arguments.nonNull("wind", wind);
        if (frame.root() != earth.inertial()) {
            throw new IllegalArgumentException("frame '" + frame.path() + "' is not in the tree of this Earth ('"
                    + earth.inertial().path() + "'): build it from the same EarthFrames");
        }
        return new AirDrag(frame, earth.earthFixed(), earth.model().ellipsoid(), air, curve, areaOverMass, wind);
    }

    /**
     * Drag with a ballistic coefficient {@code B = m / (Cd A)} (kg/m^2), the same at every Mach
     * number: {@code f = -(1/2) rho |u| u / B}.
     *
     * @param earth the Earth frames
     * @param frame the integration frame, in the tree of {@code earth}
     * @param air the atmosphere
     * @param ballisticCoefficient B = m / (Cd A) (kg/m^2), in [{@link Double#MIN_NORMAL},
     *        {@link Double#MAX_VALUE}] (a subnormal B has no finite reciprocal A/m)
     * @param wind the air's velocity relative to the Earth, east-north-up
     * @return the force
     * @throws IllegalArgumentException if {@code ballisticCoefficient} is out of that range, or as
     *         {@link #of(EarthFrames, ReferenceFrame, Atmosphere, DragCurve, double, WindProfile)}
     */
    public static AirDrag ofBallisticCoefficient(EarthFrames earth, ReferenceFrame frame, Atmosphere air,
                                                 double ballisticCoefficient, WindProfile wind) {
        Arguments.inRange("ballisticCoefficient (kg/m^2)", ballisticCoefficient, Double.MIN_NORMAL, Double.MAX_VALUE);
        return of(earth, frame, air, DragCurve.constant(1.0), 1.0 / ballisticCoefficient, wind);
    }

    /**
     * A copy with another wind.
     *
     * @param newWind the air's velocity relative to the Earth, east-north-up
     * @return the copy
     */
    public AirDrag withWind(WindProfile newWind) {
        Arguments.nonNull("newWind", newWind);
        return new AirDrag(frame, earthFixed, ellipsoid, air, curve, areaOverMass, newWind);
    }

    /**
     * A copy with another area over mass.
     *
     * @param newAreaOverMass A/m (m^2/kg), positive
     * @return the copy
     */
    public AirDrag withAreaOverMass(double newAreaOverMass) {
        Arguments.positive("newAreaOverMass (m^2/kg)", newAreaOverMass);
        return new AirDrag(frame, earthFixed, ellipsoid, air, curve, newAreaOverMass, wind);
    }

    /**
     * Returns the integration frame.
     *
     * @return the integration frame
     */
    public ReferenceFrame frame() {
        return frame;
    }

    /**
     * Returns the reference area over the mass (m^2/kg).
     *
     * @return the reference area over the mass (m^2/kg)
     */
    public double areaOverMass() {
        return areaOverMass;
    }

    /**
     * Returns the drag coefficient table.
     *
     * @return the drag coefficient table
     */
    public DragCurve curve() {
        return curve;
    }

    /**
     * Returns the wind.
     *
     * @return the wind
     */
    public WindProfile wind() {
        return wind;
    }

    /**
     * The drag specific force.
     *
     * @param time time (s from the epoch of the Earth frames)
     * @param state position (m) and velocity (m/s) seen in and resolved in the integration frame
     * @return drag (m/s^2), resolved in the integration frame; zero when the body moves with the air
     * @throws IllegalArgumentException if the height, the Mach number or the wind's height is
     *         outside its table
     */
    @Override
    public Vector3D at(double time, PointState state) {
        Placement p = placementAt(time, state);
        double[] w = SCRATCH.get();
        airVelocity(p, time, state, w);
        double ux = w[0];
        double uy = w[1];
        double uz = w[2];
        double h = w[3];
        double speed = Math.sqrt(ux * ux + uy * uy + uz * uz);
        double rho = density(h);
        if (speed == 0.0) {
            return Vector3D.ZERO;     // at rest in the air: no drag whatever the coefficient
        }
        double cd = curve.at(speed / speedOfSound(h));
        double k = -0.5 * rho * cd * areaOverMass * speed;
        return p.vectorFromBase(new Vector3D(k * ux, k * uy, k * uz));
    }

    /**
     * The Mach number of the body relative to the air.
     *
     * @param time time (s from the epoch)
     * @param state position (m) and velocity (m/s) seen in and resolved in the integration frame
     * @return airspeed over the speed of sound at the point's geodetic height
     * @throws IllegalArgumentException if the height is outside the atmosphere or the wind table
     */
    public double machAt(double time, PointState state) {
        Placement p = placementAt(time, state);
        double[] w = SCRATCH.get();
        airVelocity(p, time, state, w);
        return Math.sqrt(w[0] * w[0] + w[1] * w[1] + w[2] * w[2]) / speedOfSound(w[3]);
    }

    /** The atmosphere's density at {@code h}, refused unless finite and not negative. */
    private double density(double h) {
        double rho = air.density(h);
        if (!(rho >= 0.0 && rho <= Double.MAX_VALUE)) {
            throw new IllegalArgumentException("density of the atmosphere " + air + " at height "
                    + Formats.number(h) + " m must be finite and not negative, got " + rho + " kg/m^3");
        }
        return rho;
    }

    /** The atmosphere's speed of sound at {@code h}, refused unless positive and finite. */
    private double speedOfSound(double h) {
        double a = air.speedOfSound(h);
        if (!(a > 0.0 && a <= Double.MAX_VALUE)) {
            throw new IllegalArgumentException("speed of sound of the atmosphere " + air + " at height "
                    + Formats.number(h) + " m must be positive and finite, got " + a + " m/s");
        }
        return a;
    }

    /**
     * The checks of the public entry points, naming their parameters, then the placement of the
     * integration frame in the Earth-fixed frame at {@code time}.
     */
    private Placement placementAt(double time, PointState state) {
        Arguments.finite("time", time);
        Arguments.nonNull("state", state);
        return frame.placementIn(earthFixed, time);
    }

    /**
     * Writes the velocity relative to the air, Earth-fixed axes, into w[0..2] and the geodetic
     * height into w[3]. The wind (user code) is called while the scratch holds nothing needed, so
     * a wind that itself evaluates a drag on this thread does no harm.
     */
    private void airVelocity(Placement p, double time, PointState state, double[] w) {
        state.toArray(w, 0);
        w[6] = 0.0;
        w[7] = 0.0;
        w[8] = 0.0;
        p.toBase(w, 0, w, 0, 1);
        double ux = w[3];
        double uy = w[4];
        double uz = w[5];
        LatLonHeight g = ellipsoid.toGeodetic(new Vector3D(w[0], w[1], w[2]));
        double h = g.height();
        if (!wind.isCalm()) {
            Vector3D u = ellipsoid.localToEarthFixed(g, LocalAxes.ENU, wind.velocityAt(h, time));
            ux -= u.getX();
            uy -= u.getY();
            uz -= u.getZ();
        }
        w[0] = ux;
        w[1] = uy;
        w[2] = uz;
        w[3] = h;
    }

    @Override
    public String toString() {
        return "air drag in " + frame.path() + " (" + air + ", " + curve + ", A/m " + Formats.number(areaOverMass)
                + " m^2/kg, " + wind + ")";
    }
}
