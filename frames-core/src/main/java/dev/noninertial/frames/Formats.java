package dev.noninertial.frames;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Human-readable text for quantities with units, shared by every {@code toString} of the library
 * so that all values print the same way: components with six significant digits and the unit.
 *
 * <p>Thread-safe: stateless.
 */
public final class Formats {

    private Formats() {
    }

    /**
     * Formats a vector with its unit, for example {@code (1.00000, 0.00000, -9.80665) m/s^2}.
     *
     * @param v the vector
     * @param unit unit text appended after the components
     * @return readable text
     */
    public static String vector(Vector3D v, String unit) {
        return vector(v.getX(), v.getY(), v.getZ(), unit);
    }

    /**
     * Formats three components with their unit.
     *
     * @param x first component
     * @param y second component
     * @param z third component
     * @param unit unit text appended after the components
     * @return readable text
     */
    public static String vector(double x, double y, double z, String unit) {
        return "(" + number(x) + ", " + number(y) + ", " + number(z) + ") " + unit;
    }

    /**
     * Formats one number with six significant digits (no unit).
     *
     * @param value the number
     * @return readable text
     */
    public static String number(double value) {
        if (value == 0.0) {
            return "0";
        }
        double magnitude = Math.abs(value);
        if (magnitude >= 1e-3 && magnitude < 1e7) {
            return stripZeros(String.format(Locale.ROOT, "%.6g", value));
        }
        return String.format(Locale.ROOT, "%.6e", value);
    }

    private static String stripZeros(String text) {
        if (text.indexOf('.') < 0 || text.indexOf('e') >= 0) {
            return text;
        }
        int end = text.length();
        while (text.charAt(end - 1) == '0') {
            end--;
        }
        if (text.charAt(end - 1) == '.') {
            end--;
        }
        return text.substring(0, end);
    }
}
