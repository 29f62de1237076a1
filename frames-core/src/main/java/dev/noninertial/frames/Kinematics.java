package dev.noninertial.frames;

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
 * {@link #notFinite()} (always the same message) if a value is NaN or infinite, whatever the
 * path that called it. Ranges are not checked here: callers validate them with
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
     * Refuses unless {@code n} values from {@code from} are finite. The quick test is a sum; a
     * non-finite sum of finite values (an overflow of the sum only) is told apart by a second pass.
     */
    static void checkFinite(double[] v, int from, int n) {
        double sum = 0;
        for (int k = from; k < from + n; k++) {
            sum += v[k];
        }
        if (!Double.isFinite(sum)) {
            for (int k = from; k < from + n; k++) {
                if (!Double.isFinite(v[k])) {
                    throw notFinite();
                }
            }
        }
    }

    /**
     * States seen in F to B: {@code r_B = o + R^T r}, {@code v_B = o' + R^T (v + w x r)},
     * {@code a_B = o'' + R^T (a + al x r + 2 w x v + w x (w x r))}, for {@code count} states.
     * Source and target may be the same range.
     */
    static void toBase(double[] p, int po, double[] source, int sourceOffset, double[] target, int targetOffset,
                       int count) {
        convert(p, po, source, sourceOffset, target, targetOffset, count, true);
    }

    /**
     * States seen in B to F: {@code r = R (r_B - o)}, {@code v = R (v_B - o') - w x r},
     * {@code a = R (a_B - o'') - al x r - 2 w x v - w x (w x r)}, for {@code count} states.
     * Source and target may be the same range.
     */
    static void fromBase(double[] p, int po, double[] source, int sourceOffset, double[] target,
                         int targetOffset, int count) {
        convert(p, po, source, sourceOffset, target, targetOffset, count, false);
    }

    /**
     * Both state conversions in one loop: the placement is read once into locals, and the
     * direction test is the same for every state (the compiler moves it out of the loop).
     */
    private static void convert(double[] p, int po, double[] source, int sourceOffset, double[] target,
                                int targetOffset, int count, boolean toBase) {
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
            // the converted state
            double nx;
            double ny;
            double nz;
            double nvx;
            double nvy;
            double nvz;
            double nax;
            double nay;
            double naz;
            if (toBase) {
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
                nx = ox + r00 * x + r10 * y + r20 * z;
                ny = oy + r01 * x + r11 * y + r21 * z;
                nz = oz + r02 * x + r12 * y + r22 * z;
                nvx = ovx + r00 * vfx + r10 * vfy + r20 * vfz;
                nvy = ovy + r01 * vfx + r11 * vfy + r21 * vfz;
                nvz = ovz + r02 * vfx + r12 * vfy + r22 * vfz;
                nax = oax + r00 * afx + r10 * afy + r20 * afz;
                nay = oay + r01 * afx + r11 * afy + r21 * afz;
                naz = oaz + r02 * afx + r12 * afy + r22 * afz;
            } else {
                double dx = x - ox;
                double dy = y - oy;
                double dz = z - oz;
                double ux = vx - ovx;
                double uy = vy - ovy;
                double uz = vz - ovz;
                double ex = ax - oax;
                double ey = ay - oay;
                double ez = az - oaz;
                nx = r00 * dx + r01 * dy + r02 * dz;
                ny = r10 * dx + r11 * dy + r12 * dz;
                nz = r20 * dx + r21 * dy + r22 * dz;
                // w x r
                double cx = wy * nz - wz * ny;
                double cy = wz * nx - wx * nz;
                double cz = wx * ny - wy * nx;
                nvx = r00 * ux + r01 * uy + r02 * uz - cx;
                nvy = r10 * ux + r11 * uy + r12 * uz - cy;
                nvz = r20 * ux + r21 * uy + r22 * uz - cz;
                // R (a_B - o'') - al x r - 2 w x v - w x (w x r)
                nax = r00 * ex + r01 * ey + r02 * ez - (aly * nz - alz * ny) - 2 * (wy * nvz - wz * nvy)
                        - (wy * cz - wz * cy);
                nay = r10 * ex + r11 * ey + r12 * ez - (alz * nx - alx * nz) - 2 * (wz * nvx - wx * nvz)
                        - (wz * cx - wx * cz);
                naz = r20 * ex + r21 * ey + r22 * ez - (alx * ny - aly * nx) - 2 * (wx * nvy - wy * nvx)
                        - (wx * cy - wy * cx);
            }
            if (!Double.isFinite(nx + ny + nz + nvx + nvy + nvz + nax + nay + naz)) {
                refuseUnlessFinite(nx, ny, nz, nvx, nvy, nvz, nax, nay, naz);
            }
            target[j] = nx;
            target[j + 1] = ny;
            target[j + 2] = nz;
            target[j + 3] = nvx;
            target[j + 4] = nvy;
            target[j + 5] = nvz;
            target[j + 6] = nax;
            target[j + 7] = nay;
            target[j + 8] = naz;
        }
    }

    /** Throws {@link #notFinite()} unless all nine values are finite (their sum alone overflowed). */
    private static void refuseUnlessFinite(double a, double b, double c, double d, double e, double f,
                                           double g, double h, double k) {
        if (!(Double.isFinite(a) && Double.isFinite(b) && Double.isFinite(c) && Double.isFinite(d)
                && Double.isFinite(e) && Double.isFinite(f) && Double.isFinite(g) && Double.isFinite(h)
                && Double.isFinite(k))) {
            throw notFinite();
        }
    }

    /**
     * The four fictitious accelerations felt in F by a point at {@code r} with velocity {@code v}
     * seen in F (the state at {@code s}, its acceleration unused), written as 12 doubles: frame
     * {@code -R o''}, Euler {@code -al x r}, Coriolis {@code -2 w x v}, centrifugal
     * {@code -w x (w x r)}.
     */
    static void fictitious(double[] p, int po, double[] s, int so, double[] out, int oo) {
        double wx = p[po + RATE];
        double wy = p[po + RATE + 1];
        double wz = p[po + RATE + 2];
        double alx = p[po + RATE_CHANGE];
        double aly = p[po + RATE_CHANGE + 1];
        double alz = p[po + RATE_CHANGE + 2];
        double x = s[so];
        double y = s[so + 1];
        double z = s[so + 2];
        double vx = s[so + 3];
        double vy = s[so + 4];
        double vz = s[so + 5];
        double cx = wy * z - wz * y;
        double cy = wz * x - wx * z;
        double cz = wx * y - wy * x;
        double oax = p[po + 6];
        double oay = p[po + 7];
        double oaz = p[po + 8];
        out[oo] = -(p[po + 9] * oax + p[po + 10] * oay + p[po + 11] * oaz);
        out[oo + 1] = -(p[po + 12] * oax + p[po + 13] * oay + p[po + 14] * oaz);
        out[oo + 2] = -(p[po + 15] * oax + p[po + 16] * oay + p[po + 17] * oaz);
        out[oo + 3] = -(aly * z - alz * y);
        out[oo + 4] = -(alz * x - alx * z);
        out[oo + 5] = -(alx * y - aly * x);
        out[oo + 6] = -2 * (wy * vz - wz * vy);
        out[oo + 7] = -2 * (wz * vx - wx * vz);
        out[oo + 8] = -2 * (wx * vy - wy * vx);
        out[oo + 9] = -(wy * cz - wz * cy);
        out[oo + 10] = -(wz * cx - wx * cz);
        out[oo + 11] = -(wx * cy - wy * cx);
        checkFinite(out, oo, 12);
    }

    /**
     * Composition: {@code a} is F in B, {@code b} is G in F, {@code out} receives G in B:
     * {@code R_GB = R_GF R_FB}, {@code w_GB = w_GF + R_GF w_FB},
     * {@code al_GB = al_GF + R_GF al_FB - w_GF x (R_GF w_FB)}, and G's origin is the point
     * (o, o', o'') of {@code b}, seen in F, converted to B by {@link #toBase}. {@code out} may be
     * the same range as {@code a} or {@code b}.
     */
    static void compose(double[] a, int ao, double[] b, int bo, double[] out, int oo) {
        // Two kinds of link are common and cheap to compose: one that only turns (origin at rest at
        // F's origin: G's origin is F's) and one that only moves its origin (identity orientation,
        // no rates: G's axes and rates are F's). Their terms that are exactly zero are skipped;
        // the results agree with the general formulas except possibly in the sign of a zero.
        boolean turnOnly = true;
        for (int k = 0; k < MATRIX; k++) {
            turnOnly &= b[bo + k] == 0;
        }
        boolean moveOnly = b[bo + 9] == 1 && b[bo + 13] == 1 && b[bo + 17] == 1;
        for (int k : OFF_IDENTITY) {
            moveOnly &= b[bo + k] == 0;
        }
        // the orientation part reads both inputs before the origin part may overwrite a range
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
            System.arraycopy(a, ao, out, oo, MATRIX);
        } else {
            // the inner origin's (o, o', o'') has the layout of a point state seen in F
            toBase(a, ao, b, bo, out, oo, 1);
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
            checkFinite(out, oo, Placement.COMPONENTS);
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
        checkFinite(out, oo, Placement.COMPONENTS);
    }

    /** Indices of the inner placement that are zero for a move-only link. */
    private static final int[] OFF_IDENTITY = {10, 11, 12, 14, 15, 16, 18, 19, 20, 21, 22, 23};

    /**
     * The inverse placement: {@code p} is F in B, {@code out} receives B in F: B's origin is the
     * point at rest at B's origin converted to F by {@link #fromBase}, {@code R' = R^T},
     * {@code w' = -R^T w}, {@code al' = -R^T al}. {@code out} must not overlap {@code p}.
     */
    static void invert(double[] p, int po, double[] out, int oo) {
        // a zero state: B's origin at rest, in B (out's first 9 doubles serve as the source)
        java.util.Arrays.fill(out, oo, oo + MATRIX, 0.0);
        fromBase(p, po, out, oo, out, oo, 1);
        // R' = R^T; w' = -R^T w and al' = -R^T al: column i of R dotted with the rate
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                out[oo + MATRIX + 3 * i + j] = p[po + MATRIX + 3 * j + i];
            }
        }
        for (int k = RATE; k < Placement.COMPONENTS; k += 3) {
            for (int i = 0; i < 3; i++) {
                int m = po + MATRIX + i;
                out[oo + k + i] = -(p[m] * p[po + k] + p[m + 3] * p[po + k + 1] + p[m + 6] * p[po + k + 2]);
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
