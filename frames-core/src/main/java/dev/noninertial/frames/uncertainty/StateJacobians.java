package dev.noninertial.frames.uncertainty;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;

/**
 * Exact Jacobians of the state conversions of a {@link Placement}, with respect to the state and
 * with respect to small errors of the placement itself.
 *
 * <h2>Conventions</h2>
 * Those of {@link Placement}: {@code R} maps base components to frame components
 * ({@code v_F = R v_B}); origin {@code o, o', o''} of F seen from B, resolved in B; {@code w} and
 * {@code al} of F relative to B, resolved in F. States are ordered as in {@link StateLayout}.
 * {@code [u x]} is the cross-product matrix, {@code [u x] y = u x y}:
 * <pre>
 *   [u x] = |  0   -uz   uy |
 *           |  uz   0   -ux |
 *           | -uy   ux   0  |
 * </pre>
 * Below {@code W = [w x]}, {@code A = [al x]}, {@code W2 = W W}.
 *
 * <h2>Jacobian with respect to the state</h2>
 * The conversion F to B,
 * <pre>
 *   r_B = o   + R^T r
 *   v_B = o'  + R^T (v + W r)
 *   a_B = o'' + R^T (a + A r + 2 W v + W2 r)
 * </pre>
 * is affine in (r, v, a); differentiating each line gives the block lower-triangular matrix
 * <pre>
 *               d/dr            d/dv        d/da
 *   r_B  |  R^T              0           0   |
 *   v_B  |  R^T W            R^T         0   |
 *   a_B  |  R^T (A + W2)     2 R^T W     R^T |
 * </pre>
 * The conversion B to F, {@code r = R (r_B - o)}, {@code v = R (v_B - o') - W r},
 * {@code a = R (a_B - o'') - A r - 2 W v - W2 r}, differentiated with the chain rule
 * ({@code dv/dr_B = -W R}, {@code da/dr_B = -A R - 2 W (-W R) - W2 R}), gives
 * <pre>
 *               d/dr_B          d/dv_B      d/da_B
 *   r    |  R                0           0   |
 *   v    |  -W R             R           0   |
 *   a    |  (W2 - A) R       -2 W R      R   |
 * </pre>
 * which is the inverse of the first. The position-velocity (6x6) Jacobians are the upper-left
 * 6x6 blocks of these, because position and velocity never depend on acceleration. Since the
 * conversions are affine, these matrices are exact for any size of deviation, not only to first
 * order, and do not depend on the state.
 *
 * <h2>Jacobians with respect to placement errors</h2>
 * The attitude error is a small rotation vector {@code e}, <b>resolved in F axes</b>: the true
 * frame F is the nominal frame turned (right-hand rule) by {@code |e|} about {@code e}. In terms
 * of the orientation this is a <b>left perturbation of R</b> (a right perturbation of
 * {@code R^T}):
 * <pre>
 *   R_true = exp(-[e x]) R  ~  (I - [e x]) R,      R_true^T ~ R^T (I + [e x])
 * </pre>
 * Only R is perturbed: {@code o', o'', w, al} keep their components (rates measured by sensors
 * fixed to F keep their readings when F's attitude is mis-known). The origin error {@code d} is
 * added to {@code o} in B axes, {@code o_true = o + d}, with {@code o', o''} unchanged.
 *
 * <p>F to B, with {@code R^T (I + [e x]) y = R^T y - R^T [y x] e}:
 * <pre>
 *   d(r_B, v_B, a_B)/de = -R^T [ [r x] ; [(v + W r) x] ; [(a + A r + 2 W v + W2 r) x] ]
 *   d(r_B, v_B, a_B)/dd = [ I ; 0 ; 0 ]
 * </pre>
 * B to F, with {@code r = R (r_B - o)}, {@code u = R (v_B - o')}, {@code b = R (a_B - o'')}
 * and {@code (I - [e x]) y = y + [y x] e}:
 * <pre>
 *   dr/de = [r x]
 *   dv/de = [u x] - W [r x]
 *   da/de = [b x] - A [r x] - 2 W dv/de - W2 [r x]
 *   dr/dd = -R,   dv/dd = W R,   da/dd = (A - W2) R
 * </pre>
 * These hold to first order in {@code e} and exactly in {@code d}; they depend on the state.
 * For six-component layouts only the first six rows are returned.
 *
 * <p>All matrices are new Hipparchus {@link RealMatrix} instances owned by the caller.
 * Thread-safe: stateless.
 */
public final class StateJacobians {

