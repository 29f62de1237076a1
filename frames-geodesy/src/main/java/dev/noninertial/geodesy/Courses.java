package dev.noninertial.geodesy;

import java.io.Serializable;
import java.util.Locale;

/** The ready-made {@link GeodeticPath}s. */
final class Courses {

    /** Closest approach to a pole for a north-aligned frame on a ready-made path (rad). */
    static final double POLE_MARGIN = Math.toRadians(0.01);

    private static final int ORDER = 10;
    private static final double[] NODES = new double[ORDER];
    private static final double[] WEIGHTS = new double[ORDER];

    static {
        // Gauss-Legendre nodes and weights on [-1, 1] by Newton's method on P_n (Golub-Welsch
        // would do as well); the textbook starting values cos(pi (i + 3/4) / (n + 1/2))
        for (int i = 0; i < ORDER; i++) {
            double x = Math.cos(Math.PI * (i + 0.75) / (ORDER + 0.5));
            double dp = 0;
            for (int it = 0; it < 100; it++) {
                double p0 = 1.0;
                double p1 = x;
                for (int k = 2; k <= ORDER; k++) {
                    double p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
                    p0 = p1;
                    p1 = p2;
                }
                dp = ORDER * (x * p1 - p0) / (x * x - 1.0);
                double dx = p1 / dp;
                x -= dx;
                if (Math.abs(dx) < 1e-16) {
                    break;
                }
            }
            NODES[i] = x;
            WEIGHTS[i] = 2.0 / ((1.0 - x * x) * dp * dp);
        }
    }

    private Courses() {
    }

    /** Integral of f over [lo, hi] by composite Gauss-Legendre, panels of at most 0.02 rad. */
    static double integrate(java.util.function.DoubleUnaryOperator f, double lo, double hi) {
        int panels = Math.max(1, (int) Math.ceil(Math.abs(hi - lo) / 0.02));
        double width = (hi - lo) / panels;
        double sum = 0.0;
        for (int p = 0; p < panels; p++) {
            double mid = lo + (p + 0.5) * width;
            double part = 0.0;
            for (int i = 0; i < ORDER; i++) {
                part += WEIGHTS[i] * f.applyAsDouble(mid + 0.5 * width * NODES[i]);
            }
            sum += 0.5 * width * part;
        }
        return sum;
    }

    private static void refusePole(double t, double lat) {
        throw new IllegalArgumentException("t = " + t + " s takes the path to latitude " + Math.toDegrees(lat)
                + " deg; a north-aligned frame needs |latitude| <= " + (90.0 - Math.toDegrees(POLE_MARGIN))
                + " deg");
    }

