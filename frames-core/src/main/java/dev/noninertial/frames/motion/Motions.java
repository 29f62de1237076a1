package dev.noninertial.frames.motion;

import java.io.Serializable;
import java.util.Arrays;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;

/**
 * Ready-made motions of a frame F in its parent B. Every motion returns exact analytic rates
 * (origin velocity and acceleration, angular velocity and acceleration), never numerical
 * estimates.
 *
 * <p>Angles follow the library convention (see {@link Orientations}): "F turned by {@code a}
 * about {@code n}" means F's axes are B's axes turned by {@code +a} (right-hand rule) about
 * {@code n}, and the angular velocity of F relative to B is then {@code a' n}, resolved in F
 * (equal to its B components, since {@code n} is the rotation axis).
 *
 * <p>Time {@code t} is in seconds from the user's epoch. All motions returned here are immutable,
 * thread-safe and serializable. Stack motions with {@link Motion#then(Motion)}; a logged motion
 * is made by {@link SampledMotion#fromArrays(double[], double[], double[])}.
 */
public final class Motions {

    private Motions() {
    }

    /**
     * A frame at a fixed offset, aligned with its parent.
     *
     * @param offset position of F's origin in B (m)
     * @return the motion
     */
    public static Motion stationary(Vector3D offset) {
        return stationary(offset, Rotation.IDENTITY);
    }

    /**
     * A frame at a fixed offset and orientation.
     *
     * @param offset position of F's origin in B (m)
     * @param orientation orientation of F, mapping B components to F components
     * @return the motion
     */
    public static Motion stationary(Vector3D offset, Rotation orientation) {
        return new Fixed(Placement.stationary(offset, orientation));
    }

    /**
     * Constant spin about a fixed axis through B's origin: angle {@code angleAtZero + rate t}.
     *
     * @param axis spin axis in B (any non-zero length)
     * @param angleAtZero angle at t = 0 (rad)
     * @param rate spin rate (rad/s), positive by the right-hand rule about {@code axis}
     * @return the motion
     */
    public static Motion spin(Vector3D axis, double angleAtZero, double rate) {
        return spinUp(axis, angleAtZero, rate, 0.0);
    }

    /**
     * Spin with constant angular acceleration about a fixed axis through B's origin:
     * angle {@code angleAtZero + rateAtZero t + angularAcceleration t^2 / 2}.
     *
     * @param axis spin axis in B (any non-zero length)
     * @param angleAtZero angle at t = 0 (rad)
     * @param rateAtZero spin rate at t = 0 (rad/s)
     * @param angularAcceleration constant angular acceleration (rad/s^2)
     * @return the motion
     */
    public static Motion spinUp(Vector3D axis, double angleAtZero, double rateAtZero, double angularAcceleration) {
        return new Spin(Arguments.unitAxis("axis", axis),
                Arguments.finite("angleAtZero", angleAtZero),
                Arguments.finite("rateAtZero", rateAtZero),
                Arguments.finite("angularAcceleration", angularAcceleration));
    }

    /**
     * Translation of the origin along a polynomial in time, axes aligned with the parent:
     * {@code o(t) = c0 + c1 t + c2 t^2 + ...}.
     *
     * @param coefficients c0 (m), c1 (m/s), c2 (m/s^2), ... at least one
     * @return the motion
     */
    public static Motion translation(Vector3D... coefficients) {
        Arguments.nonNull("coefficients", coefficients);
        if (coefficients.length == 0) {
            throw new IllegalArgumentException("coefficients must hold at least one vector (c0), got none");
        }
        double[] c = new double[3 * coefficients.length];
        for (int k = 0; k < coefficients.length; k++) {
            Arguments.finite("coefficients[" + k + "]", coefficients[k]);
            c[3 * k] = coefficients[k].getX();
            c[3 * k + 1] = coefficients[k].getY();
            c[3 * k + 2] = coefficients[k].getZ();
        }
        return new Polynomial(c);
    }

