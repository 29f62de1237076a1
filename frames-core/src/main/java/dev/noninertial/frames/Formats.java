package dev.noninertial.frames;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Human-readable text for quantities with units, shared by every {@code toString} of the library
 * so that all values print the same way: each number with six significant digits and trailing
 * zeros dropped when its magnitude is in [1e-3, 1e7), in exponent form with six decimals
 * otherwise, zero as {@code 0}, then the unit.
 *
 * <p>Thread-safe: stateless.
 */
public final class Formats {

    private Formats() {
    }

    /**
     * Formats a vector with its unit: {@code vector(new Vector3D(1, 0, -9.80665), "m/s^2")} gives
     * {@code (1, 0, -9.80665) m/s^2}, {@code vector(new Vector3D(0.5, 1234.5678, 2e-5), "m")} gives
     * {@code (0.5, 1234.57, 2.000000e-05) m}.
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
     * Formats one number (no unit): six significant digits with trailing zeros dropped for
     * magnitudes in [1e-3, 1e7) ({@code 1234.5678} gives {@code 1234.57}, {@code 1.0} gives
     * {@code 1}), exponent form with six decimals otherwise ({@code 2e-5} gives
     * {@code 2.000000e-05}), {@code 0} for zero.
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
