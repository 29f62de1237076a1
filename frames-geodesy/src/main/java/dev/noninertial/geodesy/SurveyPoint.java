package dev.noninertial.geodesy;

import java.io.Serializable;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * What a marine or airborne gravity survey needs at one sample of a track: the Eotvos correction,
 * the platform's vertical acceleration, and what an ideal scalar gravimeter on a level,
 * stabilised platform reads there.
 *
 * <p><b>Conventions.</b> SI units (m/s^2; 1 mGal = 1e-5 m/s^2). The gravimeter reading is the
 * upward component (along the ellipsoid normal) of the specific force {@code f = a_inertial -
 * gravitation} of the carried level frame's origin: at rest it equals normal gravity; under way
 * it is lowered by the Eotvos effect and raised by the platform's upward acceleration, so to first
 * order {@code reading = normalGravity - eotvosCorrection + verticalAcceleration}. The Eotvos correction
 * is {@link EarthModel#eotvosCorrection(LatLonHeight, org.hipparchus.geometry.euclidean.threed.Vector3D, LocalAxes)}
 * of the horizontal ground velocity (its constant-height formula; the vertical velocity does not
 * enter). The vertical acceleration is {@code d2h/dt2} of the track's interpolant.
 *
 * <p>Immutable and thread-safe. Every component must be finite and the position non-null
 * (also on reading from a stream, where the canonical constructor runs again).
 *
 * @param time time (s from the frames' epoch)
 * @param position geodetic position of the platform
 * @param eotvosCorrection Eotvos correction, to be added to the reading (m/s^2)
 * @param verticalAcceleration upward acceleration d2h/dt2 (m/s^2)
 * @param gravimeterReading upward specific force on the level platform (m/s^2)
 * @param normalGravity normal gravity at the position, TR8350.2 Eq. 4-3 (m/s^2)
 */
public record SurveyPoint(double time, LatLonHeight position, double eotvosCorrection, double verticalAcceleration,
                          double gravimeterReading, double normalGravity) implements Serializable {

    /**
     * Checks the components.
     *
     * @param time time (s from the frames' epoch)
     * @param position geodetic position of the platform
     * @param eotvosCorrection Eotvos correction, to be added to the reading (m/s^2)
     * @param verticalAcceleration upward acceleration d2h/dt2 (m/s^2)
     * @param gravimeterReading upward specific force on the level platform (m/s^2)
     * @param normalGravity normal gravity at the position, TR8350.2 Eq. 4-3 (m/s^2)
     * @throws NullPointerException if {@code position} is null
     * @throws IllegalArgumentException if a number is not finite
     */
    public SurveyPoint {
        Arguments.finite("time", time);
        Arguments.nonNull("position", position);
        Arguments.finite("eotvosCorrection", eotvosCorrection);
        Arguments.finite("verticalAcceleration", verticalAcceleration);
        Arguments.finite("gravimeterReading", gravimeterReading);
        Arguments.finite("normalGravity", normalGravity);
    }

    /**
     * The free-air anomaly of a gravimeter reading taken at this point: the reading corrected for
     * the platform's motion, less normal gravity at the point's height,
     * {@code reading + eotvosCorrection - verticalAcceleration - normalGravity}. Normal gravity is
     * taken at the height (TR8350.2 Eq. 4-3), so its height term does the free-air correction
     * (about 0.3086 mGal per metre near the surface).
     *
     * <p>The reading must be absolute gravity on a level, stabilised platform, filtered as the
     * corrections are (see {@link SurveyFilter}): a relative meter's readings must first be scaled
     * by its calibration and tied to a base station, which this library does not do.
     *
     * @param measuredReading the gravimeter's reading at this point's time (m/s^2), finite
     * @return the free-air anomaly (m/s^2); for the ideal reading {@link #gravimeterReading()} it
     *         is zero to first order
     * @throws IllegalArgumentException if {@code measuredReading} is not finite
     */
    public double freeAirAnomaly(double measuredReading) {
        Arguments.finite("measuredReading", measuredReading);
        return measuredReading + eotvosCorrection - verticalAcceleration - normalGravity;
    }

    @Override
    public String toString() {
        return "SurveyPoint{t=" + Formats.number(time) + " s, " + position + ", eotvos="
                + Formats.number(eotvosCorrection / 1e-5) + " mGal, vertical acceleration="
                + Formats.number(verticalAcceleration / 1e-5) + " mGal, reading=" + Formats.number(gravimeterReading)
                + " m/s^2, normal gravity=" + Formats.number(normalGravity) + " m/s^2}";
    }
}
