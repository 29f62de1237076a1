package dev.noninertial.frames.uncertainty;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.random.RandomGenerator;

import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;

/** Invented test data and the independent machinery the checks use (perturbed placements, sample statistics). */
final class Fixtures {

    private Fixtures() {
    }

    /** An invented placement with every term non-zero, of the size of a ship-borne sensor mast. */
    static Placement mastOnCarrier() {
        return Placement.of(new Vector3D(120.5, -40.2, 15.0), new Vector3D(3.1, -0.7, 0.4),
                new Vector3D(0.2, 0.05, -0.3), Orientations.fromYawPitchRoll(0.7, -0.3, 1.1),
                new Vector3D(0.05, -0.12, 0.3), new Vector3D(0.01, 0.02, -0.015));
    }

    /** An invented tracked point (a buoy seen from the mast). */
    static PointState buoy() {
        return PointState.of(new Vector3D(250.0, -80.0, 30.0), new Vector3D(12.0, -5.0, 2.0),
                new Vector3D(0.3, -0.1, 0.05));
    }

    /**
     * The placement with its attitude perturbed by rotation vector e (resolved in F, F turned by
     * +|e| about e, the documented convention) and its origin moved by d (in B). Built from the
     * direction-cosine matrices of Hipparchus, not through the code under test.
     */
    static Placement perturbed(Placement p, Vector3D e, Vector3D d) {
        double[][] r = p.orientationMatrix();
        double[][] small = e.getNorm() == 0.0 ? new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}}
                : Orientations.toMatrix(Orientations.aboutAxis(e, e.getNorm()));
        double[][] m = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int k = 0; k < 3; k++) {
                m[i][k] = small[i][0] * r[0][k] + small[i][1] * r[1][k] + small[i][2] * r[2][k];
            }
        }
        Rotation turned = Orientations.fromMatrix(m);
        return Placement.of(p.origin().add(d), p.originVelocity(), p.originAcceleration(), turned,
                p.angularVelocity(), p.angularAcceleration());
    }

    /** A random symmetric positive-definite matrix with a spread of scales, from a fixed generator. */
    static RealMatrix randomCovariance(RandomGenerator random, double[] sigmas) {
        int n = sigmas.length;
        double[][] g = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                g[i][k] = random.nextGaussian();
            }
        }
        // G G^T / n + I/4: a well-conditioned correlation-like matrix, then scaled by sigmas
        double[][] c = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                double s = 0;
                for (int l = 0; l < n; l++) {
                    s += g[i][l] * g[k][l];
                }
                c[i][k] = s / n + (i == k ? 0.25 : 0.0);
            }
        }
        double[][] p = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                p[i][k] = c[i][k] / Math.sqrt(c[i][i] * c[k][k]) * sigmas[i] * sigmas[k];
            }
        }
        return MatrixUtils.createRealMatrix(p);
    }

    /** Accumulates a sample mean and covariance (two sums, in double; fine for a few 1e5 samples of O(1) spread). */
    static final class SampleStatistics {
        private final int n;
        private final double[] reference;
        private final double[] sum;
        private final double[][] sumProducts;
        private long count;

        /** @param reference a value near the mean, subtracted before summing to avoid cancellation */
        SampleStatistics(double[] reference) {
            this.n = reference.length;
            this.reference = reference.clone();
            this.sum = new double[n];
            this.sumProducts = new double[n][n];
        }

        void add(double[] x) {
            double[] d = new double[n];
            for (int i = 0; i < n; i++) {
                d[i] = x[i] - reference[i];
                sum[i] += d[i];
            }
            for (int i = 0; i < n; i++) {
                for (int k = 0; k < n; k++) {
                    sumProducts[i][k] += d[i] * d[k];
                }
            }
            count++;
        }

        double[] mean() {
            double[] m = new double[n];
            for (int i = 0; i < n; i++) {
                m[i] = reference[i] + sum[i] / count;
            }
            return m;
        }

        /** Unbiased sample covariance (divisor N - 1). */
        double[][] covariance() {
            double[][] c = new double[n][n];
            for (int i = 0; i < n; i++) {
                for (int k = 0; k < n; k++) {
                    c[i][k] = (sumProducts[i][k] - sum[i] * sum[k] / count) / (count - 1);
                }
            }
            return c;
        }

        long count() {
            return count;
        }
    }

    /**
     * Largest deviation of a sample covariance from the expected one, in units of the standard
     * error of each element. For Gaussian samples the sample covariance element S_ij has variance
     * (P_ij^2 + P_ii P_jj) / (N - 1) (Wishart distribution; e.g. Anderson, An Introduction to
     * Multivariate Statistical Analysis, ch. 7).
     */
    static double worstStandardErrors(double[][] sample, RealMatrix expected, long count) {
        double worst = 0;
        for (int i = 0; i < sample.length; i++) {
            for (int k = 0; k < sample.length; k++) {
                double pik = expected.getEntry(i, k);
                double se = Math.sqrt((pik * pik + expected.getEntry(i, i) * expected.getEntry(k, k)) / (count - 1));
                worst = Math.max(worst, Math.abs(sample[i][k] - pik) / se);
            }
        }
        return worst;
    }
}
