package dev.noninertial.frames.dynamics;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.function.Supplier;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEIntegrator;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;

/**
 * Integrates the motion of a point mass directly in any frame of a tree, inertial or not. The
 * user gives only the real specific forces; the solver adds the frame's fictitious accelerations
 * from the frame's placement in the tree's inertial root:
 * <pre>
 *   r'' = f_real(t, r, r') - R o'' - al x r - 2 w x r' - w x (w x r)
 *          \_ real _/    \frame acc/ \Euler/ \Coriolis/ \centrifugal/
 * </pre>
 * (o'', R, w, al as in {@link dev.noninertial.frames.Placement}, for the integration frame in
 * its root).
 *
 * <pre>{@code
 * TrajectorySolver solver = TrajectorySolver.of(site)
 *         .plusForce(SpecificForce.uniform(gravitationInSite))
 *         .withTolerance(1e-9)
 *         .plusEvent(TrajectoryEvent.groundImpact(Vector3D.PLUS_K, 0.0));
 * Trajectory tr = solver.solve(PointState.of(r0, v0), 0.0, 120.0);
 * }</pre>
 *
 * <p><b>Conventions.</b> SI units; time in s from the user's epoch (the time of the frame
 * motions); every vector seen in and resolved in the integration frame.
 *
 * <p><b>Gravity versus gravitation.</b> In a frame fixed to the rotating Earth pass gravitation,
 * not normal gravity: gravity already contains the centrifugal term that this solver adds itself
 * (see {@link SpecificForce}).
 *
 * <p><b>Accuracy.</b> The integrator controls the local error of each step to
 * {@code absolute + relative |component|}, with separate absolute tolerances on position (m) and
 * velocity (m/s). The global error grows with the span and the number of steps; check it for your
 * problem (for example by halving the tolerances). The default scheme is the adaptive
 * Dormand-Prince 8(5,3) of Hipparchus.
 *
 * <p>Results are for simulation and analysis, not for aiming, lifting or other safety decisions;
 * defer to local codes and licensed practice.
 *
 * <p>Immutable: every {@code with...} returns a copy. Thread-safe when the forces and events are:
 * each {@link #solve} uses its own integrator.
 */
public final class TrajectorySolver {

    /** Default absolute tolerance on position components (m). */
    public static final double DEFAULT_POSITION_TOLERANCE = 1e-6;

    /** Default absolute tolerance on velocity components (m/s). */
    public static final double DEFAULT_VELOCITY_TOLERANCE = 1e-9;

    /** Default relative tolerance. */
    public static final double DEFAULT_RELATIVE_TOLERANCE = 1e-10;

    /** Default budget of evaluations of the equations of motion per run. */
    public static final int DEFAULT_MAX_EVALUATIONS = 10_000_000;

    private final ReferenceFrame frame;
    private final List<SpecificForce> forces;
    private final List<TrajectoryEvent> events;
    private final double positionTolerance;
    private final double velocityTolerance;
    private final double relativeTolerance;
    private final double minStep;
    private final double maxStep;
    private final int maxEvaluations;
    private final IntegrationScheme scheme;
    private final Supplier<? extends ODEIntegrator> custom;
    /** Inertial terms added (all four unless a budget leaves some out). */
    private final Set<InertialTerm> included;

    private static final Set<InertialTerm> ALL_TERMS = Collections.unmodifiableSet(EnumSet.allOf(InertialTerm.class));

    private TrajectorySolver(ReferenceFrame frame, List<SpecificForce> forces, List<TrajectoryEvent> events,
                             double positionTolerance, double velocityTolerance, double relativeTolerance,
                             double minStep, double maxStep, int maxEvaluations, IntegrationScheme scheme,
                             Supplier<? extends ODEIntegrator> custom, Set<InertialTerm> included) {
        this.frame = frame;
        this.forces = List.copyOf(forces);
        this.events = List.copyOf(events);
        this.positionTolerance = positionTolerance;
        this.velocityTolerance = velocityTolerance;
        this.relativeTolerance = relativeTolerance;
        this.minStep = minStep;
        this.maxStep = maxStep;
        this.maxEvaluations = maxEvaluations;
        this.scheme = scheme;
        this.custom = custom;
        this.included = included;
    }

