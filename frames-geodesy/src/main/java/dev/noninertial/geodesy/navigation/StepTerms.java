package dev.noninertial.geodesy.navigation;

import java.io.Serializable;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;
import dev.noninertial.geodesy.LocalAxes;

/**
 * The named terms of one navigation step ({@link LevelNavigator#terms}), so an analyst sees which
 * ones matter. Accelerations are means over the step (m/s^2), angles are totals over the step
 * (rad).
 *
 * <p>Axes: the velocity-equation terms and the frame rotation angles are resolved in the
 * navigator's level axes ({@link #axes()}); the body-side corrections (coning, sculling, rotation
 * compensation, size effect) in body axes. A term left out of the navigator is reported as zero.
 *
 * <p>Immutable and thread-safe.
 *
 * @param step index of the step (steps taken before it)
 * @param start start time of the step (s)
 * @param end end time of the step (s)
 * @param axes level axes of the level-frame terms
 * @param specificForce the body's specific force resolved in the level frame, mean over the step,
 *        rotation compensation, sculling and the level frame's turn included (m/s^2, level axes)
 * @param coriolis Coriolis term {@code -2 w_ie x v} at the step's midpoint (m/s^2, level axes)
 * @param transportRateTerm transport-rate term {@code -w_en x v} at the midpoint (m/s^2, level axes)
 * @param gravity normal gravity at the midpoint, centrifugal part included (m/s^2, level axes)
 * @param coning coning correction added to the delta-angle (rad, body axes)
 * @param sculling sculling correction of the velocity increment, as a mean acceleration (m/s^2, body axes)
 * @param rotationCompensation rotation compensation {@code c1 da x dv + c2 da x (da x dv)} of the velocity increment,
 *        as a mean acceleration (m/s^2, body axes)
 * @param sizeEffect size-effect correction of the accelerometer output (m/s^2, body axes)
 * @param earthRateAngle turn of the level frame with the Earth over the step (rad, level axes)
 * @param transportRateAngle turn of the level frame over the curved Earth over the step (rad, level axes)
 */
public record StepTerms(long step, double start, double end, LocalAxes axes, Vector3D specificForce,
                        Vector3D coriolis, Vector3D transportRateTerm, Vector3D gravity, Vector3D coning,
                        Vector3D sculling, Vector3D rotationCompensation, Vector3D sizeEffect,
                        Vector3D earthRateAngle, Vector3D transportRateAngle) implements Serializable {

    /**
     * Checks the components: a step index of at least 0, finite times with {@code end >= start},
     * non-null axes and non-null finite vectors.
     *
     * @param step index of the step (steps taken before it)
     * @param start start time of the step (s)
     * @param end end time of the step (s)
     * @param axes level axes of the level-frame terms
     * @param specificForce the body's specific force resolved in the level frame, mean over the step, rotation compensation, sculling and the level frame's turn included (m/s^2, level axes)
     * @param coriolis Coriolis term {@code -2 w_ie x v} at the step's midpoint (m/s^2, level axes)
     * @param transportRateTerm transport-rate term {@code -w_en x v} at the midpoint (m/s^2, level axes)
     * @param gravity normal gravity at the midpoint, centrifugal part included (m/s^2, level axes)
     * @param coning coning correction added to the delta-angle (rad, body axes)
     * @param sculling sculling correction of the velocity increment, as a mean acceleration (m/s^2, body axes)
     * @param rotationCompensation rotation compensation {@code c1 da x dv + c2 da x (da x dv)} of the velocity increment, as a mean acceleration (m/s^2, body axes)
     * @param sizeEffect size-effect correction of the accelerometer output (m/s^2, body axes)
     * @param earthRateAngle turn of the level frame with the Earth over the step (rad, level axes)
     * @param transportRateAngle turn of the level frame over the curved Earth over the step (rad, level axes)
     * @throws NullPointerException if {@code axes} or a vector is null
     * @throws IllegalArgumentException if a component is out of range
     */
    public StepTerms {
        if (step < 0) {
            throw new IllegalArgumentException("step must be >= 0, got " + step);
        }
        Arguments.finite("start", start);
        Arguments.finite("end", end);
        if (!(end >= start)) {
            throw new IllegalArgumentException("end must be >= start " + start + " s, got " + end + " s");
        }
        Arguments.nonNull("axes", axes);
        Arguments.finite("specificForce", specificForce);
        Arguments.finite("coriolis", coriolis);
        Arguments.finite("transportRateTerm", transportRateTerm);
        Arguments.finite("gravity", gravity);
        Arguments.finite("coning", coning);
        Arguments.finite("sculling", sculling);
        Arguments.finite("rotationCompensation", rotationCompensation);
        Arguments.finite("sizeEffect", sizeEffect);
        Arguments.finite("earthRateAngle", earthRateAngle);
        Arguments.finite("transportRateAngle", transportRateAngle);
    }

    /**
     * The sum of the velocity equation's terms: specific force plus Coriolis plus transport-rate
     * term plus gravity, i.e. the mean acceleration of the step relative to the Earth in level axes.
     *
     * @return mean {@code dv/dt} over the step (m/s^2, level axes)
     */
    public Vector3D velocityRate() {
        return specificForce.add(coriolis).add(transportRateTerm).add(gravity);
    }

    @Override
    public String toString() {
        String unit = "m/s^2 (" + axes + ")";
        return String.format(Locale.ROOT, "StepTerms{step %d, t = %s s to %s s%n", step, Formats.number(start),
                Formats.number(end))
                + "  specific force        " + Formats.vector(specificForce, unit) + "\n"
                + "  Coriolis              " + Formats.vector(coriolis, unit) + "\n"
                + "  transport-rate term   " + Formats.vector(transportRateTerm, unit) + "\n"
                + "  gravity               " + Formats.vector(gravity, unit) + "\n"
                + "  coning                " + Formats.vector(coning, "rad (body)") + "\n"
                + "  sculling              " + Formats.vector(sculling, "m/s^2 (body)") + "\n"
                + "  rotation compensation " + Formats.vector(rotationCompensation, "m/s^2 (body)") + "\n"
                + "  size effect           " + Formats.vector(sizeEffect, "m/s^2 (body)") + "\n"
                + "  Earth rate angle      " + Formats.vector(earthRateAngle, "rad (" + axes + ")") + "\n"
                + "  transport rate angle  " + Formats.vector(transportRateAngle, "rad (" + axes + ")") + "}";
    }
}
