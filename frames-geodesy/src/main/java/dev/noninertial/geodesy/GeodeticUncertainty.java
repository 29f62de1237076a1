package dev.noninertial.geodesy;

import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Arrays;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.uncertainty.CovarianceCheck;

/**
 * A geodetic position with the covariance of its error in geodetic coordinates, tagged with its
 * ellipsoid, and its conversions to and from Earth-fixed Cartesian and local-level covariances.
 *
 * <h2>Conventions</h2>
 * The covariance is over (latitude (rad), longitude (rad), height (m)), so its units are rad^2,
 * rad m and m^2. Earth-fixed covariances are over (x, y, z) in ECEF axes (m^2). Local-level
 * covariances are over the position error resolved in the local-level axes at {@link #position()}
 * ({@link LocalAxes#ENU} or {@link LocalAxes#NED}, as in
 * {@link Ellipsoid#localOrientation(LatLonHeight, LocalAxes)}), in m^2. The conversions use the
 * Jacobians of {@link GeodeticJacobians}: exact for the local-level and Earth-fixed directions
 * (they differ by a rotation), first order between Earth-fixed and geodetic coordinates (the
 * neglected terms are of relative size sigma / (RM + h), about 1e-6 for a 6 m error). Outputs are
 * symmetrised. For the full position-velocity state between frames (a local-level frame at
 * another site, a moving platform) use {@code dev.noninertial.frames.uncertainty.UncertainState}
 * with the frames of {@link EarthFrames}.
 *
 * <p>For navigation, surveying or safety-relevant positioning, validate results against the
 * applicable standards and licensed practice.
 *
 * <p>Immutable and thread-safe.
 */
public final class GeodeticUncertainty implements Serializable {

    private static final long serialVersionUID = 1L;

    /** The ellipsoid the coordinates refer to. */
    private final Ellipsoid ellipsoid;
    /** The mean position. */
    private final LatLonHeight position;
    /** Covariance of (lat, lon, h), 3x3. */
    private final double[][] covariance;

    private GeodeticUncertainty(Ellipsoid ellipsoid, LatLonHeight position, double[][] covariance) {
        this.ellipsoid = ellipsoid;
        this.position = position;
        this.covariance = covariance;
    }

    /**
     * A geodetic position with a covariance in geodetic coordinates.
     *
     * @param ellipsoid the ellipsoid
     * @param position mean position
     * @param covariance 3x3 covariance of (lat (rad), lon (rad), h (m))
     * @return the uncertain position
     * @throws IllegalArgumentException if the covariance is refused by {@link CovarianceCheck}
     */
    public static GeodeticUncertainty of(Ellipsoid ellipsoid, LatLonHeight position, RealMatrix covariance) {
        Arguments.nonNull("ellipsoid", ellipsoid);
        Arguments.nonNull("position", position);
        CovarianceCheck.check("covariance", covariance, 3);
        return new GeodeticUncertainty(ellipsoid, position, symmetric(covariance.getData()));
    }

    /**
     * From an Earth-fixed position and its ECEF covariance.
     *
     * @param ellipsoid the ellipsoid
     * @param position Earth-fixed position (m)
     * @param earthFixedCovariance 3x3 covariance of (x, y, z) in ECEF axes (m^2)
     * @return the uncertain geodetic position
     * @throws IllegalArgumentException if the covariance is refused, or the point is inside the
     *         meridian evolute or on the polar axis (see {@link GeodeticJacobians})
     */
    public static GeodeticUncertainty fromEarthFixed(Ellipsoid ellipsoid, Vector3D position,
                                                     RealMatrix earthFixedCovariance) {
        Arguments.nonNull("ellipsoid", ellipsoid);
        CovarianceCheck.check("earthFixedCovariance", earthFixedCovariance, 3);
        LatLonHeight geodetic = ellipsoid.toGeodetic(position);
        RealMatrix j = GeodeticJacobians.toGeodetic(ellipsoid, geodetic);
        return new GeodeticUncertainty(ellipsoid, geodetic,
                symmetric(j.multiply(earthFixedCovariance).multiplyTransposed(j).getData()));
    }

    /**
     * From a position and the covariance of its error in the local-level axes there.
     *
     * @param ellipsoid the ellipsoid
     * @param position mean geodetic position, origin of the local-level axes
     * @param axes axis order of {@code localCovariance}
     * @param localCovariance 3x3 covariance in local-level axes (m^2)
     * @return the uncertain geodetic position
     * @throws IllegalArgumentException if the covariance is refused, or the point is inside the
     *         meridian evolute or on the polar axis
     */
    public static GeodeticUncertainty fromLocal(Ellipsoid ellipsoid, LatLonHeight position, LocalAxes axes,
                                                RealMatrix localCovariance) {
        Arguments.nonNull("ellipsoid", ellipsoid);
        Arguments.nonNull("position", position);
        Arguments.nonNull("axes", axes);
        CovarianceCheck.check("localCovariance", localCovariance, 3);
        // d(geodetic)/d(local) = d(geodetic)/dX * dX/d(local) = J_geo L^T
        RealMatrix j = GeodeticJacobians.toGeodetic(ellipsoid, position).multiplyTransposed(local(position, axes));
        return new GeodeticUncertainty(ellipsoid, position,
                symmetric(j.multiply(localCovariance).multiplyTransposed(j).getData()));
    }

