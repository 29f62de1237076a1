package dev.noninertial.geodesy.navigation;

import java.io.Serializable;
import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.sensing.IncrementLog;
import dev.noninertial.frames.sensing.SensorIncrements;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * Strapdown navigation in a north-pointing local-level frame on the spinning Earth: advances a
 * {@link NavigationState} by the delta-velocity and delta-angle increments of an inertial sensor
 * fixed in the body, and reports every term of a step by name.
 *
 * <pre>{@code
 * LevelNavigator nav = LevelNavigator.of(EarthModel.WGS84, LocalAxes.NED);
 * NavigationState next = nav.advance(state, sensor.incrementsOver(t0, t1));   // IdealSensor fixed in the body
 * StepTerms terms = nav.terms(state, sensor.incrementsOver(t0, t1));
 * }</pre>
 *
 * <h2>Method (published multi-rate strapdown algorithms)</h2>
 * One step from {@code t0} to {@code t1 = t0 + h} with the increments {@code da}, {@code dv} of
 * the step and {@code da'}, {@code dv'} of the previous step (body axes):
 * <ol>
 *   <li><b>Size effect</b> (Savage 1998, part 1, size-effect compensation): accelerometer i at
 *       offset {@code r_i} from the navigation centre senses
 *       {@code e_i . (f + dw/dt x r_i + w x (w x r_i))}; its increment is corrected by
 *       {@code e_i . (Dw x r_i + da x (da x r_i) / h + (h/12) Dw x (Dw x r_i))}, the integrals
 *       for a rate linear in time, with {@code Dw} the change of rate over the step: the rate at
 *       the step's end is estimated from the mean rates {@code da'/h'} and {@code da/h} and kept
 *       for the next step, so the corrections telescope over a run. The first step after a state
 *       without history takes no {@code Dw} term; the second makes it up.</li>
 *   <li><b>Coning</b> (Bortz 1971 rotation vector; previous-interval algorithm of Ignagni 1990
 *       and Savage 1998 part 1, exact for a rate linear in time): body rotation vector
 *       {@code phi = da + (1/12) da' x da}.</li>
 *   <li><b>Rotation compensation and sculling</b> (Savage 1998 part 1):
 *       {@code dv_b = dv + c1 da x dv + c2 da x (da x dv) + (1/12)(da' x dv + dv' x da)} with
 *       {@code c1 = (1 - cos a)/a^2}, {@code c2 = (1 - sin(a)/a)/a^2}, {@code a = |da|}: the
 *       rotation compensation in its closed form for a constant rate, then the sculling term.</li>
 *   <li><b>Level-frame rotation</b> over the step, {@code zeta = (w_ie + w_en) h} at the
 *       midpoint, Earth rate {@code w_ie} from {@link EarthModel#earthRateIn} and transport
 *       rate {@code w_en} from {@link EarthModel#transportRate}; the specific-force increment in
 *       level axes is {@code C dv_b - 1/2 zeta x C dv} (Savage 1998 part 1) plus the
 *       second-order terms of the same integral for constant rates,
 *       {@code -1/3 zeta x C (da x dv) + 1/6 zeta x (zeta x C dv)}, with {@code C = C_b^n(t0)}:
 *       with them the terms cancel exactly for a body at rest.</li>
 *   <li><b>Velocity</b> (Titterton and Weston, 2nd ed., Eq. 3.71; Groves, 2nd ed., Eq. 5.54):
 *       {@code v1 = v0 + dv_n + (g - 2 w_ie x v - w_en x v) h}, the bracket at the midpoint
 *       predicted from the start rates; {@code g} the exact normal gravity of
 *       {@link EarthModel#normalGravityIn(double, double, LocalAxes, double[], int)} (centrifugal
 *       part included).</li>
 *   <li><b>Position</b> from the mean velocity with the radii of curvature
 *       ({@link dev.noninertial.geodesy.Ellipsoid#meridianRadius}, {@code primeVerticalRadius})
 *       at the midpoint: {@code dlat = vN h / (RM + h_m)}, {@code dlon = vE h / ((RN + h_m) cos lat_m)},
 *       {@code dh = -vD h}.</li>
 *   <li><b>Attitude</b> (Savage 1998 part 1, body-frame and level-frame updates, quaternion form):
 *       {@code q1 = r(zeta)* (x) q0 (x) r(phi)}, {@code r(x) = (cos(|x|/2), sin(|x|/2) x/|x|)}
 *       with {@code q} the body in the level frame, then normalized.</li>
 * </ol>
 * The first step after a state without history takes no coning, sculling or rate-change term.
 * The corrections assume steps of about equal length. Sources: REFERENCES.md, "Inertial sensors
 * and navigation" (Miller 1983; Ignagni 1990; Savage 1998 parts 1 and 2; Titterton and Weston;
 * Groves).
 *
 * <h2>Refusals</h2>
 * A step is refused, with its index and times in the message and the caller's name of the
 * input at fault, if its end time does not follow the state's time or is more than
 * {@link #MAX_STEP_SECONDS} after it, if an increment is NaN or infinite, if the delta-velocity
 * exceeds {@link #MAX_SPECIFIC_FORCE} times the step or the delta-angle exceeds
 * {@link #MAX_DELTA_ANGLE}, or if the latitude would pass beyond {@link #MAX_LATITUDE_DEGREES}
 * (a north-pointing level frame cannot pass over a pole).
 *
 * <h2>Speed</h2>
 * The primitive form ({@link #newWork}, {@link #advance(double[], double, double, double, double,
 * double, double, double)}) and the bulk forms allocate nothing per step; the object forms
 * allocate their result.
 *
 * <p><b>Caution:</b> for simulation and analysis, not for primary navigation.
 *
 * <p>Immutable and thread-safe.
 */
public final class LevelNavigator implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Largest latitude magnitude a step may reach (deg). */
    public static final double MAX_LATITUDE_DEGREES = 89.9;

    /**
     * Longest step (s): {@code end - start} of one pair of increments. Strapdown updates run at
     * intervals of milliseconds to seconds (common practice); a longer step is refused, not
     * integrated with corrections made for short steps.
     */
    public static final double MAX_STEP_SECONDS = 3600.0;

    /**
     * Largest mean specific force of a step (m/s^2), {@code |deltaVelocity| / step}: about
     * 10,000 g, beyond the shock of a gun launch (common practice); larger increments are refused.
     */
    public static final double MAX_SPECIFIC_FORCE = 1e5;

    /**
     * Largest delta-angle of a step (rad), its norm: half a turn. The coning and sculling
     * corrections assume small rotations per step, and beyond half a turn the rotation vector
     * of a step can no longer be told from a smaller one the other way.
     */
    public static final double MAX_DELTA_ANGLE = Math.PI;

    /** Values per step written by the traced bulk run: time, lat, lon, h, velocity (3), attitude quaternion (4). */
    public static final int TRACE_VALUES = 11;

    /** The Earth model (ellipsoid, rotation rate, normal gravity). */
    private final EarthModel model;
    /** The local-level axes of the navigation frame. */
    private final LocalAxes axes;
    /** The terms included in the mechanization. */
    private final EnumSet<NavigationTerm> included;
    /** Lever arms of the x, y and z accelerometers from the centre, body axes (m), nine values. */
    private final double[] offsets;
    /** Where gravity is taken when its height or latitude dependence is left out; null: at zero. */
    private final LatLonHeight gravityReference;
    /** The step kernel on primitives. */
    private final LevelKernel kernel;

    private LevelNavigator(EarthModel model, LocalAxes axes, EnumSet<NavigationTerm> included, double[] offsets,
                           LatLonHeight gravityReference) {
        this.model = model;
        this.axes = axes;
        this.included = included;
        this.offsets = offsets;
        this.gravityReference = gravityReference;
        boolean[] on = new boolean[NavigationTerm.values().length];
        for (NavigationTerm t : included) {
            on[t.ordinal()] = true;
        }
        double refLat = gravityReference == null ? 0.0 : gravityReference.latitude();
        double refH = gravityReference == null ? 0.0 : gravityReference.height();
        this.kernel = new LevelKernel(model, Math.toRadians(MAX_LATITUDE_DEGREES), on, offsets, refLat, refH);
    }

    /**
     * A navigator with every term included and the sensor at the navigation centre.
     *
     * @param model Earth model: shape, rotation rate, normal gravity
     * @param axes level axes of the states and the reported terms
     * @return the navigator
     */
    public static LevelNavigator of(EarthModel model, LocalAxes axes) {
        Arguments.nonNull("model", model);
        Arguments.nonNull("axes", axes);
        return new LevelNavigator(model, axes, EnumSet.allOf(NavigationTerm.class), new double[9], null);
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
     * Returns the level axes of states and terms.
     *
     * @return the level axes of states and terms
     */
    public LocalAxes axes() {
        return axes;
    }

    /**
     * Returns the terms included (a copy).
     *
     * @return the terms included (a copy)
     */
    public Set<NavigationTerm> included() {
        return EnumSet.copyOf(included);
    }

    /**
     * A copy with some terms left out (for an {@link ErrorBudget} or a simplified mechanization).
     * Leaving out {@link NavigationTerm#GRAVITY_HEIGHT} or {@link NavigationTerm#GRAVITY_LATITUDE}
     * needs a gravity reference ({@link #withGravityReference}).
     *
     * @param terms the terms to leave out
     * @return the copy
     */
    public LevelNavigator without(NavigationTerm... terms) {
        Arguments.nonNull("terms", terms);
        EnumSet<NavigationTerm> set = EnumSet.copyOf(included);
        for (NavigationTerm t : terms) {
            set.remove(Arguments.nonNull("term", t));
        }
        return new LevelNavigator(model, axes, set, offsets, gravityReference);
    }

    /**
     * A copy with every term included again.
     *
     * @return the copy
     */
    public LevelNavigator withAllTerms() {
        return new LevelNavigator(model, axes, EnumSet.allOf(NavigationTerm.class), offsets, gravityReference);
    }

    /**
     * A copy whose gravity, where its height or latitude dependence is left out, is taken at this
     * reference's height or latitude.
     *
     * @param reference position whose latitude and height are used; latitude within +-90 deg
     * @return the copy
     */
    public LevelNavigator withGravityReference(LatLonHeight reference) {
        Arguments.nonNull("reference", reference);
        return new LevelNavigator(model, axes, included, offsets, reference);
    }

    /**
     * A copy with the accelerometers away from the navigation centre (size effect). Each vector is
     * the position of one accelerometer's sensing point relative to the centre, in body axes.
     *
     * @param xAccelerometer offset of the x accelerometer (m, body axes)
     * @param yAccelerometer offset of the y accelerometer (m, body axes)
     * @param zAccelerometer offset of the z accelerometer (m, body axes)
     * @return the copy
     */
    public LevelNavigator withAccelerometerOffsets(Vector3D xAccelerometer, Vector3D yAccelerometer,
                                                   Vector3D zAccelerometer) {
        Arguments.finite("xAccelerometer (m)", xAccelerometer);
        Arguments.finite("yAccelerometer (m)", yAccelerometer);
        Arguments.finite("zAccelerometer (m)", zAccelerometer);
        double[] o = {xAccelerometer.getX(), xAccelerometer.getY(), xAccelerometer.getZ(),
            yAccelerometer.getX(), yAccelerometer.getY(), yAccelerometer.getZ(),
            zAccelerometer.getX(), zAccelerometer.getY(), zAccelerometer.getZ()};
        return new LevelNavigator(model, axes, included, o, gravityReference);
    }

    /**
     * A copy with all three accelerometers at one point off the navigation centre (a lever arm).
     *
     * @param offset position of the accelerometers relative to the centre (m, body axes)
     * @return the copy
     */
    public LevelNavigator withSensorOffset(Vector3D offset) {
        Arguments.finite("offset (m)", offset);
        return withAccelerometerOffsets(offset, offset, offset);
    }

    // ------------------------------------------------------------------ object API

    /**
     * Advances a state by one pair of increments of a sensor fixed in the body.
     *
     * @param state the state at the start of the increments, in this navigator's axes
     * @param end end time of the increments (s), after {@code state.time()}
     * @param deltaVelocity integral of the specific force over the step (m/s, body axes)
     * @param deltaAngle integral of the angular rate relative to inertial space over the step (rad, body axes)
     * @return the state at {@code end}, carrying these increments as history
     * @throws IllegalArgumentException for a refused step (see the class comment) or a state in other axes
     */
    public NavigationState advance(NavigationState state, double end, Vector3D deltaVelocity, Vector3D deltaAngle) {
        double[] w = newWork(state);
        Arguments.nonNull("deltaVelocity", deltaVelocity);
        Arguments.nonNull("deltaAngle", deltaAngle);
        kernel.step(w, end, deltaVelocity.getX(), deltaVelocity.getY(), deltaVelocity.getZ(), deltaAngle.getX(),
                deltaAngle.getY(), deltaAngle.getZ(), null, 0, StepInputs.OF_VECTORS, 0);
        return NavigationState.fromWork(w, axes);
    }

    /**
     * The named terms of the step that {@link #advance(NavigationState, double, Vector3D, Vector3D)}
     * would take with the same arguments.
     *
     * @param state the state at the start of the increments, in this navigator's axes
     * @param end end time of the increments (s)
     * @param deltaVelocity integral of the specific force (m/s, body axes)
     * @param deltaAngle integral of the angular rate relative to inertial space (rad, body axes)
     * @return the terms
     * @throws IllegalArgumentException for a refused step
     */
    public StepTerms terms(NavigationState state, double end, Vector3D deltaVelocity, Vector3D deltaAngle) {
        double[] w = newWork(state);
        Arguments.nonNull("deltaVelocity", deltaVelocity);
        Arguments.nonNull("deltaAngle", deltaAngle);
        double[] t = new double[LevelKernel.TERMS];
        double start = state.time();
        kernel.step(w, end, deltaVelocity.getX(), deltaVelocity.getY(), deltaVelocity.getZ(), deltaAngle.getX(),
                deltaAngle.getY(), deltaAngle.getZ(), t, 0, StepInputs.OF_VECTORS, 0);
        return new StepTerms(state.step(), start, end, axes, level(t, 0), level(t, 3), level(t, 6), level(t, 9),
                body(t, 12), body(t, 15), body(t, 18), body(t, 21), level(t, 24), level(t, 27));
    }

    /**
     * Advances a state by the increments of a sensor fixed in the body
     * ({@code sensor.incrementsOver(t0, t1)} of {@link dev.noninertial.frames.sensing.IdealSensor},
     * or any {@link SensorIncrements} in body axes).
     *
     * @param state the state at {@code increments.start()}, in this navigator's axes
     * @param increments delta-velocity and delta-angle over [start, end], body axes
     * @return the state at {@code increments.end()}
     * @throws IllegalArgumentException if the increments do not start at the state's time
     *         (within 1e-9 s), or for a refused step
     */
    public NavigationState advance(NavigationState state, SensorIncrements increments) {
        checkStart(state, increments);
        return advance(state, increments.end(), increments.deltaVelocity(), increments.deltaAngle());
    }

    /**
     * The named terms of the step that {@link #advance(NavigationState, SensorIncrements)} would take.
     *
     * @param state the state at {@code increments.start()}, in this navigator's axes
     * @param increments delta-velocity and delta-angle, body axes
     * @return the terms
     * @throws IllegalArgumentException as for {@link #advance(NavigationState, SensorIncrements)}
     */
    public StepTerms terms(NavigationState state, SensorIncrements increments) {
        checkStart(state, increments);
        return terms(state, increments.end(), increments.deltaVelocity(), increments.deltaAngle());
    }

    /**
     * Navigates consecutive increments, allocating nothing per step beyond reading them.
     *
     * @param start the state at the start of the first increments, in this navigator's axes
     * @param increments consecutive increments (each starting where the previous ended), body axes
     * @return the state at the end of the last increments
     * @throws IllegalArgumentException if an increment does not start where the previous one ended
     *         (within 1e-9 s), or for a refused step (named in the message)
     */
    public NavigationState run(NavigationState start, SensorIncrements... increments) {
        Arguments.nonNull("start", start);
        Arguments.nonNull("increments", increments);
        double[] w = newWork(start);
        double t = start.time();
        for (int k = 0; k < increments.length; k++) {
            SensorIncrements inc = Arguments.nonNull("increments[" + k + "]", increments[k]);
            if (!(Math.abs(inc.start() - t) <= 1e-9 * Math.max(1.0, Math.abs(t)))) {
                throw new IllegalArgumentException("step " + (long) w[LevelKernel.STEP] + ": increments[" + k
                        + "] start at " + inc.start() + " s, the state is at " + t + " s (gap or overlap)");
            }
            Vector3D dv = inc.deltaVelocity();
            Vector3D da = inc.deltaAngle();
            kernel.step(w, inc.end(), dv.getX(), dv.getY(), dv.getZ(), da.getX(), da.getY(), da.getZ(), null, 0,
                    StepInputs.OF_INCREMENTS, k);
            t = inc.end();
        }
        return NavigationState.fromWork(w, axes);
    }

    private static void checkStart(NavigationState state, SensorIncrements increments) {
        Arguments.nonNull("state", state);
        Arguments.nonNull("increments", increments);
        double t = state.time();
        if (!(Math.abs(increments.start() - t) <= 1e-9 * Math.max(1.0, Math.abs(t)))) {
            throw new IllegalArgumentException("step " + state.step() + ": increments start at " + increments.start()
                    + " s, the state is at " + t + " s (they must start at the state's time)");
        }
    }

    private Vector3D level(double[] t, int o) {
        return axes == LocalAxes.NED ? new Vector3D(t[o], t[o + 1], t[o + 2])
                : new Vector3D(t[o + 1], t[o], -t[o + 2]);
    }

    private static Vector3D body(double[] t, int o) {
        return new Vector3D(t[o], t[o + 1], t[o + 2]);
    }

    // ------------------------------------------------------------------ primitive API

    /**
     * A work array holding a state for the allocation-free primitive form. Its layout is internal;
     * read it back with {@link #stateOf(double[])}.
     *
     * @param state the state, in this navigator's axes
     * @return a new work array
     * @throws IllegalArgumentException if the state is in other axes
     */
    public double[] newWork(NavigationState state) {
        Arguments.nonNull("state", state);
        if (state.axes() != axes) {
            throw new IllegalArgumentException("state is in " + state.axes() + " axes, this navigator in " + axes
                    + ": make the state in " + axes);
        }
        checkGravityReference();
        double[] w = new double[LevelKernel.LENGTH];
        state.toWork(w);
        return w;
    }

    /**
     * Advances a work array in place by one pair of increments, allocating nothing.
     *
     * @param work a work array from {@link #newWork}
     * @param end end time of the increments (s)
     * @param dvx delta-velocity x (m/s, body axes)
     * @param dvy delta-velocity y (m/s)
     * @param dvz delta-velocity z (m/s)
     * @param dax delta-angle x (rad, body axes)
     * @param day delta-angle y (rad)
     * @param daz delta-angle z (rad)
     * @throws IllegalArgumentException for a refused step
     */
    public void advance(double[] work, double end, double dvx, double dvy, double dvz, double dax, double day,
                        double daz) {
        checkWork(work);
        kernel.step(work, end, dvx, dvy, dvz, dax, day, daz, null, 0, StepInputs.OF_PRIMITIVES, 0);
    }

    /**
     * Refuses what is not a work array of {@link #newWork}: null, another length, or a
     * non-finite time, position, velocity or attitude.
     */
    private static void checkWork(double[] work) {
        Arguments.nonNull("work", work);
        if (work.length != LevelKernel.LENGTH) {
            throw new IllegalArgumentException("work must have length " + LevelKernel.LENGTH + " (from newWork), got "
                    + work.length);
        }
        for (int i = LevelKernel.T; i < LevelKernel.HIST; i++) {
            if (!Double.isFinite(work[i])) {
                throw new IllegalArgumentException("work[" + i + "] (time, position, velocity or attitude) must be "
                        + "finite, got " + work[i] + ": pass a work array from newWork, advanced only by advance");
            }
        }
    }

    /**
     * Reads the state held by a work array.
     *
     * @param work a work array from {@link #newWork}
     * @return the state, in this navigator's axes
     */
    public NavigationState stateOf(double[] work) {
        checkWork(work);
        return NavigationState.fromWork(work, axes);
    }

    // ------------------------------------------------------------------ bulk

    /**
     * Navigates a run of increments, allocating nothing per step.
     *
     * @param start the state at the start of the first step, in this navigator's axes
     * @param ends end time of each step (s), increasing, the first after {@code start.time()}
     * @param deltaVelocities delta-velocity of each step, x, y, z packed (m/s, body axes), length 3 n
     * @param deltaAngles delta-angle of each step, packed (rad, body axes), length 3 n
     * @return the state at the end of the last step
     * @throws IllegalArgumentException for mismatched lengths or a refused step (named in the message)
     */
    public NavigationState run(NavigationState start, double[] ends, double[] deltaVelocities, double[] deltaAngles) {
        return run(start, ends, deltaVelocities, deltaAngles, null);
    }

    /**
     * Navigates a logged run of increments ({@link IncrementLog}, read from a file or written by
     * the library's sensors), allocating nothing per step.
     *
     * @param start the state at the start of the log's first interval, in this navigator's axes
     * @param log the increments, body axes
     * @return the state at the end of the log's last interval
     * @throws IllegalArgumentException if the log does not start at the state's time (within 1e-9
     *         s, relative above 1 s), or for a refused step (named in the message)
     */
    public NavigationState run(NavigationState start, IncrementLog log) {
        Arguments.nonNull("start", start);
        Arguments.nonNull("log", log);
        checkStart(start, log.increment(0));
        return run(start, log.ends(), log.deltaVelocities(), log.deltaAngles());
    }

    /**
     * Refuses increment arrays whose lengths do not hold three values per step, naming each array
     * (the runs of this class and {@link ErrorBudget} share it).
     */
    static void checkIncrementLengths(int steps, double[] deltaVelocities, double[] deltaAngles) {
        if (deltaVelocities.length != 3L * steps) {
            throw new IllegalArgumentException("deltaVelocities must have 3 x ends.length = " + 3L * steps
                    + " values, got " + deltaVelocities.length);
        }
        if (deltaAngles.length != 3L * steps) {
            throw new IllegalArgumentException("deltaAngles must have 3 x ends.length = " + 3L * steps
                    + " values, got " + deltaAngles.length);
        }
    }

    /**
     * Navigates a run of increments and records the state after each step, allocating nothing
     * per step.
     *
     * @param start the state at the start of the first step, in this navigator's axes
     * @param ends end time of each step (s), n values
     * @param deltaVelocities delta-velocity of each step, packed (m/s, body axes), length 3 n
     * @param deltaAngles delta-angle of each step, packed (rad, body axes), length 3 n
     * @param trace if not null, receives {@link #TRACE_VALUES} values per step: time (s), latitude,
     *        longitude (rad), height (m), velocity (m/s, this navigator's axes), attitude quaternion
     *        of the body in the level frame (scalar first, {@link dev.noninertial.frames.Orientations}
     *        convention); length at least 11 n
     * @return the state at the end of the last step
     * @throws IllegalArgumentException for mismatched lengths or a refused step (named in the message)
     */
    public NavigationState run(NavigationState start, double[] ends, double[] deltaVelocities, double[] deltaAngles,
                               double[] trace) {
        Arguments.nonNull("start", start);
        Arguments.nonNull("ends", ends);
        Arguments.nonNull("deltaVelocities", deltaVelocities);
        Arguments.nonNull("deltaAngles", deltaAngles);
        int n = ends.length;
        checkIncrementLengths(n, deltaVelocities, deltaAngles);
        if (trace != null && trace.length < TRACE_VALUES * n) {
            throw new IllegalArgumentException("trace must have at least " + TRACE_VALUES * n + " values, got "
                    + trace.length);
        }
        double[] w = newWork(start);
        for (int k = 0; k < n; k++) {
            int i = 3 * k;
            kernel.step(w, ends[k], deltaVelocities[i], deltaVelocities[i + 1], deltaVelocities[i + 2],
                    deltaAngles[i], deltaAngles[i + 1], deltaAngles[i + 2], null, 0, StepInputs.OF_ARRAYS, k);
            if (trace != null) {
                record(w, trace, TRACE_VALUES * k);
            }
        }
        return NavigationState.fromWork(w, axes);
    }

    /**
     * Navigates increments of a regular time grid in the interleaved layout of an inertial
     * sensor's bulk output ({@code SensorIncrements.COMPONENTS} = 6 doubles per increment:
     * delta-velocity x, y, z in m/s, then delta-angle x, y, z in rad, body axes), allocating
     * nothing per step. Step {@code k} ends at {@code start.time() + (k + 1) interval}.
     *
     * @param start the state at the start of the first step, in this navigator's axes
     * @param interval step length (s), positive
     * @param count number of steps
     * @param increments the increments, 6 per step from {@code offset}
     * @param offset index of the first step's delta-velocity x
     * @param trace if not null, receives {@link #TRACE_VALUES} values per step (see
     *        {@link #run(NavigationState, double[], double[], double[], double[])})
     * @return the state at the end of the last step
     * @throws IllegalArgumentException for a range that does not fit the arrays or a refused step
     */
    public NavigationState run(NavigationState start, double interval, int count, double[] increments, int offset,
                               double[] trace) {
        Arguments.nonNull("start", start);
        Arguments.positive("interval (s)", interval);
        Arguments.nonNull("increments", increments);
        if (count < 0 || offset < 0 || (long) offset + 6L * count > increments.length) {
            throw new IllegalArgumentException("increments must hold 6 x count = " + 6L * count + " values from offset "
                    + offset + ", got an array of " + increments.length);
        }
        if (trace != null && trace.length < (long) TRACE_VALUES * count) {
            throw new IllegalArgumentException("trace must have at least " + (long) TRACE_VALUES * count
                    + " values, got " + trace.length);
        }
        double[] w = newWork(start);
        double t0 = start.time();
        StepInputs names = StepInputs.ofGrid(offset);
        for (int k = 0; k < count; k++) {
            int i = offset + 6 * k;
            kernel.step(w, t0 + (k + 1) * interval, increments[i], increments[i + 1], increments[i + 2],
                    increments[i + 3], increments[i + 4], increments[i + 5], null, 0, names, k);
            if (trace != null) {
                record(w, trace, TRACE_VALUES * k);
            }
        }
        return NavigationState.fromWork(w, axes);
    }

    /** Writes one trace record from a work array. */
    void record(double[] w, double[] trace, int o) {
        trace[o] = w[LevelKernel.T];
        trace[o + 1] = w[LevelKernel.LAT];
        trace[o + 2] = w[LevelKernel.LON];
        trace[o + 3] = w[LevelKernel.H];
        if (axes == LocalAxes.NED) {
            trace[o + 4] = w[LevelKernel.VN];
            trace[o + 5] = w[LevelKernel.VE];
            trace[o + 6] = w[LevelKernel.VD];
            System.arraycopy(w, LevelKernel.Q0, trace, o + 7, 4);
        } else {
            trace[o + 4] = w[LevelKernel.VE];
            trace[o + 5] = w[LevelKernel.VN];
            trace[o + 6] = -w[LevelKernel.VD];
            LevelKernel.nedToEnu(w[LevelKernel.Q0], w[LevelKernel.Q0 + 1], w[LevelKernel.Q0 + 2],
                    w[LevelKernel.Q0 + 3], trace, o + 7);
        }
    }

    /**
     * Returns the gravity reference, or null if none is set.
     *
     * @return the gravity reference, or null if none is set
     */
    LatLonHeight gravityReference() {
        return gravityReference;
    }

    /** The kernel, for the error budget. */
    LevelKernel kernel() {
        return kernel;
    }

    private void checkGravityReference() {
        if (gravityReference == null && (!included.contains(NavigationTerm.GRAVITY_HEIGHT)
                || !included.contains(NavigationTerm.GRAVITY_LATITUDE))) {
            throw new IllegalStateException("a gravity dependence is left out but no gravity reference is set: "
                    + "call withGravityReference(position) first");
        }
    }

    @Override
    public String toString() {
        EnumSet<NavigationTerm> out = EnumSet.complementOf(included);
        return String.format(Locale.ROOT, "LevelNavigator{%s, %s, left out %s, accelerometer offsets %s m}", model,
                axes, out, java.util.Arrays.toString(offsets));
    }
}
