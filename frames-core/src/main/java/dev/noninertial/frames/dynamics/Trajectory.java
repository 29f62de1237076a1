package dev.noninertial.frames.dynamics;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.sampling.ODEStateInterpolator;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.ReferenceFrame;

/**
 * The result of {@link TrajectorySolver#solve}: the motion of a point over a time span, in the
 * integration frame, with dense output at any time of the span, the breakdown of its acceleration
 * and the events met on the way.
 *
 * <p><b>Conventions.</b> States are seen in and resolved in the integration frame
 * ({@link #frame()}); convert with {@code at(t).in(otherFrame)}. Times in s from the user's
 * epoch. Positions and velocities between steps come from the integrator's dense output (7th
 * order for the default Dormand-Prince 8(5,3)), accurate to about the integration tolerances;
 * accelerations are recomputed from the equations of motion at the interpolated position and
 * velocity. Times outside [{@link #startTime()}, {@link #endTime()}] are refused, never
 * extrapolated.
 *
 * <p>Immutable; thread-safe when the forces given to the solver are. Not serializable (it holds
 * the integrator's dense output): ship the initial state and the solver set-up instead, or the
 * {@link FramedState}s and samples taken from it, which are.
 */
public final class Trajectory {

    private final MotionEquations equations;
    private final List<ODEStateInterpolator> steps;
    private final double[] stepEnds;
    private final double startTime;
    private final double endTime;
    private final double[] startY;
    private final double[] endY;
    private final List<EventMark> marks;
    private final EventMark stop;
    private final int evaluations;
    private final String method;

    Trajectory(MotionEquations equations, List<ODEStateInterpolator> steps, double startTime, double[] startY,
               double endTime, double[] endY, List<EventMark> marks, EventMark stop, int evaluations,
               String method) {
        this.equations = equations;
        this.steps = List.copyOf(steps);
        this.stepEnds = new double[steps.size()];
        for (int i = 0; i < stepEnds.length; i++) {
            stepEnds[i] = steps.get(i).getCurrentState().getTime();
        }
        this.startTime = startTime;
        this.endTime = endTime;
        this.startY = startY.clone();
        this.endY = endY.clone();
        this.marks = Collections.unmodifiableList(new ArrayList<>(marks));
        this.stop = stop;
        this.evaluations = evaluations;
        this.method = method;
    }

    /**
     * Returns the integration frame, in which every state of this trajectory is seen and resolved.
     *
     * @return the integration frame, in which every state of this trajectory is seen and resolved
     */
    public ReferenceFrame frame() {
        return equations.frame();
    }

    /**
     * Returns start time of the span (s from the user's epoch).
     *
     * @return start time of the span (s from the user's epoch)
     */
    public double startTime() {
        return startTime;
    }

    /**
     * Returns end time of the span (s): the requested end, or the time of the event that stopped the run.
     *
     * @return end time of the span (s): the requested end, or the time of the event that stopped the run
     */
    public double endTime() {
        return endTime;
    }

    /**
     * Returns the point at {@link #startTime()}, in the integration frame, acceleration from the equations.
     *
     * @return the point at {@link #startTime()}, in the integration frame, acceleration from the equations
     */
    public FramedState initialState() {
        return equations.framed(startTime, startY);
    }

    /**
     * Returns the point at {@link #endTime()}, in the integration frame, acceleration from the equations.
     *
     * @return the point at {@link #endTime()}, in the integration frame, acceleration from the equations
     */
    public FramedState finalState() {
        return equations.framed(endTime, endY);
    }

    /**
     * The point at any time of the span (dense output).
     *
     * @param t time (s), in [{@link #startTime()}, {@link #endTime()}]
     * @return position, velocity and acceleration seen in and resolved in the integration frame
     * @throws IllegalArgumentException if {@code t} is outside the span or not finite
     * @throws TrajectoryFailure if a force fails at {@code t}
     */
    public FramedState at(double t) {
        return equations.framed(t, interpolate(t));
    }

    /**
     * The four fictitious accelerations the point feels at time {@code t}.
     *
     * @param t time (s), in the span
     * @return frame acceleration, Euler, Coriolis and centrifugal terms, resolved in the
     *         integration frame (m/s^2)
     * @throws IllegalArgumentException if {@code t} is outside the span or not finite
     */
    public FictitiousAccelerations fictitiousAt(double t) {
        return equations.sample(t, interpolate(t)).fictitious();
    }

    /**
     * The sum of the real specific forces at time {@code t}.
     *
     * @param t time (s), in the span
     * @return real specific force resolved in the integration frame (m/s^2)
     * @throws IllegalArgumentException if {@code t} is outside the span or not finite
     */
    public Vector3D realForceAt(double t) {
        return equations.realForce(t, interpolate(t));
    }

    /**
     * The state and the breakdown of its acceleration at time {@code t}.
     *
     * @param t time (s), in the span
     * @return the sample, all vectors resolved in the integration frame
     * @throws IllegalArgumentException if {@code t} is outside the span or not finite
     */
    public TrajectorySample sampleAt(double t) {
        return equations.sample(t, interpolate(t));
    }

