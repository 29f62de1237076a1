package dev.noninertial.frames.dispersion;

import java.io.Serializable;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;

/**
 * The ellipse that holds a given probability of a bivariate normal distribution fitted to two
 * outcomes (their sample mean and covariance): the points whose Mahalanobis distance from the
 * mean is at most {@code k = sqrt(-2 ln(1 - P))} (REFERENCES.md, Statistics of dispersion;
 * {@code k = 2.4477} at 95 %).
 *
 * <p>Axes: {@code x} and {@code y} are the two outcomes in the order given to
 * {@link DispersionResult#ellipse(String, String, double)}. {@code orientation} is the angle of
 * the major axis from the +x axis toward the +y axis (radians, in (-pi/2, pi/2]); with x east and
 * y north it is measured counter-clockwise from east. The semi-axes are {@code k} times the
 * square roots of the covariance's eigenvalues.
 *
 * <p>The probability holds for normally distributed outcomes; for others the ellipse is a
 * summary of the covariance, and {@link DispersionResult#fractionInside(ConfidenceEllipse)} tells
 * how many cases it actually holds.
 *
 * @param xName name of the outcome along x
 * @param yName name of the outcome along y
 * @param centreX mean of x
 * @param centreY mean of y
 * @param semiMajor semi-major axis (units of the outcomes)
 * @param semiMinor semi-minor axis (units of the outcomes)
 * @param orientation angle of the major axis from +x toward +y (rad)
 * @param probability probability held, in (0, 1)
 * @param covXX variance of x
 * @param covXY covariance of x and y
 * @param covYY variance of y
 */
