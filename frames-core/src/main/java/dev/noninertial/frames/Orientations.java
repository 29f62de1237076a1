package dev.noninertial.frames;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Builds and reads orientations so that nobody has to guess a rotation convention.
 *
 * <p><b>Convention, everywhere in this library:</b> the orientation of a frame F in a base B is a
 * Hipparchus {@link Rotation} whose {@code applyTo(v_B)} returns the components of the same
 * vector in F axes ({@code v_F = R v_B}). "F is turned by angle {@code a} about axis {@code n}"
 * means F's axes are B's axes turned by {@code +a} (right-hand rule) about {@code n}; a vector
 * fixed in B then appears turned by {@code -a} in F.
 *
 * <p>Yaw, pitch and roll are the aerospace z-y-x sequence: start from B, turn by yaw about z,
 * then by pitch about the new y, then by roll about the new x. For a local-level NED base they
 * are heading, elevation and bank of a body frame with x forward, y right, z down.
 *
 * <p>Thread-safe: stateless.
 */
public final class Orientations {

    /**
     * Largest allowed {@code ||q| - 1|} for a quaternion said to be unit: the one tolerance of the
     * library for unit quaternions, used by every factory that takes one (here,
     * {@code SampledMotion}, {@code Placement}); an accepted quaternion is normalised before use.
     * It admits quaternions written with 7 significant digits, as in logs.
     */
    public static final double UNIT_QUATERNION_TOLERANCE = 1e-6;

    /** Largest allowed element of M M^T - I for a matrix said to be orthonormal. */
    public static final double MATRIX_TOLERANCE = 1e-9;

    private Orientations() {
    }

    /**
     * Returns the orientation of a frame aligned with its base.
     *
     * @return the orientation of a frame aligned with its base
     */
    public static Rotation identity() {
        return Rotation.IDENTITY;
    }

    /**
     * Orientation of a frame turned by {@code angle} (right-hand rule) about {@code axis}.
     *
     * @param axis rotation axis in base components, any non-zero length
     * @param angle turn angle (rad)
     * @return orientation mapping base components to frame components
     * @throws IllegalArgumentException for a zero or non-finite axis or a non-finite angle
     */
    public static Rotation aboutAxis(Vector3D axis, double angle) {
        Vector3D n = Arguments.unitAxis("axis", axis);
        Arguments.finite("angle", angle);
        return new Rotation(n, angle, RotationConvention.FRAME_TRANSFORM);
    }

    /**
     * Orientation from a unit quaternion, scalar part first, in the convention above (the
     * quaternion of a frame turned by {@code a} about unit {@code n} is
     * {@code (cos(a/2), sin(a/2) n)}).
     *
     * @param q0 scalar part
     * @param q1 vector part x
     * @param q2 vector part y
     * @param q3 vector part z
     * @return orientation mapping base components to frame components
     * @throws IllegalArgumentException if a part is not finite or the norm differs from 1 by more
     *         than {@link #UNIT_QUATERNION_TOLERANCE}
     */
    public static Rotation fromQuaternion(double q0, double q1, double q2, double q3) {
        Arguments.finite("q0", q0);
        Arguments.finite("q1", q1);
        Arguments.finite("q2", q2);
        Arguments.finite("q3", q3);
        Arguments.unitQuaternion("quaternion (q0, q1, q2, q3)", q0, q1, q2, q3);
        return new Rotation(q0, q1, q2, q3, true);
    }

    /**
     * Reads back the unit quaternion, scalar part first, with a non-negative scalar part.
     *
     * @param orientation orientation mapping base components to frame components
     * @return {q0, q1, q2, q3}
     * @throws NullPointerException if {@code orientation} is null
     * @throws IllegalArgumentException if its quaternion is not finite or not unit (see
     *         {@link Arguments#unitRotation(String, Rotation)})
     */
    public static double[] toQuaternion(Rotation orientation) {
        Arguments.unitRotation("orientation", orientation);
        return quaternion(orientation);
    }

