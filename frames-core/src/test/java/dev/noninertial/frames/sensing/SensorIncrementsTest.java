package dev.noninertial.frames.sensing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.frames.motion.Motions;

/**
 * Increments against an independent integration (Hipparchus Dormand-Prince 8(5,3), run to
 * 1e-15 relative) and against exact integrals of polynomial motions.
 */
class SensorIncrementsTest {

    private static final Vector3D G = new Vector3D(0, 0, -9.80665);

    /** A sensor on a rocking, slewing, accelerating platform with a lever arm. */
    private static IdealSensor platformSensor() {
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame deck = lab.attach("deck", 
                Motions.translation(new Vector3D(3, -2, 1), new Vector3D(1.5, 0.4, 0), new Vector3D(0.1, -0.05, 0.02))
                        .then(Motions.heave(Vector3D.PLUS_K, 0.8, 0.9, 0.3)));
        ReferenceFrame slew = deck.attach("slew", Motions.spinUp(new Vector3D(0.1, 0.2, 1), 0.4, 0.3, 0.05));
        ReferenceFrame boom = slew.attach("boom", Motions.oscillation(new Vector3D(1, -0.3, 0.2), 0.25, 1.3, 0.7));
        ReferenceFrame imu = boom.attach("imu", Motions.stationary(new Vector3D(8, 1, -2)));
        return IdealSensor.of(imu, SpecificForce.fixedInAxesOf(lab, G, imu));
    }

    @Test
    void incrementsAgreeWithAnIndependentQuadratureTo1e12() {
        IdealSensor imu = platformSensor();
        double worst = 0;
        for (double dt : new double[] {0.005, 0.1, 1.0, 4.0}) {
            for (double t0 : new double[] {0.0, 3.7, 12.25}) {
                SensorIncrements d = imu.incrementsOver(t0, t0 + dt);
                double[] ref = reference(imu, t0, dt);
                Vector3D dv = new Vector3D(ref[0], ref[1], ref[2]);
                Vector3D da = new Vector3D(ref[3], ref[4], ref[5]);
                double ev = d.deltaVelocity().subtract(dv).getNorm() / dv.getNorm();
                double ea = d.deltaAngle().subtract(da).getNorm() / da.getNorm();
                worst = Math.max(worst, Math.max(ev, ea));
                // the requirement: 1e-12 relative to the increment
                assertTrue(ev <= 1e-12, "dv dt=" + dt + " t0=" + t0 + " rel " + ev);
                assertTrue(ea <= 1e-12, "da dt=" + dt + " t0=" + t0 + " rel " + ea);
            }
        }
        System.out.printf(Locale.ROOT, "MEASURED increments vs Hipparchus Dormand-Prince 8(5,3), intervals 5 ms to 4 s: "
                + "worst relative difference %.2e%n", worst);
    }

