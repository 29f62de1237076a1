package dev.noninertial.frames.dynamics;

import org.hipparchus.ode.ODEIntegrator;
import org.hipparchus.ode.nonstiff.DormandPrince54Integrator;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.nonstiff.GraggBulirschStoerIntegrator;
import org.hipparchus.ode.nonstiff.HighamHall54Integrator;

/**
 * The adaptive-step Hipparchus integrators a {@link TrajectorySolver} can use. All control the
 * local error per step against the solver's absolute tolerances (m on position, m/s on velocity)
 * plus its relative tolerance times the component's size. Other Hipparchus integrators can be
 * supplied with {@link TrajectorySolver#withIntegrator(java.util.function.Supplier)}.
 *
 * <p>An enum constant: immutable and thread-safe; each run builds its own integrator from it.
 */
public enum IntegrationScheme {

    /** Dormand-Prince 8(5,3): explicit Runge-Kutta of order 8 with 7th-order dense output; the default. */
    DORMAND_PRINCE_853 {
        @Override
        ODEIntegrator create(double minStep, double maxStep, double[] absolute, double[] relative) {
            return new DormandPrince853Integrator(minStep, maxStep, absolute, relative);
        }
    },

    /** Dormand-Prince 5(4): cheaper per step, suited to loose tolerances. */
    DORMAND_PRINCE_54 {
        @Override
        ODEIntegrator create(double minStep, double maxStep, double[] absolute, double[] relative) {
            return new DormandPrince54Integrator(minStep, maxStep, absolute, relative);
        }
    },

    /** Higham-Hall 5(4). */
    HIGHAM_HALL_54 {
        @Override
        ODEIntegrator create(double minStep, double maxStep, double[] absolute, double[] relative) {
            return new HighamHall54Integrator(minStep, maxStep, absolute, relative);
        }
    },

    /** Gragg-Bulirsch-Stoer extrapolation: long steps on smooth problems at tight tolerances. */
    GRAGG_BULIRSCH_STOER {
        @Override
        ODEIntegrator create(double minStep, double maxStep, double[] absolute, double[] relative) {
            return new GraggBulirschStoerIntegrator(minStep, maxStep, absolute, relative);
        }
    };

    /** Builds a fresh integrator (integrators hold per-run state and are never shared). */
    abstract ODEIntegrator create(double minStep, double maxStep, double[] absolute, double[] relative);
}
