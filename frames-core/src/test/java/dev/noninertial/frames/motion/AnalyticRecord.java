package dev.noninertial.frames.motion;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;

/**
 * An analytic platform motion and its samples, the reference of the sampled-motion tests: a
 * spin-up about the vertical, a harmonic roll about the spun x axis and a harmonic heave along the
 * rolled z axis, stacked with {@link Motion#then(Motion)}. Its rates are exact (closed-form
 * derivatives of sines and polynomials, composed by the textbook rules of relative motion).
 */
final class AnalyticRecord {

    static final Motion REFERENCE = Motions.spinUp(Vector3D.PLUS_K, 0.2, 0.05, 0.004)
            .then(Motions.oscillation(Vector3D.PLUS_I, 0.12, 2 * Math.PI / 7, 0.3))
            .then(Motions.heave(Vector3D.PLUS_K, 0.8, 2 * Math.PI / 9, 0.1));

    final double[] times;
    final double[] positions;
    final double[] quaternions;
    final double[] velocities;
    final double[] rates;

    /** Samples REFERENCE at the given times. */
    AnalyticRecord(double[] times) {
        int n = times.length;
        this.times = times;
        positions = new double[3 * n];
        quaternions = new double[4 * n];
        velocities = new double[3 * n];
        rates = new double[3 * n];
        for (int i = 0; i < n; i++) {
            Placement p = REFERENCE.at(times[i]);
            put(positions, i, p.origin());
            put(velocities, i, p.originVelocity());
            put(rates, i, p.angularVelocity());
            Rotation r = p.orientation();
            quaternions[4 * i] = r.getQ0();
            quaternions[4 * i + 1] = r.getQ1();
            quaternions[4 * i + 2] = r.getQ2();
            quaternions[4 * i + 3] = r.getQ3();
        }
    }

    /** Uniform samples over [0, span] at rate hz. */
    static AnalyticRecord uniform(double hz, double span) {
        int n = (int) Math.round(span * hz) + 1;
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i / hz;
        }
        return new AnalyticRecord(t);
    }

    SampledMotion poses() {
        return SampledMotion.fromArrays(times, positions, quaternions);
    }

    SampledMotion withRates() {
        return poses().withVelocities(velocities).withAngularVelocities(rates);
    }

    private static void put(double[] a, int i, Vector3D v) {
        a[3 * i] = v.getX();
        a[3 * i + 1] = v.getY();
        a[3 * i + 2] = v.getZ();
    }

    /** Largest errors at the mid-points of all intervals: position, velocity, acceleration (m, m/s,
     *  m/s^2), attitude angle (rad), angular velocity (rad/s), angular acceleration (rad/s^2). */
    static double[] midpointErrors(SampledMotion m, double[] times) {
        double[] worst = new double[6];
        for (int i = 0; i + 1 < times.length; i++) {
            double t = 0.5 * (times[i] + times[i + 1]);
            Placement s = m.at(t);
            Placement r = REFERENCE.at(t);
            worst[0] = Math.max(worst[0], s.origin().distance(r.origin()));
            worst[1] = Math.max(worst[1], s.originVelocity().distance(r.originVelocity()));
            worst[2] = Math.max(worst[2], s.originAcceleration().distance(r.originAcceleration()));
            worst[3] = Math.max(worst[3], Rotation.distance(s.orientation(), r.orientation()));
            worst[4] = Math.max(worst[4], s.angularVelocity().distance(r.angularVelocity()));
            worst[5] = Math.max(worst[5], s.angularAcceleration().distance(r.angularAcceleration()));
        }
        return worst;
    }
}
