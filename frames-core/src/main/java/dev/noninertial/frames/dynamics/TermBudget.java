package dev.noninertial.frames.dynamics;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;

/**
 * A per-term budget of a trajectory: the same case integrated once with every inertial term the
 * solver adds, then once with each of them left out in turn (frame acceleration, Euler, Coriolis,
 * centrifugal), reporting how far each one moves the end point. The end point of a run is its
 * final state: where a stopping event (a ground impact) ended it, else at the end time, so the
 * runs may end at different times.
 *
 * <pre>{@code
 * TermBudget budget = TermBudget.of(solver, start, 0.0, 120.0);
 * double coriolisMetres = budget.distance(InertialTerm.CORIOLIS);
 * System.out.println(budget);            // one row per term; budget.toCsv() for a file
 * }</pre>
 *
 * <p><b>Conventions.</b> Shifts are the end position of the run without the term minus the end
 * position of the full run, both seen in and resolved in the solver's integration frame (m); time
 * shifts likewise (s). Only terms the solver adds are budgeted. The left-out runs are not
 * physical motions; they measure how much each term matters in this frame. The terms are not
 * independent (removing two at once is not the sum of removing each), so the shifts do not add
 * up to anything in general.
 *
 * <p>Results are for simulation and analysis, not for aiming, firing or safety decisions; defer to
 * local codes and licensed practice.
 *
 * <p>Immutable and thread-safe.
 */
public final class TermBudget {

    private final FramedState reference;
    private final Map<InertialTerm, FramedState> without;

    private TermBudget(FramedState reference, Map<InertialTerm, FramedState> without) {
        this.reference = reference;
        this.without = without;
    }

    /**
     * Runs the budget from a framed state (converted into the integration frame first).
     *
     * @param solver the case: frame, forces, events, tolerances
     * @param start the point at its time, any frame of the same tree
     * @param endTime end of the span (s), after the start time
     * @return the budget
     * @throws IllegalArgumentException as {@link TrajectorySolver#solve(FramedState, double)}
     * @throws TrajectoryFailure if one of the runs fails
     */
    public static TermBudget of(TrajectorySolver solver, FramedState start, double endTime) {
        Arguments.nonNull("solver", solver);
        Arguments.nonNull("start", start);
        return of(solver, start.in(solver.frame()).state(), start.time(), endTime);
    }

    /**
     * Runs the budget: {@code 1 + solver.terms().size()} integrations, one after the other.
     *
     * @param solver the case: frame, forces, events, tolerances
     * @param start position (m) and velocity (m/s) at {@code startTime}, in the integration frame
     * @param startTime start (s)
     * @param endTime end of the span (s), after {@code startTime}
     * @return the budget
     * @throws IllegalArgumentException as {@link TrajectorySolver#solve(PointState, double, double)}
     * @throws TrajectoryFailure if one of the runs fails
     */
    public static TermBudget of(TrajectorySolver solver, PointState start, double startTime, double endTime) {
        Arguments.nonNull("solver", solver);
        FramedState reference = solver.solve(start, startTime, endTime).finalState();
        Map<InertialTerm, FramedState> without = new EnumMap<>(InertialTerm.class);
        for (InertialTerm term : solver.terms()) {
            without.put(term, solver.withoutTerm(term).solve(start, startTime, endTime).finalState());
        }
        return new TermBudget(reference, Collections.unmodifiableMap(without));
    }

    /**
     * Returns the end point of the run with every term the solver adds.
     *
     * @return the end point of the run with every term the solver adds
     */
    public FramedState reference() {
        return reference;
    }

    /**
     * Returns the terms budgeted (those the solver adds).
     *
     * @return the terms budgeted (those the solver adds)
     */
    public Set<InertialTerm> terms() {
        return without.keySet();
    }

    /**
     * The end point of the run without one term.
     *
     * @param term a budgeted term
     * @return its end point
     * @throws IllegalArgumentException if the term was not budgeted
     */
    public FramedState endWithout(InertialTerm term) {
        Arguments.nonNull("term", term);
        FramedState s = without.get(term);
        if (s == null) {
            throw new IllegalArgumentException("term must be one of the budgeted terms " + without.keySet()
                    + ", got " + term);
        }
        return s;
    }

    /**
     * How far leaving the term out moves the end point.
     *
     * @param term a budgeted term
     * @return end position without the term minus the reference end position (m), integration frame
     */
    public Vector3D shift(InertialTerm term) {
        return endWithout(term).state().position().subtract(reference.state().position());
    }

    /**
     * The length of {@link #shift(InertialTerm)}.
     *
     * @param term a budgeted term
     * @return distance (m)
     */
    public double distance(InertialTerm term) {
        return shift(term).getNorm();
    }

    /**
     * How much leaving the term out changes the end time (a stopping event moves).
     *
     * @param term a budgeted term
     * @return end time without the term minus the reference end time (s)
     */
    public double timeShift(InertialTerm term) {
        return endWithout(term).time() - reference.time();
    }

    /**
     * The budget as CSV: a header line, then one line per budgeted term, in the order of
     * {@link InertialTerm#values()}.
     *
     * @return CSV text with columns term, dx_m, dy_m, dz_m, distance_m, dt_s (shift components in
     *         the integration frame, its length, the time shift), lines separated by '\n'
     */
    public String toCsv() {
        StringBuilder b = new StringBuilder("term,dx_m,dy_m,dz_m,distance_m,dt_s\n");
        for (InertialTerm term : without.keySet()) {
            Vector3D d = shift(term);
            b.append(String.format(Locale.ROOT, "%s,%.9e,%.9e,%.9e,%.9e,%.9e\n", term, d.getX(), d.getY(), d.getZ(),
                    d.getNorm(), timeShift(term)));
        }
        return b.toString();
    }

    /**
     * A readable table: the reference end point, then one row per budgeted term with the shift
     * components, its length and the time shift.
     *
     * @return the table, lines separated by '\n'
     */
    @Override
    public String toString() {
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "Term budget: end point with every term at t = %.6f s in %s\n",
                reference.time(), reference.frame().path()));
        b.append(String.format(Locale.ROOT, "%-20s %14s %14s %14s %14s %12s\n", "left out", "dx (m)", "dy (m)",
                "dz (m)", "distance (m)", "dt (s)"));
        for (InertialTerm term : without.keySet()) {
            Vector3D d = shift(term);
            b.append(String.format(Locale.ROOT, "%-20s %14.6g %14.6g %14.6g %14.6g %12.4g\n", term, d.getX(), d.getY(),
                    d.getZ(), d.getNorm(), timeShift(term)));
        }
        return b.toString();
    }
}
