package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

import dev.noninertial.frames.motion.Motions;

/** Bad input is refused early with a message naming the argument (and the value). */
class BadInputTest {

    private static void refused(Class<? extends Throwable> type, String mustMention, Executable call) {
        Throwable e = assertThrows(type, call);
        assertTrue(e.getMessage() != null && e.getMessage().contains(mustMention),
                () -> "message should mention '" + mustMention + "': " + e.getMessage());
    }

    @Test
    void nonFiniteComponentsAreRefused() {
        Vector3D nan = new Vector3D(0, Double.NaN, 0);
        Vector3D inf = new Vector3D(Double.POSITIVE_INFINITY, 0, 0);
        refused(IllegalArgumentException.class, "position", () -> PointState.of(nan, Vector3D.ZERO));
        refused(IllegalArgumentException.class, "velocity", () -> PointState.of(Vector3D.ZERO, inf));
        refused(IllegalArgumentException.class, "NaN", () -> PointState.of(nan, Vector3D.ZERO));
        refused(IllegalArgumentException.class, "angularVelocity", () -> Placement.of(Vector3D.ZERO, Vector3D.ZERO,
                Vector3D.ZERO, Rotation.IDENTITY, inf, Vector3D.ZERO));
        refused(IllegalArgumentException.class, "rate",
                () -> Motions.spin(Vector3D.PLUS_K, 0, Double.NaN));
        refused(IllegalArgumentException.class, "components[3]",
                () -> PointState.fromArray(new double[] {0, 0, 0, Double.NaN, 0, 0, 0, 0, 0}, 0));
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        refused(IllegalArgumentException.class, "t", () -> lab.placementIn(lab, Double.NaN));
        refused(IllegalArgumentException.class, "originAcceleration", () -> Placement.ofQuaternion(
                0, 0, 0, 0, 0, 0, 0, 0, Double.NaN, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0));
    }

    @Test
    void zeroAxisIsRefused() {
        refused(IllegalArgumentException.class, "axis", () -> Motions.spin(Vector3D.ZERO, 0, 1));
        refused(IllegalArgumentException.class, "axis", () -> Orientations.aboutAxis(Vector3D.ZERO, 1));
        refused(IllegalArgumentException.class, "direction", () -> Motions.heave(Vector3D.ZERO, 1, 1, 0));
    }

    @Test
    void nonUnitQuaternionIsRefused() {
        refused(IllegalArgumentException.class, "quaternion", () -> Orientations.fromQuaternion(1, 0.1, 0, 0));
        refused(IllegalArgumentException.class, "quaternion", () -> Placement.ofQuaternion(
                0, 0, 0, 0, 0, 0, 0, 0, 0, 2, 0, 0, 0, 0, 0, 0, 0, 0, 0));
        refused(IllegalArgumentException.class, "q2", () -> Orientations.fromQuaternion(1, 0, Double.NaN, 0));
    }

    @Test
    void nonOrthogonalOrReflectingMatrixIsRefused() {
        refused(IllegalArgumentException.class, "orthonormal",
                () -> Orientations.fromMatrix(new double[][] {{1, 0.01, 0}, {0, 1, 0}, {0, 0, 1}}));
        refused(IllegalArgumentException.class, "determinant",
                () -> Orientations.fromMatrix(new double[][] {{-1, 0, 0}, {0, 1, 0}, {0, 0, 1}}));
        refused(IllegalArgumentException.class, "3 rows", () -> Orientations.fromMatrix(new double[2][3]));
    }

    @Test
    void framesWithNoCommonRootAreRefusedNamingBoth() {
        ReferenceFrame a = ReferenceFrame.inertialRoot("alpha").attach("deck", Motions.stationary(Vector3D.PLUS_I));
        ReferenceFrame b = ReferenceFrame.inertialRoot("beta");
        refused(IllegalArgumentException.class, "alpha/deck", () -> a.placementIn(b, 0));
        refused(IllegalArgumentException.class, "beta", () -> a.placementIn(b, 0));
        FramedState s = a.stateAt(0, PointState.stationary(Vector3D.ZERO));
        refused(IllegalArgumentException.class, "share no root", () -> s.in(b));
    }

    @Test
    void motionReturningNullIsReportedWithTheFramePath() {
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame broken = lab.attach("deck", Motions.stationary(Vector3D.PLUS_I)).attach("mast", t -> null);
        refused(IllegalStateException.class, "lab/deck/mast", () -> broken.placementIn(lab, 1.0));
        refused(IllegalStateException.class, "lab/deck/mast", () -> broken.placementIn(broken.parent().get(), 1.0));
    }

    @Test
    void nullArgumentsAreRefusedByName() {
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        refused(NullPointerException.class, "childMotion", () -> lab.attach("x", null));
        refused(NullPointerException.class, "name", () -> ReferenceFrame.inertialRoot(null));
        refused(NullPointerException.class, "base", () -> lab.placementIn(null, 0));
        refused(NullPointerException.class, "stateInFrame", () -> Placement.identity().toBase((PointState) null));
        refused(NullPointerException.class, "inner", () -> Placement.identity().then(null));
        refused(NullPointerException.class, "target", () -> lab.stateAt(0, PointState.stationary(Vector3D.ZERO)).in(null));
        refused(NullPointerException.class, "position", () -> PointState.stationary(null));
        refused(IllegalArgumentException.class, "blank", () -> lab.attach(" ", Motions.stationary(Vector3D.ZERO)));
    }

    @Test
    void bulkRangesOutsideTheArraysAreRefused() {
        double[] nine = new double[9];
        refused(IllegalArgumentException.class, "targetOffset",
                () -> Placement.identity().toBase(nine, 0, new double[5], 0, 1));
        refused(IllegalArgumentException.class, "count", () -> Placement.identity().toBase(nine, 0, nine, 0, -1));
        double[] shared = new double[27];
        refused(IllegalArgumentException.class, "overlap",
                () -> Placement.identity().toBase(shared, 0, shared, 9, 2));
    }
}
