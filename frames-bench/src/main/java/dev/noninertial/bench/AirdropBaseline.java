package dev.noninertial.bench;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

import dev.noninertial.examples.AirdropStudy;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.dispersion.DispersionCase;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.air.Atmosphere1976;

/**
 * The airdrop descent of {@link AirdropStudy} written by hand: Newton's law in the drop zone's
 * east-north-up frame (fixed on the rotating Earth) on primitive doubles,
 * <pre>
 *   a = R g(o + R^T r) - (1/2) rho(h) (A/m) |u| u - 2 w x v - w x (w x (R o + r)),   u = v - wind
 * </pre>
 * with {@code R} the frame's orientation in the Earth-fixed frame, {@code o} its origin,
 * {@code w} the Earth's rotation in the frame's axes, {@code g} the library's
 * {@code EarthModel.gravitation} (the same normal field), {@code rho} the library's
 * {@code Atmosphere1976.density} at the geodetic height from {@code Ellipsoid.toGeodetic} (the
 * same models called directly, so the comparison measures the frame machinery, the force
 * plumbing and the solver wrapper), the wind taken in the zone's axes (the library turns it
 * into the local axes at the point: a difference below 1e-4 of the wind over 1 km), the same
 * Hipparchus Dormand-Prince 8(5,3) integrator, tolerances, largest step, and ground-crossing
 * detection.
 */
public final class AirdropBaseline {

    private final EarthModel model = EarthModel.WGS84;
    private final Ellipsoid shape = model.ellipsoid();
    private final Atmosphere1976 air = Atmosphere1976.standard();
    /** R row by row (v_zone = R v_ECEF), origin o (ECEF), and R o. */
    private final double[] r = new double[9];
    private final double ox;
    private final double oy;
    private final double oz;
    private final double cx;
    private final double cy;
    private final double cz;
    /** Earth rotation in zone axes. */
    private final double wx;
    private final double wy;
    private final double wz;

    /** Builds the constants of the zone frame once. */
    public AirdropBaseline() {
        EarthFrames earth = AirdropStudy.earth();
        Placement p = AirdropStudy.zone(earth).placementIn(earth.earthFixed(), 0.0);
        double[][] m = p.orientationMatrix();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                r[3 * i + j] = m[i][j];
            }
        }
        ox = p.origin().getX();
        oy = p.origin().getY();
        oz = p.origin().getZ();
        cx = r[0] * ox + r[1] * oy + r[2] * oz;
        cy = r[3] * ox + r[4] * oy + r[5] * oz;
        cz = r[6] * ox + r[7] * oy + r[8] * oz;
        double w = model.rotationRate();
        wx = r[2] * w;
        wy = r[5] * w;
        wz = r[8] * w;
    }

    /**
     * One descent by hand, from the drawn inputs of a case of {@link AirdropStudy#study(int, long)}.
     *
     * @param c the case's inputs (same order as the study)
     * @return east (m), north (m), descent time (s)
     */
    public double[] descent(DispersionCase c) {
        double heading = Math.toRadians(c.value(4));
        double alongE = Math.sin(heading);
        double alongN = Math.cos(heading);
        double x = AirdropStudy.PLANNED_EAST + c.value(0) * alongE + c.value(1) * alongN;
        double y = c.value(0) * alongN - c.value(1) * alongE;
        double speed = c.value(3);
        double areaOverMass = 1.0 / c.value(5);
        double windE = c.value(6);
        double windN = c.value(7);
        OrdinaryDifferentialEquation equations = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 6;
            }

            @Override
            public double[] computeDerivatives(double t, double[] s) {
                double ex = ox + r[0] * s[0] + r[3] * s[1] + r[6] * s[2];
                double ey = oy + r[1] * s[0] + r[4] * s[1] + r[7] * s[2];
                double ez = oz + r[2] * s[0] + r[5] * s[1] + r[8] * s[2];
                Vector3D earthFixed = new Vector3D(ex, ey, ez);
                double h = shape.toGeodetic(earthFixed).height();
                Vector3D g = model.gravitation(earthFixed);
                double gx = r[0] * g.getX() + r[1] * g.getY() + r[2] * g.getZ();
                double gy = r[3] * g.getX() + r[4] * g.getY() + r[5] * g.getZ();
                double gz = r[6] * g.getX() + r[7] * g.getY() + r[8] * g.getZ();
                double ux = s[3] - windE;
                double uy = s[4] - windN;
                double uz = s[5];
                double k = -0.5 * air.density(h) * areaOverMass * Math.sqrt(ux * ux + uy * uy + uz * uz);
                double px = cx + s[0];
                double py = cy + s[1];
                double pz = cz + s[2];
                double qx = wy * pz - wz * py;
                double qy = wz * px - wx * pz;
                double qz = wx * py - wy * px;
                return new double[] {s[3], s[4], s[5],
                    gx + k * ux - 2 * (wy * s[5] - wz * s[4]) - (wy * qz - wz * qy),
                    gy + k * uy - 2 * (wz * s[3] - wx * s[5]) - (wz * qx - wx * qz),
                    gz + k * uz - 2 * (wx * s[4] - wy * s[3]) - (wx * qy - wy * qx)};
            }
        };
        double tol = AirdropStudy.TOLERANCE;
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(0.0, AirdropStudy.MAX_STEP,
                new double[] {tol, tol, tol, tol, tol, tol}, new double[] {tol, tol, tol, tol, tol, tol});
        integrator.addEventDetector(new Ground());
        ODEStateAndDerivative end = integrator.integrate(equations,
                new ODEState(0.0, new double[] {x, y, c.value(2), speed * alongE, speed * alongN, 0.0}), 600.0);
        double[] s = end.getPrimaryState();
        return new double[] {s[0], s[1], end.getTime()};
    }

    /** Stops at the falling crossing of the zone's horizontal plane. */
    private static final class Ground implements ODEEventDetector, ODEEventHandler {
        private final AdaptableInterval interval = AdaptableInterval.of(AirdropStudy.CHECK_INTERVAL);
        private final BracketedUnivariateSolver<UnivariateFunction> solver =
                new BracketingNthOrderBrentSolver(0.0, 1e-10, 0.0, 5);

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
            return s.getPrimaryState()[2];
        }

        @Override
        public Action eventOccurred(ODEStateAndDerivative s, ODEEventDetector detector, boolean increasing) {
            return increasing ? Action.CONTINUE : Action.STOP;
        }
    }
}
