package dev.noninertial.bench;

/**
 * Baseline (b): hand-inlined code on primitive doubles, the practical limit of what a user can
 * write. A placement is held in 24 doubles (o, o', o'' in base axes; R row by row with
 * {@code v_F = R v_B}; w, al in frame axes) and a state in 9 (r, v, a). No objects, no checks.
 */
public final class PrimitiveBaseline {

    /** Doubles per placement. */
    public static final int P = 24;
    /** Doubles per state. */
    public static final int S = 9;

    private PrimitiveBaseline() {
    }

    /**
     * The scenario's placement in the 24-double layout.
     *
     * @return a new array
     */
    public static double[] scenarioPlacement() {
        double[] p = new double[P];
        Scenario.placement().toArray(p, 0);
        return p;
    }

    /**
     * The scenario's state in the 9-double layout.
     *
     * @return a new array
     */
    public static double[] scenarioState() {
        double[] s = new double[S];
        Scenario.state().toArray(s, 0);
        return s;
    }

    /**
     * One state, frame to base.
     *
     * @param p placement
     * @param s state in the frame at index i
     * @param i index of the state
     * @param out receives the state in the base at index j
     * @param j index of the result
     */
    public static void toBase(double[] p, double[] s, int i, double[] out, int j) {
        double x = s[i];
        double y = s[i + 1];
        double z = s[i + 2];
        double vx = s[i + 3];
        double vy = s[i + 4];
        double vz = s[i + 5];
        double wx = p[18];
        double wy = p[19];
        double wz = p[20];
        double cx = wy * z - wz * y;
        double cy = wz * x - wx * z;
        double cz = wx * y - wy * x;
        double fx = vx + cx;
        double fy = vy + cy;
        double fz = vz + cz;
        double gx = s[i + 6] + (p[22] * z - p[23] * y) + 2 * (wy * vz - wz * vy) + (wy * cz - wz * cy);
        double gy = s[i + 7] + (p[23] * x - p[21] * z) + 2 * (wz * vx - wx * vz) + (wz * cx - wx * cz);
        double gz = s[i + 8] + (p[21] * y - p[22] * x) + 2 * (wx * vy - wy * vx) + (wx * cy - wy * cx);
        out[j] = p[0] + p[9] * x + p[12] * y + p[15] * z;
        out[j + 1] = p[1] + p[10] * x + p[13] * y + p[16] * z;
        out[j + 2] = p[2] + p[11] * x + p[14] * y + p[17] * z;
        out[j + 3] = p[3] + p[9] * fx + p[12] * fy + p[15] * fz;
        out[j + 4] = p[4] + p[10] * fx + p[13] * fy + p[16] * fz;
        out[j + 5] = p[5] + p[11] * fx + p[14] * fy + p[17] * fz;
        out[j + 6] = p[6] + p[9] * gx + p[12] * gy + p[15] * gz;
        out[j + 7] = p[7] + p[10] * gx + p[13] * gy + p[16] * gz;
        out[j + 8] = p[8] + p[11] * gx + p[14] * gy + p[17] * gz;
    }

    /**
     * One state, base to frame.
     *
     * @param p placement
     * @param s state in the base at index i
     * @param i index of the state
     * @param out receives the state in the frame at index j
     * @param j index of the result
     */
    public static void fromBase(double[] p, double[] s, int i, double[] out, int j) {
        double dx = s[i] - p[0];
        double dy = s[i + 1] - p[1];
        double dz = s[i + 2] - p[2];
        double ux = s[i + 3] - p[3];
        double uy = s[i + 4] - p[4];
        double uz = s[i + 5] - p[5];
        double bx = s[i + 6] - p[6];
        double by = s[i + 7] - p[7];
        double bz = s[i + 8] - p[8];
        double wx = p[18];
        double wy = p[19];
        double wz = p[20];
        double rx = p[9] * dx + p[10] * dy + p[11] * dz;
        double ry = p[12] * dx + p[13] * dy + p[14] * dz;
        double rz = p[15] * dx + p[16] * dy + p[17] * dz;
        double cx = wy * rz - wz * ry;
        double cy = wz * rx - wx * rz;
        double cz = wx * ry - wy * rx;
        double vx = p[9] * ux + p[10] * uy + p[11] * uz - cx;
        double vy = p[12] * ux + p[13] * uy + p[14] * uz - cy;
        double vz = p[15] * ux + p[16] * uy + p[17] * uz - cz;
        out[j] = rx;
        out[j + 1] = ry;
        out[j + 2] = rz;
        out[j + 3] = vx;
        out[j + 4] = vy;
        out[j + 5] = vz;
        out[j + 6] = p[9] * bx + p[10] * by + p[11] * bz - (p[22] * rz - p[23] * ry) - 2 * (wy * vz - wz * vy)
                - (wy * cz - wz * cy);
        out[j + 7] = p[12] * bx + p[13] * by + p[14] * bz - (p[23] * rx - p[21] * rz) - 2 * (wz * vx - wx * vz)
                - (wz * cx - wx * cz);
        out[j + 8] = p[15] * bx + p[16] * by + p[17] * bz - (p[21] * ry - p[22] * rx) - 2 * (wx * vy - wy * vx)
                - (wx * cy - wy * cx);
    }

