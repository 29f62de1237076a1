package dev.noninertial.geodesy;

import java.io.Serializable;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;

/**
 * The attitude profiles and the body motion made by {@link AttitudeProfile}'s factories, as
 * records rather than serializable lambdas: a record deserializes through its canonical
 * constructor, so a stream meets the checks of the factories (a lambda's captured values are
 * never re-checked).
 */
final class SteadyAttitudes {

    private SteadyAttitudes() {
    }

    /**
     * A fixed attitude.
     *
     * @param sample the attitude, rates zero
     */
    record Still(AttitudeSample sample) implements AttitudeProfile, Serializable {
        private static final long serialVersionUID = 1L;

        /** Refuses a missing sample. */
        Still {
            Arguments.nonNull("sample", sample);
        }

        @Override
        public AttitudeSample at(double t) {
            Arguments.finite("t", t);
            return sample;
        }
    }

    /**
     * Angles changing at constant rates from given values at t = 0.
     *
     * @param start angles at t = 0 (rad)
     * @param headingRate d(heading)/dt (rad/s)
     * @param pitchRate d(pitch)/dt (rad/s)
     * @param rollRate d(roll)/dt (rad/s)
     */
    record Turning(AttitudeSample start, double headingRate, double pitchRate, double rollRate)
            implements AttitudeProfile, Serializable {
        private static final long serialVersionUID = 1L;

        /** Re-runs the checks of {@link AttitudeProfile#constantRates}. */
        Turning {
            Arguments.nonNull("start", start);
            Arguments.finite("headingRate", headingRate);
            Arguments.finite("pitchRate", pitchRate);
            Arguments.finite("rollRate", rollRate);
        }

        @Override
        public AttitudeSample at(double t) {
            Arguments.finite("t", t);
            return new AttitudeSample(start.heading() + headingRate * t, start.pitch() + pitchRate * t,
                    start.roll() + rollRate * t, headingRate, pitchRate, rollRate, 0, 0, 0);
        }
    }

    /**
     * The motion of a body frame in its level frame, from an attitude profile.
     *
     * @param profile the attitude over time
     */
    record BodyMotion(AttitudeProfile profile) implements Motion, Serializable {
        private static final long serialVersionUID = 1L;

        /** Refuses a missing profile. */
        BodyMotion {
            Arguments.nonNull("profile", profile);
        }

        @Override
        public Placement at(double t) {
            return AttitudeProfile.bodyPlacement(profile.at(t));
        }
    }
}
