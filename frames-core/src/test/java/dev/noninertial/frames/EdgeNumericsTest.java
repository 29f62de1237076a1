package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.motion.SampledMotion;

/**
 * Issue 15, class 4, frames-core: numerics at the edges are computed accurately or refused with
 * the documented domain.
 */
class EdgeNumericsTest {

    @Test
    void unitAxisIsUnitForTinyAndHugeAxes() {
        // invariant: a unit vector has norm 1; rounding of three squares and a square root and
        // three divisions leaves a few ulps (2.2e-16 each), so 1e-15 is generous
        for (double scale : new double[] {Double.MIN_VALUE, 1e-320, 1e-160, 1e-20, 1.0, 1e20, 1e160, 1e300,
            Double.MAX_VALUE}) {
            Vector3D u = Arguments.unitAxis("axis", new Vector3D(scale, scale, 0.5 * scale));
            assertEquals(1.0, u.getNorm(), 1e-15, "scale " + scale);
            // direction (2, 2, 1) / 3 exactly (Pythagorean triple), except where the half underflows
            if (scale > 1e-300) {
                assertEquals(2.0 / 3.0, u.getX(), 1e-15, "scale " + scale);
                assertEquals(1.0 / 3.0, u.getZ(), 1e-15, "scale " + scale);
            }
        }
        assertThrows(IllegalArgumentException.class, () -> Arguments.unitAxis("axis", Vector3D.ZERO));
    }

    @Test
    void yawPitchRollNearGimbalLockKeepsTheDefinedCombination() {
        // near pitch = +pi/2 the rotation fixes yaw - roll (the turn about the vertical) however
        // close to the lock: the read-back must return it to rounding (a few ulps of pi, 1e-15)
        double yaw = 0.4;
        double roll = -0.25;
        for (double gap : new double[] {1e-3, 1e-7, 1e-9, 1e-11, 1e-13}) {
            Rotation r = Orientations.fromYawPitchRoll(yaw, 0.5 * Math.PI - gap, roll);
            double[] back = Orientations.toYawPitchRoll(r);
            assertEquals(yaw - roll, back[0] - back[2], 1e-15, "gap " + gap);
            assertEquals(0.5 * Math.PI - gap, back[1], 1e-15, "gap " + gap);
            // independent check: the angles rebuild the rotation (Hipparchus Rotation.distance)
            assertTrue(Rotation.distance(r, Orientations.fromYawPitchRoll(back[0], back[1], back[2])) < 1e-15);
        }
    }

    @Test
    void yawAndRollStayInsideTheHalfOpenInterval() {
        // yaw = pi and roll = pi are the same angles as -pi; the promise is (-pi, pi]
        for (double pitch : new double[] {0.0, 0.3, -1.2}) {
            double[] back = Orientations.toYawPitchRoll(Orientations.fromYawPitchRoll(Math.PI, pitch, -Math.PI));
            assertTrue(back[0] > -Math.PI && back[0] <= Math.PI, "yaw " + back[0]);
            assertTrue(back[2] > -Math.PI && back[2] <= Math.PI, "roll " + back[2]);
            assertEquals(Math.PI, Math.abs(back[0]), 1e-15);
        }
        // the exact sign case: Hipparchus' identity turned by pi about z, quaternion (0, 0, 0, 1)
        double[] half = Orientations.toYawPitchRoll(new Rotation(0, -0.0, 0.0, 1, false));
        assertTrue(half[0] > -Math.PI && half[0] <= Math.PI, "yaw " + half[0]);
        assertTrue(half[2] > -Math.PI && half[2] <= Math.PI, "roll " + half[2]);
    }

    @Test
    void sampleTimesTooCloseAreRefusedUpFront() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SampledMotion.fromArrays(
                new double[] {0.0, 1e-320}, new double[6], new double[] {1, 0, 0, 0, 1, 0, 0, 0}));
        assertTrue(e.getMessage().contains("at least 1.0E-100 s apart"), e.getMessage());
        // at the documented limit the queries answer: a uniform motion x = t (m) has velocity 1 m/s
        SampledMotion m = SampledMotion.fromArrays(new double[] {0.0, 1e-100, 2e-100},
                new double[] {0, 0, 0, 1e-100, 0, 0, 2e-100, 0, 0}, new double[] {1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0});
        assertEquals(1.0, m.at(1.5e-100).originVelocity().getX(), 1e-12);
    }
}