    /**
     * The four fictitious terms for a state seen in the frame.
     *
     * @param p placement
     * @param s state in the frame (index 0)
     * @param out receives frame (0..2), Euler (3..5), Coriolis (6..8), centrifugal (9..11)
     */
    public static void fictitious(double[] p, double[] s, double[] out) {
        double x = s[0];
        double y = s[1];
        double z = s[2];
        double wx = p[18];
        double wy = p[19];
        double wz = p[20];
        double cx = wy * z - wz * y;
        double cy = wz * x - wx * z;
        double cz = wx * y - wy * x;
        out[0] = -(p[9] * p[6] + p[10] * p[7] + p[11] * p[8]);
        out[1] = -(p[12] * p[6] + p[13] * p[7] + p[14] * p[8]);
        out[2] = -(p[15] * p[6] + p[16] * p[7] + p[17] * p[8]);
        out[3] = -(p[22] * z - p[23] * y);
        out[4] = -(p[23] * x - p[21] * z);
        out[5] = -(p[21] * y - p[22] * x);
        out[6] = -2 * (wy * s[5] - wz * s[4]);
        out[7] = -2 * (wz * s[3] - wx * s[5]);
        out[8] = -2 * (wx * s[4] - wy * s[3]);
        out[9] = -(wy * cz - wz * cy);
        out[10] = -(wz * cx - wx * cz);
        out[11] = -(wx * cy - wy * cx);
    }