    /** The quaternion of a checked rotation, scalar part non-negative. */
    private static double[] quaternion(Rotation orientation) {
        double s = orientation.getQ0() < 0 ? -1.0 : 1.0;
        return new double[] {s * orientation.getQ0(), s * orientation.getQ1(), s * orientation.getQ2(),
            s * orientation.getQ3()};
    }

    /**
     * Orientation from a direction-cosine matrix {@code M} with {@code v_F = M v_B}: row i holds
     * the frame's axis i in base components.
     *
     * @param matrix 3x3 matrix, orthonormal with determinant +1
     * @return orientation mapping base components to frame components
     * @throws IllegalArgumentException if the matrix is not 3x3, has non-finite elements, is not
     *         orthonormal within {@link #MATRIX_TOLERANCE}, or is a reflection
     */
    public static Rotation fromMatrix(double[][] matrix) {
        Arguments.nonNull("matrix", matrix);
        if (matrix.length != 3) {
            throw new IllegalArgumentException("matrix must have 3 rows, got " + matrix.length);
        }
        for (int i = 0; i < 3; i++) {
            Arguments.nonNull("matrix[" + i + "]", matrix[i]);
            if (matrix[i].length != 3) {
                throw new IllegalArgumentException("matrix row " + i + " must have 3 columns, got "
                        + matrix[i].length);
            }
            for (int j = 0; j < 3; j++) {
                Arguments.finite("matrix[" + i + "][" + j + "]", matrix[i][j]);
            }
        }
        double[] rows = {matrix[0][0], matrix[0][1], matrix[0][2], matrix[1][0], matrix[1][1], matrix[1][2],
            matrix[2][0], matrix[2][1], matrix[2][2]};
        checkRotationRows(rows, 0, MATRIX_TOLERANCE, "matrix");
        return fromOrthonormalRows(matrix[0][0], matrix[0][1], matrix[0][2],
                matrix[1][0], matrix[1][1], matrix[1][2],
                matrix[2][0], matrix[2][1], matrix[2][2]);
    }

    /**
     * Reads back the direction-cosine matrix {@code M} with {@code v_F = M v_B}.
     *
     * @param orientation orientation mapping base components to frame components
     * @return a new 3x3 array
     * @throws NullPointerException if {@code orientation} is null
     * @throws IllegalArgumentException if its quaternion is not finite or not unit (see
     *         {@link Arguments#unitRotation(String, Rotation)})
     */
    public static double[][] toMatrix(Rotation orientation) {
        Arguments.unitRotation("orientation", orientation);
        return orientation.getMatrix();
    }

    /**
     * Orientation from yaw, pitch and roll (aerospace z-y-x sequence, see the class comment).
     *
     * @param yaw turn about the base z axis (rad)
     * @param pitch then about the new y axis (rad)
     * @param roll then about the new x axis (rad)
     * @return orientation mapping base components to frame components
     * @throws IllegalArgumentException if an angle is not finite
     */
    public static Rotation fromYawPitchRoll(double yaw, double pitch, double roll) {
        Arguments.finite("yaw", yaw);
        Arguments.finite("pitch", pitch);
        Arguments.finite("roll", roll);
        double cy = Math.cos(0.5 * yaw);
        double sy = Math.sin(0.5 * yaw);
        double cp = Math.cos(0.5 * pitch);
        double sp = Math.sin(0.5 * pitch);
        double cr = Math.cos(0.5 * roll);
        double sr = Math.sin(0.5 * roll);
        // q = q_yaw * q_pitch * q_roll (Hamilton product, frame turns applied in sequence)
        return new Rotation(
                cr * cp * cy + sr * sp * sy,
                sr * cp * cy - cr * sp * sy,
                cr * sp * cy + sr * cp * sy,
                cr * cp * sy - sr * sp * cy,
                false);
    }