    /**
     * A solver integrating in {@code frame}, with no force yet (free motion), default tolerances,
     * no step limit beyond the span and the Dormand-Prince 8(5,3) scheme.
     *
     * @param frame the integration frame: states, forces and results are seen and resolved in it
     * @return the solver
     * @throws NullPointerException if {@code frame} is null
     */
    public static TrajectorySolver of(ReferenceFrame frame) {
        Arguments.nonNull("frame", frame);
        return new TrajectorySolver(frame, List.of(), List.of(), DEFAULT_POSITION_TOLERANCE,
                DEFAULT_VELOCITY_TOLERANCE, DEFAULT_RELATIVE_TOLERANCE, 0.0, Double.NaN, DEFAULT_MAX_EVALUATIONS,
                IntegrationScheme.DORMAND_PRINCE_853, null, ALL_TERMS);
    }

    /**
     * A copy with one more real specific force (forces add up). In an Earth-fixed frame pass
     * gravitation, not gravity (see {@link SpecificForce}).
     *
     * @param force the force, resolved in the integration frame (m/s^2)
     * @return the copy
     * @throws NullPointerException if {@code force} is null
     */
    public TrajectorySolver plusForce(SpecificForce force) {
        Arguments.nonNull("force", force);
        List<SpecificForce> more = new ArrayList<>(forces);
        more.add(force);
        return new TrajectorySolver(frame, more, events, positionTolerance, velocityTolerance,
                relativeTolerance, minStep, maxStep, maxEvaluations, scheme, custom, included);
    }

    /**
     * A copy with one more event to watch.
     *
     * @param event the event, its vectors resolved in the integration frame
     * @return the copy
     * @throws NullPointerException if {@code event} is null
     */
    public TrajectorySolver plusEvent(TrajectoryEvent event) {
        Arguments.nonNull("event", event);
        List<TrajectoryEvent> more = new ArrayList<>(events);
        more.add(event);
        return new TrajectorySolver(frame, forces, more, positionTolerance, velocityTolerance,
                relativeTolerance, minStep, maxStep, maxEvaluations, scheme, custom, included);
    }

    /**
     * A copy with one tolerance for everything: absolute on position (m) and velocity (m/s), and
     * relative.
     *
     * @param tolerance the tolerance, positive and finite
     * @return the copy
     * @throws IllegalArgumentException if {@code tolerance} is not in (0, +inf)
     */
    public TrajectorySolver withTolerance(double tolerance) {
        Arguments.positive("tolerance", tolerance);
        return withTolerance(tolerance, tolerance, tolerance);
    }

    /**
     * A copy with separate tolerances: each step keeps its estimated local error on a position
     * component below {@code positionTolerance + relative |x|}, and likewise for velocity.
     *
     * @param positionTolerance absolute tolerance on position components (m), positive
     * @param velocityTolerance absolute tolerance on velocity components (m/s), positive
     * @param relative relative tolerance, positive
     * @return the copy
     * @throws IllegalArgumentException if a tolerance is not in (0, +inf)
     */
    public TrajectorySolver withTolerance(double positionTolerance, double velocityTolerance, double relative) {
        return new TrajectorySolver(frame, forces, events,
                Arguments.positive("positionTolerance", positionTolerance),
                Arguments.positive("velocityTolerance", velocityTolerance),
                Arguments.positive("relative", relative), minStep, maxStep, maxEvaluations, scheme, custom, included);
    }

    /**
     * A copy with a largest step. Useful when a force varies faster than the solver can see from
     * the trajectory (a short pulse), to bound the spacing of the dense output, and when a force
     * is defined only in a region (a gravity field that refuses points deep underground): the
     * stages of one long step probe the force far beyond the point where a stopping event
     * (ground impact) would end the run, since events are located only after a step. Default:
     * the whole span.
     *
     * @param seconds largest step (s), positive and finite
     * @return the copy
     * @throws IllegalArgumentException if {@code seconds} is not in (0, +inf)
     */
    public TrajectorySolver withMaxStep(double seconds) {
        return new TrajectorySolver(frame, forces, events, positionTolerance, velocityTolerance,
                relativeTolerance, minStep, Arguments.positive("seconds", seconds), maxEvaluations, scheme, custom, included);
    }

    /**
     * A copy with a smallest step: a run whose error control asks for a shorter step (a force
     * that is singular or much stiffer than expected) ends with a {@link TrajectoryFailure}
     * instead of creeping on. The last step of a run and steps cut short by events may be
     * shorter. Default 0 (no limit).
     *
     * @param seconds smallest step (s), positive and finite, below the largest step
     * @return the copy
     * @throws IllegalArgumentException if {@code seconds} is not in (0, +inf)
     */
    public TrajectorySolver withMinStep(double seconds) {
        return new TrajectorySolver(frame, forces, events, positionTolerance, velocityTolerance,
                relativeTolerance, Arguments.positive("seconds", seconds), maxStep, maxEvaluations, scheme, custom, included);
    }

