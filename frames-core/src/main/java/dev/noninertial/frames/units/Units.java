package dev.noninertial.frames.units;

import dev.noninertial.frames.Arguments;

/**
 * Named conversions between the units of the trade and the SI units the library computes in, so
 * that the unit shows where a number is written: {@code Units.knots(9)} is 9 knots in m/s,
 * {@code Units.toMilligals(a)} is an acceleration in m/s^2 expressed in mGal.
 *
 * <p>Naming: a method named after a unit takes a value <em>in</em> that unit and returns SI
 * ({@code knots(10)} returns m/s); the same name with {@code to} takes SI and returns the value in
 * that unit ({@code toKnots(5.144)} returns knots). Every pair is exact inverses up to one
 * rounding. SI here means m/s, rad, rad/s, m/s^2, rad/sqrt(s), (m/s)/sqrt(s).
 *
 * <p>Factors (definitions in the repository's REFERENCES.md, section Units): the international
 * nautical mile is exactly 1852 m, so 1 knot = 1852/3600 m/s; 1 rpm = 2 pi/60 rad/s; a degree is
 * pi/180 rad; an hour is 3600 s; standard gravity g = 9.80665 m/s^2 exactly (3rd CGPM 1901,
 * ISO 80000-3); 1 Gal = 1 cm/s^2, so 1 mGal = 1e-5 m/s^2; the angle random walk unit deg/sqrt(h)
 * is (pi/180)/60 rad/sqrt(s) and the velocity random walk unit (m/s)/sqrt(h) is 1/60
 * (m/s)/sqrt(s), since sqrt(3600 s) = 60 sqrt(s). A value that is NaN or infinite is refused
 * with an {@link IllegalArgumentException} naming the parameter: a unit conversion is where a
 * typing slip enters, so it is stopped there, not passed on as NaN.
 *
 * <p>Stateless and thread-safe.
 */
public final class Units {

    /** Standard acceleration of gravity g (m/s^2), exact by definition (3rd CGPM 1901). */
    public static final double STANDARD_GRAVITY = 9.80665;

    /** One knot in m/s: one international nautical mile (1852 m exactly) per hour. */
    public static final double KNOT = 1852.0 / 3600.0;

    /** One revolution per minute in rad/s. */
    public static final double RPM = 2.0 * Math.PI / 60.0;

    /** One milligal in m/s^2 (1 Gal = 0.01 m/s^2). */
    public static final double MILLIGAL = 1e-5;

    private static final double DEGREE = Math.PI / 180.0;
    private static final double HOUR = 3600.0;
    private static final double ROOT_HOUR = 60.0;

    private Units() {
    }