    /**
     * Harmonic oscillation of an angle about a fixed axis (roll, pitch, yaw of a ship, a
     * pendulum's swing): angle {@code amplitude sin(angularFrequency t + phase)}.
     *
     * @param axis axis in B (any non-zero length)
     * @param amplitude angle amplitude (rad)
     * @param angularFrequency 2 pi / period (rad/s)
     * @param phase phase at t = 0 (rad)
     * @return the motion
     */
    public static Motion oscillation(Vector3D axis, double amplitude, double angularFrequency, double phase) {
        return new AngleOscillation(Arguments.unitAxis("axis", axis),
                Arguments.finite("amplitude", amplitude),
                Arguments.finite("angularFrequency", angularFrequency),
                Arguments.finite("phase", phase));
    }

    /**
     * Harmonic translation of the origin along a fixed direction (heave, surge, sway), axes aligned
     * with the parent: offset {@code amplitude sin(angularFrequency t + phase)} along the unit
     * direction.
     *
     * @param direction direction in B (any non-zero length)
     * @param amplitude displacement amplitude (m)
     * @param angularFrequency 2 pi / period (rad/s)
     * @param phase phase at t = 0 (rad)
     * @return the motion
     */
    public static Motion heave(Vector3D direction, double amplitude, double angularFrequency, double phase) {
        return new Heave(Arguments.unitAxis("direction", direction),
                Arguments.finite("amplitude", amplitude),
                Arguments.finite("angularFrequency", angularFrequency),
                Arguments.finite("phase", phase));
    }

    /** Placement for a turn by angle th about unit axis n, with rate th1 and acceleration th2. */
    static Placement turn(Vector3D n, double th, double th1, double th2) {
        double half = 0.5 * th;
        double s = Math.sin(half);
        return Placement.ofQuaternion(0, 0, 0, 0, 0, 0, 0, 0, 0,
                Math.cos(half), s * n.getX(), s * n.getY(), s * n.getZ(),
                th1 * n.getX(), th1 * n.getY(), th1 * n.getZ(),
                th2 * n.getX(), th2 * n.getY(), th2 * n.getZ());
    }

    /**
     * Writes the placement of a turn by angle {@code th} about the unit axis {@code (nx, ny, nz)}
     * with rate {@code th1} and acceleration {@code th2} (origin at rest at zero) in the layout of
     * {@link Placement#toArray(double[], int)}, with exactly the arithmetic of {@link Placement#ofQuaternion} so that
     * both paths give identical bits. No checks.
     */
    @SuppressWarnings("checkstyle:ParameterNumber")
    private static void writeTurn(double nx, double ny, double nz, double th, double th1, double th2,
                          double[] target, int o) {
        double half = 0.5 * th;
        double s = Math.sin(half);
        double q0 = Math.cos(half);
        double q1 = s * nx;
        double q2 = s * ny;
        double q3 = s * nz;
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
        for (int k = 0; k < 9; k++) {
            target[o + k] = 0.0;
        }
        target[o + 9] = 2.0 * (q0q0 + q1q1) - 1.0;
        target[o + 10] = 2.0 * (q1q2 + q0q3);
        target[o + 11] = 2.0 * (q1q3 - q0q2);
        target[o + 12] = 2.0 * (q1q2 - q0q3);
        target[o + 13] = 2.0 * (q0q0 + q2q2) - 1.0;
        target[o + 14] = 2.0 * (q2q3 + q0q1);
        target[o + 15] = 2.0 * (q1q3 + q0q2);
        target[o + 16] = 2.0 * (q2q3 - q0q1);
        target[o + 17] = 2.0 * (q0q0 + q3q3) - 1.0;
        target[o + 18] = th1 * nx;
        target[o + 19] = th1 * ny;
        target[o + 20] = th1 * nz;
        target[o + 21] = th2 * nx;
        target[o + 22] = th2 * ny;
        target[o + 23] = th2 * nz;
    }

