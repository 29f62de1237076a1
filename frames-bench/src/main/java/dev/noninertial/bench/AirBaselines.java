package dev.noninertial.bench;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.TrajectorySolver;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;
import dev.noninertial.geodesy.air.AirDrag;
import dev.noninertial.geodesy.air.Atmosphere1976;
import dev.noninertial.geodesy.air.DragCurve;
import dev.noninertial.geodesy.air.WindProfile;

/**
 * Air drag written by hand for {@link AirBenchmark}: a body in the east-north-up frame of an
 * invented site on the spinning WGS84 Earth, 1,200 m up, moving at 180 m/s, in a steady 7 m/s
 * east wind, with a constant drag coefficient 0.3 and area over mass 0.002 m^2/kg. The baseline
 * precomputes the site's fixed placement in Earth-fixed axes (rows of the ENU matrix, origin) and
 * evaluates, on primitives: Earth-fixed position and velocity, geodetic latitude and height
 * (Bowring, {@link GeodesyBaselines#toGeodeticBowring}), the wind turned from the point's level
 * axes, the first layer of the 1976 atmosphere, and the drag law. The step baseline adds
 * gravitation ({@link EarthModel#gravitation(Vector3D)}, called by both sides) and the site
 * frame's inertial terms (constant Earth rate, fixed origin) and integrates with the same
 * Hipparchus Dormand-Prince 8(5,3) and tolerances as the library.
 */
public final class AirBaselines {

    /** Invented site. */
    public static final LatLonHeight SITE = LatLonHeight.ofDegrees(46.2, 9.1, 300.0);
    /** Epoch of the Earth frames. */
    public static final Instant EPOCH = Instant.parse("2026-05-05T10:00:00Z");
    /** Drag coefficient. */
    public static final double CD = 0.3;
    /** Area over mass (m^2/kg). */
    public static final double A_OVER_M = 0.002;
    /** East wind (m/s). */
    public static final double WIND_EAST = 7.0;
    /** A span the integrator covers in one step. */
    public static final double ONE_STEP = 0.01;

    /** The Earth. */
    public static final EarthFrames EARTH = EarthFrames.of(EarthModel.WGS84, EPOCH);
    /** The site frame. */
    public static final ReferenceFrame ENU = EARTH.localLevel(SITE, LocalAxes.ENU);

    // fixed placement of the site in ECEF: rows e, n, u of v_ENU = M v_ECEF, origin o
    private static final double[][] M = rows(SITE.latitude(), SITE.longitude());
    private static final Vector3D O = EarthModel.WGS84.ellipsoid().toCartesian(SITE);
    private static final double W = EarthModel.WGS84.rotationRate();

    private AirBaselines() {
    }

    /** @return the library's drag force in the site frame */
    public static AirDrag libraryDrag() {
        return EARTH.dragIn(ENU, Atmosphere1976.standard(), DragCurve.constant(CD), A_OVER_M,
                WindProfile.steady(WIND_EAST, 0.0));
    }

    /** @return the library's solver: gravitation plus drag in the site frame */
    public static TrajectorySolver librarySolver() {
        return TrajectorySolver.of(ENU).plusForce(EARTH.gravitationIn(ENU)).plusForce(libraryDrag());
    }

    /** @return the benchmark state: 1,200 m up, 180 m/s mostly north-east and climbing */
    public static PointState start() {
        return PointState.of(new Vector3D(250.0, -400.0, 1200.0), new Vector3D(120.0, 130.0, 25.0));
    }

    private static double[][] rows(double lat, double lon) {
        double sl = Math.sin(lat);
        double cl = Math.cos(lat);
        double so = Math.sin(lon);
        double co = Math.cos(lon);
        return new double[][] {{-so, co, 0}, {-sl * co, -sl * so, cl}, {cl * co, cl * so, sl}};
    }

