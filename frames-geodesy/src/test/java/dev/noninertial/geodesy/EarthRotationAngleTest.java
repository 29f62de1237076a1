package dev.noninertial.geodesy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.junit.jupiter.api.Test;

class EarthRotationAngleTest {

    private static final DfpField FIELD = DfpGeodesy.FIELD;

    /** IERS Conventions (2010), TN 36, Eq. 5.15, evaluated in 50-digit Dfp from the exact double parts. */
    private static double referenceEra(double wholeDays, double fraction) {
        Dfp tu = FIELD.newDfp(wholeDays).add(FIELD.newDfp(fraction)).subtract(FIELD.newDfp("2451545.0"));
        Dfp turns = FIELD.newDfp("0.7790572732640").add(FIELD.newDfp("1.00273781191135448").multiply(tu));
        turns = turns.subtract(turns.floor());
        return turns.multiply(FIELD.getPi().multiply(2)).toDouble();
    }

    private static double angleDifference(double u, double v) {
        double d = Math.IEEEremainder(u - v, 2 * Math.PI);
        return Math.abs(d);
    }

    @Test
    void eraAtJ2000IsTheFormulaConstant() {
        // IERS TN 36 Eq. 5.15: at Tu = 0 the angle is 2 pi 0.7790572732640 by definition; 1e-12 rad goal
        // sources: REFERENCES.md, Earth rotation
        assertEquals(2 * Math.PI * 0.7790572732640, EarthRotationAngle.atJulianDate(2451545.0, 0.0), 1e-12);
        assertEquals(2 * Math.PI * 0.7790572732640,
                EarthRotationAngle.at(Instant.parse("2000-01-01T12:00:00Z")), 1e-12);
    }

    @Test
    void splitDateMatchesDfpEvaluation() {
        // independent evaluation with Hipparchus Dfp, 50 digits; goal 1e-12 rad
        double[][] dates = {{2415020.5, 0.0}, {2451544.5, 0.123456789}, {2460754.5, 0.5},
            {2469807.5, 0.999999}, {2488068.5, 0.75}, {2433282.5, 0.31}, {2461000.5, 0.0000011574}};
        double worst = 0;
        for (double[] d : dates) {
            double diff = angleDifference(EarthRotationAngle.atJulianDate(d[0], d[1]), referenceEra(d[0], d[1]));
            worst = Math.max(worst, diff);
        }
        assertTrue(worst <= 1e-12, "worst " + worst + " rad");
    }

    @Test
    void instantAndJulianDateAgree() {
        // 2026-03-20T06:00:00 is JD 2461119.75 (Unix epoch JD 2440587.5 + 20532 days + 0.25); checked
        // by the same Dfp evaluation
        Instant i = Instant.parse("2026-03-20T06:00:00Z");
        double[] jd = EarthRotationAngle.julianDate(i);
        assertEquals(2461119.5, jd[0], 0.0);
        assertEquals(0.25, jd[1], 0.0);
        assertTrue(angleDifference(EarthRotationAngle.at(i), referenceEra(2461119.5, 0.25)) <= 1e-12);
    }

    @Test
    void rateMismatchWithTheModelIsAsDocumented() {
        // IERS rate 2 pi 1.00273781191135448 / 86400 (TN 36 Eq. 5.15) minus the WGS84 rate
        // (TR8350.2 Table 3.1), computed in Dfp: 1.4671e-12 rad/s, as stated in EarthFrames
        // sources: REFERENCES.md, Earth models; Earth rotation
        Dfp iers = FIELD.getPi().multiply(2).multiply(FIELD.newDfp("1.00273781191135448")).divide(FIELD.newDfp(86400));
        double mismatch = iers.subtract(FIELD.newDfp("0.00007292115")).toDouble();
        assertEquals(1.467e-12, mismatch, 0.001e-12);
        assertEquals(iers.toDouble(), EarthRotationAngle.RATE, 5e-20); // a few ulps
        // per day and per year (365.25 d), figures quoted in the Javadoc
        assertEquals(1.27e-7, mismatch * 86400, 0.01e-7);
        assertEquals(4.63e-5, mismatch * 86400 * 365.25, 0.01e-5);
    }

    @Test
    void outOfRangeInstantsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> EarthRotationAngle.at(Instant.parse("1899-12-31T23:59:59Z")));
        assertTrue(e.getMessage().contains("1900-01-01") && e.getMessage().contains("1899-12-31"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> EarthRotationAngle.at(Instant.parse("2100-01-01T00:00:00Z")));
        e = assertThrows(IllegalArgumentException.class, () -> EarthRotationAngle.atJulianDate(2460754.5e3, 0.0));
        assertTrue(e.getMessage().contains("Julian date"));
        assertThrows(IllegalArgumentException.class, () -> EarthRotationAngle.atJulianDate(Double.NaN, 0.0));
        assertThrows(IllegalArgumentException.class,
                () -> EarthFrames.of(EarthModel.WGS84, Instant.parse("2200-06-01T00:00:00Z")));
    }
}