    /**
     * Reads back yaw, pitch and roll (aerospace z-y-x sequence). Pitch is in [-pi/2, pi/2], yaw
     * and roll in (-pi, pi]. At pitch = +-pi/2 yaw and roll are not separable; the whole turn about
     * the vertical is then reported as yaw and roll is 0; this holds within rounding, for
     * {@code cos(pitch)} below about 1.3e-15. Computed from the quaternion by
     * half-angle formulas that stay well conditioned up to gimbal lock: pitch, and the
     * combination of yaw and roll that stays defined there (yaw - roll near +pi/2, yaw + roll
     * near -pi/2), are accurate to a few ulps; the split into yaw and roll near the lock is as
     * sensitive as the rotation itself allows (about 1e-16 / cos(pitch) rad).
     *
     * @param orientation orientation mapping base components to frame components
     * @return {yaw, pitch, roll} (rad)
     * @throws NullPointerException if {@code orientation} is null
     * @throws IllegalArgumentException if its quaternion is not finite or not unit (see
     *         {@link Arguments#unitRotation(String, Rotation)})
     */
    public static double[] toYawPitchRoll(Rotation orientation) {
        Arguments.unitRotation("orientation", orientation);
        double[] q = quaternion(orientation);
        // from the half-angle product of fromYawPitchRoll (c, s of half angles):
        //   q0 + q2 = (cp + sp) cos((yaw - roll) / 2),  q3 - q1 = (cp + sp) sin((yaw - roll) / 2)
        //   q0 - q2 = (cp - sp) cos((yaw + roll) / 2),  q3 + q1 = (cp - sp) sin((yaw + roll) / 2)
        // so the half sum and half difference are angles of vectors of length |cp -+ sp|, and
        // tan(pi/4 - pitch/2) = |cp - sp| / |cp + sp|: every quantity is well conditioned, also
        // near gimbal lock, where the matrix entries used before are tiny differences
        double dc = q[0] + q[2];
        double ds = q[3] - q[1];
        double sc = q[0] - q[2];
        double ss = q[3] + q[1];
        double plus = Math.hypot(dc, ds);
        double minus = Math.hypot(sc, ss);
        double pitch = 0.5 * Math.PI - 2.0 * Math.atan2(minus, plus);
        double halfDifference = Math.atan2(ds, dc);
        double halfSum = Math.atan2(ss, sc);
        // at the lock to within rounding (cos(pitch) = plus * minus below about 1e-15) the split
        // into yaw and roll is pure rounding noise: report the defined combination as yaw
        if (minus <= LOCK) {
            // pitch +pi/2: only yaw - roll is defined; report it as yaw
            return new double[] {halfTurn(2.0 * halfDifference), pitch, 0.0};
        }
        if (plus <= LOCK) {
            // pitch -pi/2: only yaw + roll is defined; report it as yaw
            return new double[] {halfTurn(2.0 * halfSum), pitch, 0.0};
        }
        return new double[] {halfTurn(halfSum + halfDifference), pitch, halfTurn(halfSum - halfDifference)};
    }

    /** Length of the half-angle vector below which the attitude counts as gimbal-locked: 2^-50. */
    private static final double LOCK = 0x1p-50;

    /** The angle reduced to (-pi, pi]. */
    private static double halfTurn(double angle) {
        double r = Math.IEEEremainder(angle, 2.0 * Math.PI);
        return r <= -Math.PI ? r + 2.0 * Math.PI : r;
    }

    /**
     * Reads back the rotation vector: axis times angle, angle in [0, pi].
     *
     * @param orientation orientation mapping base components to frame components
     * @return axis * angle (rad) such that {@code aboutAxis(axis, angle)} rebuilds the orientation
     * @throws NullPointerException if {@code orientation} is null
     * @throws IllegalArgumentException if its quaternion is not finite or not unit (see
     *         {@link Arguments#unitRotation(String, Rotation)})
     */
    public static Vector3D toRotationVector(Rotation orientation) {
        Arguments.unitRotation("orientation", orientation);
        double[] q = quaternion(orientation);
        double s = Math.sqrt(q[1] * q[1] + q[2] * q[2] + q[3] * q[3]);
        if (s == 0.0) {
            return Vector3D.ZERO;
        }
        double angle = 2.0 * Math.atan2(s, q[0]);
        return new Vector3D(angle / s, new Vector3D(q[1], q[2], q[3]));
    }