    /**
     * Writes a pure translation (identity orientation, no rotation rates) in the layout of
     * {@link Placement#toArray(double[], int)}. No checks.
     */
    @SuppressWarnings("checkstyle:ParameterNumber")
    private static void writeTranslation(double px, double py, double pz, double vx, double vy, double vz,
                                 double ax, double ay, double az, double[] target, int o) {
        target[o] = px;
        target[o + 1] = py;
        target[o + 2] = pz;
        target[o + 3] = vx;
        target[o + 4] = vy;
        target[o + 5] = vz;
        target[o + 6] = ax;
        target[o + 7] = ay;
        target[o + 8] = az;
        for (int k = 9; k < Placement.COMPONENTS; k++) {
            target[o + k] = 0.0;
        }
        target[o + 9] = 1.0;
        target[o + 13] = 1.0;
        target[o + 17] = 1.0;
    }

    private static void checkTarget(double[] target, int offset) {
        Arguments.nonNull("target", target);
        if (offset < 0 || offset > target.length - Placement.COMPONENTS) {
            throw new IllegalArgumentException("offset must be in [0, " + (target.length - Placement.COMPONENTS)
                    + "] for an array of length " + target.length + ", got " + offset);
        }
    }

    /** Range checks of the bulk conversions, with the messages of {@link Motion#toBase}. */
    @SuppressWarnings("checkstyle:ParameterNumber")
    private static void checkBulk(double[] times, int timeOffset, double[] source, int sourceOffset,
                                  double[] target, int targetOffset, int count) {
        Arguments.nonNull("source", source);
        Arguments.nonNull("target", target);
        Arguments.nonNull("times", times);
        if (count < 0) {
            throw new IllegalArgumentException("count must be >= 0, got " + count);
        }
        long span = (long) count * 9;
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
        if (timeOffset < 0 || (long) timeOffset + count > times.length) {
            throw new IllegalArgumentException("timeOffset must be in [0, " + (times.length - count)
                    + "] for " + count + " states, got " + timeOffset);
        }
    }

    private static void checkTime(double t) {
        if (!Double.isFinite(t)) {
            throw new IllegalArgumentException("t must be finite, got " + t);
        }
    }

    private record Fixed(Placement placement) implements Motion, Serializable {
        @Override
        public Placement at(double t) {
            checkTime(t);
            return placement;
        }

        @Override
        public void at(double t, double[] target, int offset) {
            checkTime(t);
            placement.toArray(target, offset);
        }

        @Override
        public String toString() {
            return "stationary " + placement;
        }
    }