    /**
     * Samples on a regular grid: times {@code startTime() + k interval} for every k with a time
     * not after {@link #endTime()}, then the end time itself if it is not on the grid.
     *
     * @param interval grid spacing (s), positive
     * @return the samples in time order, all vectors resolved in the integration frame
     * @throws IllegalArgumentException if {@code interval} is not positive and finite, or the
     *         grid would hold more than 10 000 000 samples
     */
    public List<TrajectorySample> samples(double interval) {
        Arguments.positive("interval", interval);
        double span = endTime - startTime;
        double count = Math.floor(span / interval + 1e-9);
        if (count >= 1e7) {
            throw new IllegalArgumentException("interval must give at most 10000000 samples over the "
                    + Formats.number(span) + " s span, got " + interval + " s");
        }
        int n = (int) count;
        List<TrajectorySample> out = new ArrayList<>(n + 2);
        double last = startTime;
        for (int k = 0; k <= n; k++) {
            // the 1e-9 slack above may put the last grid time a rounding error past the end
            last = Math.min(startTime + k * interval, endTime);
            out.add(sampleAt(last));
        }
        if (endTime - last > 1e-9 * interval) {
            out.add(sampleAt(endTime));
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * A readable table of the acceleration breakdown on a regular grid (see
     * {@link #samples(double)}): for each time the speed and the magnitudes of the real force
     * and of the four fictitious terms, and which fictitious term is largest.
     *
     * @param interval grid spacing (s), positive
     * @return the table, one line per sample after a header, units in the header
     * @throws IllegalArgumentException if {@code interval} is not positive and finite
     */
    public String breakdownTable(double interval) {
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "%12s %12s %13s %13s %13s %13s %13s  %s%n", "time [s]",
                "speed [m/s]", "real [m/s^2]", "frame [m/s^2]", "Euler [m/s^2]", "Corio [m/s^2]",
                "centr [m/s^2]", "largest fictitious"));
        for (TrajectorySample s : samples(interval)) {
            FictitiousAccelerations f = s.fictitious();
            double[] m = {f.frameAcceleration().getNorm(), f.euler().getNorm(), f.coriolis().getNorm(),
                f.centrifugal().getNorm()};
            String[] names = {"frame acceleration", "Euler", "Coriolis", "centrifugal"};
            int big = 0;
            for (int i = 1; i < 4; i++) {
                if (m[i] > m[big]) {
                    big = i;
                }
            }
            b.append(String.format(Locale.ROOT, "%12.3f %12.5g %13.5e %13.5e %13.5e %13.5e %13.5e  %s%n",
                    s.time(), s.state().state().velocity().getNorm(), s.realForce().getNorm(),
                    m[0], m[1], m[2], m[3], m[big] == 0.0 ? "none" : names[big]));
        }
        return b.toString();
    }

    /**
     * Returns the occurrence that ended the run, empty if the run reached the requested end time.
     *
     * @return the occurrence that ended the run, empty if the run reached the requested end time
     */
    public Optional<EventMark> stopEvent() {
        return Optional.ofNullable(stop);
    }

    /**
     * Returns every counted event occurrence, stopping one included, in time order.
     *
     * @return every counted event occurrence, stopping one included, in time order
     */
    public List<EventMark> events() {
        return marks;
    }

    /**
     * The occurrences of one event.
     *
     * @param eventName name of the event
     * @return its occurrences in time order (possibly empty)
     */
    public List<EventMark> events(String eventName) {
        Arguments.nonNull("eventName", eventName);
        List<EventMark> out = new ArrayList<>();
        for (EventMark m : marks) {
            if (m.eventName().equals(eventName)) {
                out.add(m);
            }
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * Returns number of integration steps taken (pieces of dense output).
     *
     * @return number of integration steps taken (pieces of dense output)
     */
    public int stepCount() {
        return steps.size();
    }

    /**
     * Returns number of evaluations of the equations of motion during the run.
     *
     * @return number of evaluations of the equations of motion during the run
     */
    public int evaluations() {
        return evaluations;
    }

    /**
     * Returns name of the integration method used.
     *
     * @return name of the integration method used
     */
    public String method() {
        return method;
    }

    private double[] interpolate(double t) {
        if (!(t >= startTime && t <= endTime)) {
            throw new IllegalArgumentException("t must be in [" + startTime + ", " + endTime
                    + "] s (the trajectory's span), got " + t);
        }
        if (t == startTime) {
            return startY;
        }
        if (t == endTime || steps.isEmpty()) {
            return endY;
        }
        int lo = 0;
        int hi = stepEnds.length - 1;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (stepEnds[mid] < t) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return steps.get(lo).getInterpolatedState(t).getPrimaryState();
    }

    @Override
    public String toString() {
        return "Trajectory{frame=" + frame().path() + ", span=[" + Formats.number(startTime) + ", "
                + Formats.number(endTime) + "] s, " + steps.size() + " steps, " + evaluations
                + " evaluations, " + method + (stop == null ? "" : ", stopped by " + stop.eventName())
                + ", events=" + marks.size() + "}";
    }
}
