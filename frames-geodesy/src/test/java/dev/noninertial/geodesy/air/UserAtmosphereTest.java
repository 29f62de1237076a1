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
 * {@link AirDrag} with an atmosphere of the user's own ({@link Atmosphere}): the drag law
 * {@code (1/2) rho Cd (A/m) v^2} with the user's density, the Mach number with the user's speed
 * of sound (both analytic for a uniform atmosphere), and the refusal of values that cannot be air.
 */
class UserAtmosphereTest {

    private static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, Instant.parse("2026-07-02T09:30:00Z"));
    // invented test range
    private static final LatLonHeight SITE = LatLonHeight.ofDegrees(-31.4, 118.2, 250.0);

    /** A uniform atmosphere: the same density and speed of sound at every height. */
    private record Uniform(double density, double speedOfSound) implements Atmosphere {
        @Override
        public double density(double height) {
            return density;
        }

        @Override
        public double speedOfSound(double height) {
            return speedOfSound;
        }
    }

    @Test
    void theUsersDensityAndSpeedOfSoundAreTheOnesUsed() {
        ReferenceFrame enu = EARTH.localLevel(SITE, LocalAxes.ENU);
        Atmosphere hotDay = new Uniform(1.05, 352.0);
        AirDrag drag = EARTH.dragIn(enu, hotDay, DragCurve.constant(0.3), 0.02, WindProfile.calm());
        // moving 120 m/s north, 40 m/s up in calm air seen in the level frame (the air is at rest in
        // the Earth-fixed frame, and so in this level frame)
        PointState s = PointState.of(new Vector3D(0, 0, 300.0), new Vector3D(0.0, 120.0, 40.0));
        double speed2 = 120.0 * 120.0 + 40.0 * 40.0;
        // drag law (1/2) rho Cd (A/m) v^2, analytic with a uniform density
        double expected = 0.5 * 1.05 * 0.3 * 0.02 * speed2;
        Vector3D f = drag.at(5.0, s);
        // a handful of double operations plus the level-axes rotation: 1e-12 relative
        assertEquals(expected, f.getNorm(), expected * 1e-12);
        // opposite to the airspeed: 1e-12 leaves room for round-off only
        assertEquals(-1.0, f.normalize().dotProduct(new Vector3D(0.0, 120.0, 40.0).normalize()), 1e-12);
        // Mach = |v| / a, analytic
        assertEquals(Math.sqrt(speed2) / 352.0, drag.machAt(5.0, s), 1e-12);
    }

    @Test
    void valuesThatCannotBeAirAreRefusedNamingTheAtmosphereAndTheHeight() {
        ReferenceFrame enu = EARTH.localLevel(SITE, LocalAxes.ENU);
        PointState s = PointState.of(new Vector3D(0, 0, 300.0), new Vector3D(50.0, 0.0, 0.0));
        for (double rho : new double[] {-0.1, Double.NaN, Double.POSITIVE_INFINITY}) {
            AirDrag drag = EARTH.dragIn(enu, new Uniform(rho, 340.0), DragCurve.constant(0.3), 0.02,
                    WindProfile.calm());
            String m = assertThrows(IllegalArgumentException.class, () -> drag.at(1.0, s)).getMessage();
            assertTrue(m.startsWith("density of the atmosphere Uniform[density=" + rho), m);
            assertTrue(m.contains("must be finite and not negative, got " + rho + " kg/m^3"), m);
            assertTrue(m.contains(" at height "), m);
        }
        for (double a : new double[] {0.0, -340.0, Double.NaN, Double.POSITIVE_INFINITY}) {
            AirDrag drag = EARTH.dragIn(enu, new Uniform(1.2, a), DragCurve.constant(0.3), 0.02,
                    WindProfile.calm());
            String m = assertThrows(IllegalArgumentException.class, () -> drag.at(1.0, s)).getMessage();
            assertTrue(m.contains("must be positive and finite, got " + a + " m/s"), m);
            m = assertThrows(IllegalArgumentException.class, () -> drag.machAt(1.0, s)).getMessage();
            assertTrue(m.startsWith("speed of sound of the atmosphere Uniform["), m);
        }
        // zero density is air of no weight, not an error: no drag (physical limit)
        AirDrag vacuum = EARTH.dragIn(enu, new Uniform(0.0, 340.0), DragCurve.constant(0.3), 0.02, WindProfile.calm());
        assertEquals(0.0, vacuum.at(1.0, s).getNorm(), 0.0);
    }
}
