package dev.noninertial.geodesy.air;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * A measured atmosphere ({@link SoundingAtmosphere}) against the barometric law of an isothermal
 * layer (textbook: {@code p = p0 exp(-g M h / (R T))}, reproduced exactly by the log-linear
 * interpolation), against the 1976 standard sampled every 500 m (error bound derived from the
 * curvature of {@code ln rho}), the standard's sea-level values, and the drag law with the
 * sounding's density.
 */
class SoundingAtmosphereTest {

    /** 1976 standard constants (REFERENCES.md, Air). */
    private static final double G0 = 9.80665;
    private static final double R = 8.31432;
    private static final double M = 0.0289644;

    @Test
    void anIsothermalSoundingGivesTheBarometricLawBetweenItsLevels() {
        double t = 250.0;
        double p0 = 98000.0;
        double[] h = {0.0, 1000.0, 3000.0, 7000.0};
        double[] p = new double[h.length];
        double[] temperature = new double[h.length];
        for (int i = 0; i < h.length; i++) {
            p[i] = p0 * Math.exp(-G0 * M * h[i] / (R * t));
            temperature[i] = t;
        }
        SoundingAtmosphere air = SoundingAtmosphere.ofPressureTemperature(h, p, temperature);
        for (double z = 0.0; z <= 7000.0; z += 137.0) {
            double expected = p0 * Math.exp(-G0 * M * z / (R * t)) * M / (R * t);
            // log-linear interpolation of an exponential is exact: rounding only, 1e-13 relative
            assertEquals(expected, air.density(z), 1e-13 * expected, "z " + z);
            // a^2 = gamma R T / M: constant for a constant temperature
            assertEquals(Math.sqrt(1.4 * R * t / M), air.speedOfSound(z), 1e-12, "z " + z);
        }
    }

