package dev.noninertial.geodesy.navigation;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.LatLonHeight;

/**
 * Which terms of the mechanization a job can drop: the same increments navigated once with every
 * term ({@link LevelNavigator#withAllTerms()}, the reference run) and once more with each
 * {@link NavigationTerm} left out, and the position and attitude deviation from the reference run
 * that each omission causes over the run.
 *
 * <pre>{@code
 * ErrorBudget budget = ErrorBudget.of(navigator, start, ends, deltaVelocities, deltaAngles);
 * System.out.println(budget);            // one row per term
 * }</pre>
 *
 * <p>The deviations measure the effect of the mechanization alone, not the sensor errors: both
 * runs see the same increments. Where the gravity model's height or latitude dependence is left
 * out, gravity is taken at the navigator's gravity reference, or at the start position if the
 * navigator has none. The horizontal and vertical parts are split along the ellipsoid normal at
 * the reference run's end position.
 *
 * <p><b>Caution:</b> for simulation and analysis, not for primary navigation.
 *
 * <p>Immutable and thread-safe.
 */
public final class ErrorBudget implements Serializable {

    private static final long serialVersionUID = 1L;

    /**
     * The effect of leaving out one term.
     *
     * @param term the term left out
     * @param horizontalAtEnd horizontal distance from the reference run at the end (m)
     * @param verticalAtEnd height difference from the reference run at the end, positive up (m)
     * @param attitudeAtEnd attitude angle from the reference run at the end (rad)
     * @param peakPosition largest position distance from the reference run over the run (m)
     * @param peakAttitude largest attitude angle from the reference run over the run (rad)
     */
    public record TermEffect(NavigationTerm term, double horizontalAtEnd, double verticalAtEnd,
                             double attitudeAtEnd, double peakPosition, double peakAttitude) implements Serializable {

        /**
         * Checks the components.
         *
         * @param term the term left out
         * @param horizontalAtEnd horizontal distance from the reference run at the end (m)
         * @param verticalAtEnd height difference from the reference run at the end, positive up (m)
         * @param attitudeAtEnd attitude angle from the reference run at the end (rad)
         * @param peakPosition largest position distance from the reference run over the run (m)
         * @param peakAttitude largest attitude angle from the reference run over the run (rad)
         * @throws NullPointerException if {@code term} is null
         * @throws IllegalArgumentException if a number is not finite
         */
        public TermEffect {
            Arguments.nonNull("term", term);
            Arguments.finite("horizontalAtEnd", horizontalAtEnd);
            Arguments.finite("verticalAtEnd", verticalAtEnd);
            Arguments.finite("attitudeAtEnd", attitudeAtEnd);
            Arguments.finite("peakPosition", peakPosition);
            Arguments.finite("peakAttitude", peakAttitude);
        }

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "%s: horizontal %.3e m, vertical %.3e m, attitude %.3e rad at the end; "
                    + "peak %.3e m, %.3e rad", term.label(), horizontalAtEnd, verticalAtEnd, attitudeAtEnd,
                    peakPosition, peakAttitude);
        }
    }

    /** The final state of the run with every term included. */
    private final NavigationState reference;
    /** Duration of each run (s). */
    private final double duration;
    /** Number of steps of each run. */
    private final int steps;
    /** The effect of leaving out each term, one entry per term. */
    @SuppressWarnings("serial") // an unmodifiable ArrayList of records: serializable
    private final List<TermEffect> effects;

    private ErrorBudget(NavigationState reference, double duration, int steps, List<TermEffect> effects) {
        this.reference = reference;
        this.duration = duration;
        this.steps = steps;
        this.effects = effects;
    }

    /**
     * Navigates the increments with every term, then with each term left out in turn.
     *
     * @param navigator the navigator (its left-out terms are restored for the reference run)
     * @param start the state at the start of the first step, in the navigator's axes
     * @param ends end time of each step (s), n values, increasing
     * @param deltaVelocities delta-velocity of each step, x, y, z packed (m/s, body axes), 3 n values
     * @param deltaAngles delta-angle of each step, packed (rad, body axes), 3 n values
     * @return the budget
     * @throws IllegalArgumentException for mismatched lengths or a refused step
     */
    public static ErrorBudget of(LevelNavigator navigator, NavigationState start, double[] ends,
                                 double[] deltaVelocities, double[] deltaAngles) {
        return of(navigator, start, ends, deltaVelocities, deltaAngles, StepInputs.OF_ARRAYS);
    }

    /** The budget, a refused step named as the caller's inputs {@code names}. */
    private static ErrorBudget of(LevelNavigator navigator, NavigationState start, double[] ends,
                                  double[] deltaVelocities, double[] deltaAngles, StepInputs names) {
        Arguments.nonNull("navigator", navigator);
        Arguments.nonNull("start", start);
        Arguments.nonNull("ends", ends);
        Arguments.nonNull("deltaVelocities", deltaVelocities);
        Arguments.nonNull("deltaAngles", deltaAngles);
        int n = ends.length;
        if (n == 0) {
            throw new IllegalArgumentException("ends must hold at least one step, got 0");
        }
        LevelNavigator.checkIncrementLengths(n, deltaVelocities, deltaAngles);
        LevelNavigator full = navigator.withAllTerms();
        if (full.gravityReference() == null) {
            full = full.withGravityReference(start.position());
        }
        Ellipsoid shape = full.model().ellipsoid();
        // reference run: Earth-fixed position (3) and attitude quaternion (4) after each step
        double[] ref = new double[7 * n];
        double[] w = full.newWork(start);
        LevelKernel kernel = full.kernel();
        for (int k = 0; k < n; k++) {
            int i = 3 * k;
            kernel.step(w, ends[k], deltaVelocities[i], deltaVelocities[i + 1], deltaVelocities[i + 2],
                    deltaAngles[i], deltaAngles[i + 1], deltaAngles[i + 2], null, 0, names, k);
            shape.toCartesian(w[LevelKernel.LAT], w[LevelKernel.LON], w[LevelKernel.H], ref, 7 * k);
            System.arraycopy(w, LevelKernel.Q0, ref, 7 * k + 3, 4);
        }
        NavigationState end = full.stateOf(w);
        Vector3D up = shape.normal(end.position());
        List<TermEffect> effects = new ArrayList<>();
        double[] x = new double[3];
        for (NavigationTerm term : NavigationTerm.values()) {
            LevelNavigator variant = full.without(term);
            LevelKernel vk = variant.kernel();
            double[] v = variant.newWork(start);
            double peakPosition = 0.0;
            double peakAttitude = 0.0;
            for (int k = 0; k < n; k++) {
                int i = 3 * k;
                vk.step(v, ends[k], deltaVelocities[i], deltaVelocities[i + 1], deltaVelocities[i + 2],
                        deltaAngles[i], deltaAngles[i + 1], deltaAngles[i + 2], null, 0, names, k);
                shape.toCartesian(v[LevelKernel.LAT], v[LevelKernel.LON], v[LevelKernel.H], x, 0);
                int o = 7 * k;
                double dx = x[0] - ref[o];
                double dy = x[1] - ref[o + 1];
                double dz = x[2] - ref[o + 2];
                peakPosition = Math.max(peakPosition, Math.sqrt(dx * dx + dy * dy + dz * dz));
                peakAttitude = Math.max(peakAttitude, angle(ref, o + 3, v, LevelKernel.Q0));
            }
            int o = 7 * (n - 1);
            Vector3D d = new Vector3D(x[0] - ref[o], x[1] - ref[o + 1], x[2] - ref[o + 2]);
            double vertical = d.dotProduct(up);
            double horizontal = Math.sqrt(Math.max(0.0, d.getNormSq() - vertical * vertical));
            effects.add(new TermEffect(term, horizontal, vertical, angle(ref, o + 3, v, LevelKernel.Q0),
                    peakPosition, peakAttitude));
        }
        return new ErrorBudget(end, ends[n - 1] - start.time(), n, Collections.unmodifiableList(effects));
    }

    /**
     * The budget of increments on a regular time grid in the interleaved layout of an inertial
     * sensor's bulk output (6 doubles per step: delta-velocity x, y, z, then delta-angle x, y, z,
     * body axes); step {@code k} ends at {@code start.time() + (k + 1) interval}.
     *
     * @param navigator the navigator
     * @param start the state at the start of the first step
     * @param interval step length (s), positive
     * @param count number of steps, at least 1
     * @param increments the increments, 6 per step from {@code offset}
     * @param offset index of the first step's delta-velocity x
     * @return the budget
     * @throws IllegalArgumentException for a range that does not fit or a refused step
     */
    public static ErrorBudget of(LevelNavigator navigator, NavigationState start, double interval, int count,
                                 double[] increments, int offset) {
        Arguments.nonNull("start", start);
        Arguments.positive("interval (s)", interval);
        Arguments.nonNull("increments", increments);
        if (count < 1 || offset < 0 || (long) offset + 6L * count > increments.length) {
            throw new IllegalArgumentException("increments must hold 6 x count = " + 6L * count + " values from offset "
                    + offset + " (count at least 1), got an array of " + increments.length);
        }
        double[] ends = new double[count];
        double[] dv = new double[3 * count];
        double[] da = new double[3 * count];
        for (int k = 0; k < count; k++) {
            ends[k] = start.time() + (k + 1) * interval;
            System.arraycopy(increments, offset + 6 * k, dv, 3 * k, 3);
            System.arraycopy(increments, offset + 6 * k + 3, da, 3 * k, 3);
        }
        return of(navigator, start, ends, dv, da, StepInputs.ofGrid(offset));
    }

    /** Angle between two unit quaternions (rad), 2 asin |vector part of a* (x) b|, safe for small angles. */
    private static double angle(double[] a, int i, double[] b, int j) {
        double a0 = a[i];
        double a1 = -a[i + 1];
        double a2 = -a[i + 2];
        double a3 = -a[i + 3];
        double b0 = b[j];
        double b1 = b[j + 1];
        double b2 = b[j + 2];
        double b3 = b[j + 3];
        double x = a0 * b1 + a1 * b0 + a2 * b3 - a3 * b2;
        double y = a0 * b2 + a2 * b0 + a3 * b1 - a1 * b3;
        double z = a0 * b3 + a3 * b0 + a1 * b2 - a2 * b1;
        return 2.0 * Math.asin(Math.min(1.0, Math.sqrt(x * x + y * y + z * z)));
    }

    /**
     * Returns the end state of the reference run (every term included).
     *
     * @return the end state of the reference run (every term included)
     */
    public NavigationState reference() {
        return reference;
    }

    /**
     * Returns duration of the run (s).
     *
     * @return duration of the run (s)
     */
    public double duration() {
        return duration;
    }

    /**
     * Returns number of steps of the run.
     *
     * @return number of steps of the run
     */
    public int steps() {
        return steps;
    }

    /**
     * Returns one effect per term, in the order of {@link NavigationTerm#values()}.
     *
     * @return one effect per term, in the order of {@link NavigationTerm#values()}
     */
    public List<TermEffect> effects() {
        return effects;
    }

    /**
     * The effect of leaving out one term.
     *
     * @param term the term
     * @return its effect
     */
    public TermEffect effect(NavigationTerm term) {
        Arguments.nonNull("term", term);
        return effects.get(term.ordinal());
    }

    /**
     * The table as CSV: a header line, then one line per term.
     *
     * @return CSV text with columns term, horizontal_end_m, vertical_end_m, attitude_end_rad,
     *         peak_position_m, peak_attitude_rad
     */
    public String toCsv() {
        StringBuilder b = new StringBuilder(
                "term,horizontal_end_m,vertical_end_m,attitude_end_rad,peak_position_m,peak_attitude_rad\n");
        for (TermEffect e : effects) {
            b.append(String.format(Locale.ROOT, "%s,%.6e,%.6e,%.6e,%.6e,%.6e%n", e.term(), e.horizontalAtEnd(),
                    e.verticalAtEnd(), e.attitudeAtEnd(), e.peakPosition(), e.peakAttitude()));
        }
        return b.toString();
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT,
                "Error budget over %.1f s (%d steps): deviation from the run with every term%n", duration, steps));
        b.append(String.format(Locale.ROOT, "%-38s %13s %13s %13s %13s %13s%n", "term left out", "horiz. end m",
                "vert. end m", "att. end rad", "peak pos. m", "peak att. rad"));
        for (TermEffect e : effects) {
            b.append(String.format(Locale.ROOT, "%-38s %13.3e %13.3e %13.3e %13.3e %13.3e%n", e.term().label(),
                    e.horizontalAtEnd(), e.verticalAtEnd(), e.attitudeAtEnd(), e.peakPosition(), e.peakAttitude()));
        }
        return b.toString();
    }
}
