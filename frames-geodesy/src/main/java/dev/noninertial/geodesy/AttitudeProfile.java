package dev.noninertial.geodesy;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;

/**
 * Heading, pitch and roll of a body over a local-level frame as functions of time, with their
 * first and second derivatives (convention in {@link AttitudeSample}). {@link #toMotion()}
 * turns it into the motion of a body frame in the level frame, with analytic angular velocity
 * and acceleration; {@link EarthFrames#body(ReferenceFrame, String, AttitudeProfile)} attaches it.
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
     * A fixed attitude.
     *
     * @param heading yaw (rad)
     * @param pitch pitch (rad)
     * @param roll roll (rad)
     * @return the profile
     */
    static AttitudeProfile still(double heading, double pitch, double roll) {
        AttitudeSample sample = AttitudeSample.still(heading, pitch, roll);
        return new SteadyAttitudes.Still(sample);
    }

    /**
     * Angles changing at constant rates from given values at t = 0 (a steady turn, a steady
     * roll-in).
     *
     * @param start angles at t = 0 (rad), rates and accelerations ignored
     * @param headingRate d(heading)/dt (rad/s)
     * @param pitchRate d(pitch)/dt (rad/s)
     * @param rollRate d(roll)/dt (rad/s)
     * @return the profile
     */
    static AttitudeProfile constantRates(AttitudeSample start, double headingRate, double pitchRate, double rollRate) {
        Arguments.nonNull("start", start);
        Arguments.finite("headingRate", headingRate);
        Arguments.finite("pitchRate", pitchRate);
        Arguments.finite("rollRate", rollRate);
        return new SteadyAttitudes.Turning(start, headingRate, pitchRate, rollRate);
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
     * @param s the attitude sample
     * @return the placement (origin at the level frame's origin)
     */
    static Placement bodyPlacement(AttitudeSample s) {
        Arguments.nonNull("attitude sample", s);
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
