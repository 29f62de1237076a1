package dev.noninertial.frames.uncertainty;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;

/** Bad covariances and bad frame pairs are refused with a message naming argument and value. */
class CovarianceInputTest {

    private final ReferenceFrame root = ReferenceFrame.inertialRoot("quay");
    private final ReferenceFrame deck = root.attach("deck", Motions.spin(Vector3D.PLUS_K, 0.0, 0.1));
    private final FramedState mean = deck.stateAt(1.0, PointState.stationary(new Vector3D(1, 2, 3)));

    private static RealMatrix diagonal(int n, double variance) {
        RealMatrix m = MatrixUtils.createRealIdentityMatrix(n);
        return m.scalarMultiply(variance);
    }

    private static void refused(String expectedFragment, Runnable action) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, action::run);
        assertTrue(e.getMessage().contains(expectedFragment), "message '" + e.getMessage() + "' lacks '"
                + expectedFragment + "'");
    }

    @Test
    void wrongSizesAreRefused() {
        refused("covariance must be 6x6 (position, velocity) or 9x9", () -> UncertainState.of(mean, diagonal(5, 1)));
        refused("got 5 rows", () -> UncertainState.of(mean, diagonal(5, 1)));
        refused("covariance must be square (6x6 or 9x9), got 6x9",
            () -> UncertainState.of(mean, MatrixUtils.createRealMatrix(6, 9)));
        refused("attitudeCovariance must be 3x3, got 2x2",
            () -> PlacementUncertainty.of(diagonal(2, 1e-6), diagonal(3, 1)));
        refused("newCovariance must be 9x9, got 6x6",
            () -> UncertainState.of(mean, diagonal(9, 1)).withCovariance(diagonal(6, 1)));
    }

    @Test
    void nonFiniteEntriesAreRefused() {
        RealMatrix m = diagonal(6, 1);
        m.setEntry(2, 4, Double.NaN);
        refused("covariance[2][4] must be finite, got NaN", () -> UncertainState.of(mean, m));
        RealMatrix o = diagonal(3, 1);
        o.setEntry(1, 1, Double.POSITIVE_INFINITY);
        refused("originCovariance[1][1] must be finite, got Infinity", () -> PlacementUncertainty.of(diagonal(3, 0), o));
    }

    @Test
    void negativeVarianceIsRefused() {
        RealMatrix m = diagonal(6, 1);
        m.setEntry(3, 3, -0.5);
        refused("covariance[3][3] is a variance and must be >= 0, got -0.5", () -> UncertainState.of(mean, m));
        refused("attitudeSigma must be in [0.0", () -> PlacementUncertainty.ofSigmas(-1e-3, 1));
    }

    @Test
    void asymmetryBeyondTheRelativeToleranceIsRefused() {
        // variances 4 and 9: s_i s_j = 6, allowed difference 6e-9
        RealMatrix m = diagonal(6, 1);
        m.setEntry(0, 0, 4);
        m.setEntry(1, 1, 9);
        m.setEntry(0, 1, 1.0);
        m.setEntry(1, 0, 1.0 + 1e-8);
        refused("covariance must be symmetric: covariance[0][1] = 1.0 but covariance[1][0] = 1.00000001",
            () -> UncertainState.of(mean, m));
        m.setEntry(1, 0, 1.0 + 5e-9); // within 6e-9: accepted
        assertDoesNotThrow(() -> UncertainState.of(mean, m));
    }

    @Test
    void indefiniteMatrixIsRefused() {
        // correlation 1.2 between x and vx: eigenvalues of the correlation matrix 2.2 and -0.2
        RealMatrix m = diagonal(6, 1);
        m.setEntry(0, 0, 100);
        m.setEntry(3, 3, 0.01);
        m.setEntry(0, 3, 1.2);
        m.setEntry(3, 0, 1.2);
        refused("covariance must be positive semidefinite: smallest eigenvalue of its correlation-scaled matrix is -0.2",
            () -> UncertainState.of(mean, m));
        // a rank-deficient (perfectly correlated) matrix is semidefinite and accepted
        m.setEntry(0, 3, 1.0);
        m.setEntry(3, 0, 1.0);
        assertDoesNotThrow(() -> UncertainState.of(mean, m));
    }

    @Test
    void wrongFramePairsAreRefused() {
        UncertainState atRoot = UncertainState.of(root.stateAt(1.0, PointState.stationary(Vector3D.ZERO)), diagonal(6, 1));
        refused("frame 'quay' is a root and has no parent", () -> atRoot.toParent(PlacementUncertainty.none()));
        ReferenceFrame other = ReferenceFrame.inertialRoot("slipway");
        UncertainState atDeck = UncertainState.of(mean, diagonal(6, 1));
        refused("child 'slipway' must have 'quay/deck' as parent, its parent is none (a root)",
            () -> atDeck.toChild(other, PlacementUncertainty.none()));
        refused("share no root", () -> atDeck.in(other));
    }
}