    /**
     * Independent reference: the six integrals as the solution of y' = reading(t), y(t0) = 0, by
     * Hipparchus' Dormand-Prince 8(5,3) integrator with step control at 1e-15 relative and 1e-16
     * absolute (m/s or rad) per step, far below the 1e-12 asked.
     */
    private static double[] reference(IdealSensor imu, double t0, double dt) {
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 6;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                InertialReading r = imu.readingAt(t);
                return new double[] {r.specificForce().getX(), r.specificForce().getY(), r.specificForce().getZ(),
                    r.angularRate().getX(), r.angularRate().getY(), r.angularRate().getZ()};
            }
        };
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-9 * dt, dt, 1e-16, 1e-15);
        return integrator.integrate(ode, new ODEState(t0, new double[6]), t0 + dt).getPrimaryState();
    }

    @Test
    void polynomialMotionsIntegrateExactly() {
        // o(t) = c0 + c1 t + c2 t^2 + c3 t^3 + c4 t^4 + c5 t^5: o'' is a cubic, its integral is
        // o'(t1) - o'(t0) exactly (fundamental theorem of calculus); the 5-point rule is exact up to
        // degree 7, so only rounding remains
        Vector3D c1 = new Vector3D(2, -1, 0.5);
        Vector3D c2 = new Vector3D(0.3, 0.1, -0.2);
        Vector3D c3 = new Vector3D(-0.05, 0.02, 0.01);
        Vector3D c4 = new Vector3D(0.004, -0.003, 0.002);
        Vector3D c5 = new Vector3D(-1e-4, 2e-4, 3e-5);
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame cart = lab.attach("cart", Motions.translation(Vector3D.ZERO, c1, c2, c3, c4, c5));
        IdealSensor imu = IdealSensor.of(cart, SpecificForce.uniform(G));
        double t0 = 1.5;
        double t1 = 4.0;
        SensorIncrements d = imu.incrementsOver(t0, t1);
        Vector3D expected = velocity(c1, c2, c3, c4, c5, t1).subtract(velocity(c1, c2, c3, c4, c5, t0))
                .subtract(t1 - t0, G);
        // 1e-14 m/s: rounding of sums of terms ~25 m/s
        IdealSensorTest.assertClose(expected, d.deltaVelocity(), 1e-14 * 25, "dv polynomial");
        assertEquals(0.0, d.deltaAngle().getNorm(), 0.0);

        // spin with constant angular acceleration about a fixed axis: w = (r0 + al t) n in S axes,
        // integral n (r0 dt + al (t1^2 - t0^2) / 2) exactly
        Vector3D n = new Vector3D(1, -2, 2).normalize();
        ReferenceFrame table = lab.attach("table", Motions.spinUp(n, 0.1, 0.6, 0.25));
        SensorIncrements s = IdealSensor.of(table, SpecificForce.uniform(G)).incrementsOver(t0, t1);
        Vector3D angle = n.scalarMultiply(0.6 * (t1 - t0) + 0.125 * (t1 * t1 - t0 * t0));
        IdealSensorTest.assertClose(angle, s.deltaAngle(), 1e-15 * 5, "dtheta spin-up");
    }

    private static Vector3D velocity(Vector3D c1, Vector3D c2, Vector3D c3, Vector3D c4, Vector3D c5, double t) {
        return new Vector3D(1, c1, 2 * t, c2, 3 * t * t, c3, 4 * t * t * t, c4).add(5 * t * t * t * t, c5);
    }

    @Test
    void aLooserToleranceStaysWithinItsStatement() {
        // convergence: the error shrinks with the tolerance and stays below what the tolerance states
        IdealSensor tight = platformSensor();
        for (double tol : new double[] {1e-4, 1e-7, 1e-10}) {
            IdealSensor loose = tight.withTolerance(tol);
            SensorIncrements a = loose.incrementsOver(2.0, 6.0);
            SensorIncrements b = tight.incrementsOver(2.0, 6.0);
            double scale = 4.0 * 30;   // integral of |a| + |g| over 4 s is below 30 m/s^2 x 4 s here
            double err = a.deltaVelocity().subtract(b.deltaVelocity()).getNorm();
            assertTrue(err <= tol * scale, "tol " + tol + " error " + err);
        }
    }

    @Test
    void gridIncrementsAreTheSingleIncrements() {
        IdealSensor imu = platformSensor();
        double[] out = new double[6 * 5 + 1];
        imu.incrementsOver(1.0, 0.02, 5, out, 1);
        for (int k = 0; k < 5; k++) {
            SensorIncrements d = imu.incrementsOver(1.0 + k * 0.02, 1.0 + (k + 1) * 0.02);
            // same readings and arithmetic: identical bits
            assertEquals(d.deltaVelocity(), new Vector3D(out[1 + 6 * k], out[2 + 6 * k], out[3 + 6 * k]));
            assertEquals(d.deltaAngle(), new Vector3D(out[4 + 6 * k], out[5 + 6 * k], out[6 + 6 * k]));
        }
    }
}