    /**
     * Composition: a is F in B, b is G in F; writes G in B into out (out may be a).
     *
     * @param a F in B
     * @param b G in F
     * @param out receives G in B
     */
    public static void compose(double[] a, double[] b, double[] out) {
        double wx = a[18];
        double wy = a[19];
        double wz = a[20];
        double px = b[0];
        double py = b[1];
        double pz = b[2];
        double pvx = b[3];
        double pvy = b[4];
        double pvz = b[5];
        double cx = wy * pz - wz * py;
        double cy = wz * px - wx * pz;
        double cz = wx * py - wy * px;
        double fx = pvx + cx;
        double fy = pvy + cy;
        double fz = pvz + cz;
        double gx = b[6] + (a[22] * pz - a[23] * py) + 2 * (wy * pvz - wz * pvy) + (wy * cz - wz * cy);
        double gy = b[7] + (a[23] * px - a[21] * pz) + 2 * (wz * pvx - wx * pvz) + (wz * cx - wx * cz);
        double gz = b[8] + (a[21] * py - a[22] * px) + 2 * (wx * pvy - wy * pvx) + (wx * cy - wy * cx);
        double a00 = a[9];
        double a01 = a[10];
        double a02 = a[11];
        double a10 = a[12];
        double a11 = a[13];
        double a12 = a[14];
        double a20 = a[15];
        double a21 = a[16];
        double a22 = a[17];
        double b00 = b[9];
        double b01 = b[10];
        double b02 = b[11];
        double b10 = b[12];
        double b11 = b[13];
        double b12 = b[14];
        double b20 = b[15];
        double b21 = b[16];
        double b22 = b[17];
        double twx = b00 * wx + b01 * wy + b02 * wz;
        double twy = b10 * wx + b11 * wy + b12 * wz;
        double twz = b20 * wx + b21 * wy + b22 * wz;
        double tax = b00 * a[21] + b01 * a[22] + b02 * a[23];
        double tay = b10 * a[21] + b11 * a[22] + b12 * a[23];
        double taz = b20 * a[21] + b21 * a[22] + b22 * a[23];
        double qwx = b[18];
        double qwy = b[19];
        double qwz = b[20];
        double o0 = a[0] + a00 * px + a10 * py + a20 * pz;
        double o1 = a[1] + a01 * px + a11 * py + a21 * pz;
        double o2 = a[2] + a02 * px + a12 * py + a22 * pz;
        double o3 = a[3] + a00 * fx + a10 * fy + a20 * fz;
        double o4 = a[4] + a01 * fx + a11 * fy + a21 * fz;
        double o5 = a[5] + a02 * fx + a12 * fy + a22 * fz;
        double o6 = a[6] + a00 * gx + a10 * gy + a20 * gz;
        double o7 = a[7] + a01 * gx + a11 * gy + a21 * gz;
        double o8 = a[8] + a02 * gx + a12 * gy + a22 * gz;
        double e21 = b[21] + tax - (qwy * twz - qwz * twy);
        double e22 = b[22] + tay - (qwz * twx - qwx * twz);
        double e23 = b[23] + taz - (qwx * twy - qwy * twx);
        out[0] = o0;
        out[1] = o1;
        out[2] = o2;
        out[3] = o3;
        out[4] = o4;
        out[5] = o5;
        out[6] = o6;
        out[7] = o7;
        out[8] = o8;
        out[9] = b00 * a00 + b01 * a10 + b02 * a20;
        out[10] = b00 * a01 + b01 * a11 + b02 * a21;
        out[11] = b00 * a02 + b01 * a12 + b02 * a22;
        out[12] = b10 * a00 + b11 * a10 + b12 * a20;
        out[13] = b10 * a01 + b11 * a11 + b12 * a21;
        out[14] = b10 * a02 + b11 * a12 + b12 * a22;
        out[15] = b20 * a00 + b21 * a10 + b22 * a20;
        out[16] = b20 * a01 + b21 * a11 + b22 * a21;
        out[17] = b20 * a02 + b21 * a12 + b22 * a22;
        out[18] = qwx + twx;
        out[19] = qwy + twy;
        out[20] = qwz + twz;
        out[21] = e21;
        out[22] = e22;
        out[23] = e23;
    }

    /**
     * Writes a turn by {@code angle} about the unit axis (nx, ny, nz) with rate and acceleration.
     *
     * @param nx axis x
     * @param ny axis y
     * @param nz axis z
     * @param angle angle (rad)
     * @param rate rate (rad/s)
     * @param acceleration angular acceleration (rad/s^2)
     * @param out receives the placement
     */
    public static void turn(double nx, double ny, double nz, double angle, double rate, double acceleration,
                            double[] out) {
        double h = 0.5 * angle;
        double s = Math.sin(h);
        double q0 = Math.cos(h);
        double q1 = s * nx;
        double q2 = s * ny;
        double q3 = s * nz;
        for (int k = 0; k < 9; k++) {
            out[k] = 0.0;
        }
        out[9] = 2.0 * (q0 * q0 + q1 * q1) - 1.0;
        out[10] = 2.0 * (q1 * q2 + q0 * q3);
        out[11] = 2.0 * (q1 * q3 - q0 * q2);
        out[12] = 2.0 * (q1 * q2 - q0 * q3);
        out[13] = 2.0 * (q0 * q0 + q2 * q2) - 1.0;
        out[14] = 2.0 * (q2 * q3 + q0 * q1);
        out[15] = 2.0 * (q1 * q3 + q0 * q2);
        out[16] = 2.0 * (q2 * q3 - q0 * q1);
        out[17] = 2.0 * (q0 * q0 + q3 * q3) - 1.0;
        out[18] = rate * nx;
        out[19] = rate * ny;
        out[20] = rate * nz;
        out[21] = acceleration * nx;
        out[22] = acceleration * ny;
        out[23] = acceleration * nz;
    }

    private static void shift(double px, double py, double pz, double vx, double vy, double vz,
                              double ax, double ay, double az, double[] out) {
        out[0] = px;
        out[1] = py;
        out[2] = pz;
        out[3] = vx;
        out[4] = vy;
        out[5] = vz;
        out[6] = ax;
        out[7] = ay;
        out[8] = az;
        for (int k = 9; k < P; k++) {
            out[k] = 0.0;
        }
        out[9] = 1.0;
        out[13] = 1.0;
        out[17] = 1.0;
    }