    /**
     * Drag in site axes, by hand on primitives.
     *
     * @param x position in the site frame (m)
     * @param y position (m)
     * @param z position (m)
     * @param vx velocity seen in the site frame (m/s)
     * @param vy velocity (m/s)
     * @param vz velocity (m/s)
     * @param out receives the drag (m/s^2), site axes, in out[0..2]; out[3..8] is scratch
     */
    public static void drag(double x, double y, double z, double vx, double vy, double vz, double[] out) {
        double[][] m = M;
        // Earth-fixed position and velocity (the site is at rest in ECEF): o + M^T r, M^T v
        double xe = O.getX() + m[0][0] * x + m[1][0] * y + m[2][0] * z;
        double ye = O.getY() + m[0][1] * x + m[1][1] * y + m[2][1] * z;
        double ze = O.getZ() + m[0][2] * x + m[1][2] * y + m[2][2] * z;
        double ux = m[0][0] * vx + m[1][0] * vy + m[2][0] * vz;
        double uy = m[0][1] * vx + m[1][1] * vy + m[2][1] * vz;
        double uz = m[0][2] * vx + m[1][2] * vy + m[2][2] * vz;
        GeodesyBaselines.toGeodeticBowring(xe, ye, ze, out);
        double lon = out[1];
        double h = out[2];
        // wind east at the point: e = (-sin lon, cos lon, 0)
        ux -= -Math.sin(lon) * WIND_EAST;
        uy -= Math.cos(lon) * WIND_EAST;
        // 1976 atmosphere, first layer (below 11 km)
        double hg = 6356766.0 * h / (6356766.0 + h);
        double t = 288.15 - 0.0065 * hg;
        double p = 101325.0 * Math.pow(288.15 / t, 9.80665 * 0.0289644 / (8.31432 * -0.0065));
        double rho = p * 0.0289644 / (8.31432 * t);
        double speed = Math.sqrt(ux * ux + uy * uy + uz * uz);
        double mach = speed / Math.sqrt(1.4 * 8.31432 * t / 0.0289644);
        if (!(mach >= 0.0)) {
            throw new IllegalStateException("Mach " + mach);
        }
        double k = -0.5 * rho * CD * A_OVER_M * speed;
        double ax = k * ux;
        double ay = k * uy;
        double az = k * uz;
        out[0] = m[0][0] * ax + m[0][1] * ay + m[0][2] * az;
        out[1] = m[1][0] * ax + m[1][1] * ay + m[1][2] * az;
        out[2] = m[2][0] * ax + m[2][1] * ay + m[2][2] * az;
    }

    /**
     * Integrates the benchmark case by hand over a span.
     *
     * @param span seconds
     * @return final state (x, y, z, vx, vy, vz)
     */
    public static double[] integrate(double span) {
        double[][] m = M;
        // Earth rate in site axes, and the site origin's inertial acceleration w x (w x o) in site axes
        double wx = m[0][2] * W;
        double wy = m[1][2] * W;
        double wz = m[2][2] * W;
        double ox = -W * W * O.getX();
        double oy = -W * W * O.getY();
        double rox = m[0][0] * ox + m[0][1] * oy;
        double roy = m[1][0] * ox + m[1][1] * oy;
        double roz = m[2][0] * ox + m[2][1] * oy;
        EarthModel model = EarthModel.WGS84;
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            private final double[] d = new double[9];

            @Override
            public int getDimension() {
                return 6;
            }

            @Override
            public double[] computeDerivatives(double t, double[] s) {
                double x = s[0];
                double y = s[1];
                double z = s[2];
                double vx = s[3];
                double vy = s[4];
                double vz = s[5];
                drag(x, y, z, vx, vy, vz, d);
                double xe = O.getX() + m[0][0] * x + m[1][0] * y + m[2][0] * z;
                double ye = O.getY() + m[0][1] * x + m[1][1] * y + m[2][1] * z;
                double ze = O.getZ() + m[0][2] * x + m[1][2] * y + m[2][2] * z;
                Vector3D g = model.gravitation(new Vector3D(xe, ye, ze));
                double gx = m[0][0] * g.getX() + m[0][1] * g.getY() + m[0][2] * g.getZ();
                double gy = m[1][0] * g.getX() + m[1][1] * g.getY() + m[1][2] * g.getZ();
                double gz = m[2][0] * g.getX() + m[2][1] * g.getY() + m[2][2] * g.getZ();
                double cx = wy * z - wz * y;
                double cy = wz * x - wx * z;
                double cz = wx * y - wy * x;
                return new double[] {vx, vy, vz,
                    gx + d[0] - rox - 2 * (wy * vz - wz * vy) - (wy * cz - wz * cy),
                    gy + d[1] - roy - 2 * (wz * vx - wx * vz) - (wz * cx - wx * cz),
                    gz + d[2] - roz - 2 * (wx * vy - wy * vx) - (wx * cy - wy * cx)};
            }
        };
        double p = TrajectorySolver.DEFAULT_POSITION_TOLERANCE;
        double u = TrajectorySolver.DEFAULT_VELOCITY_TOLERANCE;
        double q = TrajectorySolver.DEFAULT_RELATIVE_TOLERANCE;
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(0.0, span,
                new double[] {p, p, p, u, u, u}, new double[] {q, q, q, q, q, q});
        double[] y0 = {250.0, -400.0, 1200.0, 120.0, 130.0, 25.0};
        ODEStateAndDerivative end = integrator.integrate(ode, new ODEState(0.0, y0), span);
        return end.getPrimaryState();
    }
}
