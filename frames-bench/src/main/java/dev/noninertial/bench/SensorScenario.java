package dev.noninertial.bench;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Placement;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;
import dev.noninertial.frames.sensing.IdealSensor;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * Inputs of the sensor benchmarks (invented): an IMU on a lever arm of a rolling hull moored at a
 * site, in the Earth tree ECI / ECEF / level / hull / IMU, with the Earth's gravitation; and the
 * hand-written baseline: the placement of the IMU in the inertial root on primitives
 * ({@link ReferenceFrame#placementIn(ReferenceFrame, double, double[], int)}), the Earth-fixed
 * position by hand, the primitive gravitation
 * ({@link EarthModel#gravitation(double, double, double, double[], int)}) and the rotations and
 * subtraction by hand.
 */
final class SensorScenario {

    /** Readings per bulk call. */
    static final int COUNT = HotPathGate.STATES;
    /** Increment interval (s): a 100 Hz IMU. */
    static final double STEP = 0.01;

    final EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-12-02T00:00:00Z"));
    final ReferenceFrame imuFrame;
    final IdealSensor imu;
    final double[] times = new double[COUNT];
    final double[] out = new double[6 * COUNT];
    final double[] work = new double[2 * Placement.COMPONENTS + 3];

    SensorScenario() {
        ReferenceFrame level = earth.localLevel(LatLonHeight.ofDegrees(57.62, 11.31, 12.0), LocalAxes.NED);
        ReferenceFrame hull = level.attach("hull", Motions.oscillation(Vector3D.PLUS_I, 0.09, 0.63, 0.2));
        imuFrame = hull.attach("imu", Motions.stationary(new Vector3D(22.0, -9.0, -31.0)));
        imu = IdealSensor.of(imuFrame, earth.gravitationIn(imuFrame));
        for (int k = 0; k < COUNT; k++) {
            times[k] = STEP * k;
        }
    }

    /** Library: bulk readings. */
    void readings() {
        imu.readingsAt(times, 0, out, 0, COUNT);
    }

    /** Library: increments on the 100 Hz grid, {@code count} of them. */
    void increments(int count) {
        imu.incrementsOver(0.0, STEP, count, out, 0);
    }

    /** Baseline (b): placement in the root plus gravitation, by hand on primitives. */
    void baseline() {
        ReferenceFrame root = earth.inertial();
        EarthModel model = earth.model();
        double w = model.rotationRate();
        double[] p = work;
        for (int k = 0; k < COUNT; k++) {
            double t = times[k];
            imuFrame.placementIn(root, t, p, 0);
            // ECEF axes are ECI axes turned by theta about z: x_E = Rz(theta) x_I
            double th = earth.angleAtEpoch() + w * t;
            double c = Math.cos(th);
            double s = Math.sin(th);
            double ex = c * p[0] + s * p[1];
            double ey = -s * p[0] + c * p[1];
            model.gravitation(ex, ey, p[2], p, 48);
            double gix = c * p[48] - s * p[49];
            double giy = s * p[48] + c * p[49];
            double giz = p[50];
            double ax = p[6] - gix;
            double ay = p[7] - giy;
            double az = p[8] - giz;
            int o = 6 * k;
            out[o] = p[9] * ax + p[10] * ay + p[11] * az;
            out[o + 1] = p[12] * ax + p[13] * ay + p[14] * az;
            out[o + 2] = p[15] * ax + p[16] * ay + p[17] * az;
            out[o + 3] = p[18];
            out[o + 4] = p[19];
            out[o + 5] = p[20];
        }
    }
}
