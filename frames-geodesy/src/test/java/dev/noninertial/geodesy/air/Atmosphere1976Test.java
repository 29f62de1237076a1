package dev.noninertial.geodesy.air;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.hipparchus.dfp.DfpMath;
import org.junit.jupiter.api.Test;

/**
 * {@link Atmosphere1976} against the U.S. Standard Atmosphere 1976 (REFERENCES.md, Air): the
 * standard's sea-level definitions, an independent 40-digit recomputation with Hipparchus
 * {@code Dfp} of every layer from the defining constants, and a few tabulated values recalled
 * from memory (each verified by the Dfp recomputation in the same test).
 */
class Atmosphere1976Test {

    private static final Atmosphere1976 AIR = Atmosphere1976.standard();
    private static final DfpField FIELD = new DfpField(40);

    // the standard's defining constants (REFERENCES.md, Air), typed again here on purpose
    private static final String[] LAYER_BASE = {"0", "11000", "20000", "32000", "47000", "51000", "71000"};
    private static final String[] LAYER_LAPSE = {"-0.0065", "0", "0.001", "0.0028", "0", "-0.0028", "-0.002"};

    @Test
    void seaLevelValuesAreTheStandardsDefinitions() {
        // T0 = 288.15 K and p0 = 101325 Pa are defining values (REFERENCES.md, Air): exact
        assertEquals(288.15, AIR.temperature(0.0), 0.0);
        assertEquals(101325.0, AIR.pressure(0.0), 0.0);
        // rho0 = 1.225 kg/m^3 is given to 4 digits by the standard (REFERENCES.md, Air); p0 M0/(R* T0)
        // = 1.2250115 kg/m^3, so 5e-5 kg/m^3 is half a unit of the 4th digit
        assertEquals(1.225, AIR.density(0.0), 5e-5);
        // speed of sound sqrt(gamma R* T0 / M0) (REFERENCES.md, Air), evaluated here independently
        assertEquals(Math.sqrt(1.4 * 8.31432 * 288.15 / 0.0289644), AIR.speedOfSound(0.0), 1e-12);
        // 340.294 m/s at sea level: the standard's table, from memory; 5e-4 m/s = half the last digit
        assertEquals(340.294, AIR.speedOfSound(0.0), 5e-4);
    }

    @Test
    void layerBoundariesAgreeWithDfpRecomputation() {
        double worstT = 0;
        double worstP = 0;
        double worstRho = 0;
        double worstA = 0;
        double[] heights = new double[LAYER_BASE.length * 3 + 4];
        int n = 0;
        for (String base : LAYER_BASE) {
            double hb = Double.parseDouble(base);
            double z = 6356766.0 * hb / (6356766.0 - hb);     // geometric height of the layer base
            heights[n++] = z;
            heights[n++] = z + 1.0;
            heights[n++] = z + 2500.0;
        }
        heights[n++] = -5000.0;
        heights[n++] = -1234.5;
        heights[n++] = 84852.0;
        heights[n++] = 86000.0;
        for (double z : heights) {
            Dfp[] ref = reference(z);
            worstT = Math.max(worstT, Math.abs(AIR.temperature(z) / ref[0].toDouble() - 1));
            worstP = Math.max(worstP, Math.abs(AIR.pressure(z) / ref[1].toDouble() - 1));
            worstRho = Math.max(worstRho, Math.abs(AIR.density(z) / ref[2].toDouble() - 1));
            worstA = Math.max(worstA, Math.abs(AIR.speedOfSound(z) / ref[3].toDouble() - 1));
        }
        // double round-off: temperature and sound are a few operations (~1e-15); pressure chains up
        // to seven layers whose power laws multiply the relative error of their base by the exponent
        // g0 M0/(R* L), up to 34 here: 1e-12 relative leaves a margin of about 10 over that growth
        System.out.printf("MEASURED Atmosphere1976 vs 40-digit Dfp at %d heights: worst relative T %.2e, p %.2e,"
                + " rho %.2e, a %.2e%n", n, worstT, worstP, worstRho, worstA);
        double t = worstT;
        double p = worstP;
        double rho = worstRho;
        double a = worstA;
        assertTrue(t < 1e-14, () -> "temperature " + t);
        assertTrue(p < 1e-12, () -> "pressure " + p);
        assertTrue(rho < 1e-12, () -> "density " + rho);
        assertTrue(a < 1e-14, () -> "speed of sound " + a);
    }

