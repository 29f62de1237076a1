package dev.noninertial.frames.uncertainty;

import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Arrays;

import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * Uncertainty of a placement of a frame F in a base B: a zero-mean attitude error and a zero-mean
 * origin error, each with its 3x3 covariance, uncorrelated with each other and with the state
 * being converted.
 *
 * <h2>Conventions</h2>
 * <ul>
 *   <li>Attitude error {@code e}: a small rotation vector <b>resolved in F axes</b> (rad); the
 *       true frame is the nominal F turned by {@code |e|} about {@code e} (right-hand rule). With
 *       the library's orientation R (mapping B components to F components) this is a left
 *       perturbation, {@code R_true = exp(-[e x]) R}. Angular velocity and acceleration keep
 *       their F components.</li>
 *   <li>Origin error {@code d}: added to the origin o of F, <b>resolved in B axes</b> (m);
 *       origin velocity and acceleration are unchanged.</li>
 * </ul>
 * The converted covariance gains {@code Je Pe Je^T + Jd Pd Jd^T} to first order, with the
 * Jacobians of {@link StateJacobians}. First order means the attitude standard deviation must be
 * small (the neglected terms grow like its square: about 1e-6 relative at 1 mrad).
 *
 * <p>Immutable and thread-safe.
 */
public final class PlacementUncertainty implements Serializable {

    private static final long serialVersionUID = 1L;

    private static final PlacementUncertainty NONE = new PlacementUncertainty(new double[3][3], new double[3][3]);

    /** Covariance of the attitude rotation vector, resolved in F (rad^2), 3x3. */
    private final double[][] attitude;
    /** Covariance of the origin error, resolved in B (m^2), 3x3. */
    private final double[][] origin;

    private PlacementUncertainty(double[][] attitude, double[][] origin) {
        this.attitude = attitude;
        this.origin = origin;
    }

    /**
     * An uncertainty from two covariances.
     *
     * @param attitudeCovariance 3x3 covariance of the rotation vector e resolved in F (rad^2)
     * @param originCovariance 3x3 covariance of the origin error d resolved in B (m^2)
     * @return the uncertainty
     * @throws IllegalArgumentException if a matrix is refused by {@link CovarianceCheck}
     */
    public static PlacementUncertainty of(RealMatrix attitudeCovariance, RealMatrix originCovariance) {
        return new PlacementUncertainty(CovarianceCheck.checkedCopy("attitudeCovariance", attitudeCovariance, 3),
                CovarianceCheck.checkedCopy("originCovariance", originCovariance, 3));
    }

    /**
     * An isotropic uncertainty: the same standard deviation about every axis and along every
     * axis, no correlation.
     *
     * @param attitudeSigma standard deviation of each component of e (rad), at least 0
     * @param originSigma standard deviation of each component of d (m), at least 0
     * @return the uncertainty
     * @throws IllegalArgumentException if a value is negative or not finite
     */
    public static PlacementUncertainty ofSigmas(double attitudeSigma, double originSigma) {
        Arguments.inRange("attitudeSigma", attitudeSigma, 0.0, Double.MAX_VALUE);
        Arguments.inRange("originSigma", originSigma, 0.0, Double.MAX_VALUE);
        return new PlacementUncertainty(diagonal(attitudeSigma * attitudeSigma), diagonal(originSigma * originSigma));
    }

    /**
     * Returns an exactly known placement: both covariances zero.
     *
     * @return an exactly known placement: both covariances zero
     */
    public static PlacementUncertainty none() {
        return NONE;
    }

    private static double[][] diagonal(double variance) {
        return new double[][] {{variance, 0, 0}, {0, variance, 0}, {0, 0, variance}};
    }

    /**
     * Returns a new 3x3 covariance of the attitude rotation vector, resolved in F (rad^2).
     *
     * @return a new 3x3 covariance of the attitude rotation vector, resolved in F (rad^2)
     */
    public RealMatrix attitudeCovariance() {
        return MatrixUtils.createRealMatrix(attitude);
    }

    /**
     * Returns a new 3x3 covariance of the origin error, resolved in B (m^2).
     *
     * @return a new 3x3 covariance of the origin error, resolved in B (m^2)
     */
    public RealMatrix originCovariance() {
        return MatrixUtils.createRealMatrix(origin);
    }

    /**
     * Reads the fields and re-checks both covariances as {@link #of(RealMatrix, RealMatrix)} does.
     *
     * @param in the stream
     * @throws IOException if the stream fails or holds a covariance the factory refuses
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            CovarianceCheck.checkStored("attitudeCovariance", attitude, 3);
            CovarianceCheck.checkStored("originCovariance", origin, 3);
        } catch (IllegalArgumentException | NullPointerException e) {
            throw Arguments.refusedStream(PlacementUncertainty.class, e);
        }
    }

    @Override
    public boolean equals(Object other) {
        if (this == other) {
            return true;
        }
        if (!(other instanceof PlacementUncertainty)) {
            return false;
        }
        PlacementUncertainty u = (PlacementUncertainty) other;
        return Arrays.deepEquals(attitude, u.attitude) && Arrays.deepEquals(origin, u.origin);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.deepHashCode(attitude) + Arrays.deepHashCode(origin);
    }

    @Override
    public String toString() {
        return "PlacementUncertainty{attitude sigma (in F)="
                + Formats.vector(Math.sqrt(attitude[0][0]), Math.sqrt(attitude[1][1]), Math.sqrt(attitude[2][2]), "rad")
                + ", origin sigma (in B)="
                + Formats.vector(Math.sqrt(origin[0][0]), Math.sqrt(origin[1][1]), Math.sqrt(origin[2][2]), "m") + "}";
    }
}
