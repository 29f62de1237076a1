package dev.noninertial.frames.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.Function;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;

/**
 * Every Jacobian against central finite differences of the conversion itself. Source: the
 * definition of the derivative; the central difference (f(x + h) - f(x - h)) / 2h has truncation
 * error h^2 f''' / 6 and rounding error about eps |f| / h.
 */
class StateJacobiansTest {

    private static final double EPS = Math.ulp(1.0);

    private final Placement placement = Fixtures.mastOnCarrier();
    private final PointState inFrame = Fixtures.buoy();
    private final PointState inBase = placement.toBase(inFrame);

    private static double[] array(PointState s) {
        double[] x = new double[PointState.COMPONENTS];
        s.toArray(x, 0);
        return x;
    }

    /** Central-difference Jacobian of f over the first n state components, step h. */
    private static double[][] stateDifferences(Function<PointState, PointState> f, PointState at, int n, double h) {
        double[][] j = new double[n][n];
        for (int col = 0; col < n; col++) {
            double[] plus = array(at);
            double[] minus = array(at);
            plus[col] += h;
            minus[col] -= h;
            double[] fp = array(f.apply(PointState.fromArray(plus, 0)));
            double[] fm = array(f.apply(PointState.fromArray(minus, 0)));
            for (int row = 0; row < n; row++) {
                j[row][col] = (fp[row] - fm[row]) / (2 * h);
            }
        }
        return j;
    }

    /** Central-difference Jacobian of the conversion with respect to an attitude or origin error. */
    private static double[][] placementDifferences(Function<Placement, PointState> convert, Placement p,
                                                   boolean attitude, int n, double h) {
        double[][] j = new double[n][3];
        for (int col = 0; col < 3; col++) {
            Vector3D step = new Vector3D(col == 0 ? h : 0, col == 1 ? h : 0, col == 2 ? h : 0);
            Placement plus = attitude ? Fixtures.perturbed(p, step, Vector3D.ZERO)
                    : Fixtures.perturbed(p, Vector3D.ZERO, step);
            Placement minus = attitude ? Fixtures.perturbed(p, step.negate(), Vector3D.ZERO)
                    : Fixtures.perturbed(p, Vector3D.ZERO, step.negate());
            double[] fp = array(convert.apply(plus));
            double[] fm = array(convert.apply(minus));
            for (int row = 0; row < n; row++) {
                j[row][col] = (fp[row] - fm[row]) / (2 * h);
            }
        }
        return j;
    }

    private static double worst(RealMatrix analytic, double[][] numeric) {
        double worst = 0;
        for (int i = 0; i < numeric.length; i++) {
            for (int k = 0; k < numeric[0].length; k++) {
                worst = Math.max(worst, Math.abs(analytic.getEntry(i, k) - numeric[i][k]));
            }
        }
        return worst;
    }

    private static double largest(PointState s) {
        double m = 0;
        for (double x : array(s)) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }

    @Test
    void stateJacobiansMatchCentralDifferences() {
        // The conversions are affine in the state: f''' = 0, so only rounding remains,
        // about eps * |f| / h per entry; allow 100 times that.
        double h = 1e-2;
        double tolerance = 100 * EPS * Math.max(largest(inFrame), largest(inBase)) / h;
        for (StateLayout layout : StateLayout.values()) {
            int n = layout.size();
            double toBase = worst(StateJacobians.toBase(placement, layout),
                    stateDifferences(placement::toBase, inFrame, n, h));
            double fromBase = worst(StateJacobians.fromBase(placement, layout),
                    stateDifferences(placement::fromBase, inBase, n, h));
            assertTrue(toBase <= tolerance, layout + " toBase worst difference " + toBase + " > " + tolerance);
            assertTrue(fromBase <= tolerance, layout + " fromBase worst difference " + fromBase + " > " + tolerance);
            System.out.printf("uncertainty FD state %s: worst %.2e / %.2e (tolerance %.1e)%n", layout, toBase,
                    fromBase, tolerance);
        }
    }

