package dev.noninertial.frames.uncertainty;

import java.util.Locale;

import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * The acceptance rules for a covariance matrix given to this package, applied before any use.
 *
 * <p>A matrix is accepted when it has the expected square size, all entries finite, non-negative
 * variances on the diagonal, and is symmetric and positive semidefinite within the relative
 * tolerances below. Both tolerances are measured on the <em>correlation-scaled</em> matrix
 * {@code C_ij = P_ij / (s_i s_j)} with {@code s_i = sqrt(P_ii)} (or 1 where {@code P_ii = 0}), so
 * that they do not depend on the units of the components (a position-velocity covariance mixes
 * m^2 with m^2/s^2):
 * <ul>
 *   <li>symmetric: {@code |P_ij - P_ji| <= SYMMETRY_TOLERANCE * s_i s_j} for every pair;</li>
 *   <li>positive semidefinite: the smallest eigenvalue of C (computed with Hipparchus
 *       {@link EigenDecompositionSymmetric}) is not below
 *       {@code -SEMIDEFINITE_TOLERANCE * (largest eigenvalue of C)}.</li>
 * </ul>
 * Nothing is repaired: a refused matrix raises an exception naming the argument and the
 * offending entry or eigenvalue.
 *
 * <p>Thread-safe: stateless.
 */
public final class CovarianceCheck {

    /** Largest accepted {@code |P_ij - P_ji| / (s_i s_j)} (relative, dimensionless). */
    public static final double SYMMETRY_TOLERANCE = 1e-9;

    /** Largest accepted ratio of a negative smallest eigenvalue to the largest one, of C. */
    public static final double SEMIDEFINITE_TOLERANCE = 1e-9;

    private CovarianceCheck() {
    }

    /**
     * Refuses a matrix that is not an acceptable covariance of the given size.
     *
     * @param name argument name used in messages
     * @param matrix the candidate covariance
     * @param size expected number of rows and columns
     * @return {@code matrix}, for chaining
     * @throws NullPointerException if {@code matrix} is null
     * @throws IllegalArgumentException if the size is wrong, an entry is not finite, a variance is
     *         negative, or the matrix is not symmetric or not positive semidefinite within the
     *         tolerances of this class
     */
    public static RealMatrix check(String name, RealMatrix matrix, int size) {
        checkedCopy(name, matrix, size);
        return matrix;
    }

    /** Checks and returns a private copy of the entries. */
    static double[][] checkedCopy(String name, RealMatrix matrix, int size) {
        Arguments.nonNull(name, matrix);
        if (matrix.getRowDimension() != size || matrix.getColumnDimension() != size) {
            throw new IllegalArgumentException(name + " must be " + size + "x" + size + ", got "
                    + matrix.getRowDimension() + "x" + matrix.getColumnDimension());
        }
        double[][] p = matrix.getData();
        checkEntries(name, p);
        return p;
    }

    /** Checks an array read from a stream: present, {@code size} square, then as {@link #checkEntries}. */
    static void checkStored(String name, double[][] p, int size) {
        Arguments.nonNull(name, p);
        if (p.length != size) {
            throw new IllegalArgumentException(name + " must be " + size + "x" + size + ", got " + p.length + " rows");
        }
        for (int i = 0; i < size; i++) {
            if (p[i] == null || p[i].length != size) {
                throw new IllegalArgumentException(name + " row " + i + " must hold " + size + " values");
            }
            for (int j = 0; j < i; j++) {
                if (p[i] == p[j]) {
                    throw new IllegalArgumentException(name + " rows " + j + " and " + i + " must not be one array");
                }
            }
        }
        checkEntries(name, p);
    }

    /** Checks a square array already known to have the right size. */
    static void checkEntries(String name, double[][] p) {
        int n = p.length;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (!Double.isFinite(p[i][j])) {
                    throw new IllegalArgumentException(name + "[" + i + "][" + j + "] must be finite, got " + p[i][j]);
                }
            }
        }
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            if (!(p[i][i] >= 0.0)) {
                throw new IllegalArgumentException(name + "[" + i + "][" + i
                        + "] is a variance and must be >= 0, got " + p[i][i]);
            }
            s[i] = p[i][i] > 0.0 ? Math.sqrt(p[i][i]) : 1.0;
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double allowed = SYMMETRY_TOLERANCE * s[i] * s[j];
                if (!(Math.abs(p[i][j] - p[j][i]) <= allowed)) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT,
                            "%s must be symmetric: %s[%d][%d] = %s but %s[%d][%d] = %s"
                            + " (allowed difference %s = %s * sqrt(variance %d * variance %d))",
                            name, name, i, j, p[i][j], name, j, i, p[j][i], allowed, SYMMETRY_TOLERANCE, i, j));
                }
            }
        }
        double[][] c = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                c[i][j] = 0.5 * (p[i][j] + p[j][i]) / (s[i] * s[j]);
            }
        }
        double[] eigenvalues = new EigenDecompositionSymmetric(MatrixUtils.createRealMatrix(c)).getEigenvalues();
        double largest = Double.NEGATIVE_INFINITY;
        double smallest = Double.POSITIVE_INFINITY;
        for (double e : eigenvalues) {
            largest = Math.max(largest, e);
            smallest = Math.min(smallest, e);
        }
        if (smallest < -SEMIDEFINITE_TOLERANCE * Math.max(largest, 0.0)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s must be positive semidefinite: smallest eigenvalue of its correlation-scaled matrix is %s,"
                    + " below -%s times the largest (%s)", name, Formats.number(smallest), SEMIDEFINITE_TOLERANCE, Formats.number(largest)));
        }
    }
}