    /**
     * Link {@code link} of the benchmark chain at time t, hand-coded from {@link ChainLaws}.
     *
     * @param link 0 to 5
     * @param t time (s)
     * @param out receives the placement of the link in its parent
     */
    public static void link(int link, double t, double[] out) {
        switch (link) {
            case 0:
                turn(ChainLaws.AXIS0.getX(), ChainLaws.AXIS0.getY(), ChainLaws.AXIS0.getZ(),
                        ChainLaws.ANGLE0 + ChainLaws.RATE0 * t, ChainLaws.RATE0, 0.0, out);
                return;
            case 1: {
                double arg = ChainLaws.FREQUENCY1 * t + ChainLaws.PHASE1;
                double x = ChainLaws.AMPLITUDE1 * Math.sin(arg);
                double xd = ChainLaws.AMPLITUDE1 * ChainLaws.FREQUENCY1 * Math.cos(arg);
                double xdd = -ChainLaws.FREQUENCY1 * ChainLaws.FREQUENCY1 * x;
                double dx = ChainLaws.DIRECTION1.getX();
                double dy = ChainLaws.DIRECTION1.getY();
                double dz = ChainLaws.DIRECTION1.getZ();
                shift(x * dx, x * dy, x * dz, xd * dx, xd * dy, xd * dz, xdd * dx, xdd * dy, xdd * dz, out);
                return;
            }
            case 2:
                swing(ChainLaws.AXIS2.getX(), ChainLaws.AXIS2.getY(), ChainLaws.AXIS2.getZ(),
                        ChainLaws.AMPLITUDE2, ChainLaws.FREQUENCY2, ChainLaws.PHASE2, t, out);
                return;
            case 3:
                turn(ChainLaws.AXIS3.getX(), ChainLaws.AXIS3.getY(), ChainLaws.AXIS3.getZ(),
                        ChainLaws.ANGLE3 + t * (ChainLaws.RATE3 + 0.5 * ChainLaws.ACCELERATION3 * t),
                        ChainLaws.RATE3 + ChainLaws.ACCELERATION3 * t, ChainLaws.ACCELERATION3, out);
                return;
            case 4: {
                double t2 = t * t;
                shift(ChainLaws.C0.getX() + t * ChainLaws.C1.getX() + t2 * ChainLaws.C2.getX(),
                        ChainLaws.C0.getY() + t * ChainLaws.C1.getY() + t2 * ChainLaws.C2.getY(),
                        ChainLaws.C0.getZ() + t * ChainLaws.C1.getZ() + t2 * ChainLaws.C2.getZ(),
                        ChainLaws.C1.getX() + 2 * t * ChainLaws.C2.getX(),
                        ChainLaws.C1.getY() + 2 * t * ChainLaws.C2.getY(),
                        ChainLaws.C1.getZ() + 2 * t * ChainLaws.C2.getZ(),
                        2 * ChainLaws.C2.getX(), 2 * ChainLaws.C2.getY(), 2 * ChainLaws.C2.getZ(), out);
                return;
            }
            case 5:
                swing(ChainLaws.AXIS5.getX(), ChainLaws.AXIS5.getY(), ChainLaws.AXIS5.getZ(),
                        ChainLaws.AMPLITUDE5, ChainLaws.FREQUENCY5, ChainLaws.PHASE5, t, out);
                return;
            default:
                throw new IllegalArgumentException("link must be in [0, 5], got " + link);
        }
    }

    /**
     * The chain of the first {@code depth} links, composed from the outermost.
     *
     * @param depth 1 to 6
     * @param t time (s)
     * @param scratch 24 doubles of working space
     * @param out receives the placement of the innermost frame in the root
     */
    public static void chain(int depth, double t, double[] scratch, double[] out) {
        link(0, t, out);
        for (int i = 1; i < depth; i++) {
            link(i, t, scratch);
            compose(out, scratch, out);
        }
    }

    private static void swing(double nx, double ny, double nz, double amplitude, double frequency, double phase,
                              double t, double[] out) {
        double arg = frequency * t + phase;
        double s = Math.sin(arg);
        turn(nx, ny, nz, amplitude * s, amplitude * frequency * Math.cos(arg), -amplitude * frequency * frequency * s,
                out);
    }