    /**
     * Returns the ellipsoid.
     *
     * @return the ellipsoid
     */
    public Ellipsoid ellipsoid() {
        return ellipsoid;
    }

    /**
     * Returns the mean position.
     *
     * @return the mean position
     */
    public LatLonHeight position() {
        return position;
    }

    /**
     * Returns a new copy of the covariance of (lat (rad), lon (rad), h (m)).
     *
     * @return a new copy of the covariance of (lat (rad), lon (rad), h (m))
     */
    public RealMatrix covariance() {
        return MatrixUtils.createRealMatrix(covariance);
    }

    /**
     * Returns the mean position in Earth-fixed Cartesian coordinates (m).
     *
     * @return the mean position in Earth-fixed Cartesian coordinates (m)
     */
    public Vector3D earthFixedPosition() {
        return ellipsoid.toCartesian(position);
    }

    /**
     * The covariance of the Earth-fixed position, {@code J P J^T} with
     * {@link GeodeticJacobians#toCartesian(Ellipsoid, LatLonHeight)}.
     *
     * @return a new 3x3 covariance of (x, y, z), ECEF axes (m^2)
     */
    public RealMatrix earthFixedCovariance() {
        RealMatrix j = GeodeticJacobians.toCartesian(ellipsoid, position);
        return MatrixUtils.createRealMatrix(
                symmetric(j.multiply(MatrixUtils.createRealMatrix(covariance)).multiplyTransposed(j).getData()));
    }

    /**
     * The covariance of the position error resolved in the local-level axes at {@link #position()}.
     * For ENU it is diagonal-scaled from the geodetic one: east = (RN + h) cos lat dlon,
     * north = (RM + h) dlat, up = dh.
     *
     * @param axes axis order
     * @return a new 3x3 covariance in local-level axes (m^2)
     */
    public RealMatrix localCovariance(LocalAxes axes) {
        Arguments.nonNull("axes", axes);
        RealMatrix j = local(position, axes).multiply(GeodeticJacobians.toCartesian(ellipsoid, position));
        return MatrixUtils.createRealMatrix(
                symmetric(j.multiply(MatrixUtils.createRealMatrix(covariance)).multiplyTransposed(j).getData()));
    }

    /**
     * Standard deviations in metres along north, east and up at {@link #position()}.
     *
     * @return {north, east, up} (m)
     */
    public double[] localStandardDeviations() {
        RealMatrix c = localCovariance(LocalAxes.NED);
        return new double[] {Math.sqrt(c.getEntry(0, 0)), Math.sqrt(c.getEntry(1, 1)), Math.sqrt(c.getEntry(2, 2))};
    }

    private static RealMatrix local(LatLonHeight position, LocalAxes axes) {
        return MatrixUtils.createRealMatrix(Ellipsoid.localRows(position.latitude(), position.longitude(), axes));
    }

    /**
     * Reads the fields and re-checks them as {@link #of(Ellipsoid, LatLonHeight, RealMatrix)} does.
     *
     * @param in the stream
     * @throws IOException if the stream fails or holds values the factory refuses
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            Arguments.nonNull("ellipsoid", ellipsoid);
            Arguments.nonNull("position", position);
            Arguments.nonNull("covariance", covariance);
            if (covariance.length != 3) {
                throw new IllegalArgumentException("covariance must be 3x3, got " + covariance.length + " rows");
            }
            for (double[] row : covariance) {
                if (row == null || row.length != 3) {
                    throw new IllegalArgumentException("covariance must be 3x3");
                }
            }
            CovarianceCheck.check("covariance", MatrixUtils.createRealMatrix(covariance), 3);
        } catch (IllegalArgumentException | NullPointerException e) {
            throw Arguments.refusedStream(GeodeticUncertainty.class, e);
        }
    }

    private static double[][] symmetric(double[][] m) {
        for (int i = 0; i < m.length; i++) {
            for (int k = i + 1; k < m.length; k++) {
                double s = 0.5 * (m[i][k] + m[k][i]);
                m[i][k] = s;
                m[k][i] = s;
            }
        }
        return m;
    }

    @Override
    public boolean equals(Object other) {
        if (this == other) {
            return true;
        }
        if (!(other instanceof GeodeticUncertainty)) {
            return false;
        }
        GeodeticUncertainty g = (GeodeticUncertainty) other;
        return ellipsoid.equals(g.ellipsoid) && position.equals(g.position) && Arrays.deepEquals(covariance, g.covariance);
    }

    @Override
    public int hashCode() {
        return (ellipsoid.hashCode() * 31 + position.hashCode()) * 31 + Arrays.deepHashCode(covariance);
    }

    @Override
    public String toString() {
        double[] s = localStandardDeviations();
        return "GeodeticUncertainty{" + position + ", sigma north/east/up=" + Formats.vector(s[0], s[1], s[2], "m")
                + ", " + ellipsoid + "}";
    }
}