    /**
     * A copy with another budget of evaluations of the equations of motion per run; a run that
     * needs more ends with a {@link TrajectoryFailure}.
     *
     * @param count largest number of evaluations, at least 1
     * @return the copy
     * @throws IllegalArgumentException if {@code count} is below 1
     */
    public TrajectorySolver withMaxEvaluations(int count) {
        if (count < 1) {
            throw new IllegalArgumentException("count must be in [1, " + Integer.MAX_VALUE + "], got " + count);
        }
        return new TrajectorySolver(frame, forces, events, positionTolerance, velocityTolerance,
                relativeTolerance, minStep, maxStep, count, scheme, custom, included);
    }

    /**
     * A copy using another adaptive Hipparchus scheme (and no custom integrator).
     *
     * @param newScheme the scheme
     * @return the copy
     * @throws NullPointerException if {@code newScheme} is null
     */
    public TrajectorySolver withScheme(IntegrationScheme newScheme) {
        Arguments.nonNull("newScheme", newScheme);
        return new TrajectorySolver(frame, forces, events, positionTolerance, velocityTolerance,
                relativeTolerance, minStep, maxStep, maxEvaluations, newScheme, null, included);
    }

    /**
     * A copy using any Hipparchus integrator, for example a fixed-step one. The supplier must
     * return a new integrator, without step handlers or event detectors, on every call; its own
     * settings (tolerances, steps) are used and this solver's tolerances and largest step are
     * ignored. The state has dimension 6: x, y, z (m), vx, vy, vz (m/s).
     *
     * @param supplier source of fresh integrators
     * @return the copy
     * @throws NullPointerException if {@code supplier} is null
     */
    public TrajectorySolver withIntegrator(Supplier<? extends ODEIntegrator> supplier) {
        Arguments.nonNull("supplier", supplier);
        return new TrajectorySolver(frame, forces, events, positionTolerance, velocityTolerance,
                relativeTolerance, minStep, maxStep, maxEvaluations, scheme, supplier, included);
    }

    /**
     * A copy that leaves one inertial term out of the equations of motion. The result is not a
     * physical motion: use it only to see how much the term matters (for a whole budget see
     * {@link TermBudget}). Trajectories of the copy report the left-out term as zero in their
     * breakdown.
     *
     * @param term the term to leave out
     * @return the copy
     * @throws NullPointerException if {@code term} is null
     */
    public TrajectorySolver withoutTerm(InertialTerm term) {
        Arguments.nonNull("term", term);
        EnumSet<InertialTerm> fewer = EnumSet.noneOf(InertialTerm.class);
        fewer.addAll(included);
        fewer.remove(term);
        return withTerms(fewer);
    }

    /**
     * A copy that adds exactly the given inertial terms (all four is the physical case, the
     * default).
     *
     * @param terms the terms to add; any subset, the empty set included
     * @return the copy
     * @throws NullPointerException if {@code terms} or an element is null
     */
    public TrajectorySolver withTerms(Set<InertialTerm> terms) {
        Arguments.nonNull("terms", terms);
        EnumSet<InertialTerm> copy = EnumSet.noneOf(InertialTerm.class);
        for (InertialTerm t : terms) {
            copy.add(Arguments.nonNull("terms element", t));
        }
        return new TrajectorySolver(frame, forces, events, positionTolerance, velocityTolerance,
                relativeTolerance, minStep, maxStep, maxEvaluations, scheme, custom,
                Collections.unmodifiableSet(copy));
    }

