package dev.noninertial.frames.motion;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;

import org.junit.jupiter.api.Test;

/**
 * Convergence of the sampled motion to an analytic motion (the reference of {@link AnalyticRecord},
 * exact by construction) sampled at 10, 50 and 200 Hz over 60 s, errors taken at the mid-points of
 * all intervals, where interpolation errors peak.
 *
 * <p>Promised orders (the class comment of {@link SampledMotion}): a quintic Hermite matching
 * derivatives taken from local quartics: h^5 for position and attitude, h^4 for velocity and
 * angular velocity, h^3 for acceleration and angular acceleration. Standard interpolation theory
 * (REFERENCES.md, Interpolation): an interpolant exact for polynomials of degree k-1 has value
 * error O(h^k) and loses one order per derivative; the test measures the orders rather than
 * taking them on trust. The check:
 * the observed order between two rates is at least the promised order minus 0.5 (margin for
 * the constant changing with h; common practice), unless both errors are already at the
 * rounding floor (1e3 ulp of the quantity's scale).
 */
class SampledMotionAccuracyTest {

    private static final String[] NAMES = {"position (m)", "velocity (m/s)", "acceleration (m/s^2)",
        "attitude (rad)", "angular velocity (rad/s)", "angular acceleration (rad/s^2)"};
    private static final int[] PROMISED = {5, 4, 3, 5, 4, 3};
    // rounding floors: 1e3 ulp of the scale of each quantity (position ~1 m, rate ~1 /s ...)
    private static final double[] FLOOR = {2e-13, 2e-13, 2e-13, 2e-13, 2e-13, 2e-13};
    private static final double[] RATES = {10, 50, 200};

    @Test
    void poseOnlyRecordConvergesAtThePromisedOrders() {
        double[][] errors = new double[RATES.length][];
        for (int k = 0; k < RATES.length; k++) {
            AnalyticRecord r = AnalyticRecord.uniform(RATES[k], 60.0);
            errors[k] = AnalyticRecord.midpointErrors(r.poses(), r.times);
        }
        report("pose only", errors);
        checkOrders(errors, PROMISED, FLOOR);
        // absolute sanity at 10 Hz: a 0.1 s interval of a ~1 rad/s motion interpolates to 1e-6 m
        assertTrue(errors[0][0] < 1e-5, "position error at 10 Hz " + errors[0][0]);
    }

    @Test
    void measuredRatesRecordConvergesOneOrderFaster() {
        double[][] errors = new double[RATES.length][];
        for (int k = 0; k < RATES.length; k++) {
            AnalyticRecord r = AnalyticRecord.uniform(RATES[k], 60.0);
            errors[k] = AnalyticRecord.midpointErrors(r.withRates(), r.times);
        }
        report("with measured velocities and rates", errors);
        // exact first derivatives, second derivatives from quartics through them: one order more
        // than without rates (h^6, h^5, h^4). Floors: double rounding of the samples (1e-16 relative)
        // times the Hermite coefficients (~20) times 1/h per derivative (200 at 200 Hz), with margin
        double[] floor = {1e-13, 1e-11, 1e-11, 1e-13, 1e-11, 1e-11};
        checkOrders(errors, new int[] {6, 5, 4, 6, 5, 4}, floor);
        // measured rates must help: at 10 Hz the position error is at least 10 times smaller
        AnalyticRecord r = AnalyticRecord.uniform(10, 60.0);
        double[] without = AnalyticRecord.midpointErrors(r.poses(), r.times);
        assertTrue(errors[0][0] * 10 < without[0], errors[0][0] + " vs " + without[0]);
    }

    @Test
    void fictitiousAccelerationsOnBoardMatchTheAnalyticFrame() {
        // a point walking on the deck of the sampled frame sees the same frame, Euler, Coriolis and
        // centrifugal terms as on the analytic frame it was sampled from, to the interpolation
        // error at 50 Hz (acceleration 1e-6 m/s^2 and angular acceleration 1e-7 rad/s^2 from the
        // table above, times lever arms of a few metres: 1e-5 m/s^2 bound)
        AnalyticRecord r = AnalyticRecord.uniform(50, 60.0);
        dev.noninertial.frames.ReferenceFrame sea = dev.noninertial.frames.ReferenceFrame.inertialRoot("sea");
        dev.noninertial.frames.ReferenceFrame logged = sea.attach("logged deck", r.poses());
        dev.noninertial.frames.ReferenceFrame exact = sea.attach("exact deck", AnalyticRecord.REFERENCE);
        dev.noninertial.frames.PointState walker = dev.noninertial.frames.PointState.of(
                new org.hipparchus.geometry.euclidean.threed.Vector3D(3.0, -1.5, 0.8),
                new org.hipparchus.geometry.euclidean.threed.Vector3D(0.6, 0.2, 0.0));
        for (double t = 0.013; t < 60; t += 1.37) {
            dev.noninertial.frames.FictitiousAccelerations a = logged.placementIn(sea, t).fictitious(walker);
            dev.noninertial.frames.FictitiousAccelerations b = exact.placementIn(sea, t).fictitious(walker);
            assertTrue(a.frameAcceleration().distance(b.frameAcceleration()) < 1e-5, "frame at " + t);
            assertTrue(a.euler().distance(b.euler()) < 1e-5, "Euler at " + t);
            assertTrue(a.coriolis().distance(b.coriolis()) < 1e-5, "Coriolis at " + t);
            assertTrue(a.centrifugal().distance(b.centrifugal()) < 1e-5, "centrifugal at " + t);
        }
    }

    private static void checkOrders(double[][] errors, int[] promised, double[] floor) {
        for (int q = 0; q < promised.length; q++) {
            for (int k = 0; k + 1 < RATES.length; k++) {
                double coarse = errors[k][q];
                double fine = errors[k + 1][q];
                if (fine < floor[q]) {
                    continue;
                }
                double order = Math.log(coarse / fine) / Math.log(RATES[k + 1] / RATES[k]);
                assertTrue(order >= promised[q] - 0.5, NAMES[q] + ": observed order " + order + " between "
                        + RATES[k] + " and " + RATES[k + 1] + " Hz, promised " + promised[q]);
            }
        }
    }

    private static void report(String title, double[][] errors) {
        StringBuilder b = new StringBuilder("sampled motion accuracy, " + title + "\n");
        for (int q = 0; q < NAMES.length; q++) {
            b.append(String.format(Locale.ROOT, "%-32s", NAMES[q]));
            for (int k = 0; k < RATES.length; k++) {
                b.append(String.format(Locale.ROOT, " %10.3e", errors[k][q]));
            }
            for (int k = 0; k + 1 < RATES.length; k++) {
                double order = Math.log(errors[k][q] / errors[k + 1][q]) / Math.log(RATES[k + 1] / RATES[k]);
                b.append(String.format(Locale.ROOT, " %6.2f", order));
            }
            b.append('\n');
        }
        System.out.print(b);
    }
}
