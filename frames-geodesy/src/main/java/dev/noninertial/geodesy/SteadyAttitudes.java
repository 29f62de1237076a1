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
     * Angles changing at the constant rates of the start sample from its angles at t = 0.
     *
     * @param start angles (rad) and rates (rad/s) at t = 0, angular accelerations zero
     */
    record Turning(AttitudeSample start) implements AttitudeProfile, Serializable {
        private static final long serialVersionUID = 1L;

        /** Re-runs the checks of {@link AttitudeProfile#constantRates}. */
        Turning {
            Arguments.nonNull("start", start);
            if (start.headingAcceleration() != 0 || start.pitchAcceleration() != 0
                    || start.rollAcceleration() != 0) {
                throw new IllegalArgumentException("start must have zero angular accelerations for constant rates");
            }
        }

        @Override
        public AttitudeSample at(double t) {
            Arguments.finite("t", t);
            return new AttitudeSample(start.heading() + start.headingRate() * t,
                    start.pitch() + start.pitchRate() * t, start.roll() + start.rollRate() * t,
                    start.headingRate(), start.pitchRate(), start.rollRate(), 0, 0, 0);
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