    private StateJacobians() {
    }

    /**
     * Jacobian of {@link Placement#toBase(PointState)} with respect to the state seen in F.
     *
     * @param placement F in B
     * @param layout 6 (position, velocity) or 9 components
     * @return {@code d x_B / d x_F}, {@code layout.size()} square
     */
    public static RealMatrix toBase(Placement placement, StateLayout layout) {
        Arguments.nonNull("placement", placement);
        Arguments.nonNull("layout", layout);
        double[][] rt = transpose(placement.orientationMatrix());
        double[][] w = cross(placement.angularVelocity());
        double[][] al = cross(placement.angularAcceleration());
        double[][] rtw = times(rt, w);
        double[][] j = new double[layout.size()][layout.size()];
        put(j, 0, 0, rt);
        put(j, 3, 0, rtw);
        put(j, 3, 3, rt);
        if (layout == StateLayout.POSITION_VELOCITY_ACCELERATION) {
            put(j, 6, 0, times(rt, plus(al, times(w, w), 1.0)));
            put(j, 6, 3, scale(rtw, 2.0));
            put(j, 6, 6, rt);
        }
        return MatrixUtils.createRealMatrix(j);
    }

    /**
     * Jacobian of {@link Placement#fromBase(PointState)} with respect to the state seen in B.
     *
     * @param placement F in B
     * @param layout 6 (position, velocity) or 9 components
     * @return {@code d x_F / d x_B}, {@code layout.size()} square
     */
    public static RealMatrix fromBase(Placement placement, StateLayout layout) {
        Arguments.nonNull("placement", placement);
        Arguments.nonNull("layout", layout);
        double[][] r = placement.orientationMatrix();
        double[][] w = cross(placement.angularVelocity());
        double[][] al = cross(placement.angularAcceleration());
        double[][] wr = times(w, r);
        double[][] j = new double[layout.size()][layout.size()];
        put(j, 0, 0, r);
        put(j, 3, 0, scale(wr, -1.0));
        put(j, 3, 3, r);
        if (layout == StateLayout.POSITION_VELOCITY_ACCELERATION) {
            put(j, 6, 0, times(plus(times(w, w), al, -1.0), r));
            put(j, 6, 3, scale(wr, -2.0));
            put(j, 6, 6, r);
        }
        return MatrixUtils.createRealMatrix(j);
    }

    /**
     * Jacobian of {@link Placement#toBase(PointState)} with respect to the attitude error of the
     * placement (rotation vector resolved in F, left perturbation of R; see the class comment).
     *
     * @param placement nominal F in B
     * @param stateInFrame the (mean) state seen in F at which the Jacobian is taken
     * @param layout 6 or 9 rows
     * @return {@code d x_B / d e}, {@code layout.size()} x 3 (m/rad, m/s/rad, m/s^2/rad)
     */
    public static RealMatrix attitudeToBase(Placement placement, PointState stateInFrame, StateLayout layout) {
        Arguments.nonNull("placement", placement);
        Arguments.nonNull("stateInFrame", stateInFrame);
        Arguments.nonNull("layout", layout);
        double[][] minusRt = scale(transpose(placement.orientationMatrix()), -1.0);
        Vector3D w = placement.angularVelocity();
        Vector3D al = placement.angularAcceleration();
        Vector3D r = stateInFrame.position();
        Vector3D v = stateInFrame.velocity();
        Vector3D wr = Vector3D.crossProduct(w, r);
        double[][] j = new double[layout.size()][3];
        put(j, 0, 0, times(minusRt, cross(r)));
        put(j, 3, 0, times(minusRt, cross(v.add(wr))));
        if (layout == StateLayout.POSITION_VELOCITY_ACCELERATION) {
            Vector3D inner = stateInFrame.acceleration().add(Vector3D.crossProduct(al, r))
                    .add(2.0, Vector3D.crossProduct(w, v)).add(Vector3D.crossProduct(w, wr));
            put(j, 6, 0, times(minusRt, cross(inner)));
        }
        return MatrixUtils.createRealMatrix(j);
    }

    /**
     * Jacobian of {@link Placement#toBase(PointState)} with respect to the origin error of the
     * placement (added to {@code o}, in B axes). It does not depend on the state.
     *
     * @param placement nominal F in B
     * @param layout 6 or 9 rows
     * @return {@code d x_B / d d}, {@code layout.size()} x 3: identity on top, zeros below
     */
    public static RealMatrix originToBase(Placement placement, StateLayout layout) {
        Arguments.nonNull("placement", placement);
        Arguments.nonNull("layout", layout);
        double[][] j = new double[layout.size()][3];
        put(j, 0, 0, identity());
        return MatrixUtils.createRealMatrix(j);
    }

