package dev.noninertial.geodesy.navigation;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.geodesy.EarthFrames;

/**
 * Reference increments computed directly from the library's frames (an independent path from the
 * navigator): at each quadrature node the body's placement in the inertial root gives the angular
 * rate relative to inertial space (body axes) and the inertial acceleration of the body origin;
 * specific force is that acceleration minus gravitation (REFERENCES.md, "Inertial sensors and
 * navigation": f = a_inertial - gravitation), resolved in body axes. Each step is integrated with
 * 4-point Gauss-Legendre quadrature on two halves (error of order (rate x step)^8).
 */
final class FrameIncrements {

    private static final double[] NODE = {-0.8611363115940526, -0.3399810435848563, 0.3399810435848563,
        0.8611363115940526};
    private static final double[] WEIGHT = {0.3478548451374538, 0.6521451548625461, 0.6521451548625461,
        0.3478548451374538};

    final double[] ends;
    final double[] deltaVelocity;
    final double[] deltaAngle;

    private FrameIncrements(int n) {
        ends = new double[n];
        deltaVelocity = new double[3 * n];
        deltaAngle = new double[3 * n];
    }

    /** Increments of {@code n} equal steps of {@code h} from t0. */
    static FrameIncrements of(EarthFrames earth, ReferenceFrame body, double t0, double h, int n) {
        return of(earth, body, body, t0, h, n);
    }

    /**
     * As above, with gravitation taken at the origin of {@code gravityAt} (a frame with the same
     * axes as {@code body}), to leave out the gravity gradient across a lever arm.
     */
    static FrameIncrements of(EarthFrames earth, ReferenceFrame body, ReferenceFrame gravityAt, double t0, double h,
                              int n) {
        FrameIncrements r = new FrameIncrements(n);
        SpecificForce gravitation = earth.gravitationIn(gravityAt);
        PointState origin = PointState.stationary(Vector3D.ZERO);
        ReferenceFrame inertial = earth.inertial();
        for (int k = 0; k < n; k++) {
            double a = t0 + k * h;
            double[] sum = new double[6];
            for (int half = 0; half < 2; half++) {
                double lo = a + 0.5 * h * half;
                double mid = lo + 0.25 * h;
                for (int j = 0; j < 4; j++) {
                    double t = mid + 0.25 * h * NODE[j];
                    double wgt = 0.25 * h * WEIGHT[j];
                    Placement p = body.placementIn(inertial, t);
                    Vector3D f = p.vectorFromBase(p.originAcceleration()).subtract(gravitation.at(t, origin));
                    Vector3D w = p.angularVelocity();
                    sum[0] += wgt * f.getX();
                    sum[1] += wgt * f.getY();
                    sum[2] += wgt * f.getZ();
                    sum[3] += wgt * w.getX();
                    sum[4] += wgt * w.getY();
                    sum[5] += wgt * w.getZ();
                }
            }
            r.ends[k] = t0 + (k + 1) * h;
            System.arraycopy(sum, 0, r.deltaVelocity, 3 * k, 3);
            System.arraycopy(sum, 3, r.deltaAngle, 3 * k, 3);
        }
        return r;
    }

    /** Sums groups of {@code m} consecutive steps (increments are integrals, so they add). */
    FrameIncrements coarsen(int m) {
        int n = ends.length / m;
        FrameIncrements r = new FrameIncrements(n);
        for (int k = 0; k < n; k++) {
            r.ends[k] = ends[(k + 1) * m - 1];
            for (int j = 0; j < m; j++) {
                for (int c = 0; c < 3; c++) {
                    r.deltaVelocity[3 * k + c] += deltaVelocity[3 * (k * m + j) + c];
                    r.deltaAngle[3 * k + c] += deltaAngle[3 * (k * m + j) + c];
                }
            }
        }
        return r;
    }
}
