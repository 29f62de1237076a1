package dev.noninertial.bench;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;

import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.dynamics.TrajectorySolver;
import dev.noninertial.frames.motion.Motions;

/**
 * The point-mass problem of {@link DynamicsBenchmark} written by hand: Newton's law in a frame
 * spinning up about z, {@code a = g - al x r - 2 w x v - w x (w x r)} with
 * {@code w = (0, 0, RATE0 + SPIN_UP t)}, integrated by the Hipparchus Dormand-Prince 8(5,3)
 * integrator with the library's default tolerances; the interpolators are kept, as the library
 * keeps them for dense output.
 */
public final class DynamicsBaselines {

    /** Spin rate at t = 0 (rad/s). */
    public static final double RATE0 = 0.5;
    /** Angular acceleration (rad/s^2). */
    public static final double SPIN_UP = 0.002;
    /** Gravity, the real specific force in the benchmark (m/s^2), along -z. */
    public static final double G = 9.81;
    /** Span of the whole trajectory (s). */
    public static final double SPAN = 100.0;
    /** A span the integrator covers in one step (checked by a test). */
    public static final double ONE_STEP = 0.01;

    private DynamicsBaselines() {
    }

    /** @return the library solver of the benchmark: a carousel frame in an inertial yard */
    public static TrajectorySolver solver() {
        ReferenceFrame yard = ReferenceFrame.inertialRoot("yard");
        ReferenceFrame carousel = yard.attach("carousel", Motions.spinUp(Vector3D.PLUS_K, 0.0, RATE0, SPIN_UP));
        Vector3D gravity = new Vector3D(0, 0, -G);
        SpecificForce weight = (time, state) -> gravity;
        return TrajectorySolver.of(carousel).plusForce(weight);
    }

    /** @return the start state: 10 m off the axis, thrown upward and sideways */
    public static PointState start() {
        return PointState.of(new Vector3D(10.0, 0.0, 2.0), new Vector3D(0.0, 1.0, 30.0));
    }

    private static double[] y0() {
        return new double[] {10.0, 0.0, 2.0, 0.0, 1.0, 30.0};
    }

    /**
     * Integrates the benchmark problem from 0 to {@code span}.
     *
     * @param primitives true for equations on primitives (b), false for Vector3D objects (a)
     * @param span end time (s)
     * @return the final state x, y, z, vx, vy, vz
     */
    public static double[] integrate(boolean primitives, double span) {
        return run(primitives, span, new ArrayList<>());
    }

    /**
     * Number of integrator steps of {@link #integrate(boolean, double)} (for the tests).
     *
     * @param primitives as in {@link #integrate(boolean, double)}
     * @param span end time (s)
     * @return the number of steps
     */
    static int steps(boolean primitives, double span) {
        List<ODEStateInterpolator> steps = new ArrayList<>();
        run(primitives, span, steps);
        return steps.size();
    }

    private static double[] run(boolean primitives, double span, List<ODEStateInterpolator> steps) {
        double p = TrajectorySolver.DEFAULT_POSITION_TOLERANCE;
        double u = TrajectorySolver.DEFAULT_VELOCITY_TOLERANCE;
        double q = TrajectorySolver.DEFAULT_RELATIVE_TOLERANCE;
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(0.0, span,
                new double[] {p, p, p, u, u, u}, new double[] {q, q, q, q, q, q});
        integrator.addStepHandler(steps::add);
        ODEStateAndDerivative end = integrator.integrate(primitives ? new PrimitiveEquations() : new ObjectEquations(),
                new ODEState(0.0, y0()), span);
        return end.getPrimaryState();
    }

    private static final class PrimitiveEquations implements OrdinaryDifferentialEquation {
        @Override
        public int getDimension() {
            return 6;
        }

        @Override
        public double[] computeDerivatives(double t, double[] y) {
            double w = RATE0 + SPIN_UP * t;
            double x = y[0];
            double yy = y[1];
            double vx = y[3];
            double vy = y[4];
            // w = (0, 0, w), al = (0, 0, SPIN_UP): -al x r - 2 w x v - w x (w x r)
            double ax = SPIN_UP * yy + 2 * w * vy + w * w * x;
            double ay = -SPIN_UP * x - 2 * w * vx + w * w * yy;
            return new double[] {y[3], y[4], y[5], ax, ay, -G};
        }
    }

    private static final class ObjectEquations implements OrdinaryDifferentialEquation {
        private final Vector3D gravity = new Vector3D(0, 0, -G);

        @Override
        public int getDimension() {
            return 6;
        }

        @Override
        public double[] computeDerivatives(double t, double[] y) {
            Vector3D r = new Vector3D(y[0], y[1], y[2]);
            Vector3D v = new Vector3D(y[3], y[4], y[5]);
            Vector3D w = new Vector3D(0, 0, RATE0 + SPIN_UP * t);
            Vector3D al = new Vector3D(0, 0, SPIN_UP);
            Vector3D a = gravity.subtract(Vector3D.crossProduct(al, r))
                    .subtract(Vector3D.crossProduct(w, v).scalarMultiply(2))
                    .subtract(Vector3D.crossProduct(w, Vector3D.crossProduct(w, r)));
            return new double[] {v.getX(), v.getY(), v.getZ(), a.getX(), a.getY(), a.getZ()};
        }
    }
}
