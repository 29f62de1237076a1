package dev.noninertial.geodesy;

import java.util.SplittableRandom;

/**
 * The long accuracy sweep of {@link Ellipsoid#toGeodetic}: run as a main class
 * (not part of CI). Arguments: number of points (default 1,000,000), seed.
 */
public final class GeodeticSweep {

    private GeodeticSweep() {
    }

    /** Draws (lat, lon, h): every third point near the surface, others over the whole range. */
    static double[] draw(SplittableRandom random, int index) {
        double lat;
        switch (index % 7) {
            case 0:
                lat = 0.5 * Math.PI - Math.scalb(random.nextDouble(), -random.nextInt(60)); // near a pole
                break;
            case 1:
                lat = Math.scalb(random.nextDouble(), -random.nextInt(60)); // near the equator
                break;
            default:
                lat = Math.asin(2 * random.nextDouble() - 1);
        }
        if (random.nextBoolean()) {
            lat = -lat;
        }
        double lon = (2 * random.nextDouble() - 1) * Math.PI;
        double h;
        switch (index % 3) {
            case 0:
                h = -10e3 + 1010e3 * random.nextDouble();
                break;
            case 1:
                h = -5000e3 + 5000e3 * random.nextDouble();
                break;
            default:
                h = Math.exp(Math.log(1000e3) + random.nextDouble() * Math.log(400.0)); // 1e3 km .. 4e5 km
        }
        return new double[] {lat, lon, h};
    }

    /**
     * Runs the sweep and prints the worst errors.
     *
     * @param args optional point count and seed
     */
    public static void main(String[] args) {
        int count = args.length > 0 ? Integer.parseInt(args[0]) : 1_000_000;
        long seed = args.length > 1 ? Long.parseLong(args[1]) : 20260320L;
        DfpGeodesy ref = DfpGeodesy.wgs84();
        SplittableRandom random = new SplittableRandom(seed);
        double worstNear = 0;
        double[] atNear = null;
        double worstRel = 0;
        double[] atRel = null;
        long start = System.nanoTime();
        for (int i = 0; i < count; i++) {
            double[] s = draw(random, i);
            GeodeticConversionTest.Result r = GeodeticConversionTest.measure(ref, s[0], s[1], s[2]);
            if (s[2] >= -10e3 && s[2] <= 1000e3) {
                if (r.error() > worstNear) {
                    worstNear = r.error();
                    atNear = s;
                }
            } else if (r.error() / r.radius() > worstRel) {
                worstRel = r.error() / r.radius();
                atRel = s;
            }
            if ((i + 1) % 50_000 == 0) {
                System.out.printf("... %d points, %.0f s, worst near %.3e m, worst relative %.3e%n", i + 1,
                        (System.nanoTime() - start) * 1e-9, worstNear, worstRel);
            }
        }
        double seconds = (System.nanoTime() - start) * 1e-9;
        System.out.printf("points %d, seed %d, %.1f s%n", count, seed, seconds);
        System.out.printf("worst |X'-X| for h in [-10 km, 1000 km]: %.3e m at lat %.17g lon %.17g h %.17g%n",
                worstNear, atNear[0], atNear[1], atNear[2]);
        System.out.printf("worst |X'-X|/|X| elsewhere: %.3e at lat %.17g lon %.17g h %.17g%n",
                worstRel, atRel[0], atRel[1], atRel[2]);
    }
}
