package dev.noninertial.geodesy;

import java.util.Locale;
import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * How far Bowring's one-step latitude, the start of the fast path of
 * {@link Ellipsoid#toGeodetic}, lies from the converged latitude, by height band on WGS84: the
 * figures quoted in that method's Javadoc. Run as a main class (not part of CI).
 */
public final class GeodeticStartSpread {

    private GeodeticStartSpread() {
    }

    /**
     * Prints the worst start error per height band.
     *
     * @param args optional number of points per band (default 200,000)
     */
    public static void main(String[] args) {
        int count = args.length > 0 ? Integer.parseInt(args[0]) : 200_000;
        Ellipsoid e = Ellipsoid.WGS84;
        double a = e.semiMajorAxis();
        double b = e.semiMinorAxis();
        double e2 = e.eccentricitySquared();
        double ep2 = e.secondEccentricitySquared();
        double[][] bands = {{-10e3, 10e3}, {-10e3, 1000e3}, {-3000e3, -10e3}, {1000e3, 400000e3}};
        for (double[] band : bands) {
            SplittableRandom random = new SplittableRandom(5L);
            double worst = 0;
            for (int i = 0; i < count; i++) {
                double lat = Math.asin(random.nextDouble(-1, 1));
                double h = random.nextDouble(band[0], band[1]);
                Vector3D x = e.toCartesian(LatLonHeight.of(lat, 0.3, h));
                double p = Math.hypot(x.getX(), x.getY());
                double z = Math.abs(x.getZ());
                double az = a * z;
                double bp = b * p;
                double rr = az * az + bp * bp;
                double inv3 = 1 / (rr * Math.sqrt(rr));
                double start = Math.atan2(z + ep2 * b * az * az * az * inv3, p - e2 * a * bp * bp * bp * inv3);
                worst = Math.max(worst, Math.abs(start - Math.abs(e.toGeodetic(x).latitude())));
            }
            System.out.printf(Locale.ROOT, "h in [%.0f km, %.0f km]: worst start error %.2e rad over %d points%n",
                    band[0] / 1e3, band[1] / 1e3, worst, count);
        }
    }
}