    private record Spin(Vector3D axis, double angleAtZero, double rateAtZero, double angularAcceleration)
            implements Motion, Serializable {
        @Override
        public Placement at(double t) {
            checkTime(t);
            double angle = angleAtZero + t * (rateAtZero + 0.5 * angularAcceleration * t);
            return turn(axis, angle, rateAtZero + angularAcceleration * t, angularAcceleration);
        }

        @Override
        public void at(double t, double[] target, int offset) {
            checkTime(t);
            checkTarget(target, offset);
            double angle = angleAtZero + t * (rateAtZero + 0.5 * angularAcceleration * t);
            if (!Double.isFinite(angle)) {
                throw new IllegalArgumentException("spin angle overflows at t = " + t + ": it must stay finite");
            }
            writeTurn(axis.getX(), axis.getY(), axis.getZ(), angle, rateAtZero + angularAcceleration * t,
                    angularAcceleration, target, offset);
        }

        // Bulk conversion F to B specialised for a spin: the placement stays in registers and the zero
        // origin terms are skipped. Same arithmetic as the generic path (which adds the zero
        // origin), so the same values; only the sign of a zero result may differ.
        @Override
        public void toBase(double[] times, int timeOffset, double[] source, int sourceOffset,
                           double[] target, int targetOffset, int count) {
            checkBulk(times, timeOffset, source, sourceOffset, target, targetOffset, count);
            double nx = axis.getX();
            double ny = axis.getY();
            double nz = axis.getZ();
            double alx = angularAcceleration * nx;
            double aly = angularAcceleration * ny;
            double alz = angularAcceleration * nz;
            for (int k = 0; k < count; k++) {
                double t = times[timeOffset + k];
                checkTime(t);
                double angle = angleAtZero + t * (rateAtZero + 0.5 * angularAcceleration * t);
                if (!Double.isFinite(angle)) {
                    throw new IllegalArgumentException("spin angle overflows at t = " + t + ": it must stay finite");
                }
                double rate = rateAtZero + angularAcceleration * t;
                double half = 0.5 * angle;
                double sh = Math.sin(half);
                double q0 = Math.cos(half);
                double q1 = sh * nx;
                double q2 = sh * ny;
                double q3 = sh * nz;
                double q0q0 = q0 * q0;
                double r00 = 2.0 * (q0q0 + q1 * q1) - 1.0;
                double r01 = 2.0 * (q1 * q2 + q0 * q3);
                double r02 = 2.0 * (q1 * q3 - q0 * q2);
                double r10 = 2.0 * (q1 * q2 - q0 * q3);
                double r11 = 2.0 * (q0q0 + q2 * q2) - 1.0;
                double r12 = 2.0 * (q2 * q3 + q0 * q1);
                double r20 = 2.0 * (q1 * q3 + q0 * q2);
                double r21 = 2.0 * (q2 * q3 - q0 * q1);
                double r22 = 2.0 * (q0q0 + q3 * q3) - 1.0;
                double wx = rate * nx;
                double wy = rate * ny;
                double wz = rate * nz;
                int i = sourceOffset + 9 * k;
                int j = targetOffset + 9 * k;
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
                target[j] = r00 * x + r10 * y + r20 * z;
                target[j + 1] = r01 * x + r11 * y + r21 * z;
                target[j + 2] = r02 * x + r12 * y + r22 * z;
                target[j + 3] = r00 * vfx + r10 * vfy + r20 * vfz;
                target[j + 4] = r01 * vfx + r11 * vfy + r21 * vfz;
                target[j + 5] = r02 * vfx + r12 * vfy + r22 * vfz;
                target[j + 6] = r00 * afx + r10 * afy + r20 * afz;
                target[j + 7] = r01 * afx + r11 * afy + r21 * afz;
                target[j + 8] = r02 * afx + r12 * afy + r22 * afz;
            }
        }

        @Override
        public String toString() {
            return "spin about " + Formats.vector(axis, "") + "angle(0)=" + Formats.number(angleAtZero)
                    + " rad, rate(0)=" + Formats.number(rateAtZero) + " rad/s, acceleration="
                    + Formats.number(angularAcceleration) + " rad/s^2";
        }
    }

    private record AngleOscillation(Vector3D axis, double amplitude, double angularFrequency, double phase)
            implements Motion, Serializable {
        @Override
        public Placement at(double t) {
            checkTime(t);
            double arg = angularFrequency * t + phase;
            double s = Math.sin(arg);
            double c = Math.cos(arg);
            return turn(axis, amplitude * s, amplitude * angularFrequency * c,
                    -amplitude * angularFrequency * angularFrequency * s);
        }

        @Override
        public void at(double t, double[] target, int offset) {
            checkTime(t);
            checkTarget(target, offset);
            double arg = angularFrequency * t + phase;
            double s = Math.sin(arg);
            double c = Math.cos(arg);
            writeTurn(axis.getX(), axis.getY(), axis.getZ(), amplitude * s, amplitude * angularFrequency * c,
                    -amplitude * angularFrequency * angularFrequency * s, target, offset);
        }

        @Override
        public String toString() {
            return "oscillation about " + Formats.vector(axis, "") + "amplitude=" + Formats.number(amplitude)
                    + " rad, angularFrequency=" + Formats.number(angularFrequency) + " rad/s, phase="
                    + Formats.number(phase) + " rad";
        }
    }

