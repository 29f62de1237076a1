package dev.noninertial.frames;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * The one kinematics kernel of the library, on the primitive placement layout of
 * {@link Placement#toArray(double[], int)} (24 doubles: o, o', o'' in B axes; R row by row with
 * {@code v_F = R v_B}; w and al of F relative to B in F axes) and the state layout of
 * {@link PointState#COMPONENTS} (9 doubles: r, v, a). Every kinematic formula of the library is
 * written here once: the object API of {@link Placement}, its bulk loops, the frame chains of
 * {@link ReferenceFrame}, the motions (through {@link Placement#ofQuaternion}) and the
 * integrator's equations (through {@link Placement#fictitious(PointState)}) all call these
 * methods.
 *
 * <p>Names are the same in every method: {@code o*} origin, {@code ov*} origin velocity,
 * {@code oa*} origin acceleration, {@code rIJ} orientation element, {@code w*} angular velocity,
 * {@code al*} angular acceleration; a leading {@code i} marks the inner placement of a
 * composition.
 *
 * <p>One rule for results: every method checks what it writes and throws
 * {@link #notFinite()} (always the same message; the bulk loops add the state it came from) if a
 * value is NaN or infinite, whatever the path that called it; {@link #compose} leaves the check
 * of the finished placement to its callers ({@link #checkFinite}), so that a chain is checked
 * once, after its last link. Ranges are
 * not checked here: callers validate them with
 * {@link Arguments#fromIndexSize}. Stateless.
 */
final class Kinematics {

    /** The message of every refusal of a non-finite kinematic result, on every path. */
    static final String NOT_FINITE = "kinematic result must be finite, got NaN or infinity: an input is not"
            + " finite, or the result overflows the range of double";

    /** Offsets in the placement layout. */
    static final int ORIGIN = 0;
    /** Offset of the orientation matrix, row by row. */
    static final int MATRIX = 9;
    /** Offset of the angular velocity. */
    static final int RATE = 18;
    /** Offset of the angular acceleration. */
    static final int RATE_CHANGE = 21;

    private Kinematics() {
    }

    /**
     * Returns the refusal of a non-finite result, with the message of every path.
     *
     * @return the refusal of a non-finite result, with the message of every path
     */
    static IllegalArgumentException notFinite() {
        return new IllegalArgumentException(NOT_FINITE);
    }

    /**
     * Refuses a stored layout, read from an untrusted stream, unless it holds exactly {@code n}
     * doubles (the {@link Placement#COMPONENTS} of a placement, the {@link PointState#COMPONENTS}
     * of a state).
     */
    static void checkLength(double[] c, int n) {
        if (c == null || c.length != n) {
            throw new IllegalArgumentException("components must hold " + n + " doubles, got "
                    + (c == null ? "none" : c.length));
        }
    }

    /**
     * Refuses unless {@code n} values from {@code from} are finite. The quick test is a sum; a
     * non-finite sum of finite values (an overflow of the sum only) is told apart by a second pass.
     */
    static void checkFinite(double[] v, int from, int n) {
        if (!allFinite(v, from, n)) {
            throw notFinite();
        }
    }

    /**
     * True if {@code n} values from {@code from} are finite: the quick test of
     * {@link #checkFinite}, for callers that name the value they refuse.
     */
    static boolean allFinite(double[] v, int from, int n) {
        // four independent partial sums: the additions overlap instead of waiting on each other
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        double s3 = 0;
        int k = from;
        for (int end = from + n - 3; k < end; k += 4) {
            s0 += v[k];
            s1 += v[k + 1];
            s2 += v[k + 2];
            s3 += v[k + 3];
        }
        for (; k < from + n; k++) {
            s0 += v[k];
        }
        if (Double.isFinite(s0 + s1 + s2 + s3)) {
            return true;
        }
        for (int i = from; i < from + n; i++) {
            if (!Double.isFinite(v[i])) {
                return false;
            }
        }
        return true;
    }

    /**
     * States seen in F to B: {@code r_B = o + R^T r}, {@code v_B = o' + R^T (v + w x r)},
     * {@code a_B = o'' + R^T (a + al x r + 2 w x v + w x (w x r))}, for {@code count} states,
     * the placement at {@code p[po, po + 24)}. Source and target may be the same range.
     */
    static void toBase(double[] p, int po, double[] source, int sourceOffset, double[] target, int targetOffset,
                       int count, int nameBase) {
        convert(true, p, po, source, sourceOffset, target, targetOffset, count, nameBase);
    }

    /**
     * States seen in B to F: {@code r = R (r_B - o)}, {@code v = R (v_B - o') - w x r},
     * {@code a = R (a_B - o'') - al x r - 2 w x v - w x (w x r)}, for {@code count} states, the
     * placement at {@code p[po, po + 24)}. Source and target may be the same range.
     */
    static void fromBase(double[] p, int po, double[] source, int sourceOffset, double[] target,
                         int targetOffset, int count, int nameBase) {
        convert(false, p, po, source, sourceOffset, target, targetOffset, count, nameBase);
    }

    /**
     * Composition: {@code a[ao, ao + 24)} is F in B, {@code b[bo, bo + 24)} is G in F,
     * {@code out[oo, oo + 24)} receives G in B:
     * {@code R_GB = R_GF R_FB}, {@code w_GB = w_GF + R_GF w_FB},
     * {@code al_GB = al_GF + R_GF al_FB - w_GF x (R_GF w_FB)}, and G's origin is the point
     * (o, o', o'') of {@code b}, seen in F, converted to B by {@link #toBase}. {@code out} may be
     * the same range as {@code a} or {@code b}. The caller checks the finished result once
     * ({@link #checkFinite}), after the last link of a chain.
     */
    static void compose(double[] a, int ao, double[] b, int bo, double[] out, int oo) {
        compose(a, ao, null, 0, b, bo, out, oo);
    }

    /**
     * Composition in place with a motion, allocating nothing: {@code p[po, po + 24)} is F in B;
     * it is read, {@code inner}'s placement at {@code t} (G in F) is written over it by
     * {@link Motion#at(double, double[], int)}, and the range receives G in B, with the same
     * arithmetic as {@link #compose}. The caller checks the result ({@link #checkFinite}).
     */
    static void stack(double[] p, int po, Motion inner, double t) {
        compose(p, po, inner, t, p, po, p, po);
    }

    /**
     * The reading of a placement for both bulk directions: {@code p[po, po + 24)} into registers
     * once per call, then the loop of the direction. Small enough for the JIT to inline into
     * its callers (312 bytes of bytecode, under HotSpot's default limit of 325 for hot calls),
     * where the constant direction removes the branch: paired with the split reads it replaced,
     * the single-state object paths measured 1.62-1.70x (F to B) and 1.61-1.71x (B to F) the
     * primitive baseline, against 1.66-1.83x and 1.61-1.66x before; the same reader also serving
     * the composition (a third branch, 394 bytes, not inlined) measured 1.82-1.98x and 1.86-2.27x
     * (frames-bench PairedRatios, 9 rounds, 3 to 5 runs each, 2026-12-03 between 10:40 and
     * 11:37 UTC, 1-minute load 3 to 4.5). The composition reads its placement on its own, below.
     * The two directions stay two loops: one loop for both measured 1.8x to 4.2x the primitive
     * baseline on the single-state object path, against 1.4x to 1.7x apart (frames-bench
     * PairedRatios, 9 rounds, 2026-12-02 16:56-17:00 UTC, 1-minute load 9 to 17).
     */
    private static void convert(boolean toBase, double[] p, int po, double[] source, int sourceOffset,
                                double[] target, int targetOffset, int count, int nameBase) {
        double ox = p[po];
        double oy = p[po + 1];
        double oz = p[po + 2];
        double ovx = p[po + 3];
        double ovy = p[po + 4];
        double ovz = p[po + 5];
        double oax = p[po + 6];
        double oay = p[po + 7];
        double oaz = p[po + 8];
        double r00 = p[po + 9];
        double r01 = p[po + 10];
        double r02 = p[po + 11];
        double r10 = p[po + 12];
        double r11 = p[po + 13];
        double r12 = p[po + 14];
        double r20 = p[po + 15];
        double r21 = p[po + 16];
        double r22 = p[po + 17];
        double wx = p[po + 18];
        double wy = p[po + 19];
        double wz = p[po + 20];
        double alx = p[po + 21];
        double aly = p[po + 22];
        double alz = p[po + 23];
        if (toBase) {
            toBase(ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz, r00, r01, r02,
                    r10, r11, r12, r20, r21, r22, wx, wy, wz, alx, aly, alz,
                    source, sourceOffset, target, targetOffset, count, nameBase);
        } else {
            fromBase(ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz, r00, r01, r02,
                    r10, r11, r12, r20, r21, r22, wx, wy, wz, alx, aly, alz,
                    source, sourceOffset, target, targetOffset, count, nameBase);
        }
    }

    /**
     * The reading of F in B, {@code a[ao, ao + 24)}, into registers for the composition with G in
     * F at {@code b[bo, bo + 24)}, which {@code inner}, unless null, first writes there at time
     * {@code t}; {@code out[oo, oo + 24)} receives G in B.
     */
    private static void compose(double[] a, int ao, Motion inner, double t, double[] b, int bo, double[] out,
                                int oo) {
        double ox = a[ao];
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
        if (inner != null) {
            inner.at(t, b, bo);
        }
        compose(ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz, r00, r01, r02,
                r10, r11, r12, r20, r21, r22, wx, wy, wz, alx, aly, alz, b, bo, out, oo);
    }

    /** {@link #toBase} on a placement held in registers. */
    private static void toBase(double ox, double oy, double oz, double ovx, double ovy, double ovz,
                               double oax, double oay, double oaz, double r00, double r01, double r02,
                               double r10, double r11, double r12, double r20, double r21, double r22,
                               double wx, double wy, double wz, double alx, double aly, double alz,
                               double[] source, int sourceOffset, double[] target, int targetOffset, int count,
                               int nameBase) {
        // both indices advance by a stride instead of being recomputed as offset + k * 9: with
        // the recomputed pair the bulk loop measured 1.28x the hand-inlined primitive loop, with
        // strides 0.91x to 1.00x (frames-bench PairedRatios, 2026-12-02)
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
            // w x r
            double cx = wy * z - wz * y;
            double cy = wz * x - wx * z;
            double cz = wx * y - wy * x;
            double vfx = vx + cx;
            double vfy = vy + cy;
            double vfz = vz + cz;
            // a + al x r + 2 w x v + w x (w x r)
            double afx = ax + (aly * z - alz * y) + 2 * (wy * vz - wz * vy) + (wy * cz - wz * cy);
            double afy = ay + (alz * x - alx * z) + 2 * (wz * vx - wx * vz) + (wz * cx - wx * cz);
            double afz = az + (alx * y - aly * x) + 2 * (wx * vy - wy * vx) + (wx * cy - wy * cx);
            double nx = ox + r00 * x + r10 * y + r20 * z;
            double ny = oy + r01 * x + r11 * y + r21 * z;
            double nz = oz + r02 * x + r12 * y + r22 * z;
            double nvx = ovx + r00 * vfx + r10 * vfy + r20 * vfz;
            double nvy = ovy + r01 * vfx + r11 * vfy + r21 * vfz;
            double nvz = ovz + r02 * vfx + r12 * vfy + r22 * vfz;
            double nax = oax + r00 * afx + r10 * afy + r20 * afz;
            double nay = oay + r01 * afx + r11 * afy + r21 * afz;
            double naz = oaz + r02 * afx + r12 * afy + r22 * afz;
            store(source, nameBase, i, target, j, nx, ny, nz, nvx, nvy, nvz, nax, nay, naz);
        }
    }


    /** {@link #fromBase} on a placement held in registers. */
    private static void fromBase(double ox, double oy, double oz, double ovx, double ovy, double ovz,
                                 double oax, double oay, double oaz, double r00, double r01, double r02,
                                 double r10, double r11, double r12, double r20, double r21, double r22,
                                 double wx, double wy, double wz, double alx, double aly, double alz,
                                 double[] source, int sourceOffset, double[] target, int targetOffset, int count,
                                 int nameBase) {
        int end = sourceOffset + count * PointState.COMPONENTS;
        for (int i = sourceOffset, j = targetOffset; i < end; i += PointState.COMPONENTS,
                j += PointState.COMPONENTS) {
            double dx = source[i] - ox;
            double dy = source[i + 1] - oy;
            double dz = source[i + 2] - oz;
            double ux = source[i + 3] - ovx;
            double uy = source[i + 4] - ovy;
            double uz = source[i + 5] - ovz;
            double ex = source[i + 6] - oax;
            double ey = source[i + 7] - oay;
            double ez = source[i + 8] - oaz;
            double nx = r00 * dx + r01 * dy + r02 * dz;
            double ny = r10 * dx + r11 * dy + r12 * dz;
            double nz = r20 * dx + r21 * dy + r22 * dz;
            // w x r
            double cx = wy * nz - wz * ny;
            double cy = wz * nx - wx * nz;
            double cz = wx * ny - wy * nx;
            double nvx = r00 * ux + r01 * uy + r02 * uz - cx;
            double nvy = r10 * ux + r11 * uy + r12 * uz - cy;
            double nvz = r20 * ux + r21 * uy + r22 * uz - cz;
            // R (a_B - o'') - al x r - 2 w x v - w x (w x r)
            double nax = r00 * ex + r01 * ey + r02 * ez - (aly * nz - alz * ny) - 2 * (wy * nvz - wz * nvy)
                    - (wy * cz - wz * cy);
            double nay = r10 * ex + r11 * ey + r12 * ez - (alz * nx - alx * nz) - 2 * (wz * nvx - wx * nvz)
                    - (wz * cx - wx * cz);
            double naz = r20 * ex + r21 * ey + r22 * ez - (alx * ny - aly * nx) - 2 * (wx * nvy - wy * nvx)
                    - (wx * cy - wy * cx);
            store(source, nameBase, i, target, j, nx, ny, nz, nvx, nvy, nvz, nax, nay, naz);
        }
    }


    /** Writes one state (or origin), refusing it unless all nine values are finite. */
    static void store(double[] target, int j, double x, double y, double z, double vx, double vy,
                              double vz, double ax, double ay, double az) {
        store(null, -1, 0, target, j, x, y, z, vx, vy, vz, ax, ay, az);
    }

    /**
     * {@link #store(double[], int, double, double, double, double, double, double, double, double, double)}
     * for a state converted from {@code source[i, i + 9)}: a refused result whose source state holds a
     * NaN or an infinity names that value, as {@code source[i] (state k, component c)} with {@code k}
     * counted from {@code nameBase}; an overflow from a finite source state is refused with
     * {@link #NOT_FINITE} followed by {@code (state k, source[i] to source[i + 8])} (a negative
     * {@code nameBase}: no naming, the generic refusal).
     * The input test runs only on the refusal path: a separate pass over the source before the
     * conversion measured 2.11x to 4.38x the primitive baseline on the bulk conversion, against
     * 1.29x without it (frames-bench HotPathGate medians, 2026-12-03 11:37 to 12:02 UTC, load 3 to 4).
     */
    static void store(double[] source, int nameBase, int i, double[] target, int j, double x, double y, double z,
                      double vx, double vy, double vz, double ax, double ay, double az) {
        if (!Double.isFinite((x + y + z) + (vx + vy + vz) + (ax + ay + az))) {
            refuse(source, nameBase, i, x, y, z, vx, vy, vz, ax, ay, az);
        }
        target[j] = x;
        target[j + 1] = y;
        target[j + 2] = z;
        target[j + 3] = vx;
        target[j + 4] = vy;
        target[j + 5] = vz;
        target[j + 6] = ax;
        target[j + 7] = ay;
        target[j + 8] = az;
    }

    /**
     * The refusal path of {@link #store}, out of line so that the store stays small enough to be
     * inlined into every loop: names a non-finite source value if there is one, else refuses a
     * non-finite result with {@link #NOT_FINITE} followed, on a bulk path ({@code nameBase >= 0}),
     * by the state it came from; returns if all nine values are finite (only their sum overflowed).
     */
    private static void refuse(double[] source, int nameBase, int i, double x, double y, double z, double vx,
                               double vy, double vz, double ax, double ay, double az) {
        if (nameBase >= 0) {
            refuseSource(source, nameBase, i);
        }
        if (!allFinite(x, y, z, vx, vy, vz, ax, ay, az)) {
            throw nameBase < 0 ? notFinite() : new IllegalArgumentException(NOT_FINITE + " (state "
                    + (i - nameBase) / PointState.COMPONENTS + ", source[" + i + "] to source["
                    + (i + PointState.COMPONENTS - 1) + "])");
        }
    }

    /** Refuses the first non-finite value of the source state at {@code i}, naming it; returns if none. */
    private static void refuseSource(double[] source, int nameBase, int i) {
        for (int c = 0; c < PointState.COMPONENTS; c++) {
            if (!Double.isFinite(source[i + c])) {
                throw new IllegalArgumentException("source[" + (i + c) + "] (state "
                        + (i - nameBase) / PointState.COMPONENTS + ", component " + c + ") must be finite, got "
                        + source[i + c]);
            }
        }
    }

    /** Throws {@link #notFinite()} unless all nine values are finite (their sum alone overflowed). */
    private static void refuseUnlessFinite(double a, double b, double c, double d, double e, double f,
                                           double g, double h, double k) {
        if (!allFinite(a, b, c, d, e, f, g, h, k)) {
            throw notFinite();
        }
    }

    /** Whether all nine values are finite. */
    private static boolean allFinite(double a, double b, double c, double d, double e, double f, double g,
                                     double h, double k) {
        return Double.isFinite(a) && Double.isFinite(b) && Double.isFinite(c) && Double.isFinite(d)
                && Double.isFinite(e) && Double.isFinite(f) && Double.isFinite(g) && Double.isFinite(h)
                && Double.isFinite(k);
    }

    /**
     * The four fictitious accelerations felt in F by a point at {@code r} with velocity {@code v}
     * seen in F (the state at {@code s}, its acceleration unused): frame {@code -R o''}, Euler
     * {@code -al x r}, Coriolis {@code -2 w x v}, centrifugal {@code -w x (w x r)}. One small
     * method per term, each small enough for the JIT to inline, so that a caller reading only
     * the components (the equations of motion) allocates none of the objects.
     */
    static FictitiousAccelerations fictitious(double[] p, double[] s, int so) {
        return new FictitiousAccelerations(frameTerm(p), eulerTerm(p, s[so], s[so + 1], s[so + 2]),
                coriolisTerm(p, s[so + 3], s[so + 4], s[so + 5]), centrifugalTerm(p, s[so], s[so + 1], s[so + 2]));
    }

    /** The frame term {@code -R o''} of the placement {@code p}. */
    static Vector3D frameTerm(double[] p) {
        double oax = p[6];
        double oay = p[7];
        double oaz = p[8];
        return term(-(p[9] * oax + p[10] * oay + p[11] * oaz), -(p[12] * oax + p[13] * oay + p[14] * oaz),
                -(p[15] * oax + p[16] * oay + p[17] * oaz));
    }

    /** The Euler term {@code -al x r} of the placement {@code p} at {@code r = (x, y, z)}. */
    static Vector3D eulerTerm(double[] p, double x, double y, double z) {
        double alx = p[RATE_CHANGE];
        double aly = p[RATE_CHANGE + 1];
        double alz = p[RATE_CHANGE + 2];
        return term(-(aly * z - alz * y), -(alz * x - alx * z), -(alx * y - aly * x));
    }

    /** The Coriolis term {@code -2 w x v} of the placement {@code p} at {@code v = (vx, vy, vz)}. */
    static Vector3D coriolisTerm(double[] p, double vx, double vy, double vz) {
        double wx = p[RATE];
        double wy = p[RATE + 1];
        double wz = p[RATE + 2];
        return term(-2 * (wy * vz - wz * vy), -2 * (wz * vx - wx * vz), -2 * (wx * vy - wy * vx));
    }

    /** The centrifugal term {@code -w x (w x r)} of the placement {@code p} at {@code r = (x, y, z)}. */
    static Vector3D centrifugalTerm(double[] p, double x, double y, double z) {
        double wx = p[RATE];
        double wy = p[RATE + 1];
        double wz = p[RATE + 2];
        double cx = wy * z - wz * y;
        double cy = wz * x - wx * z;
        double cz = wx * y - wy * x;
        return term(-(wy * cz - wz * cy), -(wz * cx - wx * cz), -(wx * cy - wy * cx));
    }

    /** One term, refused by {@link #notFinite()} unless finite. */
    private static Vector3D term(double x, double y, double z) {
        if (!Double.isFinite(x + y + z)) {
            refuseUnlessFinite(x, y, z, 0, 0, 0, 0, 0, 0);
        }
        return new Vector3D(x, y, z);
    }

    /** {@link #compose} with F in B held in registers, G in F at {@code b[bo, bo + 24)}. */
    private static void compose(double ox, double oy, double oz, double ovx, double ovy, double ovz,
                                double oax, double oay, double oaz, double r00, double r01, double r02,
                                double r10, double r11, double r12, double r20, double r21, double r22,
                                double wx, double wy, double wz, double alx, double aly, double alz,
                                double[] b, int bo, double[] out, int oo) {
        // Two kinds of link are common and cheap to compose: one that only turns (origin at rest at
        // F's origin: G's origin is F's) and one that only moves its origin (identity orientation,
        // no rates: G's axes and rates are F's). Their terms that are exactly zero are skipped;
        // the results agree with the general formulas except possibly in the sign of a zero.
        boolean turnOnly = b[bo] == 0 && b[bo + 1] == 0 && b[bo + 2] == 0 && b[bo + 3] == 0 && b[bo + 4] == 0
                && b[bo + 5] == 0 && b[bo + 6] == 0 && b[bo + 7] == 0 && b[bo + 8] == 0;
        boolean moveOnly = b[bo + 9] == 1 && b[bo + 13] == 1 && b[bo + 17] == 1 && b[bo + 10] == 0
                && b[bo + 11] == 0 && b[bo + 12] == 0 && b[bo + 14] == 0 && b[bo + 15] == 0 && b[bo + 16] == 0
                && b[bo + 18] == 0 && b[bo + 19] == 0 && b[bo + 20] == 0 && b[bo + 21] == 0 && b[bo + 22] == 0
                && b[bo + 23] == 0;
        // the inner orientation is read before the origin part may overwrite its range
        double ir00 = b[bo + 9];
        double ir01 = b[bo + 10];
        double ir02 = b[bo + 11];
        double ir10 = b[bo + 12];
        double ir11 = b[bo + 13];
        double ir12 = b[bo + 14];
        double ir20 = b[bo + 15];
        double ir21 = b[bo + 16];
        double ir22 = b[bo + 17];
        double iwx = b[bo + 18];
        double iwy = b[bo + 19];
        double iwz = b[bo + 20];
        double ialx = b[bo + 21];
        double ialy = b[bo + 22];
        double ialz = b[bo + 23];
        if (turnOnly) {
            store(out, oo, ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz);
        } else {
            // the inner origin's (o, o', o'') has the layout of a point state seen in F
            toBase(ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz, r00, r01, r02,
                    r10, r11, r12, r20, r21, r22, wx, wy, wz, alx, aly, alz, b, bo, out, oo, 1, -1);
        }
        if (moveOnly) {
            out[oo + 9] = r00;
            out[oo + 10] = r01;
            out[oo + 11] = r02;
            out[oo + 12] = r10;
            out[oo + 13] = r11;
            out[oo + 14] = r12;
            out[oo + 15] = r20;
            out[oo + 16] = r21;
            out[oo + 17] = r22;
            out[oo + 18] = wx;
            out[oo + 19] = wy;
            out[oo + 20] = wz;
            out[oo + 21] = alx;
            out[oo + 22] = aly;
            out[oo + 23] = alz;
            return;
        }
        // R_GF w and R_GF al
        double twx = ir00 * wx + ir01 * wy + ir02 * wz;
        double twy = ir10 * wx + ir11 * wy + ir12 * wz;
        double twz = ir20 * wx + ir21 * wy + ir22 * wz;
        double tax = ir00 * alx + ir01 * aly + ir02 * alz;
        double tay = ir10 * alx + ir11 * aly + ir12 * alz;
        double taz = ir20 * alx + ir21 * aly + ir22 * alz;
        // R_GB = R_GF R_FB
        out[oo + 9] = ir00 * r00 + ir01 * r10 + ir02 * r20;
        out[oo + 10] = ir00 * r01 + ir01 * r11 + ir02 * r21;
        out[oo + 11] = ir00 * r02 + ir01 * r12 + ir02 * r22;
        out[oo + 12] = ir10 * r00 + ir11 * r10 + ir12 * r20;
        out[oo + 13] = ir10 * r01 + ir11 * r11 + ir12 * r21;
        out[oo + 14] = ir10 * r02 + ir11 * r12 + ir12 * r22;
        out[oo + 15] = ir20 * r00 + ir21 * r10 + ir22 * r20;
        out[oo + 16] = ir20 * r01 + ir21 * r11 + ir22 * r21;
        out[oo + 17] = ir20 * r02 + ir21 * r12 + ir22 * r22;
        out[oo + 18] = iwx + twx;
        out[oo + 19] = iwy + twy;
        out[oo + 20] = iwz + twz;
        out[oo + 21] = ialx + tax - (iwy * twz - iwz * twy);
        out[oo + 22] = ialy + tay - (iwz * twx - iwx * twz);
        out[oo + 23] = ialz + taz - (iwx * twy - iwy * twx);
    }

    /**
     * The inverse placement: {@code p} is F in B, {@code out} receives B in F: B's origin is the
     * point at rest at B's origin converted to F by {@link #fromBase}, {@code R' = R^T},
     * {@code w' = -R^T w}, {@code al' = -R^T al}. {@code out} must not overlap {@code p}.
     */
    static void invert(double[] p, double[] out, int oo) {
        // a zero state: B's origin at rest, in B (out's first 9 doubles serve as the source)
        java.util.Arrays.fill(out, oo, oo + MATRIX, 0.0);
        fromBase(p, 0, out, oo, out, oo, 1, -1);
        // R' = R^T; w' = -R^T w and al' = -R^T al: column i of R dotted with the rate
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                out[oo + MATRIX + 3 * i + j] = p[MATRIX + 3 * j + i];
            }
        }
        for (int k = RATE; k < Placement.COMPONENTS; k += 3) {
            for (int i = 0; i < 3; i++) {
                int m = MATRIX + i;
                out[oo + k + i] = -(p[m] * p[k] + p[m + 3] * p[k + 1] + p[m + 6] * p[k + 2]);
            }
        }
        checkFinite(out, oo + RATE, 6);
    }

    /**
     * The orientation matrix of a quaternion (scalar first), row by row, the same matrix as
     * Hipparchus {@code Rotation.getMatrix()}: {@code applyTo(u) = M u}, so with the library's
     * convention {@code v_F = M v_B}. Not normalised: the caller checks the norm.
     */
    static void quaternionToMatrix(double q0, double q1, double q2, double q3, double[] out, int oo) {
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
        out[oo] = 2.0 * (q0q0 + q1q1) - 1.0;
        out[oo + 1] = 2.0 * (q1q2 + q0q3);
        out[oo + 2] = 2.0 * (q1q3 - q0q2);
        out[oo + 3] = 2.0 * (q1q2 - q0q3);
        out[oo + 4] = 2.0 * (q0q0 + q2q2) - 1.0;
        out[oo + 5] = 2.0 * (q2q3 + q0q1);
        out[oo + 6] = 2.0 * (q1q3 + q0q2);
        out[oo + 7] = 2.0 * (q2q3 - q0q1);
        out[oo + 8] = 2.0 * (q0q0 + q3q3) - 1.0;
    }
}
