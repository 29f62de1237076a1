package dev.noninertial.frames.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.junit.jupiter.api.Test;

/**
 * The conversion factors against their definitions (REFERENCES.md, Units), recomputed with
 * Hipparchus {@code Dfp} at 40 digits so that the check does not reuse the class's arithmetic.
 */
class UnitsTest {

    private static final DfpField FIELD = new DfpField(40);

    /** A 40-digit value rounded to the nearest double. */
    private static double exact(Dfp value) {
        return value.toDouble();
    }

    private static Dfp pi() {
        return FIELD.getPi();
    }

    @Test
    void factorsMatchTheirDefinitions() {
        // international knot: 1852 m per 3600 s (REFERENCES.md, Units)
        assertEquals(exact(FIELD.newDfp(1852).divide(3600)), Units.knots(1.0), 0.0);
        // standard gravity 9.80665 m/s^2 exactly (3rd CGPM 1901; REFERENCES.md, Units)
        assertEquals(9.80665, Units.standardGravities(1.0), 0.0);
        // 1 Gal = 1 cm/s^2
        assertEquals(exact(FIELD.newDfp(1).divide(FIELD.newDfp(100_000))), Units.milligals(1.0), 0.0);
        // the tolerances below are one rounding of each of the two factors of the product (ulps)
        assertEquals(exact(pi().multiply(2).divide(60)), Units.rpm(1.0), Math.ulp(0.1));
        assertEquals(exact(pi().divide(180)), Units.degrees(1.0), Math.ulp(0.0175));
        assertEquals(exact(pi().divide(180)), Units.degreesPerSecond(1.0), Math.ulp(0.0175));
        assertEquals(exact(pi().divide(180).divide(3600)), Units.degreesPerHour(1.0), 2 * Math.ulp(4.8e-6));
        // deg/sqrt(h) = (pi/180) rad / sqrt(3600 s); (m/s)/sqrt(h) = (m/s) / sqrt(3600 s)
        Dfp rootHour = FIELD.newDfp(3600).sqrt();
        assertEquals(exact(pi().divide(180).divide(rootHour)), Units.degreesPerRootHour(1.0), 2 * Math.ulp(2.9e-4));
        assertEquals(exact(FIELD.getOne().divide(rootHour)), Units.metresPerSecondPerRootHour(1.0), Math.ulp(0.0167));
    }

    @Test
    void everyPairIsInverse() {
        double[] values = {0.0, 1.0, -3.5, 10.0, 123.456, 1e-7};
        for (double x : values) {
            // two roundings (one per direction), so at most 2 ulp of x
            double tol = 2 * Math.ulp(x);
            assertEquals(x, Units.toKnots(Units.knots(x)), tol);
            assertEquals(x, Units.toRpm(Units.rpm(x)), tol);
            assertEquals(x, Units.toDegrees(Units.degrees(x)), tol);
            assertEquals(x, Units.toDegreesPerSecond(Units.degreesPerSecond(x)), tol);
            assertEquals(x, Units.toDegreesPerHour(Units.degreesPerHour(x)), 2 * tol);
            assertEquals(x, Units.toStandardGravities(Units.standardGravities(x)), tol);
            assertEquals(x, Units.toMilligals(Units.milligals(x)), tol);
            assertEquals(x, Units.toDegreesPerRootHour(Units.degreesPerRootHour(x)), 2 * tol);
            assertEquals(x, Units.toMetresPerSecondPerRootHour(Units.metresPerSecondPerRootHour(x)), tol);
        }
    }

    @Test
    void tradeFiguresComeOutRight() {
        // WGS84 rotation rate 7.292115e-5 rad/s (REFERENCES.md, Earth models) is 15.041 deg/h:
        // 7.292115e-5 * 3600 * 180 / pi = 15.04106... deg/h, recomputed here with Dfp
        double earthRate = 7.292115e-5;
        double expected = exact(FIELD.newDfp("7.292115e-5").multiply(FIELD.newDfp(3600 * 180)).divide(pi()));
        assertEquals(expected, Units.toDegreesPerHour(earthRate), 1e-13);
        // the Eotvos rule of thumb's 0.004154 V^2 mGal (V in knots; REFERENCES.md, Gravimetry) is
        // V^2 / R with R = 6371 km: 1 kn^2 / 6.371e6 m = 4.1541e-6 m/s^2 = 0.0041541 mGal
        assertEquals(0.004154, Units.toMilligals(Units.knots(1) * Units.knots(1) / 6.371e6), 1e-6);
    }

    @Test
    void refusesNonFiniteValuesNamingTheParameter() {
        // a NaN or infinite value is refused where it is converted, naming the parameter
        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class, () -> Units.knots(Double.NaN));
        assertTrue(nan.getMessage().contains("knots"), nan.getMessage());
        IllegalArgumentException inf = assertThrows(IllegalArgumentException.class,
                () -> Units.toMilligals(Double.POSITIVE_INFINITY));
        assertTrue(inf.getMessage().contains("metresPerSecondSquared"), inf.getMessage());
        // the largest finite inputs still convert to finite values (every factor is below 1e4)
        assertTrue(Double.isFinite(Units.toDegreesPerHour(1e300)));
    }
}
