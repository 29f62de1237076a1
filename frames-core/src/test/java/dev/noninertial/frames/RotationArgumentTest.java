package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

import dev.noninertial.frames.motion.Motions;

/**
 * A Hipparchus rotation built with {@code needsNormalization} false holds its quaternion as given
 * (NaN, or not unit); every entry point taking one refuses it under the parameter's name, through
 * {@link Arguments#unitRotation(String, Rotation)}. A rotation is a unit quaternion (Hipparchus
 * {@code Rotation} documentation; REFERENCES.md, Hipparchus), so the norm 1 is the rule checked.
 */
class RotationArgumentTest {

    /** Built without normalization: NaN kept. */
    private static final Rotation NAN = new Rotation(Double.NaN, 0, 0, 0, false);
    /** Built without normalization: norm 2 kept. */
    private static final Rotation DOUBLE_LENGTH = new Rotation(2, 0, 0, 0, false);

    private static void refusedNaming(String name, Executable call) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(namesWord(e.getMessage(), name), () -> "should name '" + name + "': " + e.getMessage());
    }

    @Test
    void aRotationHoldingNaNIsRefusedByTheParameterName() {
        for (Rotation bad : new Rotation[] {NAN, DOUBLE_LENGTH}) {
            refusedNaming("orientation", () -> Placement.of(Vector3D.ZERO, Vector3D.ZERO, Vector3D.ZERO, bad,
                    Vector3D.ZERO, Vector3D.ZERO));
            refusedNaming("orientation", () -> Placement.stationary(Vector3D.ZERO, bad));
            refusedNaming("orientation", () -> Placement.identity().withOrientation(bad, Vector3D.ZERO,
                    Vector3D.ZERO));
            refusedNaming("orientation", () -> Motions.stationary(Vector3D.PLUS_I, bad));
            refusedNaming("orientation", () -> Orientations.toQuaternion(bad));
            refusedNaming("orientation", () -> Orientations.toMatrix(bad));
            refusedNaming("orientation", () -> Orientations.toYawPitchRoll(bad));
            refusedNaming("orientation", () -> Orientations.toRotationVector(bad));
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Arguments.unitRotation("attitude", NAN));
        assertTrue(e.getMessage().contains("NaN") && e.getMessage().contains("finite"), e.getMessage());
    }

    @Test
    void aUnitRotationPasses() {
        Rotation turn = Orientations.aboutAxis(Vector3D.PLUS_K, 0.4);
        assertSame(turn, Arguments.unitRotation("orientation", turn));
        // within the library's unit tolerance (1e-6) a hand-made quaternion passes too
        assertSame(Rotation.IDENTITY, Arguments.unitRotation("orientation", Rotation.IDENTITY));
        Rotation nearUnit = new Rotation(1 + 5e-7, 0, 0, 0, false);
        assertSame(nearUnit, Arguments.unitRotation("orientation", nearUnit));
    }

    @Test
    void aComponentTooLargeForAUnitQuaternionIsNamed() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Orientations.fromQuaternion(0.5, 0.5, 1e300, 0.5));
        assertTrue(e.getMessage().contains("q2 = 1.0E300"), e.getMessage());
        // a subnormal component: no single component is out of range, the whole quaternion is named
        e = assertThrows(IllegalArgumentException.class, () -> Orientations.fromQuaternion(Double.MIN_VALUE, 0.5, 0.5,
                0.5));
        assertTrue(e.getMessage().contains("(q0, q1, q2, q3)") && e.getMessage().contains("norm"), e.getMessage());
    }

    /** The rule of the API fuzz: the message holds the name as a whole word. */
    private static boolean namesWord(String message, String name) {
        return message != null && message.matches("(?s).*\\b" + name + "\\b.*");
    }
}