    @Test
    void theStandardSampledEvery500mIsReproducedWithinTheInterpolationBound() {
        Atmosphere1976 standard = Atmosphere1976.standard();
        int n = 23;   // 0 to 11 km: the first layer, lapse -6.5 K/km
        double[] h = new double[n];
        double[] rho = new double[n];
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = 500.0 * i;
            rho[i] = standard.density(h[i]);
            a[i] = standard.speedOfSound(h[i]);
        }
        SoundingAtmosphere air = SoundingAtmosphere.of(h, rho, a);
        double worstRho = 0;
        double worstA = 0;
        for (double z = 0.0; z <= 11000.0; z += 50.0) {
            worstRho = Math.max(worstRho, Math.abs(air.density(z) / standard.density(z) - 1));
            worstA = Math.max(worstA, Math.abs(air.speedOfSound(z) / standard.speedOfSound(z) - 1));
        }
        System.out.printf("MEASURED sounding every 500 m from the 1976 standard, 0 to 11 km: density worst relative"
                + " error %.2e, speed of sound %.2e%n", worstRho, worstA);
        // linear interpolation of ln rho errs by at most dh^2 / 8 max|(ln rho)''|; with
        // |(ln rho)''| = |L / T^2 (g0 M0 / R* + L)| = 1.8e-4 / T^2 per m^2 (L = -6.5 K/km), largest at
        // the layer's top, 216.65 K: 3.8e-9, so the bound for dh = 500 m is 1.2e-4 (derived here)
        assertTrue(worstRho < 1.2e-4, "density " + worstRho);
        // a^2 is linear in geopotential height, which bends from geometric height by 2/r0: T'' = 2e-9
        // K/m^2, an error of dh^2/8 T''/(2T) below 1e-6 relative
        assertTrue(worstA < 1e-6, "speed of sound " + worstA);
        // at the levels the values are the level's
        assertEquals(rho[7], air.density(h[7]), 0.0);
        assertEquals(a[22], air.speedOfSound(h[22]), 0.0);
    }

    @Test
    void seaLevelOfTheStandardFromPressureAndTemperature() {
        SoundingAtmosphere air = SoundingAtmosphere.ofPressureTemperature(new double[] {0.0, 100.0},
                new double[] {101325.0, 100129.0}, new double[] {288.15, 287.5});
        // the standard's sea-level density 1.225 kg/m^3 (REFERENCES.md, Air; four digits) and speed of
        // sound 340.294 m/s (the standard's table, from memory)
        assertEquals(1.225, air.density(0.0), 5e-4);
        assertEquals(340.294, air.speedOfSound(0.0), 1e-3);
    }

    @Test
    void theDragUsesTheSoundingsDensity() {
        EarthFrames earth = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-07-02T09:30:00Z"));
        // invented test range at 250 m
        ReferenceFrame enu = earth.localLevel(LatLonHeight.ofDegrees(-31.4, 118.2, 250.0), LocalAxes.ENU);
        SoundingAtmosphere air = SoundingAtmosphere.of(new double[] {0.0, 1000.0}, new double[] {1.2, 1.1},
                new double[] {340.0, 336.0});
        AirDrag drag = AirDrag.of(earth, enu, air, DragCurve.constant(0.5), 0.01, WindProfile.calm());
        // 30 m/s east relative to the ground at the site (no wind): f = -(1/2) rho Cd (A/m) v^2 along -east,
        // with rho from the sounding at the geodetic height 250 m
        Vector3D f = drag.at(0.0, PointState.of(Vector3D.ZERO, new Vector3D(30.0, 0.0, 0.0)));
        double rho = air.density(250.0);
        assertEquals(Math.exp(Math.log(1.2) + 0.25 * (Math.log(1.1) - Math.log(1.2))), rho, 1e-15);
        // 1e-9 m/s^2: the height of the site origin from the geodetic round trip (mm) barely moves rho
        assertEquals(-0.5 * rho * 0.5 * 0.01 * 900.0, f.getX(), 1e-9);
        assertEquals(0.0, f.getY(), 1e-9);
    }

    @Test
    void refusesWhatIsNotASounding() {
        double[] h = {0.0, 500.0, 1000.0};
        double[] rho = {1.2, 1.15, 1.1};
        double[] a = {340.0, 338.0, 336.0};
        SoundingAtmosphere air = SoundingAtmosphere.of(h, rho, a);
        IllegalArgumentException above = assertThrows(IllegalArgumentException.class, () -> air.density(1000.5));
        assertTrue(above.getMessage().contains("[0.0, 1000.0] m, got 1000.5"), above.getMessage());
        assertThrows(IllegalArgumentException.class, () -> air.speedOfSound(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> air.speedOfSound(-0.1));
        IllegalArgumentException order = assertThrows(IllegalArgumentException.class,
                () -> SoundingAtmosphere.of(new double[] {0.0, 500.0, 500.0}, rho, a));
        assertTrue(order.getMessage().contains("heights[2]"), order.getMessage());
        IllegalArgumentException negative = assertThrows(IllegalArgumentException.class,
                () -> SoundingAtmosphere.of(h, new double[] {1.2, -1.0, 1.1}, a));
        assertTrue(negative.getMessage().contains("densities[1]"), negative.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SoundingAtmosphere.of(h, rho, new double[] {340.0, 338.0}));
        assertThrows(IllegalArgumentException.class,
                () -> SoundingAtmosphere.of(new double[] {0.0}, new double[] {1.2}, new double[] {340.0}));
        IllegalArgumentException cold = assertThrows(IllegalArgumentException.class,
                () -> SoundingAtmosphere.ofPressureTemperature(h, new double[] {1e5, 9e4, 8e4}, new double[] {280, 0, 270}));
        assertTrue(cold.getMessage().contains("temperatures[1]"), cold.getMessage());
        assertEquals("SoundingAtmosphere{3 levels, 0 to 1000 m}", air.toString());
    }
}
