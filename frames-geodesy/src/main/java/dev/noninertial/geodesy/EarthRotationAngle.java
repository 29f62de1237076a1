package dev.noninertial.geodesy;

import java.time.Instant;

import dev.noninertial.frames.Arguments;

/**
 * The Earth rotation angle (ERA) of the IERS Conventions (2010), IERS Technical Note 36,
 * Eq. 5.15: {@code ERA(Tu) = 2 pi (0.7790572732640 + 1.00273781191135448 Tu)},
 * {@code Tu = JD(UT1) - 2451545.0}, reduced to [0, 2 pi).
 *
 * <p>The angle is evaluated to about 1e-13 rad: the Julian date is kept in two parts (whole and
 * fractional days), the whole turns contributed by the integer days are dropped before the
 * multiplication, and only the small excess rate 0.00273781191135448 multiplies the large day
 * count.
 *
 * <p>Time scale: the argument is UT1. A {@link java.time.Instant} is read as a UT1 instant on
 * the 86400-second day (no leap seconds). Passing UTC instead of UT1 (|UT1 - UTC| &lt; 0.9 s)
 * turns the Earth by up to 6.6e-5 rad, about 420 m on the equator; apply the published
 * UT1 - UTC yourself when that matters.
 *
 * <p>Supported span: {@link #EARLIEST} (inclusive) to {@link #LATEST} (exclusive), Julian
 * dates 2415020.5 to 2488069.5. Outside it the linear formula is still defined but the library
 * refuses it, so that a wrong century or a unit mix-up fails loudly.
 *
 * <p>Thread-safe: stateless.
 */
public final class EarthRotationAngle {

    /** First supported instant, 1900-01-01T00:00:00 UT1. */
    public static final Instant EARLIEST = Instant.parse("1900-01-01T00:00:00Z");

    /** End of the supported span (exclusive), 2100-01-01T00:00:00 UT1. */
    public static final Instant LATEST = Instant.parse("2100-01-01T00:00:00Z");

    /** Julian date of J2000.0 (2000-01-01 12:00 UT1). */
    public static final double J2000 = 2451545.0;

    /**
     * Rate of the IERS angle, {@code 2 pi 1.00273781191135448 / 86400} rad per UT1 second,
     * about 7.2921151467e-5 rad/s.
     */
    public static final double RATE = 2.0 * Math.PI * 1.00273781191135448 / 86400.0;

    private static final double JD_MIN = 2415020.5;
    private static final double JD_MAX = 2488069.5;
    private static final double UNIX_EPOCH_JD = 2440587.5;

    private EarthRotationAngle() {
    }

    /**
     * ERA at a UT1 instant.
     *
     * @param ut1 the instant, read as UT1
     * @return the angle (rad), in [0, 2 pi)
     * @throws IllegalArgumentException if the instant is outside [{@link #EARLIEST}, {@link #LATEST})
     */
    public static double at(Instant ut1) {
        double[] jd = julianDate(ut1);
        return atJulianDate(jd[0], jd[1]);
    }

    /**
     * ERA at a two-part UT1 Julian date {@code wholeDays + fraction}. Any split is accepted, but
     * the precision is best when {@code wholeDays} holds the integer or half-integer part and
     * {@code fraction} the rest (a single double Julian date carries only about 40 microseconds).
     *
     * @param wholeDays first part of the Julian date (days), e.g. 2460754.5
     * @param fraction second part (days), e.g. 0.25
     * @return the angle (rad), in [0, 2 pi)
     * @throws IllegalArgumentException if a part is not finite or their sum is outside
     *         [2415020.5, 2488069.5)
     */
    public static double atJulianDate(double wholeDays, double fraction) {
        Arguments.finite("wholeDays", wholeDays);
        Arguments.finite("fraction", fraction);
        double sum = wholeDays + fraction;
        if (!(sum >= JD_MIN && sum < JD_MAX)) {
            throw new IllegalArgumentException("Julian date (UT1) wholeDays + fraction must be in [" + JD_MIN + ", "
                    + JD_MAX + ") (years 1900 to 2099), got " + wholeDays + " + " + fraction);
        }
        // fractional days: the integer days add whole turns of the unit rate and drop out
        double frac = (wholeDays - Math.floor(wholeDays)) + (fraction - Math.floor(fraction));
        double tu = (wholeDays - J2000) + fraction;
        double turns = frac + 0.7790572732640 + 0.00273781191135448 * tu;
        turns -= Math.floor(turns);
        double angle = 2.0 * Math.PI * turns;
        return angle < 2.0 * Math.PI ? angle : 0.0;
    }

    /**
     * Two-part Julian date of an instant on the 86400-second day: {whole days ending in .5,
     * fraction of day in [0, 1)}.
     */
    static double[] julianDate(Instant instant) {
        Arguments.nonNull("ut1", instant);
        if (instant.isBefore(EARLIEST) || !instant.isBefore(LATEST)) {
            throw new IllegalArgumentException("instant (UT1) must be in [" + EARLIEST + ", " + LATEST + "), got "
                    + instant);
        }
        long seconds = instant.getEpochSecond();
        long days = Math.floorDiv(seconds, 86400L);
        long secondOfDay = Math.floorMod(seconds, 86400L);
        double fraction = (secondOfDay + instant.getNano() * 1e-9) / 86400.0;
        return new double[] {UNIX_EPOCH_JD + days, fraction};
    }
}
