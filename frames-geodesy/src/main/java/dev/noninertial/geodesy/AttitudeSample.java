package dev.noninertial.geodesy;

import java.io.Serializable;

import dev.noninertial.frames.Arguments;

/**
 * Attitude of a body relative to a local-level frame at one instant: heading (yaw), pitch and
 * roll in radians, with first and second time derivatives.
 *
 * <p>Convention: the aerospace z-y-x sequence of {@link dev.noninertial.frames.Orientations}:
 * from the level frame's axes turn by heading about z, then pitch about the new y, then roll
 * about the new x. Over an NED level frame with a body frame x forward, y right, z down, heading
 * is measured clockwise from north, pitch is nose up, roll is right side down.
 *
 * <p>Immutable and thread-safe.
 *
 * @param heading yaw angle (rad)
 * @param pitch pitch angle (rad)
 * @param roll roll angle (rad)
 * @param headingRate d(heading)/dt (rad/s)
 * @param pitchRate d(pitch)/dt (rad/s)
 * @param rollRate d(roll)/dt (rad/s)
 * @param headingAcceleration d2(heading)/dt2 (rad/s^2)
 * @param pitchAcceleration d2(pitch)/dt2 (rad/s^2)
 * @param rollAcceleration d2(roll)/dt2 (rad/s^2)
 */
public record AttitudeSample(double heading, double pitch, double roll,
                             double headingRate, double pitchRate, double rollRate,
                             double headingAcceleration, double pitchAcceleration, double rollAcceleration)
        implements Serializable {

    /**
     * Validates the sample.
     *
     * @param heading yaw angle (rad)
     * @param pitch pitch angle (rad)
     * @param roll roll angle (rad)
     * @param headingRate d(heading)/dt (rad/s)
     * @param pitchRate d(pitch)/dt (rad/s)
     * @param rollRate d(roll)/dt (rad/s)
     * @param headingAcceleration d2(heading)/dt2 (rad/s^2)
     * @param pitchAcceleration d2(pitch)/dt2 (rad/s^2)
     * @param rollAcceleration d2(roll)/dt2 (rad/s^2)
     * @throws IllegalArgumentException if a value is not finite
     */
    public AttitudeSample {
        Arguments.finite("heading", heading);
        Arguments.finite("pitch", pitch);
        Arguments.finite("roll", roll);
        Arguments.finite("headingRate", headingRate);
        Arguments.finite("pitchRate", pitchRate);
        Arguments.finite("rollRate", rollRate);
        Arguments.finite("headingAcceleration", headingAcceleration);
        Arguments.finite("pitchAcceleration", pitchAcceleration);
        Arguments.finite("rollAcceleration", rollAcceleration);
    }

    /**
     * A stationary attitude (no rates, no angular accelerations).
     *
     * @param heading yaw angle (rad)
     * @param pitch pitch angle (rad)
     * @param roll roll angle (rad)
     * @return the sample
     */
    public static AttitudeSample stationary(double heading, double pitch, double roll) {
        return new AttitudeSample(heading, pitch, roll, 0, 0, 0, 0, 0, 0);
    }

    /**
     * A copy with the three rates replaced (angles and angular accelerations kept).
     *
     * @param newHeadingRate d(heading)/dt (rad/s)
     * @param newPitchRate d(pitch)/dt (rad/s)
     * @param newRollRate d(roll)/dt (rad/s)
     * @return the sample
     * @throws IllegalArgumentException if a rate is not finite
     */
    public AttitudeSample withRates(double newHeadingRate, double newPitchRate, double newRollRate) {
        Arguments.finite("newHeadingRate", newHeadingRate);
        Arguments.finite("newPitchRate", newPitchRate);
        Arguments.finite("newRollRate", newRollRate);
        return new AttitudeSample(heading, pitch, roll, newHeadingRate, newPitchRate, newRollRate,
                headingAcceleration, pitchAcceleration, rollAcceleration);
    }
}
