package dev.noninertial.examples.chart;

import java.util.Arrays;
import java.util.Objects;

import dev.noninertial.frames.Arguments;

/**
 * One labelled curve of a {@link CurveSheet}: a polyline through points {@code (x[i], y[i])} in the
 * units of the sheet's axes.
 *
 * <p>Immutable and thread-safe: the arrays are copied on the way in and on the way out.
 */
public final class Curve {

    private final String label;
    private final double[] x;
    private final double[] y;
    private final boolean markers;

    private Curve(String label, double[] x, double[] y, boolean markers) {
        this.label = label;
        this.x = x;
        this.y = y;
        this.markers = markers;
    }

    /**
     * Points drawn as small dots, not joined (a scatter, for example landing points of a
     * dispersion study); same checks as {@link #of(String, double[], double[])}.
     *
     * @param label legend text, not blank
     * @param x abscissas in the unit of the sheet's horizontal axis, finite, at least two
     * @param y ordinates in the unit of the sheet's vertical axis, finite, as many as {@code x}
     * @return the point set
     * @throws IllegalArgumentException as {@link #of(String, double[], double[])}
     */
    public static Curve points(String label, double[] x, double[] y) {
        Curve c = of(label, x, y);
        return new Curve(c.label, c.x, c.y, true);
    }

    /** @return true if drawn as separate dots, false for a polyline */
    public boolean markers() {
        return markers;
    }

    /**
     * A curve through the given points.
     *
     * @param label legend text, not blank
     * @param x abscissas in the unit of the sheet's horizontal axis, finite, at least two
     * @param y ordinates in the unit of the sheet's vertical axis, finite, as many as {@code x}
     * @return the curve
     * @throws IllegalArgumentException if the label is blank, the arrays differ in length, hold
     *         fewer than two points, or a value is NaN or infinite
     */
    public static Curve of(String label, double[] x, double[] y) {
        Arguments.nonNull("label", label);
        Arguments.nonNull("x", x);
        Arguments.nonNull("y", y);
        if (label.isBlank()) {
            throw new IllegalArgumentException("label must not be blank");
        }
        if (x.length != y.length) {
            throw new IllegalArgumentException("x and y must have the same length, got " + x.length
                    + " and " + y.length);
        }
        if (x.length < 2) {
            throw new IllegalArgumentException("a curve needs at least 2 points, got " + x.length);
        }
        for (int i = 0; i < x.length; i++) {
            Arguments.finite("x[" + i + "]", x[i]);
            Arguments.finite("y[" + i + "]", y[i]);
        }
        return new Curve(label, x.clone(), y.clone(), false);
    }

    /** @return the legend text */
    public String label() {
        return label;
    }

    /** @return a copy of the abscissas */
    public double[] x() {
        return x.clone();
    }

    /** @return a copy of the ordinates */
    public double[] y() {
        return y.clone();
    }

    /** @return the number of points */
    public int size() {
        return x.length;
    }

    double xAt(int i) {
        return x[i];
    }

    double yAt(int i) {
        return y[i];
    }

    @Override
    public boolean equals(Object other) {
        if (this == other) {
            return true;
        }
        if (!(other instanceof Curve)) {
            return false;
        }
        Curve c = (Curve) other;
        return label.equals(c.label) && markers == c.markers && Arrays.equals(x, c.x) && Arrays.equals(y, c.y);
    }

    @Override
    public int hashCode() {
        return Objects.hash(label, Arrays.hashCode(x), Arrays.hashCode(y));
    }

    @Override
    public String toString() {
        return "Curve{" + label + ", " + x.length + " points}";
    }
}