    /**
     * Refuses 9 finite values (a 3x3 matrix row by row from {@code offset}) that are not a
     * rotation: {@code |M M^T - I|} above {@code tolerance} elementwise, or a reflection.
     */
    static void checkRotationRows(double[] m, int offset, double tolerance, String name) {
        double worst = 0;
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                int a = offset + 3 * i;
                int b = offset + 3 * j;
                double dot = m[a] * m[b] + m[a + 1] * m[b + 1] + m[a + 2] * m[b + 2];
                worst = Math.max(worst, Math.abs(dot - (i == j ? 1.0 : 0.0)));
            }
        }
        if (!(worst <= tolerance)) {
            throw new IllegalArgumentException(name + " must be an orthonormal rotation matrix (|M M^T - I| <= "
                    + tolerance + " elementwise), worst deviation " + worst);
        }
        int o = offset;
        double det = m[o] * (m[o + 4] * m[o + 8] - m[o + 5] * m[o + 7])
                - m[o + 1] * (m[o + 3] * m[o + 8] - m[o + 5] * m[o + 6])
                + m[o + 2] * (m[o + 3] * m[o + 7] - m[o + 4] * m[o + 6]);
        if (!(det > 0)) {
            throw new IllegalArgumentException(name + " must be a rotation (determinant +1), got determinant "
                    + det);
        }
    }

    /**
     * Converts orthonormal matrix rows to a rotation (Shepperd's method, stable for all angles).
     */
    static Rotation fromOrthonormalRows(double m00, double m01, double m02, double m10, double m11, double m12,
                                        double m20, double m21, double m22) {
        double[] q = new double[4];
        matrixToQuaternion(m00, m01, m02, m10, m11, m12, m20, m21, m22, q, 0);
        return new Rotation(q[0], q[1], q[2], q[3], true);
    }

    /**
     * The quaternion (scalar first, library convention) of the orthonormal matrix held row by row
     * at {@code m[mo]}, written at {@code q[qo]}; allocates nothing.
     */
    static void matrixToQuaternion(double[] m, int mo, double[] q, int qo) {
        matrixToQuaternion(m[mo], m[mo + 1], m[mo + 2], m[mo + 3], m[mo + 4], m[mo + 5], m[mo + 6], m[mo + 7],
                m[mo + 8], q, qo);
    }

    /** Shepperd's method on matrix rows, written at {@code out[oo]}, scalar first. */
    private static void matrixToQuaternion(double m00, double m01, double m02, double m10, double m11, double m12,
                                           double m20, double m21, double m22, double[] out, int oo) {
        // Hipparchus matrix of quaternion q: m01 = 2(q1q2 + q0q3), m10 = 2(q1q2 - q0q3), ...
        double trace = m00 + m11 + m22;
        double q0;
        double q1;
        double q2;
        double q3;
        if (trace > -0.19) {
            q0 = 0.5 * Math.sqrt(trace + 1.0);
            double inv = 0.25 / q0;
            q1 = inv * (m12 - m21);
            q2 = inv * (m20 - m02);
            q3 = inv * (m01 - m10);
        } else if (m00 > -0.19) {
            q1 = 0.5 * Math.sqrt(m00 - m11 - m22 + 1.0);
            double inv = 0.25 / q1;
            q0 = inv * (m12 - m21);
            q2 = inv * (m01 + m10);
            q3 = inv * (m02 + m20);
        } else if (m11 > -0.19) {
            q2 = 0.5 * Math.sqrt(m11 - m00 - m22 + 1.0);
            double inv = 0.25 / q2;
            q0 = inv * (m20 - m02);
            q1 = inv * (m01 + m10);
            q3 = inv * (m12 + m21);
        } else {
            q3 = 0.5 * Math.sqrt(m22 - m00 - m11 + 1.0);
            double inv = 0.25 / q3;
            q0 = inv * (m01 - m10);
            q1 = inv * (m02 + m20);
            q2 = inv * (m12 + m21);
        }
        out[oo] = q0;
        out[oo + 1] = q1;
        out[oo + 2] = q2;
        out[oo + 3] = q3;
    }
}