    private record Heave(Vector3D direction, double amplitude, double angularFrequency, double phase)
            implements Motion, Serializable {
        @Override
        public Placement at(double t) {
            checkTime(t);
            double arg = angularFrequency * t + phase;
            double p = amplitude * Math.sin(arg);
            double v = amplitude * angularFrequency * Math.cos(arg);
            double a = -angularFrequency * angularFrequency * p;
            double dx = direction.getX();
            double dy = direction.getY();
            double dz = direction.getZ();
            return Placement.ofQuaternion(p * dx, p * dy, p * dz, v * dx, v * dy, v * dz, a * dx, a * dy, a * dz,
                    1, 0, 0, 0, 0, 0, 0, 0, 0, 0);
        }

        @Override
        public void at(double t, double[] target, int offset) {
            checkTime(t);
            checkTarget(target, offset);
            double arg = angularFrequency * t + phase;
            double p = amplitude * Math.sin(arg);
            double v = amplitude * angularFrequency * Math.cos(arg);
            double a = -angularFrequency * angularFrequency * p;
            double dx = direction.getX();
            double dy = direction.getY();
            double dz = direction.getZ();
            writeTranslation(p * dx, p * dy, p * dz, v * dx, v * dy, v * dz, a * dx, a * dy, a * dz, target, offset);
        }

        @Override
        public String toString() {
            return "heave along " + Formats.vector(direction, "") + "amplitude=" + Formats.number(amplitude)
                    + " m, angularFrequency=" + Formats.number(angularFrequency) + " rad/s, phase="
                    + Formats.number(phase) + " rad";
        }
    }

    /** o(t) = sum c_k t^k, coefficients packed x,y,z per degree. */
    private static final class Polynomial implements Motion, Serializable {
        private static final long serialVersionUID = 1L;
        private final double[] c;

        Polynomial(double[] c) {
            this.c = c;
        }

        @Override
        public Placement at(double t) {
            checkTime(t);
            double[] p = new double[9];
            int degree = c.length / 3 - 1;
            // Horner for value, first and second derivatives
            for (int axis = 0; axis < 3; axis++) {
                double value = c[3 * degree + axis];
                double d1 = 0;
                double d2 = 0;
                for (int k = degree - 1; k >= 0; k--) {
                    d2 = d2 * t + 2 * d1;
                    d1 = d1 * t + value;
                    value = value * t + c[3 * k + axis];
                }
                p[axis] = value;
                p[3 + axis] = d1;
                p[6 + axis] = d2;
            }
            return Placement.ofQuaternion(p[0], p[1], p[2], p[3], p[4], p[5], p[6], p[7], p[8],
                    1, 0, 0, 0, 0, 0, 0, 0, 0, 0);
        }

        @Override
        public void at(double t, double[] target, int offset) {
            checkTime(t);
            checkTarget(target, offset);
            writeTranslation(0, 0, 0, 0, 0, 0, 0, 0, 0, target, offset);
            int degree = c.length / 3 - 1;
            // same Horner recurrences as at(t), written straight into the target
            for (int axis = 0; axis < 3; axis++) {
                double value = c[3 * degree + axis];
                double d1 = 0;
                double d2 = 0;
                for (int k = degree - 1; k >= 0; k--) {
                    d2 = d2 * t + 2 * d1;
                    d1 = d1 * t + value;
                    value = value * t + c[3 * k + axis];
                }
                if (!Double.isFinite(value + d1 + d2)) {
                    throw new IllegalArgumentException("translation overflows at t = " + t
                            + ": position, velocity and acceleration must stay finite");
                }
                target[offset + axis] = value;
                target[offset + 3 + axis] = d1;
                target[offset + 6 + axis] = d2;
            }
        }

        @Override
        public boolean equals(Object other) {
            return other instanceof Polynomial && Arrays.equals(c, ((Polynomial) other).c);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(c);
        }

        @Override
        public String toString() {
            StringBuilder b = new StringBuilder("translation o(t) =");
            for (int k = 0; k < c.length / 3; k++) {
                b.append(k == 0 ? " " : " + ").append(Formats.vector(c[3 * k], c[3 * k + 1], c[3 * k + 2],
                        k == 0 ? "m" : "m/s^" + k)).append(k == 0 ? "" : " t^" + k);
            }
            return b.toString();
        }
    }
}
