package dev.noninertial.geodesy;

import java.time.Instant;

import org.hipparchus.dfp.Dfp;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;

/** Prints the measured figures of the accuracy report (run as a main class; not part of CI). */
public final class GeodesyFigures {

    private GeodesyFigures() {
    }

    /**
     * Prints the figures.
     *
     * @param args unused
     */
    public static void main(String[] args) {
        Ellipsoid wgs = Ellipsoid.WGS84;
        EarthModel m = EarthModel.WGS84;
        // IOGP 373-7-2 example
        // sources: REFERENCES.md, Geodetic conversions
        double lat = Math.toRadians(53 + 48 / 60.0 + 33.820 / 3600.0);
        double lon = Math.toRadians(2 + 7 / 60.0 + 46.380 / 3600.0);
        Vector3D x = wgs.toCartesian(LatLonHeight.of(lat, lon, 73.0));
        System.out.printf("IOGP forward: dX %.2e dY %.2e dZ %.2e m%n", x.getX() - 3771793.968, x.getY() - 140253.342,
                x.getZ() - 5124304.349);
        LatLonHeight back = wgs.toGeodetic(new Vector3D(3771793.968, 140253.342, 5124304.349));
        System.out.printf("IOGP inverse: dlat %.2e m dlon %.2e m dh %.2e m%n", (back.latitude() - lat) * 6.38e6,
                (back.longitude() - lon) * 6.38e6 * Math.cos(lat), back.height() - 73.0);
        // gravity constants
        System.out.printf("WGS84 ge %.2e gp %.2e k %.2e m %.2e%n", m.equatorialGravity() - 9.7803253359,
                m.polarGravity() - 9.8321849378, m.somiglianaConstant() - 0.00193185265241,
                m.centrifugalRatio() - 0.00344978650684);
        System.out.printf("GRS80 ge %.2e gp %.2e%n", EarthModel.GRS80.equatorialGravity() - 9.7803267715,
                EarthModel.GRS80.polarGravity() - 9.8321863685);
        double worstSom = 0;
        double worstAngle = 0;
        for (double deg = -90; deg <= 90; deg += 0.5) {
            LatLonHeight s = LatLonHeight.ofDegrees(deg, 33, 0);
            Vector3D g = m.normalGravityVector(wgs.toCartesian(s));
            worstSom = Math.max(worstSom, Math.abs(g.getNorm() - m.normalGravityOnEllipsoid(s.latitude())));
            worstAngle = Math.max(worstAngle, Vector3D.angle(g.negate(), wgs.normal(s)));
        }
        System.out.printf("exact vs Somigliana on surface: %.2e m/s^2, angle to normal %.2e rad%n", worstSom, worstAngle);
        double worstFd = 0;
        for (double[] s : new double[][] {{12, 40, 0}, {-61, 200, 35e3}, {89.9, 0, 2000e3}, {0, -120, 500},
            {45, 45, 36000e3}}) {
            Vector3D p = wgs.toCartesian(LatLonHeight.ofDegrees(s[0], s[1], s[2]));
            Vector3D g = m.normalGravityVector(p);
            for (int i = 0; i < 3; i++) {
                Vector3D d = new Vector3D(i == 0 ? 10 : 0, i == 1 ? 10 : 0, i == 2 ? 10 : 0);
                double fd = (m.normalPotential(p.add(d)) - m.normalPotential(p.subtract(d))) / 20;
                double an = i == 0 ? g.getX() : i == 1 ? g.getY() : g.getZ();
                worstFd = Math.max(worstFd, Math.abs(fd - an));
            }
        }
        System.out.printf("gradient vs finite differences of potential: %.2e m/s^2%n", worstFd);
        for (double h : new double[] {-400, 1000, 10e3, 50e3, 100e3}) {
            double worst = 0;
            for (double deg = 0; deg <= 90; deg += 5) {
                LatLonHeight s = LatLonHeight.ofDegrees(deg, 10, h);
                worst = Math.max(worst, Math.abs(m.normalGravity(s) - m.normalGravityVector(wgs.toCartesian(s)).getNorm()));
            }
            System.out.printf("height series vs exact at h = %.0f m: %.2e m/s^2%n", h, worst);
        }
        // ERA
        double[][] dates = {{2415020.5, 0.0}, {2451544.5, 0.123456789}, {2460754.5, 0.5},
            {2469807.5, 0.999999}, {2488068.5, 0.75}, {2433282.5, 0.31}, {2461000.5, 0.0000011574}};
        double worstEra = 0;
        for (double[] d : dates) {
            Dfp tu = DfpGeodesy.FIELD.newDfp(d[0]).add(DfpGeodesy.FIELD.newDfp(d[1]))
                    .subtract(DfpGeodesy.FIELD.newDfp("2451545.0"));
            Dfp turns = DfpGeodesy.FIELD.newDfp("0.7790572732640")
                    .add(DfpGeodesy.FIELD.newDfp("1.00273781191135448").multiply(tu));
            turns = turns.subtract(turns.floor());
            double ref = turns.multiply(DfpGeodesy.FIELD.getPi().multiply(2)).toDouble();
            worstEra = Math.max(worstEra, Math.abs(Math.IEEEremainder(EarthRotationAngle.atJulianDate(d[0], d[1]) - ref,
                    2 * Math.PI)));
        }
        System.out.printf("ERA vs Dfp: %.2e rad; at J2000 %.2e rad%n", worstEra,
                EarthRotationAngle.atJulianDate(2451545.0, 0) - 2 * Math.PI * 0.7790572732640);
        // Eotvos
        EarthFrames earth = EarthFrames.of(m, Instant.parse("2026-03-20T12:00:00Z"));
        double ve = 10 * 1852.0 / 3600.0;
        LatLonHeight start = LatLonHeight.ofDegrees(60.0, 5.0, 0.0);
        GeodeticPath run = GeodeticPath.steadyCourse(wgs, start, new Vector3D(ve, 0, 0), LocalAxes.ENU);
        ReferenceFrame moving = earth.carriedLevel("launch", run, LocalAxes.ENU);
        ReferenceFrame still = earth.localLevel("ashore", run.at(600).position(), LocalAxes.ENU);
        Placement pm = moving.placementIn(earth.inertial(), 600);
        Placement ps = still.placementIn(earth.inertial(), 600);
        double engine = ps.vectorFromBase(ps.originAcceleration()).getZ() - pm.vectorFromBase(pm.originAcceleration()).getZ();
        double rule = (7.503 * 10 * 0.5 + 0.004154 * 100) * 1e-5;
        System.out.printf("Eotvos engine %.6f mGal, closed form diff %.2e m/s^2, rule of thumb diff %.4f mGal%n",
                engine * 1e5, engine - m.eotvosCorrection(start, new Vector3D(ve, 0, 0), LocalAxes.ENU), (engine - rule) * 1e5);
        // rest test
        double worstRest = 0;
        for (double deg = 0; deg <= 90; deg += 1) {
            Vector3D r = wgs.toCartesian(LatLonHeight.ofDegrees(deg, 8, 0));
            FictitiousAccelerations f = earth.earthFixed().placementIn(earth.inertial(), 12).fictitious(PointState.stationary(r));
            Vector3D seen = m.normalGravityVector(r).negate().add(m.gravitation(r)).add(f.total());
            worstRest = Math.max(worstRest, seen.getNorm());
        }
        System.out.printf("point held on the ellipsoid, residual acceleration in ECEF: %.2e m/s^2%n", worstRest);
        // finite-difference checks (five-point stencil) of a carried frame and a body frame
        GeodeticPath course = GeodeticPath.steadyCourse(wgs, LatLonHeight.ofDegrees(58.0, -4.0, 30.0),
                new Vector3D(8.0, -5.0, 0), LocalAxes.NED);
        ReferenceFrame level = earth.carriedLevel("level", course, LocalAxes.NED);
        report("carried level in ECEF", level, earth.earthFixed(), 5400.0, 1.0);
        report("carried level in ECI", level, earth.inertial(), 5400.0, 1.0);
        AttitudeProfile sway = s -> new AttitudeSample(
                0.7 + 0.1 * Math.sin(0.2 * s), 0.05 * Math.sin(0.5 * s + 1), 0.2 * Math.sin(0.3 * s),
                0.02 * Math.cos(0.2 * s), 0.025 * Math.cos(0.5 * s + 1), 0.06 * Math.cos(0.3 * s),
                -0.004 * Math.sin(0.2 * s), -0.0125 * Math.sin(0.5 * s + 1), -0.018 * Math.sin(0.3 * s));
        ReferenceFrame body = earth.body("hull", level, sway, LocalAxes.NED);
        report("body in carried level", body, level, 37.0, 1e-3);
        report("body in ECI", body, earth.inertial(), 37.0, 1e-3);
    }

    private static void report(String what, ReferenceFrame f, ReferenceFrame b, double t, double h) {
        Placement p = f.placementIn(b, t);
        double dw = EarthFramesTest.angularVelocityByDifferences(f, b, t, h).distance(p.angularVelocity());
        double da = EarthFramesTest.differentiate(x -> f.placementIn(b, x).angularVelocity(), t, h)
                .distance(p.angularAcceleration());
        System.out.printf("%s: |w - fd| %.2e rad/s (|w| %.2e), |al - fd| %.2e rad/s^2 (|al| %.2e), step %.0e s%n",
                what, dw, p.angularVelocity().getNorm(), da, p.angularAcceleration().getNorm(), h);
    }
}
