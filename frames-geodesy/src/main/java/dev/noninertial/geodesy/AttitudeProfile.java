package dev.noninertial.geodesy;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;

/**
 * Heading, pitch and roll of a body over a local-level frame as functions of time, with their
 * first and second derivatives (convention in {@link AttitudeSample}). {@link #toMotion()}
 * turns it into the motion of a body frame in the level frame, with analytic angular velocity
 * and acceleration; {@link EarthFrames#body(String, dev.noninertial.frames.ReferenceFrame, AttitudeProfile,
 * LocalAxes)} attaches it with the heading sense named.
 *
 * <p>Time {@code t} is in seconds from the frames' epoch. Implementations must return
 * consistent derivatives and should be immutable and thread-safe.
 */
@FunctionalInterface
public interface AttitudeProfile {

    /**
     * The attitude and its rates at time {@code t}.
     *
     * @param t time (s)
     * @return the sample
     */
    AttitudeSample at(double t);

    /**
     * An attitude that does not change (all rates zero).
     *
     * @param heading yaw (rad)
     * @param pitch pitch (rad)
     * @param roll roll (rad)
     * @return the profile
     */
    static AttitudeProfile stationary(double heading, double pitch, double roll) {
        AttitudeSample sample = AttitudeSample.stationary(heading, pitch, roll);
        return new SteadyAttitudes.Still(sample);
    }

    /**
     * Angles changing at constant rates from a start sample at t = 0 (a steady turn, a steady
     * roll-in): {@code heading(t) = start.heading() + start.headingRate() t}, and so on. Make the
     * start sample with {@link AttitudeSample#withRates(double, double, double)}, for example
     * {@code constantRates(AttitudeSample.stationary(h, p, r).withRates(0, 0, rollRate))}.
     *
     * @param start angles (rad) and rates (rad/s) at t = 0; its angular accelerations must be zero
     * @return the profile
     * @throws IllegalArgumentException if an angular acceleration of {@code start} is not zero
     *         (a constant-rate profile has none)
     */
    static AttitudeProfile constantRates(AttitudeSample start) {
        Arguments.nonNull("start", start);
        if (start.headingAcceleration() != 0 || start.pitchAcceleration() != 0 || start.rollAcceleration() != 0) {
            throw new IllegalArgumentException("start must have zero angular accelerations for constant rates, got ("
                    + start.headingAcceleration() + ", " + start.pitchAcceleration() + ", "
                    + start.rollAcceleration() + ") rad/s^2 (heading, pitch, roll)");
        }
        return new SteadyAttitudes.Turning(start);
    }

    /**
     * The motion of the body frame in the level frame: orientation by the z-y-x sequence, angular
     * velocity in body axes
     * {@code (roll' - heading' sin(pitch), pitch' cos(roll) + heading' sin(roll) cos(pitch),
     * -pitch' sin(roll) + heading' cos(roll) cos(pitch))} and its time derivative; the origin
     * stays at the level frame's origin.
     *
     * @return the motion
     */
    default Motion toMotion() {
        return new SteadyAttitudes.BodyMotion(this);
    }

    /**
     * Placement of the body frame in the level frame for one attitude sample.
     *
     * @param sample the attitude sample
     * @return the placement (origin at the level frame's origin)
     */
    static Placement bodyPlacement(AttitudeSample sample) {
        Arguments.nonNull("sample", sample);
        AttitudeSample s = sample;
        double sr = Math.sin(s.roll());
        double cr = Math.cos(s.roll());
        double sp = Math.sin(s.pitch());
        double cp = Math.cos(s.pitch());
        double yd = s.headingRate();
        double pd = s.pitchRate();
        double rd = s.rollRate();
        double wx = rd - yd * sp;
        double wy = pd * cr + yd * sr * cp;
        double wz = -pd * sr + yd * cr * cp;
        double ydd = s.headingAcceleration();
        double pdd = s.pitchAcceleration();
        double rdd = s.rollAcceleration();
        double ax = rdd - ydd * sp - yd * cp * pd;
        double ay = pdd * cr - pd * sr * rd + ydd * sr * cp + yd * cr * rd * cp - yd * sr * sp * pd;
        double az = -pdd * sr - pd * cr * rd + ydd * cr * cp - yd * sr * rd * cp - yd * cr * sp * pd;
        double[] q = dev.noninertial.frames.Orientations.toQuaternion(
                dev.noninertial.frames.Orientations.fromYawPitchRoll(s.heading(), s.pitch(), s.roll()));
        return Placement.ofQuaternion(0, 0, 0, 0, 0, 0, 0, 0, 0, q[0], q[1], q[2], q[3], wx, wy, wz, ax, ay, az);
    }
}