    /**
     * Many states through one placement, frame to base, placement held in locals.
     *
     * @param p placement
     * @param src states in the frame
     * @param dst receives states in the base
     * @param n number of states
     */
    public static void toBaseAll(double[] p, double[] src, double[] dst, int n) {
        double ox = p[0];
        double oy = p[1];
        double oz = p[2];
        double ovx = p[3];
        double ovy = p[4];
        double ovz = p[5];
        double oax = p[6];
        double oay = p[7];
        double oaz = p[8];
        double m00 = p[9];
        double m01 = p[10];
        double m02 = p[11];
        double m10 = p[12];
        double m11 = p[13];
        double m12 = p[14];
        double m20 = p[15];
        double m21 = p[16];
        double m22 = p[17];
        double wx = p[18];
        double wy = p[19];
        double wz = p[20];
        double ex = p[21];
        double ey = p[22];
        double ez = p[23];
        for (int k = 0; k < n; k++) {
            int i = k * S;
            double x = src[i];
            double y = src[i + 1];
            double z = src[i + 2];
            double vx = src[i + 3];
            double vy = src[i + 4];
            double vz = src[i + 5];
            double cx = wy * z - wz * y;
            double cy = wz * x - wx * z;
            double cz = wx * y - wy * x;
            double fx = vx + cx;
            double fy = vy + cy;
            double fz = vz + cz;
            double gx = src[i + 6] + (ey * z - ez * y) + 2 * (wy * vz - wz * vy) + (wy * cz - wz * cy);
            double gy = src[i + 7] + (ez * x - ex * z) + 2 * (wz * vx - wx * vz) + (wz * cx - wx * cz);
            double gz = src[i + 8] + (ex * y - ey * x) + 2 * (wx * vy - wy * vx) + (wx * cy - wy * cx);
            dst[i] = ox + m00 * x + m10 * y + m20 * z;
            dst[i + 1] = oy + m01 * x + m11 * y + m21 * z;
            dst[i + 2] = oz + m02 * x + m12 * y + m22 * z;
            dst[i + 3] = ovx + m00 * fx + m10 * fy + m20 * fz;
            dst[i + 4] = ovy + m01 * fx + m11 * fy + m21 * fz;
            dst[i + 5] = ovz + m02 * fx + m12 * fy + m22 * fz;
            dst[i + 6] = oax + m00 * gx + m10 * gy + m20 * gz;
            dst[i + 7] = oay + m01 * gx + m11 * gy + m21 * gz;
            dst[i + 8] = oaz + m02 * gx + m12 * gy + m22 * gz;
        }
    }

    /**
     * Many states through one placement, base to frame, placement held in locals.
     *
     * @param p placement
     * @param src states in the base
     * @param dst receives states in the frame
     * @param n number of states
     */
    public static void fromBaseAll(double[] p, double[] src, double[] dst, int n) {
        double ox = p[0];
        double oy = p[1];
        double oz = p[2];
        double ovx = p[3];
        double ovy = p[4];
        double ovz = p[5];
        double oax = p[6];
        double oay = p[7];
        double oaz = p[8];
        double m00 = p[9];
        double m01 = p[10];
        double m02 = p[11];
        double m10 = p[12];
        double m11 = p[13];
        double m12 = p[14];
        double m20 = p[15];
        double m21 = p[16];
        double m22 = p[17];
        double wx = p[18];
        double wy = p[19];
        double wz = p[20];
        double ex = p[21];
        double ey = p[22];
        double ez = p[23];
        for (int k = 0; k < n; k++) {
            int i = k * S;
            double dx = src[i] - ox;
            double dy = src[i + 1] - oy;
            double dz = src[i + 2] - oz;
            double ux = src[i + 3] - ovx;
            double uy = src[i + 4] - ovy;
            double uz = src[i + 5] - ovz;
            double bx = src[i + 6] - oax;
            double by = src[i + 7] - oay;
            double bz = src[i + 8] - oaz;
            double rx = m00 * dx + m01 * dy + m02 * dz;
            double ry = m10 * dx + m11 * dy + m12 * dz;
            double rz = m20 * dx + m21 * dy + m22 * dz;
            double cx = wy * rz - wz * ry;
            double cy = wz * rx - wx * rz;
            double cz = wx * ry - wy * rx;
            double vx = m00 * ux + m01 * uy + m02 * uz - cx;
            double vy = m10 * ux + m11 * uy + m12 * uz - cy;
            double vz = m20 * ux + m21 * uy + m22 * uz - cz;
            dst[i] = rx;
            dst[i + 1] = ry;
            dst[i + 2] = rz;
            dst[i + 3] = vx;
            dst[i + 4] = vy;
            dst[i + 5] = vz;
            dst[i + 6] = m00 * bx + m01 * by + m02 * bz - (ey * rz - ez * ry) - 2 * (wy * vz - wz * vy)
                    - (wy * cz - wz * cy);
            dst[i + 7] = m10 * bx + m11 * by + m12 * bz - (ez * rx - ex * rz) - 2 * (wz * vx - wx * vz)
                    - (wz * cx - wx * cz);
            dst[i + 8] = m20 * bx + m21 * by + m22 * bz - (ex * ry - ey * rx) - 2 * (wx * vy - wy * vx)
                    - (wx * cy - wy * cx);
        }
    }

