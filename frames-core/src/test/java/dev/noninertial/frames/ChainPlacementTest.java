package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.motion.Motions;

/**
 * Placement through chains of frames, computed on primitives: it must give the same bits as the
 * composition of the links' placements with {@link Placement#then(Placement)}, and agree with an
 * independent Hipparchus composition of rotations.
 */
class ChainPlacementTest {

    private static Motion[] links() {
        return new Motion[] {
            Motions.spin(new Vector3D(0, 0.1, 1), 0.2, 0.05),
            Motions.heave(new Vector3D(0, 0.1, 1), 1.5, 0.6, 0.3),
            t -> Motions.oscillation(Vector3D.PLUS_I, 0.12, 0.8, 0.1).at(t), // user lambda: default path
            Motions.spinUp(new Vector3D(0.1, -0.2, 1), 0.0, 1.1, 0.02),
            Motions.translation(new Vector3D(2, -1, 0.5), new Vector3D(0.3, 0.1, 0))
                    .then(Motions.stationary(Vector3D.ZERO, new Rotation(Vector3D.PLUS_J, 0.3, RotationConvention.FRAME_TRANSFORM))),
            Motions.oscillation(new Vector3D(0, 1, 0.1), 0.3, 1.7, 0.0),
        };
    }

    @Test
    void chainPlacementHasTheBitsOfSuccessiveThen() {
        Motion[] m = links();
        ReferenceFrame[] f = new ReferenceFrame[m.length + 1];
        f[0] = ReferenceFrame.inertialRoot("quay");
        for (int i = 0; i < m.length; i++) {
            f[i + 1] = f[i].attach("link" + i, m[i]);
        }
        for (double t : new double[] {0.0, 0.45, 13.0, -2.5}) {
            for (int depth = 1; depth <= m.length; depth++) {
                Placement expected = m[0].at(t);
                for (int i = 1; i < depth; i++) {
                    expected = expected.then(m[i].at(t));
                }
                assertEquals(expected, f[depth].placementIn(f[0], t), "depth " + depth + " t " + t);
                // intermediate ancestor as base
                if (depth >= 3) {
                    Placement partial = m[1].at(t);
                    for (int i = 2; i < depth; i++) {
                        partial = partial.then(m[i].at(t));
                    }
                    assertEquals(partial, f[depth].placementIn(f[1], t), "from link0, depth " + depth);
                }
            }
        }
    }

    @Test
    void chainOrientationMatchesHipparchusComposition() {
        // independent check: Hipparchus Rotation.applyTo(Rotation) composes "first r, then this"
        Motion[] m = links();
        ReferenceFrame leaf = ReferenceFrame.inertialRoot("quay");
        ReferenceFrame root = leaf;
        for (int i = 0; i < m.length; i++) {
            leaf = leaf.attach("link" + i, m[i]);
        }
        double t = 3.3;
        Rotation expected = Rotation.IDENTITY;
        for (Motion link : m) {
            expected = link.at(t).orientation().applyTo(expected);
        }
        Rotation actual = leaf.placementIn(root, t).orientation();
        // tolerance: six compositions of unit rotations, rounding of a few ulps each
        assertTrue(Rotation.distance(expected, actual) < 1e-14, "distance " + Rotation.distance(expected, actual));
    }

    @Test
    void nullFromAUserMotionInAChainIsRefused() {
        ReferenceFrame root = ReferenceFrame.inertialRoot("quay");
        ReferenceFrame broken = root.attach("a", Motions.spin(Vector3D.PLUS_K, 0, 1)).attach("b", t -> null);
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> broken.placementIn(root, 1.0));
        assertTrue(e.getMessage().contains("returned a null placement at t = 1.0"), e.getMessage());
    }
}
