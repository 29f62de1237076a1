package dev.noninertial.geodesy;

import java.io.Serializable;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.Placement;

/**
 * Motion, in the Earth-fixed frame, of a level, north-aligned frame whose origin follows a
 * {@link GeodeticPath}. All rates are analytic: the angular velocity relative to Earth-fixed is
 * the transport rate, ENU {@code (-lat', lon' cos lat, lon' sin lat)}.
 */
final class CarriedLevelMotion implements Motion, Serializable {

    private static final long serialVersionUID = 1L;

    private final Ellipsoid ellipsoid;
    @SuppressWarnings("serial") // the library's paths are serializable, a user's must be too
    private final GeodeticPath path;
    private final LocalAxes axes;

    CarriedLevelMotion(Ellipsoid ellipsoid, GeodeticPath path, LocalAxes axes) {
        this.ellipsoid = ellipsoid;
        this.path = path;
        this.axes = axes;
    }

    /**
     * Re-checks the fields read from a stream as {@link EarthFrames#carriedLevel} does.
     *
     * @param in the stream
     * @throws java.io.IOException if the stream fails or a field is missing
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(java.io.ObjectInputStream in) throws java.io.IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            dev.noninertial.frames.Arguments.nonNull("ellipsoid", ellipsoid);
            dev.noninertial.frames.Arguments.nonNull("path", path);
            dev.noninertial.frames.Arguments.nonNull("axes", axes);
        } catch (NullPointerException e) {
            throw dev.noninertial.frames.Arguments.refusedStream(CarriedLevelMotion.class, e);
        }
    }

    @Override
    public Placement at(double t) {
        PathSample p = path.at(t);
        if (p == null) {
            throw new IllegalStateException("path returned null at t = " + t);
        }
        double lat = p.latitude();
        double lon = p.longitude();
        double h = p.height();
        double dLat = p.latitudeRate();
        double dLon = p.longitudeRate();
        double dH = p.heightRate();
        double e2 = ellipsoid.eccentricitySquared();
        double s = Math.sin(lat);
        double c = Math.cos(lat);
        double w2 = 1.0 - e2 * s * s;
        double n = ellipsoid.semiMajorAxis() / Math.sqrt(w2);
        double m = n * (1.0 - e2) / w2;
        double dN = n * e2 * s * c / w2;          // dRN/dlat
        double dM = 3.0 * m * e2 * s * c / w2;    // dRM/dlat
        // velocity in ENU
        double ve = (n + h) * c * dLon;
        double vn = (m + h) * dLat;
        double vu = dH;
        // transport rate and its derivative, ENU
        double wE = -dLat;
        double wN = dLon * c;
        double wU = dLon * s;
        double aE = -p.latitudeAcceleration();
        double aN = p.longitudeAcceleration() * c - dLon * s * dLat;
        double aU = p.longitudeAcceleration() * s + dLon * c * dLat;
        // acceleration seen from Earth-fixed, ENU components: d(v_L)/dt + w x v_L
        double dve = (dN * dLat + dH) * c * dLon - (n + h) * s * dLat * dLon + (n + h) * c * p.longitudeAcceleration();
        double dvn = (dM * dLat + dH) * dLat + (m + h) * p.latitudeAcceleration();
        double dvu = p.heightAcceleration();
        double accE = dve + (wN * vu - wU * vn);
        double accN = dvn + (wU * ve - wE * vu);
        double accU = dvu + (wE * vn - wN * ve);

        double[][] enu = Ellipsoid.localRows(lat, lon, LocalAxes.ENU);
        Vector3D origin = ellipsoid.toCartesian(p.position());
        Vector3D velocity = toEcef(enu, ve, vn, vu);
        Vector3D acceleration = toEcef(enu, accE, accN, accU);
        double[][] rows = axes == LocalAxes.ENU ? enu : Ellipsoid.localRows(lat, lon, LocalAxes.NED);
        Vector3D w = axes == LocalAxes.ENU ? new Vector3D(wE, wN, wU) : new Vector3D(wN, wE, -wU);
        Vector3D al = axes == LocalAxes.ENU ? new Vector3D(aE, aN, aU) : new Vector3D(aN, aE, -aU);
        return Placement.of(origin, velocity, acceleration, Orientations.fromMatrix(rows), w, al);
    }

    private static Vector3D toEcef(double[][] enu, double e, double n, double u) {
        return new Vector3D(enu[0][0] * e + enu[1][0] * n + enu[2][0] * u,
                enu[0][1] * e + enu[1][1] * n + enu[2][1] * u,
                enu[0][2] * e + enu[1][2] * n + enu[2][2] * u);
    }

    @Override
    public String toString() {
        return "level frame (" + axes + ") carried along " + path;
    }
}