    /**
     * Many states, each at its own time, through the scenario's spin-up, frame to base: the
     * spin placement is computed in locals per state and applied at once.
     *
     * @param times time of each state (s)
     * @param src states in the frame
     * @param dst receives states in the base
     * @param n number of states
     */
    public static void spinUpToBaseAll(double[] times, double[] src, double[] dst, int n) {
        double nx = Scenario.SPIN_AXIS.getX();
        double ny = Scenario.SPIN_AXIS.getY();
        double nz = Scenario.SPIN_AXIS.getZ();
        double a0 = Scenario.SPIN_ANGLE0;
        double r0 = Scenario.SPIN_RATE0;
        double acc = Scenario.SPIN_ACCELERATION;
        double ex = acc * nx;
        double ey = acc * ny;
        double ez = acc * nz;
        for (int k = 0; k < n; k++) {
            double t = times[k];
            double rate = r0 + acc * t;
            double h = 0.5 * (a0 + t * (r0 + 0.5 * acc * t));
            double s = Math.sin(h);
            double q0 = Math.cos(h);
            double q1 = s * nx;
            double q2 = s * ny;
            double q3 = s * nz;
            double m00 = 2.0 * (q0 * q0 + q1 * q1) - 1.0;
            double m01 = 2.0 * (q1 * q2 + q0 * q3);
            double m02 = 2.0 * (q1 * q3 - q0 * q2);
            double m10 = 2.0 * (q1 * q2 - q0 * q3);
            double m11 = 2.0 * (q0 * q0 + q2 * q2) - 1.0;
            double m12 = 2.0 * (q2 * q3 + q0 * q1);
            double m20 = 2.0 * (q1 * q3 + q0 * q2);
            double m21 = 2.0 * (q2 * q3 - q0 * q1);
            double m22 = 2.0 * (q0 * q0 + q3 * q3) - 1.0;
            double wx = rate * nx;
            double wy = rate * ny;
            double wz = rate * nz;
            int i = k * S;
            double x = src[i];
            double y = src[i + 1];
            double z = src[i + 2];
            double vx = src[i + 3];
            double vy = src[i + 4];
            double vz = src[i + 5];
            double cx = wy * z - wz * y;
            double cy = wz * x - wx * z;
            double cz = wx * y - wy * x;
            double fx = vx + cx;
            double fy = vy + cy;
            double fz = vz + cz;
            double gx = src[i + 6] + (ey * z - ez * y) + 2 * (wy * vz - wz * vy) + (wy * cz - wz * cy);
            double gy = src[i + 7] + (ez * x - ex * z) + 2 * (wz * vx - wx * vz) + (wz * cx - wx * cz);
            double gz = src[i + 8] + (ex * y - ey * x) + 2 * (wx * vy - wy * vx) + (wx * cy - wy * cx);
            dst[i] = m00 * x + m10 * y + m20 * z;
            dst[i + 1] = m01 * x + m11 * y + m21 * z;
            dst[i + 2] = m02 * x + m12 * y + m22 * z;
            dst[i + 3] = m00 * fx + m10 * fy + m20 * fz;
            dst[i + 4] = m01 * fx + m11 * fy + m21 * fz;
            dst[i + 5] = m02 * fx + m12 * fy + m22 * fz;
            dst[i + 6] = m00 * gx + m10 * gy + m20 * gz;
            dst[i + 7] = m01 * gx + m11 * gy + m21 * gz;
            dst[i + 8] = m02 * gx + m12 * gy + m22 * gz;
        }
    }
}