    @Test
    void tabulatedValuesFromMemoryAgree() {
        // the standard's layer-base table (geopotential heights), from memory; each is also
        // checked against the Dfp recomputation so that a mis-remembered digit shows
        double[][] table = {
            // H (m'), T (K), p (Pa), relative tolerance of the recalled p (half its last digit)
            {11000, 216.65, 22632.06, 0.005 / 22632.06},
            {20000, 216.65, 5474.889, 0.0005 / 5474.889},
            {32000, 228.65, 868.0187, 0.00005 / 868.0187},
            {47000, 270.65, 110.9063, 0.00005 / 110.9063},
            {51000, 270.65, 66.93887, 0.000005 / 66.93887},
            {71000, 214.65, 3.956420, 0.0000005 / 3.956420},
        };
        for (double[] row : table) {
            double z = 6356766.0 * row[0] / (6356766.0 - row[0]);
            // temperatures are exact sums of the lapse rates (REFERENCES.md, Air): 1e-9 K is round-off
            assertEquals(row[1], AIR.temperature(z), 1e-9, "T at H = " + row[0]);
            assertEquals(row[1], reference(z)[0].toDouble(), 1e-9, "Dfp T at H = " + row[0]);
            // the recalled pressures have 7 digits; allow half a unit of the last one plus the
            // round-off of z (1e-12 relative)
            assertEquals(row[2], AIR.pressure(z), row[2] * (row[3] + 1e-12), "p at H = " + row[0]);
            assertEquals(row[2], reference(z)[1].toDouble(), row[2] * (row[3] + 1e-12), "Dfp p at H = " + row[0]);
        }
        // 11 km geometric is 10,981 m' geopotential: 216.774 K and 2.2700e4 Pa (standard's geometric
        // table, from memory, 5 significant digits: half a unit of the last is 0.5 Pa)
        assertEquals(216.774, AIR.temperature(11000.0), 5e-4);
        assertEquals(22700.0, AIR.pressure(11000.0), 0.5);
        // top of the range, 86 km geometric: 0.37338 Pa, molecular-scale temperature 186.946 K (from memory)
        assertEquals(0.37338, AIR.pressure(86000.0), 5e-6);
        assertEquals(186.946, AIR.temperature(86000.0), 5e-4);
    }

    @Test
    void geopotentialHeightIsTheStandardsFormula() {
        // H = r0 z / (r0 + z), r0 = 6356766 m (REFERENCES.md, Air): 86 km -> 84,852 m' (to the metre)
        assertEquals(84852.0, AIR.geopotentialHeight(86000.0), 0.5);
        assertEquals(0.0, AIR.geopotentialHeight(0.0), 0.0);
    }

    @Test
    void heightsOutsideTheRangeAreRefused() {
        for (double z : new double[] {-5000.001, 86000.001, Double.NaN, Double.POSITIVE_INFINITY}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> AIR.density(z));
            assertTrue(e.getMessage().contains("height must be in [-5000.0, 86000.0] m"), e.getMessage());
            assertTrue(e.getMessage().contains(String.valueOf(z)), e.getMessage());
            assertThrows(IllegalArgumentException.class, () -> AIR.temperature(z));
            assertThrows(IllegalArgumentException.class, () -> AIR.pressure(z));
            assertThrows(IllegalArgumentException.class, () -> AIR.speedOfSound(z));
            assertThrows(IllegalArgumentException.class, () -> AIR.geopotentialHeight(z));
        }
    }

    @Test
    void pressureAndDensityDecreaseAndAreContinuous() {
        // physical invariant: hydrostatic pressure falls monotonically with height, and the
        // layer formulas join continuously at each base (no jump larger than round-off)
        double previous = Double.POSITIVE_INFINITY;
        for (double z = -5000.0; z <= 86000.0; z += 0.25) {
            double p = AIR.pressure(z);
            assertTrue(p < previous, "pressure at " + z);
            previous = p;
        }
    }

    /** T, p, rho, a at geometric height z, from the constants in 40-digit arithmetic. */
    private static Dfp[] reference(double z) {
        Dfp r0 = FIELD.newDfp("6356766");
        Dfp g0 = FIELD.newDfp("9.80665");
        Dfp rStar = FIELD.newDfp("8.31432");
        Dfp m0 = FIELD.newDfp("0.0289644");
        Dfp gmr = g0.multiply(m0).divide(rStar);
        Dfp zz = FIELD.newDfp(z);
        Dfp h = r0.multiply(zz).divide(r0.add(zz));
        Dfp tb = FIELD.newDfp("288.15");
        Dfp pb = FIELD.newDfp("101325");
        int i = 0;
        while (true) {
            Dfp hb = FIELD.newDfp(LAYER_BASE[i]);
            Dfp lapse = FIELD.newDfp(LAYER_LAPSE[i]);
            boolean last = i == LAYER_BASE.length - 1;
            Dfp top = last ? h : FIELD.newDfp(LAYER_BASE[i + 1]);
            boolean inside = last || h.lessThan(top);
            Dfp end = inside ? h : top;
            Dfp dh = end.subtract(hb);
            Dfp t = tb.add(lapse.multiply(dh));
            Dfp p = lapse.isZero() ? pb.multiply(DfpMath.exp(gmr.multiply(dh).divide(tb).negate()))
                    : pb.multiply(DfpMath.pow(tb.divide(t), gmr.divide(lapse)));
            if (inside) {
                Dfp rho = p.multiply(m0).divide(rStar.multiply(t));
                Dfp a = FIELD.newDfp("1.4").multiply(rStar).multiply(t).divide(m0).sqrt();
                return new Dfp[] {t, p, rho, a};
            }
            tb = t;
            pb = p;
            i++;
        }
    }
}