public record ConfidenceEllipse(String xName, String yName, double centreX, double centreY,
        double semiMajor, double semiMinor, double orientation, double probability,
        double covXX, double covXY, double covYY) implements Serializable {

    /** Most points {@link #boundary(int)} makes (a plotting outline; more is refused, not truncated). */
    public static final int MAX_BOUNDARY_POINTS = 1_000_000;

    /**
     * Checks the components (also on deserialization, which runs this constructor): names
     * present, centre and covariance finite, variances and semi-axes non-negative and finite,
     * probability in (0, 1).
     *
     * @param xName name of the outcome along x
     * @param yName name of the outcome along y
     * @param centreX mean of x
     * @param centreY mean of y
     * @param semiMajor semi-major axis (units of the outcomes)
     * @param semiMinor semi-minor axis (units of the outcomes)
     * @param orientation angle of the major axis from +x toward +y (rad)
     * @param probability probability held, in (0, 1)
     * @param covXX variance of x
     * @param covXY covariance of x and y
     * @param covYY variance of y
     * @throws NullPointerException if a name is null
     * @throws IllegalArgumentException if a number is out of range
     */
    public ConfidenceEllipse {
        Arguments.nonNull("xName", xName);
        Arguments.nonNull("yName", yName);
        Arguments.finite("centreX", centreX);
        Arguments.finite("centreY", centreY);
        Arguments.inRange("semiMajor", semiMajor, 0.0, Double.MAX_VALUE);
        Arguments.inRange("semiMinor", semiMinor, 0.0, Double.MAX_VALUE);
        Arguments.finite("orientation", orientation);
        if (!(probability > 0.0 && probability < 1.0)) {
            throw new IllegalArgumentException("probability must be in (0, 1), got " + probability);
        }
        Arguments.inRange("covXX", covXX, 0.0, Double.MAX_VALUE);
        Arguments.finite("covXY", covXY);
        Arguments.inRange("covYY", covYY, 0.0, Double.MAX_VALUE);
    }

    /**
     * The Mahalanobis radius of the ellipse holding probability {@code P} of a bivariate normal:
     * {@code sqrt(-2 ln(1 - P))} (the chi-square distribution with two degrees of freedom).
     *
     * @param probability probability in (0, 1)
     * @return the radius (dimensionless)
     * @throws IllegalArgumentException if {@code probability} is not inside (0, 1)
     */
    public static double mahalanobisRadius(double probability) {
        if (!(probability > 0.0 && probability < 1.0)) {
            throw new IllegalArgumentException("probability must be in (0, 1), got " + probability);
        }
        return Math.sqrt(-2.0 * Math.log1p(-probability));
    }

    /**
     * An ellipse from a mean and a 2x2 covariance.
     *
     * @param xName name of the x outcome
     * @param yName name of the y outcome
     * @param centreX mean of x
     * @param centreY mean of y
     * @param covXX variance of x, {@code >= 0}
     * @param covXY covariance of x and y
     * @param covYY variance of y, {@code >= 0}
     * @param probability probability in (0, 1)
     * @return the ellipse
     * @throws IllegalArgumentException if an argument is out of range
     */
    public static ConfidenceEllipse of(String xName, String yName, double centreX, double centreY,
            double covXX, double covXY, double covYY, double probability) {
        Arguments.finite("centreX", centreX);
        Arguments.finite("centreY", centreY);
        Arguments.inRange("covXX", covXX, 0.0, Double.MAX_VALUE);
        Arguments.inRange("covYY", covYY, 0.0, Double.MAX_VALUE);
        Arguments.finite("covXY", covXY);
        double k = mahalanobisRadius(probability);
        double half = 0.5 * (covXX + covYY);
        double spread = Math.hypot(0.5 * (covXX - covYY), covXY);
        double large = half + spread;
        double small = Math.max(0.0, half - spread);   // rounding can make a singular one slightly negative
        double angle = 0.5 * Math.atan2(2.0 * covXY, covXX - covYY);
        return new ConfidenceEllipse(xName, yName, centreX, centreY, k * Math.sqrt(large), k * Math.sqrt(small),
                angle, probability, covXX, covXY, covYY);
    }

    /**
     * The Mahalanobis radius of this ellipse, {@code sqrt(-2 ln(1 - probability))}.
     *
     * @return the radius
     */
    public double radius() {
        return mahalanobisRadius(probability);
    }

    /**
     * Whether a point lies inside or on the ellipse (Mahalanobis distance from the centre at most
     * {@link #radius()}).
     *
     * @param x the x value
     * @param y the y value
     * @return true if inside or on the boundary
     */
    public boolean contains(double x, double y) {
        double dx = x - centreX;
        double dy = y - centreY;
        double det = covXX * covYY - covXY * covXY;
        double k = radius();
        return (covYY * dx * dx - 2.0 * covXY * dx * dy + covXX * dy * dy) <= k * k * det;
    }

    /**
     * Points on the boundary, for plotting: {@code count} points evenly spaced in the ellipse's
     * parametric angle, starting on the major axis.
     *
     * @param count number of points, in [3, {@link #MAX_BOUNDARY_POINTS}]
     * @return array {@code [count][2]} of (x, y)
     * @throws IllegalArgumentException if {@code count} is outside [3, {@link #MAX_BOUNDARY_POINTS}]
     */
    public double[][] boundary(int count) {
        if (count < 3 || count > MAX_BOUNDARY_POINTS) {
            throw new IllegalArgumentException("count must be in [3, " + MAX_BOUNDARY_POINTS + "], got " + count);
        }
        double c = Math.cos(orientation);
        double s = Math.sin(orientation);
        double[][] points = new double[count][2];
        for (int i = 0; i < count; i++) {
            double t = 2.0 * Math.PI * i / count;
            double u = semiMajor * Math.cos(t);
            double v = semiMinor * Math.sin(t);
            points[i][0] = centreX + c * u - s * v;
            points[i][1] = centreY + s * u + c * v;
        }
        return points;
    }

    @Override
    public String toString() {
        return "ConfidenceEllipse[" + Formats.number(100.0 * probability) + " % of (" + xName + ", " + yName
                + "): centre (" + Formats.number(centreX) + ", " + Formats.number(centreY) + "), semi-axes "
                + Formats.number(semiMajor) + " x " + Formats.number(semiMinor) + ", major axis at "
                + Formats.number(Math.toDegrees(orientation)) + " deg from +" + xName + " toward +" + yName + "]";
    }
}
