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
        Arguments.finite("offset", offset);
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
        Arguments.finite("offset", offset);
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
        Arguments.finite("rate", rate);
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

    /**
     * A turn about a fixed axis through B's origin whose angle follows a profile (rate table,
     * centrifuge arm): angle, rate and angular acceleration are the profile's, so the rates are the
     * derivatives of the angle by construction. Times outside the profile's span are refused.
     *
     * @param axis turning axis in B (any non-zero length)
     * @param profile angle over time (rad, positive by the right-hand rule about {@code axis})
     * @return the motion
     */
    public static Motion turning(Vector3D axis, SpinProfile profile) {
        return new TurningMotion(Arguments.unitAxis("axis", axis), Arguments.nonNull("profile", profile));
    }

    /**
     * Motions one after another in time: {@code motions[0]} before {@code joinTimes[0]},
     * {@code motions[i]} from {@code joinTimes[i - 1]} to {@code joinTimes[i]}, the last one from
     * the last join on (at a join, the later motion). Every motion is evaluated at the same,
     * global time. At each join the two motions must agree in origin, origin velocity,
     * orientation and angular velocity within 1e-9 relative (floor 1 m, 1 m/s, 1 rad/s, and
     * 1e-9 rad for the orientation); accelerations may jump.
     *
     * @param joinTimes switching times (s), finite, strictly increasing, one fewer than the motions
     * @param motions the motions in order, at least two
     * @return the motion
     * @throws IllegalArgumentException if the counts do not match, a time is refused, or a join is
     *         discontinuous (the message names the join, the quantity and both values)
     */
    public static Motion sequence(double[] joinTimes, Motion... motions) {
        Arguments.nonNull("joinTimes", joinTimes);
        Arguments.nonNull("motions", motions);
        if (motions.length < 2 || joinTimes.length != motions.length - 1) {
            throw new IllegalArgumentException("motions must hold at least two motions and joinTimes one fewer, got "
                    + motions.length + " motions and " + joinTimes.length + " join times");
        }
        for (int i = 0; i < motions.length; i++) {
            Arguments.nonNull("motions[" + i + "]", motions[i]);
        }
        for (int i = 0; i < joinTimes.length; i++) {
            Arguments.finite("joinTimes[" + i + "]", joinTimes[i]);
            if (i > 0 && !(joinTimes[i] > joinTimes[i - 1])) {
                throw new IllegalArgumentException("joinTimes must increase strictly: joinTimes[" + i + "] = "
                        + joinTimes[i] + " s after joinTimes[" + (i - 1) + "] = " + joinTimes[i - 1] + " s");
            }
        }
        return new MotionSequence(joinTimes.clone(), motions.clone());
    }

    /** Placement for a turn by angle th about unit axis n, with rate th1 and acceleration th2. */
    static Placement turn(Vector3D n, double th, double th1, double th2) {
        return turn(n, th, th1, th2, null, 0);
    }

    /**
     * A turn by angle {@code th} about the unit axis {@code n} with rate {@code th1} and
     * acceleration {@code th2} (origin at rest at zero), through {@link #place}: a new placement
     * when {@code target} is null, else written into it (and null returned).
     */
    private static Placement turn(Vector3D n, double th, double th1, double th2, double[] target, int offset) {
        double half = 0.5 * th;
        double s = Math.sin(half);
        return place(target, offset, 0, 0, 0, 0, 0, 0, 0, 0, 0,
                Math.cos(half), s * n.getX(), s * n.getY(), s * n.getZ(),
                th1 * n.getX(), th1 * n.getY(), th1 * n.getZ(),
                th2 * n.getX(), th2 * n.getY(), th2 * n.getZ());
    }

    /**
     * The one exit of the motions below, so that {@code at(t)} and {@code at(t, target, offset)}
     * run one evaluation: the placement of
     * {@link Placement#ofQuaternion(double, double, double, double, double, double, double, double,
     * double, double, double, double, double, double, double, double, double, double, double)}
     * when {@code target} is null (returned), else its primitive twin writing into
     * {@code target[offset, offset + 24)} (null returned); the same bits either way.
     */
    private static Placement place(double[] target, int offset, double ox, double oy, double oz, double ovx,
                                   double ovy, double ovz, double oax, double oay, double oaz, double q0,
                                   double q1, double q2, double q3, double wx, double wy, double wz, double alx,
                                   double aly, double alz) {
        if (target == null) {
            return Placement.ofQuaternion(ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz, q0, q1, q2, q3, wx, wy, wz,
                    alx, aly, alz);
        }
        Placement.ofQuaternion(ox, oy, oz, ovx, ovy, ovz, oax, oay, oaz, q0, q1, q2, q3, wx, wy, wz, alx, aly,
                alz, target, offset);
        return null;
    }

    private static void checkTime(double t) {
        if (!Double.isFinite(t)) {
            throw new IllegalArgumentException("t must be finite, got " + t);
        }
    }

    /**
     * Re-checks the parameters of a motion record: records of this class are also built by
     * deserialization, through their canonical constructor, so a stream meets the checks of the
     * factories.
     */
    private static void checkUnitAxis(String name, Vector3D axis) {
        Arguments.finite(name, axis);
        double norm = axis.getNorm();
        if (!(Math.abs(norm - 1.0) <= 1e-12)) {
            throw new IllegalArgumentException(name + " must be a unit vector (within 1e-12), got norm " + norm);
        }
    }

    /** Checks the parameters shared by the oscillating motions. */
    private static void checkOscillation(double amplitude, double angularFrequency, double phase) {
        Arguments.finite("amplitude", amplitude);
        Arguments.finite("angularFrequency", angularFrequency);
        Arguments.finite("phase", phase);
    }

    /**
     * A motion of this class evaluated once for both {@code at} methods: {@link #place} returns a
     * new placement when {@code target} is null, else writes it there (see {@link Motions#place}),
     * so the object and the primitive path have the same bits by construction.
     */
    private interface Evaluated extends Motion {
        @Override
        default Placement at(double t) {
            checkTime(t);
            return place(t, null, 0);
        }

        @Override
        default void at(double t, double[] target, int offset) {
            checkTime(t);
            place(t, Arguments.nonNull("target", target), offset);
        }

        /**
         * The placement at a finite time {@code t}: returned when {@code target} is null, else
         * written into {@code target[offset, offset + 24)} and null returned.
         *
         * @param t time (s), finite
         * @param target destination array, or null for a new placement
         * @param offset index where o's x component is written
         * @return the placement, or null when written into {@code target}
         */
        Placement place(double t, double[] target, int offset);
    }

    private record Fixed(Placement placement) implements Motion, Serializable {
        Fixed {
            Arguments.nonNull("placement", placement);
        }

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
            implements Evaluated, Serializable {
        Spin {
            checkUnitAxis("axis", axis);
            Arguments.finite("angleAtZero", angleAtZero);
            Arguments.finite("rateAtZero", rateAtZero);
            Arguments.finite("angularAcceleration", angularAcceleration);
        }

        @Override
        public Placement place(double t, double[] target, int offset) {
            double angle = angleAtZero + t * (rateAtZero + 0.5 * angularAcceleration * t);
            if (!Double.isFinite(angle)) {
                throw new IllegalArgumentException("spin angle overflows at t = " + t + ": it must stay finite");
            }
            return turn(axis, angle, rateAtZero + angularAcceleration * t, angularAcceleration, target, offset);
        }

        @Override
        public String toString() {
            return "spin about " + Formats.vector(axis, "") + "angle(0)=" + Formats.number(angleAtZero)
                    + " rad, rate(0)=" + Formats.number(rateAtZero) + " rad/s, acceleration="
                    + Formats.number(angularAcceleration) + " rad/s^2";
        }
    }

    private record AngleOscillation(Vector3D axis, double amplitude, double angularFrequency, double phase)
            implements Evaluated, Serializable {
        AngleOscillation {
            checkUnitAxis("axis", axis);
            checkOscillation(amplitude, angularFrequency, phase);
        }

        @Override
        public Placement place(double t, double[] target, int offset) {
            double arg = angularFrequency * t + phase;
            double s = Math.sin(arg);
            double c = Math.cos(arg);
            return turn(axis, amplitude * s, amplitude * angularFrequency * c,
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
            implements Evaluated, Serializable {
        Heave {
            checkUnitAxis("direction", direction);
            checkOscillation(amplitude, angularFrequency, phase);
        }

        @Override
        public Placement place(double t, double[] target, int offset) {
            double arg = angularFrequency * t + phase;
            double p = amplitude * Math.sin(arg);
            double v = amplitude * angularFrequency * Math.cos(arg);
            double a = -angularFrequency * angularFrequency * p;
            double dx = direction.getX();
            double dy = direction.getY();
            double dz = direction.getZ();
            return Motions.place(target, offset, p * dx, p * dy, p * dz, v * dx, v * dy, v * dz, a * dx, a * dy,
                    a * dz, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0);
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

        /**
         * Re-checks the coefficients read from a stream as {@link Motions#translation} does.
         *
         * @param in the stream
         * @throws java.io.IOException if the stream fails or the coefficients are refused
         * @throws ClassNotFoundException if a class of the stream is missing
         */
        private void readObject(java.io.ObjectInputStream in) throws java.io.IOException, ClassNotFoundException {
            in.defaultReadObject();
            try {
                Arguments.nonNull("coefficients", c);
                if (c.length == 0 || c.length % 3 != 0) {
                    throw new IllegalArgumentException("coefficients must hold whole vectors, got " + c.length
                            + " values");
                }
                for (int k = 0; k < c.length; k++) {
                    Arguments.finite("coefficients[" + k / 3 + "]", c[k]);
                }
            } catch (IllegalArgumentException | NullPointerException e) {
                throw Arguments.refusedStream(Polynomial.class, e);
            }
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
            Arguments.fromIndexSize("target", target, "offset", offset, Placement.COMPONENTS);
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
            // the origin terms are in place: add the identity orientation and zero rates
            double[] o = target;
            int k = offset;
            Placement.ofQuaternion(o[k], o[k + 1], o[k + 2], o[k + 3], o[k + 4], o[k + 5], o[k + 6], o[k + 7],
                    o[k + 8], 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, target, offset);
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
