package dev.noninertial.frames;

import java.io.InvalidObjectException;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Refuses bad input early, with a message that names the argument, the value and the allowed range.
 *
 * <p>Every public entry point of the library validates its arguments through this class so that
 * messages read the same everywhere. Nothing is ever clamped or silently repaired.
 *
 * <p>Thread-safe: stateless.
 */
public final class Arguments {

    private Arguments() {
    }

    /**
     * Refuses a null reference.
     *
     * @param name argument name used in the message
     * @param value the value to check
     * @param <T> type of the value
     * @return {@code value}, for chaining
     * @throws NullPointerException if {@code value} is null
     */
    public static <T> T nonNull(String name, T value) {
        if (value == null) {
            throw new NullPointerException(name + " must not be null");
        }
        return value;
    }

    /**
     * Refuses NaN and infinite values.
     *
     * @param name argument name used in the message
     * @param value the value to check
     * @return {@code value}
     * @throws IllegalArgumentException if {@code value} is not finite
     */
    public static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, got " + value);
        }
        return value;
    }

    /**
     * Refuses null vectors and vectors with a NaN or infinite component.
     *
     * @param name argument name used in the message
     * @param value the vector to check
     * @return {@code value}
     * @throws NullPointerException if {@code value} is null
     * @throws IllegalArgumentException if a component is not finite
     */
    public static Vector3D finite(String name, Vector3D value) {
        nonNull(name, value);
        if (!Double.isFinite(value.getX()) || !Double.isFinite(value.getY()) || !Double.isFinite(value.getZ())) {
            throw new IllegalArgumentException(name + " must have finite components, got " + vector(value));
        }
        return value;
    }

    /**
     * Refuses a null rotation and one whose quaternion is not finite or not unit within
     * {@link Orientations#UNIT_QUATERNION_TOLERANCE}: a Hipparchus {@link Rotation} built with
     * {@code needsNormalization} false holds its four numbers as given, NaN and non-unit ones
     * included. Every public entry point taking a {@link Rotation} checks it here, under the
     * parameter's name.
     *
     * @param name argument name used in the message
     * @param value the rotation to check
     * @return {@code value}
     * @throws NullPointerException if {@code value} is null
     * @throws IllegalArgumentException if a quaternion component is not finite or its norm
     *         differs from 1 by more than {@link Orientations#UNIT_QUATERNION_TOLERANCE}
     */
    public static Rotation unitRotation(String name, Rotation value) {
        nonNull(name, value);
        unitQuaternion(name, value.getQ0(), value.getQ1(), value.getQ2(), value.getQ3());
        return value;
    }

    /**
     * Refuses a quaternion that is not finite or whose norm differs from 1 by more than
     * {@link Orientations#UNIT_QUATERNION_TOLERANCE}: the one unit-quaternion check of the library
     * (rotations, the quaternion factories of {@code Placement} and {@code Orientations}). The
     * message names {@code name}, the four components and the norm, and the first component that
     * alone rules the quaternion out (not finite, or outside [-1, 1]).
     *
     * @param name argument name used in the message
     * @param q0 scalar part
     * @param q1 vector part x
     * @param q2 vector part y
     * @param q3 vector part z
     * @return the norm
     * @throws IllegalArgumentException if a component is not finite or the norm is not 1 within the tolerance
     */
    public static double unitQuaternion(String name, double q0, double q1, double q2, double q3) {
        double norm = Math.sqrt(q0 * q0 + q1 * q1 + q2 * q2 + q3 * q3);
        if (Math.abs(norm - 1.0) <= Orientations.UNIT_QUATERNION_TOLERANCE) {
            return norm;
        }
        double[] values = {q0, q1, q2, q3};
        String culprit = "";
        for (int k = 0; k < 4 && culprit.isEmpty(); k++) {
            if (!Double.isFinite(values[k])) {
                culprit = "; q" + k + " = " + values[k] + " is not finite";
            } else if (!(Math.abs(values[k]) <= 1.0 + Orientations.UNIT_QUATERNION_TOLERANCE)) {
                culprit = "; q" + k + " = " + values[k] + " is outside [-1, 1] on its own";
            }
        }
        throw new IllegalArgumentException(name + " must be a finite quaternion of unit norm (|norm - 1| <= "
                + Orientations.UNIT_QUATERNION_TOLERANCE + "), got (" + q0 + ", " + q1 + ", " + q2 + ", " + q3
                + ") with norm " + norm + culprit);
    }

    /**
     * Refuses a value outside a closed interval (NaN is refused too).
     *
     * @param name argument name used in the message
     * @param value the value to check
     * @param min smallest allowed value
     * @param max largest allowed value
     * @return {@code value}
     * @throws IllegalArgumentException if {@code value} is outside [min, max] or NaN
     */
    public static double inRange(String name, double value, double min, double max) {
        if (!(value >= min && value <= max)) {
            throw new IllegalArgumentException(
                    name + " must be in [" + min + ", " + max + "], got " + value);
        }
        return value;
    }

    /**
     * Refuses values that are not strictly positive and finite.
     *
     * @param name argument name used in the message
     * @param value the value to check
     * @return {@code value}
     * @throws IllegalArgumentException if {@code value} is not in (0, +inf)
     */
    public static double positive(String name, double value) {
        if (!(value > 0.0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, got " + value);
        }
        return value;
    }

    /**
     * Returns the unit vector along a non-zero, finite axis. Any non-zero finite length works,
     * from subnormal to the largest double: the result has norm 1 within 2 ulps.
     *
     * @param name argument name used in the message
     * @param axis the axis to check
     * @return the normalized axis
     * @throws IllegalArgumentException if the axis has zero length or non-finite components
     */
    public static Vector3D unitAxis(String name, Vector3D axis) {
        finite(name, axis);
        double x = axis.getX();
        double y = axis.getY();
        double z = axis.getZ();
        double largest = Math.max(Math.abs(x), Math.max(Math.abs(y), Math.abs(z)));
        if (largest == 0.0) {
            throw new IllegalArgumentException(
                    name + " must be a non-zero axis (length > 0), got " + vector(axis));
        }
        if (largest >= 0x1p-450 && largest <= 0x1p450) {
            // the squares neither overflow nor underflow: the plain formula (bits as before)
            return axis.scalarMultiply(1.0 / axis.getNorm());
        }
        // scale by a power of two (exact) so that the largest component is in [1, 2): the squares
        // can then neither overflow (huge axes) nor lose bits to underflow (tiny axes)
        double scale = Math.scalb(1.0, -Math.getExponent(largest));
        x *= scale;
        y *= scale;
        z *= scale;
        double norm = Math.sqrt(x * x + y * y + z * z);
        return new Vector3D(x / norm, y / norm, z / norm);
    }

    /**
     * Refuses a range of {@code size} doubles from {@code offset} that does not fit an array, as
     * {@link java.util.Objects#checkFromIndexSize(int, int, int)} does, but overflow-safe in the
     * message too and throwing {@link IllegalArgumentException} that names the offset argument.
     *
     * @param arrayName name of the array argument
     * @param array the array
     * @param offsetName name of the offset argument
     * @param offset index of the first element of the range
     * @param size number of elements of the range, at least 0
     * @throws NullPointerException if {@code array} is null
     * @throws IllegalArgumentException if {@code size} is negative (naming the size), the array is
     *         shorter than {@code size} (naming the array: no offset could fit), or the range does
     *         not fit from the offset (naming the offset)
     */
    public static void fromIndexSize(String arrayName, double[] array, String offsetName, int offset, int size) {
        nonNull(arrayName, array);
        if (size < 0) {
            throw new IllegalArgumentException("size must be at least 0 for a range of " + arrayName + " from "
                    + offsetName + " " + offset + ", got " + size);
        }
        if (size > array.length) {
            throw new IllegalArgumentException(arrayName + " must have length at least " + size + " for " + size
                    + " values (from " + offsetName + " " + offset + "), got length " + array.length);
        }
        if (offset < 0 || offset > array.length - size) {
            throw new IllegalArgumentException(offsetName + " must be in [0, " + ((long) array.length - size)
                    + "] for " + size + " values in " + arrayName + " of length " + array.length + ", got "
                    + offset);
        }
    }

    /**
     * Refuses a range of {@code count} items of {@code stride} doubles each from {@code offset}
     * that does not fit an array, blaming the right argument: the count when no offset could
     * hold that many items (or it is negative), the offset otherwise. Overflow-safe: the span is
     * computed in {@code long}.
     *
     * @param arrayName name of the array argument
     * @param array the array
     * @param offsetName name of the offset argument
     * @param offset index of the first element of the range
     * @param countName name of the count argument
     * @param count number of items
     * @param stride doubles per item, positive
     * @throws NullPointerException if {@code array} is null
     * @throws IllegalArgumentException if the count is negative or too large for the array, or the
     *         range does not fit from the offset
     */
    public static void fromIndexSize(String arrayName, double[] array, String offsetName, int offset,
                                     String countName, int count, int stride) {
        nonNull(arrayName, array);
        long span = (long) count * stride;
        if (count < 0 || span > array.length) {
            throw new IllegalArgumentException(countName + " must be in [0, " + array.length / stride + "] for "
                    + arrayName + " of length " + array.length + " (" + stride + (stride == 1 ? " value" : " values")
                    + " per item, from " + offsetName + " " + offset + "), got " + count);
        }
        fromIndexSize(arrayName, array, offsetName, offset, (int) span);
    }

    /**
     * The exception a {@code readObject} or {@code readResolve} throws when the value read from a
     * stream fails the checks its factory makes: every serializable type of the library re-runs
     * those checks on reading, since a stream is untrusted input.
     *
     * @param type the type being read, named in the message
     * @param cause the refusal of the factory checks
     * @return an {@link InvalidObjectException} naming the type, with the refusal's message and
     *         the refusal as its cause
     */
    public static InvalidObjectException refusedStream(Class<?> type, RuntimeException cause) {
        nonNull("type", type);
        nonNull("cause", cause);
        InvalidObjectException failure = new InvalidObjectException(
                "corrupt " + type.getSimpleName() + " in the stream: " + cause.getMessage());
        failure.initCause(cause);
        return failure;
    }

    private static String vector(Vector3D v) {
        return String.format(Locale.ROOT, "(%s, %s, %s)", v.getX(), v.getY(), v.getZ());
    }
}