    @Test
    void fromBaseJacobianIsTheInverseOfToBase() {
        // Inverse function theorem: d(f^-1) = (df)^-1. Entries are O(1); rounding of 9x9 products ~1e-15.
        RealMatrix product = StateJacobians.fromBase(placement, StateLayout.POSITION_VELOCITY_ACCELERATION)
                .multiply(StateJacobians.toBase(placement, StateLayout.POSITION_VELOCITY_ACCELERATION));
        double worst = product.subtract(MatrixUtils.createRealIdentityMatrix(9)).getNorm1();
        System.out.printf("uncertainty J_from J_to - I: norm1 %.2e%n", worst);
        assertEquals(0.0, worst, 1e-13);
    }

    @Test
    void attitudeJacobiansMatchCentralDifferences() {
        // Nonlinear in the rotation vector: truncation h^2 |f'''| / 6 with |f'''| ~ |f| ~ 400,
        // i.e. 7e-9 at h = 1e-5 rad, plus rounding eps * 400 / h = 9e-9 (the perturbed placement
        // goes through a quaternion and back, a few more ulps): about 1.6e-8, allow 1e-7.
        double h = 1e-5;
        double tolerance = 1e-7;
        for (StateLayout layout : StateLayout.values()) {
            int n = layout.size();
            double toBase = worst(StateJacobians.attitudeToBase(placement, inFrame, layout),
                    placementDifferences(p -> p.toBase(inFrame), placement, true, n, h));
            double fromBase = worst(StateJacobians.attitudeFromBase(placement, inBase, layout),
                    placementDifferences(p -> p.fromBase(inBase), placement, true, n, h));
            assertTrue(toBase <= tolerance, layout + " attitude toBase worst difference " + toBase);
            assertTrue(fromBase <= tolerance, layout + " attitude fromBase worst difference " + fromBase);
            System.out.printf("uncertainty FD attitude %s: worst %.2e / %.2e (tolerance %.1e)%n", layout, toBase,
                    fromBase, tolerance);
        }
    }

    @Test
    void originJacobiansMatchCentralDifferences() {
        // Affine in the origin error: rounding only, eps * |f| / h (the perturbed placement also
        // re-derives R from a quaternion, ~1e-16 relative on |r| ~ 270 m, divided by 2h).
        double h = 1e-2;
        double tolerance = 1e3 * EPS * Math.max(largest(inFrame), largest(inBase)) / h;
        for (StateLayout layout : StateLayout.values()) {
            int n = layout.size();
            double toBase = worst(StateJacobians.originToBase(placement, layout),
                    placementDifferences(p -> p.toBase(inFrame), placement, false, n, h));
            double fromBase = worst(StateJacobians.originFromBase(placement, layout),
                    placementDifferences(p -> p.fromBase(inBase), placement, false, n, h));
            assertTrue(toBase <= tolerance, layout + " origin toBase worst difference " + toBase + " > " + tolerance);
            assertTrue(fromBase <= tolerance, layout + " origin fromBase worst difference " + fromBase + " > "
                    + tolerance);
            System.out.printf("uncertainty FD origin %s: worst %.2e / %.2e (tolerance %.1e)%n", layout, toBase,
                    fromBase, tolerance);
        }
    }

    @Test
    void sixComponentJacobianIsTheUpperLeftBlock() {
        // Position and velocity do not depend on acceleration (Placement's conversion formulas).
        RealMatrix full = StateJacobians.toBase(placement, StateLayout.POSITION_VELOCITY_ACCELERATION);
        RealMatrix six = StateJacobians.toBase(placement, StateLayout.POSITION_VELOCITY);
        assertEquals(0.0, full.getSubMatrix(0, 5, 0, 5).subtract(six).getNorm1(), 0.0);
        assertEquals(0.0, full.getSubMatrix(0, 5, 6, 8).getNorm1(), 0.0);
    }
}
