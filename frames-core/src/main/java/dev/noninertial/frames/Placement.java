package dev.noninertial.frames;

import java.io.IOException;
import java.io.ObjectInputStream;
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
 * {@link #fromBase(double[], int, double[], int, int)} allocate nothing at all. Every result is
 * finite or the call throws {@link IllegalArgumentException}, with the same message on every path
 * (object, bulk, frame chain, motion).
 *
 * <h2>Primitive layouts</h2>
 * Two array layouts hold a placement, each with one validated pair of methods:
 * <ul>
 *   <li>matrix layout, {@link #COMPONENTS} = 24 doubles: {@link #toArray(double[], int)} and
 *       {@link #fromArray(double[], int)}; this is what {@link Motion#at(double, double[], int)}
 *       writes and the bulk paths read;</li>
 *   <li>quaternion layout, {@link #QUATERNION_COMPONENTS} = 19 doubles:
 *       {@link #toQuaternionArray(double[], int)} and {@link #fromQuaternionArray(double[], int)},
 *       the array form of {@link #ofQuaternion}; {@link #ofQuaternion(double, double, double,
 *       double, double, double, double, double, double, double, double, double, double, double,
 *       double, double, double, double, double, double[], int) ofQuaternion(..., target, offset)}
 *       writes the matrix layout of the same placement without allocating.</li>
 * </ul>
 *
 * <p>Immutable and thread-safe.
 */
public final class Placement implements Serializable {

    private static final long serialVersionUID = 2L;

    /**
     * Number of doubles one placement occupies in the matrix layout of
     * {@link #toArray(double[], int)} and {@link Motion#at(double, double[], int)}.
     */
    public static final int COMPONENTS = 24;

    /** Number of doubles one placement occupies in the quaternion layout of {@link #toQuaternionArray}. */
    public static final int QUATERNION_COMPONENTS = 19;

    private static final Placement IDENTITY = new Placement(new double[] {
        0, 0, 0, 0, 0, 0, 0, 0, 0,
        1, 0, 0, 0, 1, 0, 0, 0, 1,
        0, 0, 0, 0, 0, 0});

    /**
     * Largest {@code ||q|^2 - 1|} of a quaternion that {@link #ofQuaternion} uses as given; one
     * further off (up to {@link Orientations#UNIT_QUATERNION_TOLERANCE} on {@code ||q| - 1|}) is
     * normalised first. A quaternion computed from a sine and a cosine is within a few 1e-16, and
     * normalising it would only move rounding around; the matrix of an accepted quaternion is
     * orthonormal within about 4e-12, well inside {@link Orientations#MATRIX_TOLERANCE}, so every
     * array {@link #toArray(double[], int)} writes is accepted back by
     * {@link #fromArray(double[], int)}.
     */
    static final double AS_GIVEN = 1e-12;

    /**
     * The components in the matrix layout of {@link #toArray(double[], int)}: o, o', o'' (B axes),
     * R row by row ({@code v_F = R v_B}), w and al (F axes). Never shared, never modified.
     *
     * @serial 24 finite doubles with an orthonormal, right-handed R (checked on reading)
     */
    private final double[] c;

    /** Takes ownership of a validated array in the matrix layout. */
    private Placement(double[] c) {
        this.c = c;
    }

    /**
     * Returns the placement of a frame in itself: zero offset, identity orientation, no rates.
     *
     * @return the placement of a frame in itself: zero offset, identity orientation, no rates
     */
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
     * @throws IllegalArgumentException if a component is NaN or infinite, or the orientation's
     *         quaternion is not unit (see {@link Arguments#unitRotation(String, Rotation)})
     */
    public static Placement of(Vector3D origin, Vector3D originVelocity, Vector3D originAcceleration,
                               Rotation orientation, Vector3D angularVelocity, Vector3D angularAcceleration) {
        Arguments.finite("origin", origin);
        Arguments.finite("originVelocity", originVelocity);
        Arguments.finite("originAcceleration", originAcceleration);
        Arguments.unitRotation("orientation", orientation);
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
     * maps B components to F components: F turned by angle {@code a} about unit axis {@code n} has
     * {@code (cos(a/2), sin(a/2) n)}. A quaternion whose norm differs from 1 by at most
     * {@link Orientations#UNIT_QUATERNION_TOLERANCE} is accepted and normalised (one within 1e-12
     * of unit, as computed ones are, is used as given).
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
     *         within {@link Orientations#UNIT_QUATERNION_TOLERANCE}
     */
    public static Placement ofQuaternion(double ox, double oy, double oz, double ovx, double ovy, double ovz,
                                         double oax, double oay, double oaz,
                                         double q0, double q1, double q2, double q3,
                                         double wx, double wy, double wz, double alx, double aly, double alz) {
        double[] c = new double[COMPONENTS];
        ofQuaternion(ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz, q0, q1, q2, q3, wx, wy, wz, alx, aly, alz, c, 0);
        return new Placement(c);
    }

    /**
     * The primitive twin of {@link #ofQuaternion(double, double, double, double, double, double,
     * double, double, double, double, double, double, double, double, double, double, double,
     * double, double) ofQuaternion}: writes the same placement, with the same checks and the same
     * bits, in the matrix layout of {@link #toArray(double[], int)}, allocating nothing. This is
     * what an allocation-free {@link Motion#at(double, double[], int)} calls.
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
     * @param q0 quaternion scalar part (maps B components to F components)
     * @param q1 quaternion vector part x
     * @param q2 quaternion vector part y
     * @param q3 quaternion vector part z
     * @param wx angular velocity x in F (rad/s)
     * @param wy angular velocity y in F (rad/s)
     * @param wz angular velocity z in F (rad/s)
     * @param alx angular acceleration x in F (rad/s^2)
     * @param aly angular acceleration y in F (rad/s^2)
     * @param alz angular acceleration z in F (rad/s^2)
     * @param target destination array
     * @param offset index where o's x component is written
     * @throws NullPointerException if {@code target} is null
     * @throws IllegalArgumentException if the range does not fit the array, a value is not finite or the quaternion is not unit
     *         within {@link Orientations#UNIT_QUATERNION_TOLERANCE}
     */
    public static void ofQuaternion(double ox, double oy, double oz, double ovx, double ovy, double ovz,
                                    double oax, double oay, double oaz,
                                    double q0, double q1, double q2, double q3,
                                    double wx, double wy, double wz, double alx, double aly, double alz,
                                    double[] target, int offset) {
        Arguments.fromIndexSize("target", target, "offset", offset, COMPONENTS);
        double sum = ox + oy + oz + ovx + ovy + ovz + oax + oay + oaz + wx + wy + wz + alx + aly + alz;
        double n2 = q0 * q0 + q1 * q1 + q2 * q2 + q3 * q3;
        if (!Double.isFinite(sum) || !(Math.abs(n2 - 1.0) <= AS_GIVEN)) {
            double inv = 1.0 / refuseComponents(ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz, q0, q1, q2, q3,
                    wx, wy, wz, alx, aly, alz);
            q0 *= inv;
            q1 *= inv;
            q2 *= inv;
            q3 *= inv;
        }
        int o = offset;
        // (o, o', o'') has the layout of a point state; all finite here, as checked above
        Kinematics.store(target, o, ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz);
        Kinematics.quaternionToMatrix(q0, q1, q2, q3, target, o + Kinematics.MATRIX);
        target[o + 18] = wx;
        target[o + 19] = wy;
        target[o + 20] = wz;
        target[o + 21] = alx;
        target[o + 22] = aly;
        target[o + 23] = alz;
    }

    /**
     * Parameter names of the primitive factories, in their order, with the component they are
     * (named in refusals: motions call these factories, their users know the components).
     */
    private static final String[] COMPONENT_NAMES = {"ox (origin x)", "oy (origin y)", "oz (origin z)",
        "ovx (originVelocity x)", "ovy (originVelocity y)", "ovz (originVelocity z)",
        "oax (originAcceleration x)", "oay (originAcceleration y)", "oaz (originAcceleration z)",
        "q0 (quaternion scalar)", "q1 (quaternion x)", "q2 (quaternion y)", "q3 (quaternion z)",
        "wx (angularVelocity x)", "wy (angularVelocity y)", "wz (angularVelocity z)",
        "alx (angularAcceleration x)", "aly (angularAcceleration y)", "alz (angularAcceleration z)"};

    /** Refuses a non-finite component or a quaternion off unit; returns the quaternion's norm. */
    private static double refuseComponents(double ox, double oy, double oz, double ovx, double ovy, double ovz,
                                           double oax, double oay, double oaz,
                                           double q0, double q1, double q2, double q3,
                                           double wx, double wy, double wz, double alx, double aly, double alz) {
        if (!Double.isFinite(ox + oy + oz + ovx + ovy + ovz + oax + oay + oaz + wx + wy + wz + alx + aly + alz)
                || !Double.isFinite(q0) || !Double.isFinite(q1) || !Double.isFinite(q2) || !Double.isFinite(q3)) {
            // the first non-finite component (the sum of finite huge ones may overflow: then none
            // is refused here), by its parameter name, in parameter order
            double[] values = {ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz, q0, q1, q2, q3, wx, wy, wz, alx, aly, alz};
            for (int k = 0; k < values.length; k++) {
                Arguments.finite(COMPONENT_NAMES[k], values[k]);
            }
        }
        return Arguments.unitQuaternion("quaternion (q0, q1, q2, q3)", q0, q1, q2, q3);
    }

    // ------------------------------------------------------------------ primitive layouts

    /**
     * A placement from the matrix layout of {@link #toArray(double[], int)} ({@link #COMPONENTS}
     * doubles: o, o', o'' in B axes; R row by row with {@code v_F = R v_B}, row i holding F's axis
     * i in B components; w and al of F relative to B in F axes). The values are copied.
     *
     * @param source the array
     * @param offset index of o's x component
     * @return the placement
     * @throws NullPointerException if {@code source} is null
     * @throws IllegalArgumentException if the range does not fit the array, a value is not finite, or R is not orthonormal within
     *         1e-8 per element of {@code R R^T - I}, or R is a reflection
     */
    public static Placement fromArray(double[] source, int offset) {
        Arguments.fromIndexSize("source", source, "offset", offset, COMPONENTS);
        double[] c = java.util.Arrays.copyOfRange(source, offset, offset + COMPONENTS);
        checkLayout(c, "source");
        return new Placement(c);
    }

    /** Refuses a matrix-layout array that is not finite or whose R is not a rotation. */
    private static void checkLayout(double[] c, String name) {
        for (int k = 0; k < COMPONENTS; k++) {
            if (!Double.isFinite(c[k])) {
                throw new IllegalArgumentException(name + " component " + k + " must be finite, got " + c[k]);
            }
        }
        Orientations.checkRotationRows(c, Kinematics.MATRIX, Orientations.MATRIX_TOLERANCE, name + " orientation");
    }

    /**
     * Writes this placement in the matrix layout, {@link #COMPONENTS} consecutive doubles in this
     * order: origin o (3, m), origin velocity o' (3, m/s), origin acceleration o'' (3, m/s^2), all in B
     * axes; the orientation matrix R row by row (9; {@code v_F = R v_B}, row i holds F's axis i
     * in B components); angular velocity w (3, rad/s) and angular acceleration al (3, rad/s^2)
     * of F relative to B, in F axes. Allocates nothing. {@link #fromArray(double[], int)} reads
     * it back.
     *
     * @param target destination array
     * @param offset index where o's x component is written
     * @throws NullPointerException if {@code target} is null
     * @throws IllegalArgumentException if the range does not fit the array
     */
    public void toArray(double[] target, int offset) {
        Arguments.fromIndexSize("target", target, "offset", offset, COMPONENTS);
        System.arraycopy(c, 0, target, offset, COMPONENTS);
    }

    /**
     * A placement from the quaternion layout of {@link #toQuaternionArray(double[], int)}: the
     * 19 arguments of {@link #ofQuaternion} in their order (o, o', o'' in B axes; q0, q1, q2, q3
     * scalar first, mapping B components to F components; w and al in F axes), with its checks.
     *
     * @param source the array
     * @param offset index of o's x component
     * @return the placement
     * @throws NullPointerException if {@code source} is null
     * @throws IllegalArgumentException if the range does not fit the array, a value is not finite or the quaternion is not unit
     *         within {@link Orientations#UNIT_QUATERNION_TOLERANCE}
     */
    public static Placement fromQuaternionArray(double[] source, int offset) {
        Arguments.fromIndexSize("source", source, "offset", offset, QUATERNION_COMPONENTS);
        double[] s = source;
        int o = offset;
        return ofQuaternion(s[o], s[o + 1], s[o + 2], s[o + 3], s[o + 4], s[o + 5], s[o + 6], s[o + 7], s[o + 8],
                s[o + 9], s[o + 10], s[o + 11], s[o + 12],
                s[o + 13], s[o + 14], s[o + 15], s[o + 16], s[o + 17], s[o + 18]);
    }

    /**
     * Writes this placement in the quaternion layout, {@link #QUATERNION_COMPONENTS} consecutive
     * doubles: o, o', o'' (9, B axes), the unit quaternion q0, q1, q2, q3 of R (4, scalar first,
     * the quaternion of {@link #orientation()}: maps B components to F components, sign chosen with
     * q0 &gt;= 0 where the method of the conversion allows), w and al (6, F axes).
     * {@link #fromQuaternionArray(double[], int)} reads it back (up to the rounding of the
     * matrix-quaternion conversion, about 1e-16). Allocates nothing.
     *
     * @param target destination array
     * @param offset index where o's x component is written
     * @throws NullPointerException if {@code target} is null
     * @throws IllegalArgumentException if the range does not fit the array
     */
    public void toQuaternionArray(double[] target, int offset) {
        Arguments.fromIndexSize("target", target, "offset", offset, QUATERNION_COMPONENTS);
        System.arraycopy(c, 0, target, offset, Kinematics.MATRIX);
        Orientations.matrixToQuaternion(c, Kinematics.MATRIX, target, offset + Kinematics.MATRIX);
        System.arraycopy(c, Kinematics.RATE, target, offset + 13, 6);
    }

    /**
     * The components in the matrix layout, for the kernel callers of this package: returns the
     * internal array itself, not a copy, so a caller must never modify it (package-private, so
     * unreachable from outside the package; public accessors copy).
     */
    double[] components() {
        return c;
    }

    /** A placement taking over a matrix-layout array the kernel has filled and checked. */
    static Placement wrap(double[] components) {
        return new Placement(components);
    }

    // ------------------------------------------------------------------ accessors

    /**
     * Returns position o of F's origin seen from B, resolved in B (m).
     *
     * @return position o of F's origin seen from B, resolved in B (m)
     */
    public Vector3D origin() {
        return new Vector3D(c[0], c[1], c[2]);
    }

    /**
     * Returns velocity o' of F's origin seen from B, resolved in B (m/s).
     *
     * @return velocity o' of F's origin seen from B, resolved in B (m/s)
     */
    public Vector3D originVelocity() {
        return new Vector3D(c[3], c[4], c[5]);
    }

    /**
     * Returns acceleration o'' of F's origin seen from B, resolved in B (m/s^2).
     *
     * @return acceleration o'' of F's origin seen from B, resolved in B (m/s^2)
     */
    public Vector3D originAcceleration() {
        return new Vector3D(c[6], c[7], c[8]);
    }

    /**
     * The orientation R of F in B.
     *
     * @return a Hipparchus rotation whose {@code applyTo} maps B components to F components
     */
    public Rotation orientation() {
        return Orientations.fromOrthonormalRows(c[9], c[10], c[11], c[12], c[13], c[14], c[15], c[16], c[17]);
    }

    /**
     * The orientation as a direction-cosine matrix.
     *
     * @return a new 3x3 array M with {@code v_F = M v_B}; row i holds F's axis i in B components
     */
    public double[][] orientationMatrix() {
        return new double[][] {{c[9], c[10], c[11]}, {c[12], c[13], c[14]}, {c[15], c[16], c[17]}};
    }

    /**
     * Returns angular velocity w of F relative to B, resolved in F (rad/s).
     *
     * @return angular velocity w of F relative to B, resolved in F (rad/s)
     */
    public Vector3D angularVelocity() {
        return new Vector3D(c[18], c[19], c[20]);
    }

    /**
     * Returns angular acceleration al of F relative to B, resolved in F (rad/s^2).
     *
     * @return angular acceleration al of F relative to B, resolved in F (rad/s^2)
     */
    public Vector3D angularAcceleration() {
        return new Vector3D(c[21], c[22], c[23]);
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
        double[] n = c.clone();
        n[0] = origin.getX();
        n[1] = origin.getY();
        n[2] = origin.getZ();
        n[3] = originVelocity.getX();
        n[4] = originVelocity.getY();
        n[5] = originVelocity.getZ();
        n[6] = originAcceleration.getX();
        n[7] = originAcceleration.getY();
        n[8] = originAcceleration.getZ();
        return new Placement(n);
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
     * @throws IllegalArgumentException if the result overflows (is not finite)
     */
    public Placement then(Placement inner) {
        Arguments.nonNull("inner", inner);
        double[] out = new double[COMPONENTS];
        Kinematics.compose(c, 0, inner.c, 0, out, 0);
        Kinematics.checkFinite(out, 0, COMPONENTS);
        return new Placement(out);
    }

    /**
     * The inverse placement: this is F in B, the result is B in F.
     *
     * @return placement of B in F
     * @throws IllegalArgumentException if the result overflows (is not finite)
     */
    public Placement inverse() {
        double[] out = new double[COMPONENTS];
        Kinematics.invert(c, out, 0);
        return new Placement(out);
    }

    // ------------------------------------------------------------------ conversions

    /**
     * Converts a point state seen in F to the same point seen in B (all terms included).
     *
     * @param stateInFrame state seen in and resolved in F
     * @return state seen in and resolved in B
     * @throws IllegalArgumentException if the result overflows (is not finite)
     */
    public PointState toBase(PointState stateInFrame) {
        Arguments.nonNull("stateInFrame", stateInFrame);
        double[] out = new double[PointState.COMPONENTS];
        Kinematics.toBase(c, 0, stateInFrame.components(), 0, out, 0, 1, -1);
        return PointState.wrap(out);
    }

    /**
     * Converts a point state seen in B to the same point seen in F (all terms included).
     *
     * @param stateInBase state seen in and resolved in B
     * @return state seen in and resolved in F
     * @throws IllegalArgumentException if the result overflows (is not finite)
     */
    public PointState fromBase(PointState stateInBase) {
        Arguments.nonNull("stateInBase", stateInBase);
        double[] out = new double[PointState.COMPONENTS];
        Kinematics.fromBase(c, 0, stateInBase.components(), 0, out, 0, 1, -1);
        return PointState.wrap(out);
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
     * @throws NullPointerException if an array is null
     * @throws IllegalArgumentException if a range does not fit its array, the ranges overlap with
     *         different offsets, or a source value or a result is not finite (a non-finite source
     *         value is named; the states before it are converted, the others untouched)
     */
    public void toBase(double[] source, int sourceOffset, double[] target, int targetOffset, int count) {
        checkBulk(source, sourceOffset, target, targetOffset, count);
        Kinematics.toBase(c, 0, source, sourceOffset, target, targetOffset, count, sourceOffset);
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
     * @throws NullPointerException if an array is null
     * @throws IllegalArgumentException if a range does not fit its array, the ranges overlap with
     *         different offsets, or a source value or a result is not finite (a non-finite source
     *         value is named; the states before it are converted, the others untouched)
     */
    public void fromBase(double[] source, int sourceOffset, double[] target, int targetOffset, int count) {
        checkBulk(source, sourceOffset, target, targetOffset, count);
        Kinematics.fromBase(c, 0, source, sourceOffset, target, targetOffset, count, sourceOffset);
    }

    /** Range checks of every bulk conversion: both ranges fit, and they do not overlap partly. */
    static void checkBulk(double[] source, int sourceOffset, double[] target, int targetOffset, int count) {
        Arguments.fromIndexSize("source", source, "sourceOffset", sourceOffset, "count", count,
                PointState.COMPONENTS);
        Arguments.fromIndexSize("target", target, "targetOffset", targetOffset, "count", count,
                PointState.COMPONENTS);
        long span = (long) count * PointState.COMPONENTS;
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
     * @throws IllegalArgumentException if a term overflows (is not finite)
     * @see FictitiousAccelerations
     */
    public FictitiousAccelerations fictitious(PointState stateInFrame) {
        Arguments.nonNull("stateInFrame", stateInFrame);
        return Kinematics.fictitious(c, stateInFrame.components(), 0);
    }

    /**
     * Converts a position from F to B: {@code o + R^T r}.
     *
     * @param positionInFrame position in F (m)
     * @return position in B (m)
     * @throws IllegalArgumentException if a component is not finite, or the result overflows
     */
    public Vector3D positionToBase(Vector3D positionInFrame) {
        Arguments.finite("positionInFrame", positionInFrame);
        Vector3D p = vectorToBase(positionInFrame);
        return finite(c[0] + p.getX(), c[1] + p.getY(), c[2] + p.getZ());
    }

    /**
     * Converts a position from B to F: {@code R (r_B - o)}.
     *
     * @param positionInBase position in B (m)
     * @return position in F (m)
     * @throws IllegalArgumentException if a component is not finite, or the result overflows
     */
    public Vector3D positionFromBase(Vector3D positionInBase) {
        Arguments.finite("positionInBase", positionInBase);
        return vectorFromBase(new Vector3D(positionInBase.getX() - c[0], positionInBase.getY() - c[1],
                positionInBase.getZ() - c[2]));
    }

    /**
     * Re-resolves a free vector (force, direction, angular velocity) from F axes to B axes:
     * {@code R^T u}. No origin or rate terms are involved.
     *
     * @param vectorInFrame components in F
     * @return components in B
     * @throws IllegalArgumentException if a component is not finite, or the result overflows
     */
    public Vector3D vectorToBase(Vector3D vectorInFrame) {
        Arguments.finite("vectorInFrame", vectorInFrame);
        return rotate(vectorInFrame, 1, 3);
    }

    /**
     * Re-resolves a free vector from B axes to F axes: {@code R u}.
     *
     * @param vectorInBase components in B
     * @return components in F
     * @throws IllegalArgumentException if a component is not finite, or the result overflows
     */
    public Vector3D vectorFromBase(Vector3D vectorInBase) {
        Arguments.finite("vectorInBase", vectorInBase);
        return rotate(vectorInBase, 3, 1);
    }

    /**
     * {@code R u} (rows {@code 3} apart in the layout, elements of a row {@code 1} apart) or
     * {@code R^T u} (the transpose: rows 1 apart, elements 3 apart), refusing a non-finite result.
     */
    private Vector3D rotate(Vector3D u, int row, int element) {
        double x = u.getX();
        double y = u.getY();
        double z = u.getZ();
        int r0 = Kinematics.MATRIX;
        int r1 = r0 + row;
        int r2 = r1 + row;
        return finite(c[r0] * x + c[r0 + element] * y + c[r0 + 2 * element] * z,
                c[r1] * x + c[r1 + element] * y + c[r1 + 2 * element] * z,
                c[r2] * x + c[r2 + element] * y + c[r2 + 2 * element] * z);
    }

    /** A vector of finite components, or the refusal every kinematic path gives. */
    private static Vector3D finite(double x, double y, double z) {
        if (!(Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(z))) {
            throw Kinematics.notFinite();
        }
        return new Vector3D(x, y, z);
    }

    // ------------------------------------------------------------------ object methods

    /**
     * Re-checks a deserialized placement like the factories check their input: a stream is
     * untrusted.
     *
     * @param in the stream
     * @throws IOException if the stream fails
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            Kinematics.checkLength(c, COMPONENTS);
            checkLayout(c, "serialized placement");
        } catch (IllegalArgumentException e) {
            throw Arguments.refusedStream(Placement.class, e);
        }
    }

    @Override
    public boolean equals(Object other) {
        return this == other || other instanceof Placement o && java.util.Arrays.equals(c, o.c);
    }

    @Override
    public int hashCode() {
        return java.util.Arrays.hashCode(c);
    }

    @Override
    public String toString() {
        double[] ypr = Orientations.toYawPitchRoll(orientation());
        return "Placement{origin=" + Formats.vector(c[0], c[1], c[2], "m")
                + ", velocity=" + Formats.vector(c[3], c[4], c[5], "m/s")
                + ", acceleration=" + Formats.vector(c[6], c[7], c[8], "m/s^2")
                + ", yawPitchRoll=" + Formats.vector(Math.toDegrees(ypr[0]), Math.toDegrees(ypr[1]),
                        Math.toDegrees(ypr[2]), "deg")
                + ", angularVelocity=" + Formats.vector(c[18], c[19], c[20], "rad/s")
                + ", angularAcceleration=" + Formats.vector(c[21], c[22], c[23], "rad/s^2") + "}";
    }
}