    /**
     * A speed given in knots.
     *
     * @param knots speed (kn)
     * @return the speed (m/s)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double knots(double knots) {
        return Arguments.finite("knots", knots) * KNOT;
    }

    /**
     * A speed expressed in knots.
     *
     * @param metresPerSecond speed (m/s)
     * @return the speed (kn)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double toKnots(double metresPerSecond) {
        return Arguments.finite("metresPerSecond", metresPerSecond) / KNOT;
    }

    /**
     * A rotation rate given in revolutions per minute.
     *
     * @param rpm rate (rev/min)
     * @return the rate (rad/s)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double rpm(double rpm) {
        return Arguments.finite("rpm", rpm) * RPM;
    }

    /**
     * A rotation rate expressed in revolutions per minute.
     *
     * @param radiansPerSecond rate (rad/s)
     * @return the rate (rev/min)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double toRpm(double radiansPerSecond) {
        return Arguments.finite("radiansPerSecond", radiansPerSecond) / RPM;
    }

    /**
     * An angle given in degrees (latitudes, longitudes, headings, amplitudes).
     *
     * @param degrees angle (deg)
     * @return the angle (rad)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double degrees(double degrees) {
        return Arguments.finite("degrees", degrees) * DEGREE;
    }

    /**
     * An angle expressed in degrees.
     *
     * @param radians angle (rad)
     * @return the angle (deg)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double toDegrees(double radians) {
        return Arguments.finite("radians", radians) / DEGREE;
    }

    /**
     * A rotation rate given in degrees per second (turn rates, gyro ranges).
     *
     * @param degreesPerSecond rate (deg/s)
     * @return the rate (rad/s)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double degreesPerSecond(double degreesPerSecond) {
        return Arguments.finite("degreesPerSecond", degreesPerSecond) * DEGREE;
    }

    /**
     * A rotation rate expressed in degrees per second.
     *
     * @param radiansPerSecond rate (rad/s)
     * @return the rate (deg/s)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double toDegreesPerSecond(double radiansPerSecond) {
        return Arguments.finite("radiansPerSecond", radiansPerSecond) / DEGREE;
    }

    /**
     * A rotation rate given in degrees per hour (gyro biases, the Earth rate of about 15 deg/h).
     *
     * @param degreesPerHour rate (deg/h)
     * @return the rate (rad/s)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double degreesPerHour(double degreesPerHour) {
        return Arguments.finite("degreesPerHour", degreesPerHour) * DEGREE / HOUR;
    }

    /**
     * A rotation rate expressed in degrees per hour.
     *
     * @param radiansPerSecond rate (rad/s)
     * @return the rate (deg/h)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double toDegreesPerHour(double radiansPerSecond) {
        return Arguments.finite("radiansPerSecond", radiansPerSecond) * HOUR / DEGREE;
    }

    /**
     * An acceleration given in multiples of standard gravity g = 9.80665 m/s^2.
     *
     * @param gees acceleration (g)
     * @return the acceleration (m/s^2)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double standardGravities(double gees) {
        return Arguments.finite("gees", gees) * STANDARD_GRAVITY;
    }

    /**
     * An acceleration expressed in multiples of standard gravity g = 9.80665 m/s^2.
     *
     * @param metresPerSecondSquared acceleration (m/s^2)
     * @return the acceleration (g)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double toStandardGravities(double metresPerSecondSquared) {
        return Arguments.finite("metresPerSecondSquared", metresPerSecondSquared) / STANDARD_GRAVITY;
    }

    /**
     * An acceleration given in milligals (gravimetry: anomalies, Eotvos corrections).
     *
     * @param milligals acceleration (mGal)
     * @return the acceleration (m/s^2)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double milligals(double milligals) {
        return Arguments.finite("milligals", milligals) * MILLIGAL;
    }

    /**
     * An acceleration expressed in milligals.
     *
     * @param metresPerSecondSquared acceleration (m/s^2)
     * @return the acceleration (mGal)
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double toMilligals(double metresPerSecondSquared) {
        return Arguments.finite("metresPerSecondSquared", metresPerSecondSquared) / MILLIGAL;
    }

    /**
     * A gyro angle random walk given in degrees per root hour.
     *
     * @param degreesPerRootHour angle random walk (deg/sqrt(h))
     * @return the angle random walk (rad/sqrt(s))
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double degreesPerRootHour(double degreesPerRootHour) {
        return Arguments.finite("degreesPerRootHour", degreesPerRootHour) * DEGREE / ROOT_HOUR;
    }

    /**
     * A gyro angle random walk expressed in degrees per root hour.
     *
     * @param radiansPerRootSecond angle random walk (rad/sqrt(s))
     * @return the angle random walk (deg/sqrt(h))
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double toDegreesPerRootHour(double radiansPerRootSecond) {
        return Arguments.finite("radiansPerRootSecond", radiansPerRootSecond) * ROOT_HOUR / DEGREE;
    }

    /**
     * An accelerometer velocity random walk given in metres per second per root hour.
     *
     * @param metresPerSecondPerRootHour velocity random walk ((m/s)/sqrt(h))
     * @return the velocity random walk ((m/s)/sqrt(s))
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double metresPerSecondPerRootHour(double metresPerSecondPerRootHour) {
        return Arguments.finite("metresPerSecondPerRootHour", metresPerSecondPerRootHour) / ROOT_HOUR;
    }

    /**
     * An accelerometer velocity random walk expressed in metres per second per root hour.
     *
     * @param metresPerSecondPerRootSecond velocity random walk ((m/s)/sqrt(s))
     * @return the velocity random walk ((m/s)/sqrt(h))
     * @throws IllegalArgumentException if the value is NaN or infinite
     */
    public static double toMetresPerSecondPerRootHour(double metresPerSecondPerRootSecond) {
        return Arguments.finite("metresPerSecondPerRootSecond", metresPerSecondPerRootSecond) * ROOT_HOUR;
    }
}