    /**
     * Constant rates of latitude, longitude and height.
     *
     * @param start the position at time zero
     * @param latitudeRate rate of latitude (rad/s)
     * @param longitudeRate rate of longitude (rad/s)
     * @param heightRate rate of height (m/s)
     */
    record ConstantRates(LatLonHeight start, double latitudeRate, double longitudeRate, double heightRate)
            implements GeodeticPath, Serializable {
        /**
         * Re-runs the checks of {@link GeodeticPath#constantRates} (records deserialize through
         * this constructor).
         */
        ConstantRates {
            dev.noninertial.frames.Arguments.nonNull("start", start);
            dev.noninertial.frames.Arguments.finite("latitudeRate", latitudeRate);
            dev.noninertial.frames.Arguments.finite("longitudeRate", longitudeRate);
            dev.noninertial.frames.Arguments.finite("heightRate", heightRate);
        }

        @Override
        public PathSample at(double t) {
            if (!Double.isFinite(t)) {
                throw new IllegalArgumentException("t must be finite, got " + t);
            }
            double lat = start.latitude() + latitudeRate * t;
            if (!(Math.abs(lat) < 0.5 * Math.PI)) {
                refusePole(t, lat);
            }
            return new PathSample(lat, start.longitude() + longitudeRate * t, start.height() + heightRate * t,
                    latitudeRate, longitudeRate, heightRate, 0.0, 0.0, 0.0);
        }

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "constant rates from %s: %.6e rad/s north, %.6e rad/s east, %.6g m/s up",
                    start, latitudeRate, longitudeRate, heightRate);
        }
    }

    /** Constant north and east ground speed at constant height. */
    static final class Steady implements GeodeticPath, Serializable {
        private static final long serialVersionUID = 1L;
        private final Ellipsoid ellipsoid;
        private final LatLonHeight start;
        private final double vn;
        private final double ve;
        private final double arcToNorthLimit;
        private final double arcToSouthLimit;

        Steady(Ellipsoid ellipsoid, LatLonHeight start, double vn, double ve) {
            this.ellipsoid = ellipsoid;
            this.start = start;
            this.vn = vn;
            this.ve = ve;
            double limit = 0.5 * Math.PI - POLE_MARGIN;
            if (Math.abs(start.latitude()) > limit) {
                throw new IllegalArgumentException("start.latitude must be within [-" + Math.toDegrees(limit) + ", "
                        + Math.toDegrees(limit) + "] deg, got " + start.latitudeDegrees() + " deg");
            }
            this.arcToNorthLimit = arc(start.latitude(), limit);
            this.arcToSouthLimit = arc(start.latitude(), -limit);
        }

        /**
         * Re-runs the constructor's checks and computations and refuses a stream whose stored
         * limits disagree with them.
         *
         * @param in the stream
         * @throws java.io.IOException if the stream fails or holds values the factory refuses
         * @throws ClassNotFoundException if a class of the stream is missing
         */
        private void readObject(java.io.ObjectInputStream in) throws java.io.IOException, ClassNotFoundException {
            in.defaultReadObject();
            try {
                dev.noninertial.frames.Arguments.nonNull("ellipsoid", ellipsoid);
                dev.noninertial.frames.Arguments.nonNull("start", start);
                dev.noninertial.frames.Arguments.finite("northSpeed", vn);
                dev.noninertial.frames.Arguments.finite("eastSpeed", ve);
                Steady fresh = new Steady(ellipsoid, start, vn, ve);
                if (Double.compare(fresh.arcToNorthLimit, arcToNorthLimit) != 0
                        || Double.compare(fresh.arcToSouthLimit, arcToSouthLimit) != 0) {
                    throw new IllegalArgumentException("stored arcs to the pole limits disagree with the course");
                }
            } catch (IllegalArgumentException | NullPointerException e) {
                throw dev.noninertial.frames.Arguments.refusedStream(Steady.class, e);
            }
        }

        private double rm(double lat) {
            return ellipsoid.meridianRadius(lat) + start.height();
        }

        private double rn(double lat) {
            return ellipsoid.primeVerticalRadius(lat) + start.height();
        }

        /** Meridian arc (m) at the path's height from lat0 to lat1. */
        private double arc(double lat0, double lat1) {
            return integrate(this::rm, lat0, lat1);
        }

        @Override
        public PathSample at(double t) {
            if (!Double.isFinite(t)) {
                throw new IllegalArgumentException("t must be finite, got " + t);
            }
            double lat0 = start.latitude();
            double lat = lat0;
            double lon;
            if (vn != 0.0) {
                double target = vn * t;
                if (target > arcToNorthLimit || target < arcToSouthLimit) {
                    refusePole(t, lat0 + target / rm(lat0));
                }
                // Newton on arc(lat0, lat) = target, the arc carried forward piece by piece, kept
                // inside the bracket [lo, hi] that holds the root (the limits' arcs bound it): a
                // step from a low latitude, where the meridian radius is smallest, overshoots
                // towards the pole, so a step leaving the bracket is replaced by bisection
                double limit = 0.5 * Math.PI - POLE_MARGIN;
                double lo = target >= 0 ? lat0 : -limit;
                double hi = target >= 0 ? limit : lat0;
                double done = 0.0;
                for (int k = 0; k < 80; k++) {
                    if (done < target) {
                        lo = Math.max(lo, lat);
                    } else if (done > target) {
                        hi = Math.min(hi, lat);
                    } else {
                        break;
                    }
                    double next = lat + (target - done) / rm(lat);
                    if (!(next > lo && next < hi)) {
                        next = 0.5 * (lo + hi);
                    }
                    if (next == lat) {
                        break;
                    }
                    done += arc(lat, next);
                    lat = next;
                }
                double ratio = ve / vn;
                lon = start.longitude() + ratio * integrate(x -> rm(x) / (rn(x) * Math.cos(x)), lat0, lat);
            } else {
                lon = start.longitude() + ve * t / (rn(lat0) * Math.cos(lat0));
            }
            double e2 = ellipsoid.eccentricitySquared();
            double s = Math.sin(lat);
            double c = Math.cos(lat);
            double w2 = 1.0 - e2 * s * s;
            double rmh = rm(lat);
            double rnh = rn(lat);
            double dRm = 3.0 * (rmh - start.height()) * e2 * s * c / w2;
            double dRn = (rnh - start.height()) * e2 * s * c / w2;
            double latRate = vn / rmh;
            double lonRate = ve / (rnh * c);
            double latAcc = -latRate * latRate * dRm / rmh;
            double lonAcc = -lonRate * latRate * (dRn * c - rnh * s) / (rnh * c);
            return new PathSample(lat, lon, start.height(), latRate, lonRate, 0.0, latAcc, lonAcc, 0.0);
        }

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "steady course from %s: %.6g m/s north, %.6g m/s east", start, vn, ve);
        }
    }
}
