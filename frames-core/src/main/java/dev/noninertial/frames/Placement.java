package dev.noninertial.frames;

import java.io.Serializable;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Where a frame F sits in a base frame B at one instant, with all rates.
 *
 * <h2>Conventions</h2>
 * SI units, right-handed axes.
 * <ul>
 *   <li>{@code o, o', o''}: position, velocity and acceleration of F's origin seen from B,
 *       resolved in B axes (m, m/s, m/s^2).</li>
 *   <li>{@code R}: orientation, maps B components to F components: {@code v_F = R v_B}.
 *       {@link #orientation()} returns it as a Hipparchus {@link Rotation} whose
 *       {@code applyTo} performs exactly this map; {@link #vectorFromBase(Vector3D)} and
 *       {@link #vectorToBase(Vector3D)} apply it without any convention to remember.</li>
 *   <li>{@code w}: angular velocity of F relative to B, resolved in F axes (rad/s).</li>
 *   <li>{@code al = dw/dt}: angular acceleration of F relative to B (the same vector whether the
 *       derivative is taken in B or in F), resolved in F axes (rad/s^2).</li>
 * </ul>
 * A point state (r, v, a) seen in F converts to B by
 * <pre>
 *   r_B = o + R^T r
 *   v_B = o' + R^T (v + w x r)
 *   a_B = o'' + R^T (a + al x r + 2 w x v + w x (w x r))
 * </pre>
 * and back by
 * <pre>
 *   a_F = R (a_B - o'') - al x r - 2 w x v - w x (w x r)
 * </pre>
 * whose last four terms are the frame, Euler, Coriolis and centrifugal accelerations
 * ({@link #fictitious(PointState)}).
 *
 * <p>All computations run on primitive doubles and allocate only their result. The bulk methods
 * {@link #toBase(double[], int, double[], int, int)} and
 * {@link #fromBase(double[], int, double[], int, int)} allocate nothing at all.
 *
 * <p>Immutable and thread-safe.
 */
public final class Placement implements Serializable {

    private static final long serialVersionUID = 1L;

    private static final Placement IDENTITY = new Placement(
            0, 0, 0, 0, 0, 0, 0, 0, 0,
            1, 0, 0, 0, 1, 0, 0, 0, 1,
            0, 0, 0, 0, 0, 0);

    /** Tolerance on |q| - 1 for quaternions given to the factories. */
    static final double UNIT_TOLERANCE = 1e-9;

    // origin of F in B, resolved in B
    /** Origin x of F in B axes (m). */
    final double ox;
    /** Origin y (m). */
    final double oy;
    /** Origin z (m). */
    final double oz;
    /** Origin velocity x in B axes (m/s). */
    final double ovx;
    /** Origin velocity y (m/s). */
    final double ovy;
    /** Origin velocity z (m/s). */
    final double ovz;
    /** Origin acceleration x in B axes (m/s^2). */
    final double oax;
    /** Origin acceleration y (m/s^2). */
    final double oay;
    /** Origin acceleration z (m/s^2). */
    final double oaz;
    // R, row-major, maps B components to F components
    /** Orientation element (0, 0): v_F = R v_B. */
    final double r00;
    /** Orientation element (0, 1): v_F = R v_B. */
    final double r01;
    /** Orientation element (0, 2): v_F = R v_B. */
    final double r02;
    /** Orientation element (1, 0): v_F = R v_B. */
    final double r10;
    /** Orientation element (1, 1): v_F = R v_B. */
    final double r11;
    /** Orientation element (1, 2): v_F = R v_B. */
    final double r12;
    /** Orientation element (2, 0): v_F = R v_B. */
    final double r20;
    /** Orientation element (2, 1): v_F = R v_B. */
    final double r21;
    /** Orientation element (2, 2): v_F = R v_B. */
    final double r22;
    // angular velocity and acceleration of F relative to B, resolved in F
    /** Angular velocity x of F relative to B, F axes (rad/s). */
    final double wx;
    /** Angular velocity y (rad/s). */
    final double wy;
    /** Angular velocity z (rad/s). */
    final double wz;
    /** Angular acceleration x, F axes (rad/s^2). */
    final double alx;
    /** Angular acceleration y (rad/s^2). */
    final double aly;
    /** Angular acceleration z (rad/s^2). */
    final double alz;

    @SuppressWarnings("checkstyle:ParameterNumber")
    Placement(double ox, double oy, double oz, double ovx, double ovy, double ovz,
              double oax, double oay, double oaz,
              double r00, double r01, double r02, double r10, double r11, double r12,
              double r20, double r21, double r22,
              double wx, double wy, double wz, double alx, double aly, double alz) {
        this.ox = ox;
        this.oy = oy;
        this.oz = oz;
        this.ovx = ovx;
        this.ovy = ovy;
        this.ovz = ovz;
        this.oax = oax;
        this.oay = oay;
        this.oaz = oaz;
        this.r00 = r00;
        this.r01 = r01;
        this.r02 = r02;
        this.r10 = r10;
        this.r11 = r11;
        this.r12 = r12;
        this.r20 = r20;
        this.r21 = r21;
        this.r22 = r22;
        this.wx = wx;
        this.wy = wy;
        this.wz = wz;
        this.alx = alx;
        this.aly = aly;
        this.alz = alz;
    }

    /** @return the placement of a frame in itself: zero offset, identity orientation, no rates */
    public static Placement identity() {
        return IDENTITY;
    }

    /**
     * A placement from vectors and a Hipparchus rotation.
     *
     * @param origin position o of F's origin seen from B, in B axes (m)
     * @param originVelocity o' in B axes (m/s)
     * @param originAcceleration o'' in B axes (m/s^2)
     * @param orientation R, whose {@code applyTo} maps B components to F components
     * @param angularVelocity w of F relative to B, in F axes (rad/s)
     * @param angularAcceleration al = dw/dt, in F axes (rad/s^2)
     * @return the placement
     * @throws IllegalArgumentException if a component is NaN or infinite
     */
    public static Placement of(Vector3D origin, Vector3D originVelocity, Vector3D originAcceleration,
                               Rotation orientation, Vector3D angularVelocity, Vector3D angularAcceleration) {
        Arguments.finite("origin", origin);
        Arguments.finite("originVelocity", originVelocity);
        Arguments.finite("originAcceleration", originAcceleration);
        Arguments.nonNull("orientation", orientation);
        Arguments.finite("angularVelocity", angularVelocity);
        Arguments.finite("angularAcceleration", angularAcceleration);
        return ofQuaternion(origin.getX(), origin.getY(), origin.getZ(),
                originVelocity.getX(), originVelocity.getY(), originVelocity.getZ(),
                originAcceleration.getX(), originAcceleration.getY(), originAcceleration.getZ(),
                orientation.getQ0(), orientation.getQ1(), orientation.getQ2(), orientation.getQ3(),
                angularVelocity.getX(), angularVelocity.getY(), angularVelocity.getZ(),
                angularAcceleration.getX(), angularAcceleration.getY(), angularAcceleration.getZ());
    }

    /**
     * A placement with a fixed offset and orientation and no rates.
     *
     * @param origin position of F's origin in B axes (m)
     * @param orientation R, whose {@code applyTo} maps B components to F components
     * @return the placement
     */
    public static Placement stationary(Vector3D origin, Rotation orientation) {
        return of(origin, Vector3D.ZERO, Vector3D.ZERO, orientation, Vector3D.ZERO, Vector3D.ZERO);
    }

    /**
     * Low-level factory on primitives for motion implementations: the orientation is a unit
     * quaternion (scalar first) in the same convention as Hipparchus {@link Rotation}, so that it
     * maps B components to F components.
     *
     * @param ox origin x in B (m)
     * @param oy origin y in B (m)
     * @param oz origin z in B (m)
     * @param ovx origin velocity x in B (m/s)
     * @param ovy origin velocity y in B (m/s)
     * @param ovz origin velocity z in B (m/s)
     * @param oax origin acceleration x in B (m/s^2)
     * @param oay origin acceleration y in B (m/s^2)
     * @param oaz origin acceleration z in B (m/s^2)
     * @param q0 quaternion scalar part
     * @param q1 quaternion vector part x
     * @param q2 quaternion vector part y
     * @param q3 quaternion vector part z
     * @param wx angular velocity x in F (rad/s)
     * @param wy angular velocity y in F (rad/s)
     * @param wz angular velocity z in F (rad/s)
     * @param alx angular acceleration x in F (rad/s^2)
     * @param aly angular acceleration y in F (rad/s^2)
     * @param alz angular acceleration z in F (rad/s^2)
     * @return the placement
     * @throws IllegalArgumentException if a value is not finite or the quaternion is not unit
     *         within 1e-9
     */
    @SuppressWarnings("checkstyle:ParameterNumber")
    public static Placement ofQuaternion(double ox, double oy, double oz, double ovx, double ovy, double ovz,
                                         double oax, double oay, double oaz,
                                         double q0, double q1, double q2, double q3,
                                         double wx, double wy, double wz, double alx, double aly, double alz) {
        double sum = ox + oy + oz + ovx + ovy + ovz + oax + oay + oaz + wx + wy + wz + alx + aly + alz;
        double n2 = q0 * q0 + q1 * q1 + q2 * q2 + q3 * q3;
        if (!Double.isFinite(sum) || !(Math.abs(n2 - 1.0) <= 2 * UNIT_TOLERANCE)) {
            refuseComponents(ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz, q0, q1, q2, q3,
                    wx, wy, wz, alx, aly, alz);
        }
        double q0q0 = q0 * q0;
        double q0q1 = q0 * q1;
        double q0q2 = q0 * q2;
        double q0q3 = q0 * q3;
        double q1q1 = q1 * q1;
        double q1q2 = q1 * q2;
        double q1q3 = q1 * q3;
        double q2q2 = q2 * q2;
        double q2q3 = q2 * q3;
        double q3q3 = q3 * q3;
        // same matrix as Hipparchus Rotation.getMatrix(): applyTo(u) = M u
        return new Placement(ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz,
                2.0 * (q0q0 + q1q1) - 1.0, 2.0 * (q1q2 + q0q3), 2.0 * (q1q3 - q0q2),
                2.0 * (q1q2 - q0q3), 2.0 * (q0q0 + q2q2) - 1.0, 2.0 * (q2q3 + q0q1),
                2.0 * (q1q3 + q0q2), 2.0 * (q2q3 - q0q1), 2.0 * (q0q0 + q3q3) - 1.0,
                wx, wy, wz, alx, aly, alz);
    }

    @SuppressWarnings("checkstyle:ParameterNumber")
    private static void refuseComponents(double ox, double oy, double oz, double ovx, double ovy, double ovz,
                                         double oax, double oay, double oaz,
                                         double q0, double q1, double q2, double q3,
                                         double wx, double wy, double wz, double alx, double aly, double alz) {
        Arguments.finite("origin", new Vector3D(ox, oy, oz));
        Arguments.finite("originVelocity", new Vector3D(ovx, ovy, ovz));
        Arguments.finite("originAcceleration", new Vector3D(oax, oay, oaz));
        Arguments.finite("angularVelocity", new Vector3D(wx, wy, wz));
        Arguments.finite("angularAcceleration", new Vector3D(alx, aly, alz));
        double norm = Math.sqrt(q0 * q0 + q1 * q1 + q2 * q2 + q3 * q3);
        if (Math.abs(norm * norm - 1.0) <= 2 * UNIT_TOLERANCE) {
            return; // all finite: only the quick sum overflowed
        }
        throw new IllegalArgumentException("quaternion must be finite with norm 1 (within " + UNIT_TOLERANCE
                + "), got (" + q0 + ", " + q1 + ", " + q2 + ", " + q3 + ") with norm " + norm);
    }

    // ------------------------------------------------------------------ accessors

    /** @return position o of F's origin seen from B, resolved in B (m) */
    public Vector3D origin() {
        return new Vector3D(ox, oy, oz);
    }

    /** @return velocity o' of F's origin seen from B, resolved in B (m/s) */
    public Vector3D originVelocity() {
        return new Vector3D(ovx, ovy, ovz);
    }

    /** @return acceleration o'' of F's origin seen from B, resolved in B (m/s^2) */
    public Vector3D originAcceleration() {
        return new Vector3D(oax, oay, oaz);
    }

    /**
     * The orientation R of F in B.
     *
     * @return a Hipparchus rotation whose {@code applyTo} maps B components to F components
     */
    public Rotation orientation() {
        return Orientations.fromOrthonormalRows(r00, r01, r02, r10, r11, r12, r20, r21, r22);
    }

    /**
     * The orientation as a direction-cosine matrix.
     *
     * @return a new 3x3 array M with {@code v_F = M v_B}; row i holds F's axis i in B components
     */
    public double[][] orientationMatrix() {
        return new double[][] {{r00, r01, r02}, {r10, r11, r12}, {r20, r21, r22}};
    }

    /** @return angular velocity w of F relative to B, resolved in F (rad/s) */
    public Vector3D angularVelocity() {
        return new Vector3D(wx, wy, wz);
    }

    /** @return angular acceleration al of F relative to B, resolved in F (rad/s^2) */
    public Vector3D angularAcceleration() {
        return new Vector3D(alx, aly, alz);
    }

    // ------------------------------------------------------------------ copies

    /**
     * A copy with another origin motion.
     *
     * @param origin o in B (m)
     * @param originVelocity o' in B (m/s)
     * @param originAcceleration o'' in B (m/s^2)
     * @return the copy
     */
    public Placement withOrigin(Vector3D origin, Vector3D originVelocity, Vector3D originAcceleration) {
        Arguments.finite("origin", origin);
        Arguments.finite("originVelocity", originVelocity);
        Arguments.finite("originAcceleration", originAcceleration);
        return new Placement(origin.getX(), origin.getY(), origin.getZ(),
                originVelocity.getX(), originVelocity.getY(), originVelocity.getZ(),
                originAcceleration.getX(), originAcceleration.getY(), originAcceleration.getZ(),
                r00, r01, r02, r10, r11, r12, r20, r21, r22, wx, wy, wz, alx, aly, alz);
    }

    /**
     * A copy with another rotational motion.
     *
     * @param orientation R, whose {@code applyTo} maps B components to F components
     * @param angularVelocity w in F (rad/s)
     * @param angularAcceleration al in F (rad/s^2)
     * @return the copy
     */
    public Placement withOrientation(Rotation orientation, Vector3D angularVelocity, Vector3D angularAcceleration) {
        return of(origin(), originVelocity(), originAcceleration(), orientation, angularVelocity,
                angularAcceleration);
    }

    // ------------------------------------------------------------------ algebra

    /**
     * Composes placements: this is F in B, {@code inner} is G in F; the result is G in B.
     *
     * <pre>
     *   R_GB = R_GF R_FB,  w_GB = w_GF + R_GF w_FB,
     *   al_GB = al_GF + R_GF al_FB - w_GF x (R_GF w_FB)
     * </pre>
     * and G's origin is converted to B as a point state of F.
     *
     * @param inner placement of G in F
     * @return placement of G in B
     */
    public Placement then(Placement inner) {
        Arguments.nonNull("inner", inner);
        // one composition formula serves objects and the primitive chains of ReferenceFrame, so
        // both give the same bits; the scratch array is the only allocation besides the result
        double[] work = new double[2 * COMPONENTS];
        toArray(work, 0);
        inner.toArray(work, COMPONENTS);
        compose(work, 0, work, COMPONENTS, work, 0);
        return fromArray(work, 0);
    }

    /**
     * The inverse placement: this is F in B, the result is B in F.
     *
     * @return placement of B in F
     */
    public Placement inverse() {
        // B's origin seen from F: r = -R o
        double rx = -(r00 * ox + r01 * oy + r02 * oz);
        double ry = -(r10 * ox + r11 * oy + r12 * oz);
        double rz = -(r20 * ox + r21 * oy + r22 * oz);
        // v = -R o' - w x r
        double vx = -(r00 * ovx + r01 * ovy + r02 * ovz) - (wy * rz - wz * ry);
        double vy = -(r10 * ovx + r11 * ovy + r12 * ovz) - (wz * rx - wx * rz);
        double vz = -(r20 * ovx + r21 * ovy + r22 * ovz) - (wx * ry - wy * rx);
        // a = -R o'' - al x r - 2 w x v - w x (w x r)
        double cx = wy * rz - wz * ry;
        double cy = wz * rx - wx * rz;
        double cz = wx * ry - wy * rx;
        double ax = -(r00 * oax + r01 * oay + r02 * oaz) - (aly * rz - alz * ry)
                - 2 * (wy * vz - wz * vy) - (wy * cz - wz * cy);
        double ay = -(r10 * oax + r11 * oay + r12 * oaz) - (alz * rx - alx * rz)
                - 2 * (wz * vx - wx * vz) - (wz * cx - wx * cz);
        double az = -(r20 * oax + r21 * oay + r22 * oaz) - (alx * ry - aly * rx)
                - 2 * (wx * vy - wy * vx) - (wx * cy - wy * cx);
        // R' = R^T ; w' = -R^T w ; al' = -R^T al (resolved in B)
        return new Placement(rx, ry, rz, vx, vy, vz, ax, ay, az,
                r00, r10, r20, r01, r11, r21, r02, r12, r22,
                -(r00 * wx + r10 * wy + r20 * wz),
                -(r01 * wx + r11 * wy + r21 * wz),
                -(r02 * wx + r12 * wy + r22 * wz),
                -(r00 * alx + r10 * aly + r20 * alz),
                -(r01 * alx + r11 * aly + r21 * alz),
                -(r02 * alx + r12 * aly + r22 * alz));
    }

    // ------------------------------------------------------------------ conversions

    /**
     * Converts a point state seen in F to the same point seen in B (all terms included).
     *
     * @param stateInFrame state seen in and resolved in F
     * @return state seen in and resolved in B
     */
    public PointState toBase(PointState stateInFrame) {
        Arguments.nonNull("stateInFrame", stateInFrame);
        PointState s = stateInFrame;
        double cx = wy * s.z - wz * s.y;
        double cy = wz * s.x - wx * s.z;
        double cz = wx * s.y - wy * s.x;
        double vfx = s.vx + cx;
        double vfy = s.vy + cy;
        double vfz = s.vz + cz;
        double afx = s.ax + (aly * s.z - alz * s.y) + 2 * (wy * s.vz - wz * s.vy) + (wy * cz - wz * cy);
        double afy = s.ay + (alz * s.x - alx * s.z) + 2 * (wz * s.vx - wx * s.vz) + (wz * cx - wx * cz);
        double afz = s.az + (alx * s.y - aly * s.x) + 2 * (wx * s.vy - wy * s.vx) + (wx * cy - wy * cx);
        return new PointState(
                ox + r00 * s.x + r10 * s.y + r20 * s.z,
                oy + r01 * s.x + r11 * s.y + r21 * s.z,
                oz + r02 * s.x + r12 * s.y + r22 * s.z,
                ovx + r00 * vfx + r10 * vfy + r20 * vfz,
                ovy + r01 * vfx + r11 * vfy + r21 * vfz,
                ovz + r02 * vfx + r12 * vfy + r22 * vfz,
                oax + r00 * afx + r10 * afy + r20 * afz,
                oay + r01 * afx + r11 * afy + r21 * afz,
                oaz + r02 * afx + r12 * afy + r22 * afz);
    }

    /**
     * Converts a point state seen in B to the same point seen in F (all terms included).
     *
     * @param stateInBase state seen in and resolved in B
     * @return state seen in and resolved in F
     */
    public PointState fromBase(PointState stateInBase) {
        Arguments.nonNull("stateInBase", stateInBase);
        PointState s = stateInBase;
        double dx = s.x - ox;
        double dy = s.y - oy;
        double dz = s.z - oz;
        double rx = r00 * dx + r01 * dy + r02 * dz;
        double ry = r10 * dx + r11 * dy + r12 * dz;
        double rz = r20 * dx + r21 * dy + r22 * dz;
        double cx = wy * rz - wz * ry;
        double cy = wz * rx - wx * rz;
        double cz = wx * ry - wy * rx;
        double ux = s.vx - ovx;
        double uy = s.vy - ovy;
        double uz = s.vz - ovz;
        double vx = r00 * ux + r01 * uy + r02 * uz - cx;
        double vy = r10 * ux + r11 * uy + r12 * uz - cy;
        double vz = r20 * ux + r21 * uy + r22 * uz - cz;
        double bx = s.ax - oax;
        double by = s.ay - oay;
        double bz = s.az - oaz;
        return new PointState(rx, ry, rz, vx, vy, vz,
                r00 * bx + r01 * by + r02 * bz - (aly * rz - alz * ry) - 2 * (wy * vz - wz * vy) - (wy * cz - wz * cy),
                r10 * bx + r11 * by + r12 * bz - (alz * rx - alx * rz) - 2 * (wz * vx - wx * vz) - (wz * cx - wx * cz),
                r20 * bx + r21 * by + r22 * bz - (alx * ry - aly * rx) - 2 * (wx * vy - wy * vx) - (wx * cy - wy * cx));
    }

    /**
     * Bulk conversion F to B on primitive arrays, allocating nothing. Each state occupies
     * {@link PointState#COMPONENTS} consecutive doubles: x, y, z, vx, vy, vz, ax, ay, az. Source
     * and target may be the same array (in-place conversion) when the offsets are equal.
     *
     * @param source states seen in F
     * @param sourceOffset index of the first state's x in {@code source}
     * @param target receives states seen in B
     * @param targetOffset index of the first state's x in {@code target}
     * @param count number of states
     * @throws IllegalArgumentException if the ranges do not fit the arrays
     */
    public void toBase(double[] source, int sourceOffset, double[] target, int targetOffset, int count) {
        checkBulk(source, sourceOffset, target, targetOffset, count);
        int end = sourceOffset + count * PointState.COMPONENTS;
        for (int i = sourceOffset, j = targetOffset; i < end; i += PointState.COMPONENTS,
                j += PointState.COMPONENTS) {
            double x = source[i];
            double y = source[i + 1];
            double z = source[i + 2];
            double vx = source[i + 3];
            double vy = source[i + 4];
            double vz = source[i + 5];
            double ax = source[i + 6];
            double ay = source[i + 7];
            double az = source[i + 8];
            double cx = wy * z - wz * y;
            double cy = wz * x - wx * z;
            double cz = wx * y - wy * x;
            double vfx = vx + cx;
            double vfy = vy + cy;
            double vfz = vz + cz;
            double afx = ax + (aly * z - alz * y) + 2 * (wy * vz - wz * vy) + (wy * cz - wz * cy);
            double afy = ay + (alz * x - alx * z) + 2 * (wz * vx - wx * vz) + (wz * cx - wx * cz);
            double afz = az + (alx * y - aly * x) + 2 * (wx * vy - wy * vx) + (wx * cy - wy * cx);
            target[j] = ox + r00 * x + r10 * y + r20 * z;
            target[j + 1] = oy + r01 * x + r11 * y + r21 * z;
            target[j + 2] = oz + r02 * x + r12 * y + r22 * z;
            target[j + 3] = ovx + r00 * vfx + r10 * vfy + r20 * vfz;
            target[j + 4] = ovy + r01 * vfx + r11 * vfy + r21 * vfz;
            target[j + 5] = ovz + r02 * vfx + r12 * vfy + r22 * vfz;
            target[j + 6] = oax + r00 * afx + r10 * afy + r20 * afz;
            target[j + 7] = oay + r01 * afx + r11 * afy + r21 * afz;
            target[j + 8] = oaz + r02 * afx + r12 * afy + r22 * afz;
        }
    }

    /**
     * Bulk conversion B to F on primitive arrays, allocating nothing; layout as in
     * {@link #toBase(double[], int, double[], int, int)}.
     *
     * @param source states seen in B
     * @param sourceOffset index of the first state's x in {@code source}
     * @param target receives states seen in F
     * @param targetOffset index of the first state's x in {@code target}
     * @param count number of states
     * @throws IllegalArgumentException if the ranges do not fit the arrays
     */
    public void fromBase(double[] source, int sourceOffset, double[] target, int targetOffset, int count) {
        checkBulk(source, sourceOffset, target, targetOffset, count);
        // Both indices advance by a stride instead of being recomputed as offset + k * 9 for each
        // array: with the recomputed pair this loop measured 1.28x the hand-inlined primitive
        // loop, with strides 0.91x to 1.00x (frames-bench PairedRatios). checkBulk bounds end.
        int end = sourceOffset + count * PointState.COMPONENTS;
        for (int i = sourceOffset, j = targetOffset; i < end; i += PointState.COMPONENTS,
                j += PointState.COMPONENTS) {
            double dx = source[i] - ox;
            double dy = source[i + 1] - oy;
            double dz = source[i + 2] - oz;
            double ux = source[i + 3] - ovx;
            double uy = source[i + 4] - ovy;
            double uz = source[i + 5] - ovz;
            double bx = source[i + 6] - oax;
            double by = source[i + 7] - oay;
            double bz = source[i + 8] - oaz;
            double rx = r00 * dx + r01 * dy + r02 * dz;
            double ry = r10 * dx + r11 * dy + r12 * dz;
            double rz = r20 * dx + r21 * dy + r22 * dz;
            double cx = wy * rz - wz * ry;
            double cy = wz * rx - wx * rz;
            double cz = wx * ry - wy * rx;
            double vx = r00 * ux + r01 * uy + r02 * uz - cx;
            double vy = r10 * ux + r11 * uy + r12 * uz - cy;
            double vz = r20 * ux + r21 * uy + r22 * uz - cz;
            target[j] = rx;
            target[j + 1] = ry;
            target[j + 2] = rz;
            target[j + 3] = vx;
            target[j + 4] = vy;
            target[j + 5] = vz;
            target[j + 6] = r00 * bx + r01 * by + r02 * bz - (aly * rz - alz * ry) - 2 * (wy * vz - wz * vy)
                    - (wy * cz - wz * cy);
            target[j + 7] = r10 * bx + r11 * by + r12 * bz - (alz * rx - alx * rz) - 2 * (wz * vx - wx * vz)
                    - (wz * cx - wx * cz);
            target[j + 8] = r20 * bx + r21 * by + r22 * bz - (alx * ry - aly * rx) - 2 * (wx * vy - wy * vx)
                    - (wx * cy - wy * cx);
        }
    }

    static void checkBulk(double[] source, int sourceOffset, double[] target, int targetOffset, int count) {
        Arguments.nonNull("source", source);
        Arguments.nonNull("target", target);
        if (count < 0) {
            throw new IllegalArgumentException("count must be >= 0, got " + count);
        }
        long span = (long) count * PointState.COMPONENTS;
        if (sourceOffset < 0 || sourceOffset + span > source.length) {
            throw new IllegalArgumentException("sourceOffset must be in [0, " + (source.length - span)
                    + "] for " + count + " states, got " + sourceOffset);
        }
        if (targetOffset < 0 || targetOffset + span > target.length) {
            throw new IllegalArgumentException("targetOffset must be in [0, " + (target.length - span)
                    + "] for " + count + " states, got " + targetOffset);
        }
        if (source == target && sourceOffset != targetOffset
                && Math.abs((long) sourceOffset - targetOffset) < span) {
            throw new IllegalArgumentException("source and target ranges overlap with different offsets ("
                    + sourceOffset + " and " + targetOffset + ")");
        }
    }

    /**
     * The fictitious accelerations felt in F by a point with the given state seen in F.
     * Only the position and velocity of the state are used.
     *
     * @param stateInFrame state seen in and resolved in F
     * @return the four terms, resolved in F (m/s^2)
     * @see FictitiousAccelerations
     */
    public FictitiousAccelerations fictitious(PointState stateInFrame) {
        Arguments.nonNull("stateInFrame", stateInFrame);
        PointState s = stateInFrame;
        double cx = wy * s.z - wz * s.y;
        double cy = wz * s.x - wx * s.z;
        double cz = wx * s.y - wy * s.x;
        return new FictitiousAccelerations(
                new Vector3D(-(r00 * oax + r01 * oay + r02 * oaz),
                        -(r10 * oax + r11 * oay + r12 * oaz),
                        -(r20 * oax + r21 * oay + r22 * oaz)),
                new Vector3D(-(aly * s.z - alz * s.y), -(alz * s.x - alx * s.z), -(alx * s.y - aly * s.x)),
                new Vector3D(-2 * (wy * s.vz - wz * s.vy), -2 * (wz * s.vx - wx * s.vz), -2 * (wx * s.vy - wy * s.vx)),
                new Vector3D(-(wy * cz - wz * cy), -(wz * cx - wx * cz), -(wx * cy - wy * cx)));
    }

    /**
     * Converts a position from F to B: {@code o + R^T r}.
     *
     * @param positionInFrame position in F (m)
     * @return position in B (m)
     */
    public Vector3D positionToBase(Vector3D positionInFrame) {
        Vector3D p = vectorToBase(positionInFrame);
        return new Vector3D(ox + p.getX(), oy + p.getY(), oz + p.getZ());
    }

    /**
     * Converts a position from B to F: {@code R (r_B - o)}.
     *
     * @param positionInBase position in B (m)
     * @return position in F (m)
     */
    public Vector3D positionFromBase(Vector3D positionInBase) {
        Arguments.nonNull("positionInBase", positionInBase);
        return vectorFromBase(new Vector3D(positionInBase.getX() - ox, positionInBase.getY() - oy,
                positionInBase.getZ() - oz));
    }

    /**
     * Re-resolves a free vector (force, direction, angular velocity) from F axes to B axes:
     * {@code R^T u}. No origin or rate terms are involved.
     *
     * @param vectorInFrame components in F
     * @return components in B
     */
    public Vector3D vectorToBase(Vector3D vectorInFrame) {
        Arguments.nonNull("vectorInFrame", vectorInFrame);
        double x = vectorInFrame.getX();
        double y = vectorInFrame.getY();
        double z = vectorInFrame.getZ();
        return new Vector3D(r00 * x + r10 * y + r20 * z, r01 * x + r11 * y + r21 * z, r02 * x + r12 * y + r22 * z);
    }

    /**
     * Re-resolves a free vector from B axes to F axes: {@code R u}.
     *
     * @param vectorInBase components in B
     * @return components in F
     */
    public Vector3D vectorFromBase(Vector3D vectorInBase) {
        Arguments.nonNull("vectorInBase", vectorInBase);
        double x = vectorInBase.getX();
        double y = vectorInBase.getY();
        double z = vectorInBase.getZ();
        return new Vector3D(r00 * x + r01 * y + r02 * z, r10 * x + r11 * y + r12 * z, r20 * x + r21 * y + r22 * z);
    }

    // ------------------------------------------------------------------ primitive layout

    /**
     * Number of doubles one placement occupies in the primitive layout of
     * {@link #toArray(double[], int)} and {@link Motion#at(double, double[], int)}.
     */
    public static final int COMPONENTS = 24;

    /**
     * Writes this placement on primitives, {@link #COMPONENTS} consecutive doubles in this order:
     * origin o (3, m), origin velocity o' (3, m/s), origin acceleration o'' (3, m/s^2), all in B
     * axes; the orientation matrix R row by row (9; {@code v_F = R v_B}, row i holds F's axis i
     * in B components); angular velocity w (3, rad/s) and angular acceleration al (3, rad/s^2)
     * of F relative to B, in F axes. Allocates nothing.
     *
     * @param target destination array
     * @param offset index where o's x component is written
     * @throws IllegalArgumentException if the range does not fit the array
     */
    public void toArray(double[] target, int offset) {
        Arguments.nonNull("target", target);
        if (offset < 0 || offset > target.length - COMPONENTS) {
            throw new IllegalArgumentException("offset must be in [0, " + (target.length - COMPONENTS)
                    + "] for an array of length " + target.length + ", got " + offset);
        }
        int o = offset;
        target[o] = ox;
        target[o + 1] = oy;
        target[o + 2] = oz;
        target[o + 3] = ovx;
        target[o + 4] = ovy;
        target[o + 5] = ovz;
        target[o + 6] = oax;
        target[o + 7] = oay;
        target[o + 8] = oaz;
        target[o + 9] = r00;
        target[o + 10] = r01;
        target[o + 11] = r02;
        target[o + 12] = r10;
        target[o + 13] = r11;
        target[o + 14] = r12;
        target[o + 15] = r20;
        target[o + 16] = r21;
        target[o + 17] = r22;
        target[o + 18] = wx;
        target[o + 19] = wy;
        target[o + 20] = wz;
        target[o + 21] = alx;
        target[o + 22] = aly;
        target[o + 23] = alz;
    }

    /**
     * Converts one state F to B with the placement given in the primitive layout of
     * {@link #toArray(double[], int)}; same arithmetic as {@link #toBase(PointState)}.
     * No checks: callers validate the ranges.
     */
    static void toBase(double[] p, int po, double[] source, int i, double[] target, int j) {
        double x = source[i];
        double y = source[i + 1];
        double z = source[i + 2];
        double vx = source[i + 3];
        double vy = source[i + 4];
        double vz = source[i + 5];
        double ax = source[i + 6];
        double ay = source[i + 7];
        double az = source[i + 8];
        double m00 = p[po + 9];
        double m01 = p[po + 10];
        double m02 = p[po + 11];
        double m10 = p[po + 12];
        double m11 = p[po + 13];
        double m12 = p[po + 14];
        double m20 = p[po + 15];
        double m21 = p[po + 16];
        double m22 = p[po + 17];
        double qx = p[po + 18];
        double qy = p[po + 19];
        double qz = p[po + 20];
        double bx = p[po + 21];
        double by = p[po + 22];
        double bz = p[po + 23];
        double cx = qy * z - qz * y;
        double cy = qz * x - qx * z;
        double cz = qx * y - qy * x;
        double vfx = vx + cx;
        double vfy = vy + cy;
        double vfz = vz + cz;
        double afx = ax + (by * z - bz * y) + 2 * (qy * vz - qz * vy) + (qy * cz - qz * cy);
        double afy = ay + (bz * x - bx * z) + 2 * (qz * vx - qx * vz) + (qz * cx - qx * cz);
        double afz = az + (bx * y - by * x) + 2 * (qx * vy - qy * vx) + (qx * cy - qy * cx);
        target[j] = p[po] + m00 * x + m10 * y + m20 * z;
        target[j + 1] = p[po + 1] + m01 * x + m11 * y + m21 * z;
        target[j + 2] = p[po + 2] + m02 * x + m12 * y + m22 * z;
        target[j + 3] = p[po + 3] + m00 * vfx + m10 * vfy + m20 * vfz;
        target[j + 4] = p[po + 4] + m01 * vfx + m11 * vfy + m21 * vfz;
        target[j + 5] = p[po + 5] + m02 * vfx + m12 * vfy + m22 * vfz;
        target[j + 6] = p[po + 6] + m00 * afx + m10 * afy + m20 * afz;
        target[j + 7] = p[po + 7] + m01 * afx + m11 * afy + m21 * afz;
        target[j + 8] = p[po + 8] + m02 * afx + m12 * afy + m22 * afz;
    }

    /**
     * Converts one state B to F with the placement given in the primitive layout of
     * {@link #toArray(double[], int)}; same arithmetic as {@link #fromBase(PointState)}.
     * No checks: callers validate the ranges.
     */
    static void fromBase(double[] p, int po, double[] source, int i, double[] target, int j) {
        double dx = source[i] - p[po];
        double dy = source[i + 1] - p[po + 1];
        double dz = source[i + 2] - p[po + 2];
        double ux = source[i + 3] - p[po + 3];
        double uy = source[i + 4] - p[po + 4];
        double uz = source[i + 5] - p[po + 5];
        double bx = source[i + 6] - p[po + 6];
        double by = source[i + 7] - p[po + 7];
        double bz = source[i + 8] - p[po + 8];
        double m00 = p[po + 9];
        double m01 = p[po + 10];
        double m02 = p[po + 11];
        double m10 = p[po + 12];
        double m11 = p[po + 13];
        double m12 = p[po + 14];
        double m20 = p[po + 15];
        double m21 = p[po + 16];
        double m22 = p[po + 17];
        double qx = p[po + 18];
        double qy = p[po + 19];
        double qz = p[po + 20];
        double ex = p[po + 21];
        double ey = p[po + 22];
        double ez = p[po + 23];
        double rx = m00 * dx + m01 * dy + m02 * dz;
        double ry = m10 * dx + m11 * dy + m12 * dz;
        double rz = m20 * dx + m21 * dy + m22 * dz;
        double cx = qy * rz - qz * ry;
        double cy = qz * rx - qx * rz;
        double cz = qx * ry - qy * rx;
        double vx = m00 * ux + m01 * uy + m02 * uz - cx;
        double vy = m10 * ux + m11 * uy + m12 * uz - cy;
        double vz = m20 * ux + m21 * uy + m22 * uz - cz;
        target[j] = rx;
        target[j + 1] = ry;
        target[j + 2] = rz;
        target[j + 3] = vx;
        target[j + 4] = vy;
        target[j + 5] = vz;
        target[j + 6] = m00 * bx + m01 * by + m02 * bz - (ey * rz - ez * ry) - 2 * (qy * vz - qz * vy)
                - (qy * cz - qz * cy);
        target[j + 7] = m10 * bx + m11 * by + m12 * bz - (ez * rx - ex * rz) - 2 * (qz * vx - qx * vz)
                - (qz * cx - qx * cz);
        target[j + 8] = m20 * bx + m21 * by + m22 * bz - (ex * ry - ey * rx) - 2 * (qx * vy - qy * vx)
                - (qx * cy - qy * cx);
    }

    /**
     * Composition on the primitive layout of {@link #toArray(double[], int)}, with exactly the
     * arithmetic of {@link #then(Placement)}: {@code a} is F in B, {@code b} is G in F, {@code out}
     * receives G in B. {@code out} may be the same range as {@code a} or {@code b}. No checks.
     */
    @SuppressWarnings("checkstyle:MethodLength")
    static void compose(double[] a, int ao, double[] b, int bo, double[] out, int oo) {
        double ox = a[ao + 0];
        double oy = a[ao + 1];
        double oz = a[ao + 2];
        double ovx = a[ao + 3];
        double ovy = a[ao + 4];
        double ovz = a[ao + 5];
        double oax = a[ao + 6];
        double oay = a[ao + 7];
        double oaz = a[ao + 8];
        double r00 = a[ao + 9];
        double r01 = a[ao + 10];
        double r02 = a[ao + 11];
        double r10 = a[ao + 12];
        double r11 = a[ao + 13];
        double r12 = a[ao + 14];
        double r20 = a[ao + 15];
        double r21 = a[ao + 16];
        double r22 = a[ao + 17];
        double wx = a[ao + 18];
        double wy = a[ao + 19];
        double wz = a[ao + 20];
        double alx = a[ao + 21];
        double aly = a[ao + 22];
        double alz = a[ao + 23];
        double qox = b[bo + 0];
        double qoy = b[bo + 1];
        double qoz = b[bo + 2];
        double qovx = b[bo + 3];
        double qovy = b[bo + 4];
        double qovz = b[bo + 5];
        double qoax = b[bo + 6];
        double qoay = b[bo + 7];
        double qoaz = b[bo + 8];
        double qr00 = b[bo + 9];
        double qr01 = b[bo + 10];
        double qr02 = b[bo + 11];
        double qr10 = b[bo + 12];
        double qr11 = b[bo + 13];
        double qr12 = b[bo + 14];
        double qr20 = b[bo + 15];
        double qr21 = b[bo + 16];
        double qr22 = b[bo + 17];
        double qwx = b[bo + 18];
        double qwy = b[bo + 19];
        double qwz = b[bo + 20];
        double qalx = b[bo + 21];
        double qaly = b[bo + 22];
        double qalz = b[bo + 23];
        // Two kinds of link are common and cheap to compose: one that only turns (origin at rest at
        // F's origin: G's origin is F's) and one that only moves its origin (identity orientation,
        // no rates: G's axes and rates are F's). Their terms that are exactly zero are skipped;
        // the results agree with the general formulas except possibly in the sign of a zero.
        boolean turnOnly = qox == 0 && qoy == 0 && qoz == 0 && qovx == 0 && qovy == 0 && qovz == 0
                && qoax == 0 && qoay == 0 && qoaz == 0;
        boolean moveOnly = qr00 == 1 && qr11 == 1 && qr22 == 1 && qr01 == 0 && qr02 == 0 && qr10 == 0
                && qr12 == 0 && qr20 == 0 && qr21 == 0 && qwx == 0 && qwy == 0 && qwz == 0
                && qalx == 0 && qaly == 0 && qalz == 0;
        double nox;
        double noy;
        double noz;
        double novx;
        double novy;
        double novz;
        double noax;
        double noay;
        double noaz;
        if (turnOnly) {
            nox = ox;
            noy = oy;
            noz = oz;
            novx = ovx;
            novy = ovy;
            novz = ovz;
            noax = oax;
            noay = oay;
            noaz = oaz;
        } else {
            // origin of G: the point (o, o', o'') of the inner placement, seen in F, converted to B
            double px = qox;
            double py = qoy;
            double pz = qoz;
            double pvx = qovx;
            double pvy = qovy;
            double pvz = qovz;
            // w x p
            double cx = wy * pz - wz * py;
            double cy = wz * px - wx * pz;
            double cz = wx * py - wy * px;
            double vfx = pvx + cx;
            double vfy = pvy + cy;
            double vfz = pvz + cz;
            // al x p + 2 w x pv + w x (w x p)
            double afx = qoax + (aly * pz - alz * py) + 2 * (wy * pvz - wz * pvy) + (wy * cz - wz * cy);
            double afy = qoay + (alz * px - alx * pz) + 2 * (wz * pvx - wx * pvz) + (wz * cx - wx * cz);
            double afz = qoaz + (alx * py - aly * px) + 2 * (wx * pvy - wy * pvx) + (wx * cy - wy * cx);
            nox = ox + r00 * px + r10 * py + r20 * pz;
            noy = oy + r01 * px + r11 * py + r21 * pz;
            noz = oz + r02 * px + r12 * py + r22 * pz;
            novx = ovx + r00 * vfx + r10 * vfy + r20 * vfz;
            novy = ovy + r01 * vfx + r11 * vfy + r21 * vfz;
            novz = ovz + r02 * vfx + r12 * vfy + r22 * vfz;
            noax = oax + r00 * afx + r10 * afy + r20 * afz;
            noay = oay + r01 * afx + r11 * afy + r21 * afz;
            noaz = oaz + r02 * afx + r12 * afy + r22 * afz;
        }
        double nr00;
        double nr01;
        double nr02;
        double nr10;
        double nr11;
        double nr12;
        double nr20;
        double nr21;
        double nr22;
        double nwx;
        double nwy;
        double nwz;
        double nalx;
        double naly;
        double nalz;
        if (moveOnly) {
            nr00 = r00;
            nr01 = r01;
            nr02 = r02;
            nr10 = r10;
            nr11 = r11;
            nr12 = r12;
            nr20 = r20;
            nr21 = r21;
            nr22 = r22;
            nwx = wx;
            nwy = wy;
            nwz = wz;
            nalx = alx;
            naly = aly;
            nalz = alz;
        } else {
            // R_GB = R_GF R_FB
            nr00 = qr00 * r00 + qr01 * r10 + qr02 * r20;
            nr01 = qr00 * r01 + qr01 * r11 + qr02 * r21;
            nr02 = qr00 * r02 + qr01 * r12 + qr02 * r22;
            nr10 = qr10 * r00 + qr11 * r10 + qr12 * r20;
            nr11 = qr10 * r01 + qr11 * r11 + qr12 * r21;
            nr12 = qr10 * r02 + qr11 * r12 + qr12 * r22;
            nr20 = qr20 * r00 + qr21 * r10 + qr22 * r20;
            nr21 = qr20 * r01 + qr21 * r11 + qr22 * r21;
            nr22 = qr20 * r02 + qr21 * r12 + qr22 * r22;
            // R_GF w and R_GF al
            double twx = qr00 * wx + qr01 * wy + qr02 * wz;
            double twy = qr10 * wx + qr11 * wy + qr12 * wz;
            double twz = qr20 * wx + qr21 * wy + qr22 * wz;
            double tax = qr00 * alx + qr01 * aly + qr02 * alz;
            double tay = qr10 * alx + qr11 * aly + qr12 * alz;
            double taz = qr20 * alx + qr21 * aly + qr22 * alz;
            nwx = qwx + twx;
            nwy = qwy + twy;
            nwz = qwz + twz;
            nalx = qalx + tax - (qwy * twz - qwz * twy);
            naly = qaly + tay - (qwz * twx - qwx * twz);
            nalz = qalz + taz - (qwx * twy - qwy * twx);
        }
        out[oo + 0] = nox;
        out[oo + 1] = noy;
        out[oo + 2] = noz;
        out[oo + 3] = novx;
        out[oo + 4] = novy;
        out[oo + 5] = novz;
        out[oo + 6] = noax;
        out[oo + 7] = noay;
        out[oo + 8] = noaz;
        out[oo + 9] = nr00;
        out[oo + 10] = nr01;
        out[oo + 11] = nr02;
        out[oo + 12] = nr10;
        out[oo + 13] = nr11;
        out[oo + 14] = nr12;
        out[oo + 15] = nr20;
        out[oo + 16] = nr21;
        out[oo + 17] = nr22;
        out[oo + 18] = nwx;
        out[oo + 19] = nwy;
        out[oo + 20] = nwz;
        out[oo + 21] = nalx;
        out[oo + 22] = naly;
        out[oo + 23] = nalz;
    }

    /** A placement from the primitive layout of {@link #toArray(double[], int)}; no checks. */
    static Placement fromArray(double[] c, int o) {
        return new Placement(c[o], c[o + 1], c[o + 2], c[o + 3], c[o + 4], c[o + 5], c[o + 6], c[o + 7], c[o + 8],
                c[o + 9], c[o + 10], c[o + 11], c[o + 12], c[o + 13], c[o + 14], c[o + 15], c[o + 16], c[o + 17],
                c[o + 18], c[o + 19], c[o + 20], c[o + 21], c[o + 22], c[o + 23]);
    }

    // ------------------------------------------------------------------ object methods

    private double[] components() {
        return new double[] {ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz,
            r00, r01, r02, r10, r11, r12, r20, r21, r22, wx, wy, wz, alx, aly, alz};
    }

    @Override
    public boolean equals(Object other) {
        if (this == other) {
            return true;
        }
        if (!(other instanceof Placement)) {
            return false;
        }
        return java.util.Arrays.equals(components(), ((Placement) other).components());
    }

    @Override
    public int hashCode() {
        return java.util.Arrays.hashCode(components());
    }

    @Override
    public String toString() {
        double[] ypr = Orientations.toYawPitchRoll(orientation());
        return "Placement{origin=" + Formats.vector(ox, oy, oz, "m")
                + ", velocity=" + Formats.vector(ovx, ovy, ovz, "m/s")
                + ", acceleration=" + Formats.vector(oax, oay, oaz, "m/s^2")
                + ", yawPitchRoll=" + Formats.vector(Math.toDegrees(ypr[0]), Math.toDegrees(ypr[1]),
                        Math.toDegrees(ypr[2]), "deg")
                + ", angularVelocity=" + Formats.vector(wx, wy, wz, "rad/s")
                + ", angularAcceleration=" + Formats.vector(alx, aly, alz, "rad/s^2") + "}";
    }
}