    /**
     * Jacobian of {@link Placement#fromBase(PointState)} with respect to the attitude error of the
     * placement (rotation vector resolved in F, left perturbation of R; see the class comment).
     *
     * @param placement nominal F in B
     * @param stateInBase the (mean) state seen in B at which the Jacobian is taken
     * @param layout 6 or 9 rows
     * @return {@code d x_F / d e}, {@code layout.size()} x 3 (m/rad, m/s/rad, m/s^2/rad)
     */
    public static RealMatrix attitudeFromBase(Placement placement, PointState stateInBase, StateLayout layout) {
        Arguments.nonNull("placement", placement);
        Arguments.nonNull("stateInBase", stateInBase);
        Arguments.nonNull("layout", layout);
        Vector3D r = placement.positionFromBase(stateInBase.position());
        Vector3D u = placement.vectorFromBase(stateInBase.velocity().subtract(placement.originVelocity()));
        double[][] w = cross(placement.angularVelocity());
        double[][] rx = cross(r);
        double[][] drde = rx;
        double[][] dvde = plus(cross(u), times(w, rx), -1.0);
        double[][] j = new double[layout.size()][3];
        put(j, 0, 0, drde);
        put(j, 3, 0, dvde);
        if (layout == StateLayout.POSITION_VELOCITY_ACCELERATION) {
            Vector3D b = placement.vectorFromBase(
                    stateInBase.acceleration().subtract(placement.originAcceleration()));
            double[][] al = cross(placement.angularAcceleration());
            double[][] dade = plus(cross(b), times(plus(al, times(w, w), 1.0), rx), -1.0);
            dade = plus(dade, times(w, dvde), -2.0);
            put(j, 6, 0, dade);
        }
        return MatrixUtils.createRealMatrix(j);
    }

    /**
     * Jacobian of {@link Placement#fromBase(PointState)} with respect to the origin error of the
     * placement (added to {@code o}, in B axes). It does not depend on the state.
     *
     * @param placement nominal F in B
     * @param layout 6 or 9 rows
     * @return {@code d x_F / d d}, {@code layout.size()} x 3: {@code -R ; W R ; (A - W2) R}
     */
    public static RealMatrix originFromBase(Placement placement, StateLayout layout) {
        Arguments.nonNull("placement", placement);
        Arguments.nonNull("layout", layout);
        double[][] r = placement.orientationMatrix();
        double[][] w = cross(placement.angularVelocity());
        double[][] j = new double[layout.size()][3];
        put(j, 0, 0, scale(r, -1.0));
        put(j, 3, 0, times(w, r));
        if (layout == StateLayout.POSITION_VELOCITY_ACCELERATION) {
            double[][] al = cross(placement.angularAcceleration());
            put(j, 6, 0, times(plus(al, times(w, w), -1.0), r));
        }
        return MatrixUtils.createRealMatrix(j);
    }

    // ------------------------------------------------------------------ 3x3 algebra on arrays

    static double[][] cross(Vector3D u) {
        return new double[][] {
            {0.0, -u.getZ(), u.getY()},
            {u.getZ(), 0.0, -u.getX()},
            {-u.getY(), u.getX(), 0.0}};
    }

    private static double[][] identity() {
        return new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}};
    }

    private static double[][] transpose(double[][] m) {
        double[][] t = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int k = 0; k < 3; k++) {
                t[i][k] = m[k][i];
            }
        }
        return t;
    }

    private static double[][] times(double[][] a, double[][] b) {
        double[][] c = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int k = 0; k < 3; k++) {
                c[i][k] = a[i][0] * b[0][k] + a[i][1] * b[1][k] + a[i][2] * b[2][k];
            }
        }
        return c;
    }

    /** a + factor * b. */
    private static double[][] plus(double[][] a, double[][] b, double factor) {
        double[][] c = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int k = 0; k < 3; k++) {
                c[i][k] = a[i][k] + factor * b[i][k];
            }
        }
        return c;
    }

    private static double[][] scale(double[][] a, double factor) {
        return plus(new double[3][3], a, factor);
    }

    private static void put(double[][] target, int row, int column, double[][] block) {
        for (int i = 0; i < 3; i++) {
            System.arraycopy(block[i], 0, target[row + i], column, 3);
        }
    }
}