    /**
     * Returns the inertial terms this solver adds (all four unless some were left out).
     *
     * @return the inertial terms this solver adds (all four unless some were left out)
     */
    public Set<InertialTerm> terms() {
        return included;
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
     * Returns the real specific forces, in the order given.
     *
     * @return the real specific forces, in the order given
     */
    public List<SpecificForce> forces() {
        return forces;
    }

    /**
     * Returns the events watched, in the order given.
     *
     * @return the events watched, in the order given
     */
    public List<TrajectoryEvent> events() {
        return events;
    }

    /**
     * Integrates from a framed state: the state is first converted into the integration frame.
     *
     * @param start the point at its time, in any frame of the same tree; its acceleration is
     *        ignored (the equations of motion give it)
     * @param endTime end of the span (s), after {@code start.time()}
     * @return the trajectory
     * @throws IllegalArgumentException if {@code endTime} is not after the start time, or the
     *         frames share no root
     * @throws TrajectoryFailure if the integration cannot go on (see {@link #solve(PointState, double, double)})
     */
    public Trajectory solve(FramedState start, double endTime) {
        Arguments.nonNull("start", start);
        return solve(start.in(frame).state(), start.time(), endTime);
    }

    /**
     * Integrates the motion of a point over [{@code startTime}, {@code endTime}], or until a
     * stopping event.
     *
     * @param start position (m) and velocity (m/s) at {@code startTime}, seen in and resolved in
     *        the integration frame; its acceleration is ignored (the equations of motion give it)
     * @param startTime start of the span (s from the user's epoch), finite
     * @param endTime end of the span (s), finite and after {@code startTime}
     * @return the trajectory
     * @throws IllegalArgumentException if a time is not finite or {@code endTime} is not after
     *         {@code startTime}
     * @throws NullPointerException if {@code start} is null
     * @throws TrajectoryFailure if a force or event function throws or returns a non-finite
     *         value, the state becomes non-finite, the frame motion fails, or the integrator gives
     *         up; the exception names the time and state
     */
    public Trajectory solve(PointState start, double startTime, double endTime) {
        Arguments.nonNull("start", start);
        Arguments.finite("startTime", startTime);
        Arguments.finite("endTime", endTime);
        if (!(endTime > startTime)) {
            throw new IllegalArgumentException("endTime must be after startTime = " + startTime + " s, got "
                    + endTime + " s");
        }
        MotionEquations equations = new MotionEquations(frame, forces, included);
        ODEIntegrator integrator = createIntegrator(endTime - startTime);
        integrator.setMaxEvaluations(maxEvaluations);
        List<ODEStateInterpolator> steps = new ArrayList<>();
        integrator.addStepHandler(new ODEStepHandler() {
            @Override
            public void handleStep(ODEStateInterpolator interpolator) {
                if (steps.size() >= MAX_STORED_STEPS) {
                    ODEStateAndDerivative at = interpolator.getPreviousState();
                    throw new TrajectoryFailure("the run needs more than " + MAX_STORED_STEPS + " accepted steps, the"
                            + " most a trajectory stores (dense output); integrate shorter spans one after the other,"
                            + " or loosen the tolerances", at.getTime(), at.getPrimaryState(), null);
                }
                steps.add(interpolator);
            }
        });
        RunLog log = new RunLog();
        for (TrajectoryEvent e : events) {
            integrator.addEventDetector(new Watch(e, equations, log));
        }
        Vector3D r = start.position();
        Vector3D v = start.velocity();
        double[] y0 = {r.getX(), r.getY(), r.getZ(), v.getX(), v.getY(), v.getZ()};
        ODEStateAndDerivative last;
        try {
            last = integrator.integrate(equations, new ODEState(startTime, y0), endTime);
        } catch (TrajectoryFailure e) {
            throw completed(e, equations, steps, startTime, y0, log, integrator);
        } catch (MathRuntimeException e) {
            ODEStateAndDerivative at = integrator.getStepStart();
            TrajectoryFailure f = new TrajectoryFailure("integrator " + integrator.getName() + " gave up ("
                    + e.getMessage() + ")", at == null ? startTime : at.getTime(),
                    at == null ? y0 : at.getPrimaryState(), e);
            throw completed(f, equations, steps, startTime, y0, log, integrator);
        }
        return new Trajectory(equations, steps, startTime, y0, last.getTime(), last.getPrimaryState(),
                log.marks, log.stop, integrator.getEvaluations(), integrator.getName());
    }

    private ODEIntegrator createIntegrator(double span) {
        if (custom != null) {
            ODEIntegrator i = custom.get();
            if (i == null) {
                throw new IllegalArgumentException("integrator supplier must return an integrator, got null");
            }
            if (!i.getStepHandlers().isEmpty() || !i.getEventDetectors().isEmpty()) {
                throw new IllegalArgumentException("integrator supplier must return a fresh integrator without "
                        + "step handlers or event detectors, got one with " + i.getStepHandlers().size()
                        + " handlers and " + i.getEventDetectors().size() + " detectors");
            }
            return i;
        }
        double p = positionTolerance;
        double u = velocityTolerance;
        double q = relativeTolerance;
        double step = Double.isNaN(maxStep) ? span : maxStep;
        if (!(minStep < step)) {
            throw new IllegalArgumentException("minimum step must be below the largest step " + step
                    + " s (the span unless set), got " + minStep + " s");
        }
        return scheme.create(minStep, step, new double[] {p, p, p, u, u, u}, new double[] {q, q, q, q, q, q});
    }

    @Override
    public String toString() {
        return "TrajectorySolver{frame=" + frame.path() + ", " + forces.size() + " forces, " + events.size()
                + " events, tolerance position=" + Formats.number(positionTolerance) + " m, velocity="
                + Formats.number(velocityTolerance) + " m/s, relative=" + Formats.number(relativeTolerance)
                + ", minStep=" + Formats.number(minStep) + " s, maxStep="
                + (Double.isNaN(maxStep) ? "span" : Formats.number(maxStep) + " s") + ", "
                + (custom == null ? scheme : "custom integrator")
                + (included.size() == InertialTerm.values().length ? "" : ", inertial terms " + included) + "}";
    }

    /**
     * Most accepted steps one trajectory stores with their dense output. A run that needs more is
     * refused with a {@link TrajectoryFailure} whose {@link TrajectoryFailure#partial()} holds the
     * steps computed so far, so memory stays bounded instead of growing until the run fails.
     * The memory a stored step takes is measured on the
     * <a href="../../../../../reliability.html#runs">reliability page</a> (section Integrations that
     * fail).
     */
    public static final int MAX_STORED_STEPS = 200_000;

    /** The failure with the trajectory computed before it. */
    private static TrajectoryFailure completed(TrajectoryFailure e, MotionEquations equations,
                                               List<ODEStateInterpolator> steps, double startTime, double[] y0,
                                               RunLog log, ODEIntegrator integrator) {
        Trajectory partial = null;
        double lastGood = startTime;
        if (!steps.isEmpty()) {
            ODEStateAndDerivative end = steps.get(steps.size() - 1).getCurrentState();
            lastGood = end.getTime();
            partial = new Trajectory(equations, steps, startTime, y0, lastGood, end.getPrimaryState(),
                    log.marks, null, integrator.getEvaluations(), integrator.getName());
        }
        return e.completed(partial, lastGood, startTime);
    }

    private static final class RunLog {
        private final List<EventMark> marks = new ArrayList<>();
        private EventMark stop;
    }

    /** Bridge from a {@link TrajectoryEvent} to the Hipparchus event machinery. */
    private static final class Watch implements ODEEventDetector, ODEEventHandler {
        private final TrajectoryEvent event;
        private final MotionEquations equations;
        private final RunLog log;
        private final AdaptableInterval interval;
        private final BracketedUnivariateSolver<UnivariateFunction> solver;

        Watch(TrajectoryEvent event, MotionEquations equations, RunLog log) {
            this.event = event;
            this.equations = equations;
            this.log = log;
            this.interval = AdaptableInterval.of(event.checkInterval());
            this.solver = new BracketingNthOrderBrentSolver(0.0, event.timeAccuracy(), 0.0, 5);
        }

        @Override
        public AdaptableInterval getMaxCheckInterval() {
            return interval;
        }

        @Override
        public int getMaxIterationCount() {
            return 100;
        }

        @Override
        public BracketedUnivariateSolver<UnivariateFunction> getSolver() {
            return solver;
        }

        @Override
        public ODEEventHandler getHandler() {
            return this;
        }

        @Override
        public double g(ODEStateAndDerivative s) {
            double t = s.getTime();
            double[] y = s.getPrimaryState();
            double[] d = s.getPrimaryDerivative();
            MotionEquations.checkState(t, y);
            PointState p = PointState.of(new Vector3D(y[0], y[1], y[2]), new Vector3D(y[3], y[4], y[5]),
                    new Vector3D(d[3], d[4], d[5]));
            double value;
            try {
                value = event.function().at(t, p);
            } catch (TrajectoryFailure e) {
                throw e;
            } catch (RuntimeException e) {
                throw new TrajectoryFailure("crossing function of event '" + event.name() + "' threw " + e, t, y, e);
            }
            if (!Double.isFinite(value)) {
                throw new TrajectoryFailure("crossing function of event '" + event.name()
                        + "' returned a non-finite value " + value, t, y, null);
            }
            return value;
        }

        @Override
        public Action eventOccurred(ODEStateAndDerivative s, ODEEventDetector detector, boolean increasing) {
            TrajectoryEvent.Direction dir = event.direction();
            if ((dir == TrajectoryEvent.Direction.RISING && !increasing)
                    || (dir == TrajectoryEvent.Direction.FALLING && increasing)) {
                return Action.CONTINUE;
            }
            boolean stops = event.stops() && log.stop == null;
            EventMark mark = new EventMark(event.name(), equations.framed(s.getTime(), s.getPrimaryState()),
                    increasing, stops);
            log.marks.add(mark);
            if (stops) {
                log.stop = mark;
                return Action.STOP;
            }
            return Action.CONTINUE;
        }
    }
}
