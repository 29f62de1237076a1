package dev.noninertial.geodesy;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Orientations;

/**
 * An oblate ellipsoid of revolution about the z axis: semi-major axis {@code a} and flattening
 * {@code f = (a - b) / a}. It carries the geodetic conversions, the radii of curvature and the
 * local-level axes.
 *
 * <p>Conventions: Cartesian coordinates are Earth-fixed (ECEF: origin at the centre, z along the
 * axis of revolution toward the north pole, x in the plane of longitude 0, y completing a
 * right-handed set), in metres. Angles are in radians. {@link LatLonHeight} holds geodetic
 * latitude (angle of the ellipsoid normal above the equator), longitude and height along the
 * normal.
 *
 * <p>Immutable and thread-safe.
 */
public final class Ellipsoid implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Smallest accepted semi-major axis (m). */
    public static final double MIN_SEMI_MAJOR_AXIS = 1.0;

    /** Largest accepted semi-major axis (m). */
    public static final double MAX_SEMI_MAJOR_AXIS = 1.0e10;

    /** Largest accepted flattening; beyond it the shape is no longer a planet-like body. */
    public static final double MAX_FLATTENING = 0.5;

    /** Largest flattening for which {@link #toGeodetic} tries its fast path (Earth: 0.00335). */
    private static final double FAST_MAX_FLATTENING = 0.01;

    /** Distance (m) beyond which {@link #toGeodetic(Vector3D)} works on a position scaled by a power of two. */
    private static final double FAR_DISTANCE = 0x1p330;

    /** WGS84: a = 6378137 m, 1/f = 298.257223563 (NIMA TR8350.2, 3rd ed., Table 3.1). */
    public static final Ellipsoid WGS84 = ofInverseFlattening(6378137.0, 298.257223563);

    /** GRS80: a = 6378137 m, 1/f = 298.257222101 (Moritz, Geodetic Reference System 1980). */
    public static final Ellipsoid GRS80 = ofInverseFlattening(6378137.0, 298.257222101);

    /** Semi-major axis a (m). */
    private final double a;
    /** Flattening f. */
    private final double f;
    /** Semi-minor axis b = a (1 - f) (m). */
    private final double b;
    /** First eccentricity squared. */
    private final double e2;
    /** Second eccentricity squared. */
    private final double ep2;
    /** a^2 - b^2, the squared linear eccentricity (m^2). */
    private final double linear2;

    private Ellipsoid(double a, double f) {
        this.a = a;
        this.f = f;
        this.b = a * (1.0 - f);
        this.e2 = f * (2.0 - f);
        this.ep2 = e2 / ((1.0 - f) * (1.0 - f));
        this.linear2 = a * a * e2;
    }

    /**
     * An ellipsoid from semi-major axis and flattening.
     *
     * @param semiMajorAxis a (m), in [{@value #MIN_SEMI_MAJOR_AXIS}, {@value #MAX_SEMI_MAJOR_AXIS}]
     * @param flattening f = (a - b) / a, in [0, {@value #MAX_FLATTENING}] (0 is a sphere)
     * @return the ellipsoid
     * @throws IllegalArgumentException if a value is NaN or out of its range
     */
    public static Ellipsoid of(double semiMajorAxis, double flattening) {
        Arguments.inRange("semiMajorAxis (m)", semiMajorAxis, MIN_SEMI_MAJOR_AXIS, MAX_SEMI_MAJOR_AXIS);
        Arguments.inRange("flattening", flattening, 0.0, MAX_FLATTENING);
        return new Ellipsoid(semiMajorAxis, flattening);
    }

    /**
     * An ellipsoid from semi-major axis and inverse flattening, the way standards publish them.
     *
     * @param semiMajorAxis a (m), in [{@value #MIN_SEMI_MAJOR_AXIS}, {@value #MAX_SEMI_MAJOR_AXIS}]
     * @param inverseFlattening 1/f, at least 2 (use {@link #of(double, double)} with f = 0 for a sphere)
     * @return the ellipsoid
     * @throws IllegalArgumentException if a value is NaN or out of its range
     */
    public static Ellipsoid ofInverseFlattening(double semiMajorAxis, double inverseFlattening) {
        if (!(inverseFlattening >= 1.0 / MAX_FLATTENING) || Double.isInfinite(inverseFlattening)) {
            throw new IllegalArgumentException("inverseFlattening must be finite and >= "
                    + (1.0 / MAX_FLATTENING) + ", got " + inverseFlattening);
        }
        return of(semiMajorAxis, 1.0 / inverseFlattening);
    }

    /**
     * Returns semi-major (equatorial) axis a (m).
     *
     * @return semi-major (equatorial) axis a (m)
     */
    public double semiMajorAxis() {
        return a;
    }

    /**
     * Returns semi-minor (polar) axis b = a (1 - f) (m).
     *
     * @return semi-minor (polar) axis b = a (1 - f) (m)
     */
    public double semiMinorAxis() {
        return b;
    }

    /**
     * Returns flattening f = (a - b) / a.
     *
     * @return flattening f = (a - b) / a
     */
    public double flattening() {
        return f;
    }

    /**
     * Returns first eccentricity squared e^2 = f (2 - f) = (a^2 - b^2) / a^2.
     *
     * @return first eccentricity squared e^2 = f (2 - f) = (a^2 - b^2) / a^2
     */
    public double eccentricitySquared() {
        return e2;
    }

    /**
     * Returns second eccentricity squared e'^2 = (a^2 - b^2) / b^2.
     *
     * @return second eccentricity squared e'^2 = (a^2 - b^2) / b^2
     */
    public double secondEccentricitySquared() {
        return ep2;
    }

    /**
     * Returns linear eccentricity E = sqrt(a^2 - b^2) (m).
     *
     * @return linear eccentricity E = sqrt(a^2 - b^2) (m)
     */
    public double linearEccentricity() {
        return Math.sqrt(linear2);
    }

    // ------------------------------------------------------------------ radii

    /**
     * Meridian radius of curvature {@code RM = a (1 - e^2) / (1 - e^2 sin^2 lat)^1.5}.
     *
     * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
     * @return RM (m)
     * @throws IllegalArgumentException if the latitude is out of range or NaN
     */
    public double meridianRadius(double latitude) {
        checkLatitude(latitude);
        double s = Math.sin(latitude);
        return meridianRadiusOf(1.0 - e2 * s * s);
    }

    /** RM from {@code w2 = 1 - e^2 sin^2 lat}: the one copy of the formula. */
    private double meridianRadiusOf(double w2) {
        return a * (1.0 - e2) / (w2 * Math.sqrt(w2));
    }

    /** RN from {@code w2 = 1 - e^2 sin^2 lat}: the one copy of the formula. */
    private double primeVerticalRadiusOf(double w2) {
        return a / Math.sqrt(w2);
    }

    /**
     * Both radii of curvature at once, written into an array without allocating (one sine
     * instead of two): {@code out[offset] = RM} ({@link #meridianRadius}),
     * {@code out[offset + 1] = RN} ({@link #primeVerticalRadius}).
     *
     * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
     * @param out receives RM and RN (m)
     * @param offset index of RM in {@code out}
     * @throws IllegalArgumentException if the latitude is out of range or NaN
     */
    public void radiiOfCurvature(double latitude, double[] out, int offset) {
        checkLatitude(latitude);
        Arguments.fromIndexSize("out", out, "offset", offset, 2);
        double s = Math.sin(latitude);
        double w2 = 1.0 - e2 * s * s;
        out[offset] = meridianRadiusOf(w2);
        out[offset + 1] = primeVerticalRadiusOf(w2);
    }

    /**
     * Prime-vertical radius of curvature {@code RN = a / sqrt(1 - e^2 sin^2 lat)} (the radius of
     * curvature in the east-west direction; also the length of the normal from the surface to the
     * polar axis).
     *
     * @param latitude geodetic latitude (rad), in [-pi/2, pi/2]
     * @return RN (m)
     * @throws IllegalArgumentException if the latitude is out of range or NaN
     */
    public double primeVerticalRadius(double latitude) {
        checkLatitude(latitude);
        double s = Math.sin(latitude);
        return primeVerticalRadiusOf(1.0 - e2 * s * s);
    }

    static void checkLatitude(double latitude) {
        if (!(Math.abs(latitude) <= 0.5 * Math.PI)) {
            throw new IllegalArgumentException("latitude must be in [-pi/2, pi/2] rad ([-90, 90] deg), got "
                    + latitude + " rad");
        }
    }

    // ------------------------------------------------------------------ conversions

    /**
     * Geodetic to Earth-fixed Cartesian:
     * {@code x = (RN + h) cos lat cos lon, y = (RN + h) cos lat sin lon, z = (RN (1 - e^2) + h) sin lat}.
     *
     * @param position geodetic position (radians, metres)
     * @return Earth-fixed Cartesian position (m), ECEF axes
     */
    public Vector3D toCartesian(LatLonHeight position) {
        Arguments.nonNull("position", position);
        double[] x = new double[3];
        toCartesian(position.latitude(), position.longitude(), position.height(), x, 0);
        return new Vector3D(x[0], x[1], x[2]);
    }

    /**
     * Geodetic to Earth-fixed Cartesian, written into an array without allocating: the primitive
     * form of {@link #toCartesian(LatLonHeight)} (same formula) for hot paths. The arguments are
     * not checked.
     *
     * @param latitude geodetic latitude (rad)
     * @param longitude longitude (rad)
     * @param height ellipsoidal height (m)
     * @param out receives x, y, z (m), ECEF axes
     * @param offset index of x in {@code out}
     */
    public void toCartesian(double latitude, double longitude, double height, double[] out, int offset) {
        checkLatitude(latitude);
        Arguments.finite("longitude", longitude);
        Arguments.finite("height", height);
        Arguments.fromIndexSize("out", out, "offset", offset, 3);
        double sLat = Math.sin(latitude);
        double cLat = Math.cos(latitude);
        double n = a / Math.sqrt(1.0 - e2 * sLat * sLat);
        double rp = (n + height) * cLat;
        out[offset] = rp * Math.cos(longitude);
        out[offset + 1] = rp * Math.sin(longitude);
        out[offset + 2] = (n * (1.0 - e2) + height) * sLat;
    }

    /**
     * Earth-fixed Cartesian to geodetic, exact to double precision for every point (all
     * latitudes including the poles, the centre and the region inside the evolute of the
     * meridian ellipse included).
     *
     * <p>Method, for flattening up to 0.01 and distances from the centre between a/2 and
     * 1000 a (the common case): Bowring's one-step latitude, with the parametric latitude's sine
     * and cosine taken from ratios of the coordinates, starts Newton's method on the normal
     * condition {@code p sin(lat) - z cos(lat) - e^2 N sin(lat) cos(lat) = 0} with its exact
     * derivative and its large products split exactly with fused multiply-add. Near the surface
     * Bowring's start is close enough that one step, convergence being quadratic with a ratio of
     * about e^2/2, reaches double precision; deep inside a second step is taken (the measured
     * start errors are on the accuracy page, see below). The one
     * inverse-trigonometric seed is a short series (within 1e-15 rad), corrected by that step.
     * Everywhere else, and wherever three steps would not converge: the foot point F on the
     * ellipse satisfies {@code X - F = s grad(q)/2} with
     * {@code q = p^2/a^2 + z^2/b^2 - 1}, which gives {@code F = (a^2 p/(a^2+s), b^2 z/(b^2+s))}
     * and one scalar equation in {@code s}, strictly decreasing and convex on the admissible
     * interval (the classical Lagrange-multiplier form of the nearest-point problem). It is solved
     * by Newton's method in {@code sigma = b^2 + s}, started from a Bowring-type estimate and kept
     * inside a proven bracket, so it converges monotonically from below in a few steps. The
     * latitude follows from the normal at F and the height from the projection of X on it.
     * On both paths the height is a compensated sum of exactly split products, and the longitude
     * is corrected by one exactly split Newton step.
     * At the centre the nearest surface points are the poles: the result is latitude +pi/2,
     * height -b. On the axis the longitude is reported as 0.
     *
     * <p>Accuracy and cost are measured, not promised here: the figures, with their date and
     * conditions, are on the documentation site's
     * <a href="../../../../accuracy.html#geodesy">accuracy page</a> (section Geodesy, against a
     * 50-digit Hipparchus Dfp reference) and <a href="../../../../benchmarks.html">benchmark
     * page</a>. Allocates only the result.
     *
     * <p>Domain: every finite position whose height is a finite double (refused otherwise:
     * components near the largest double, with a distance above it). Beyond 2^330 m (about 2.2e99 m) from the centre the
     * position is first scaled by a power of two, exactly, since the squares would overflow
     * from about 1e150 m; there latitude and longitude have converged to their limits and the
     * height scales with the distance, to rounding.
     *
     * @param position Earth-fixed Cartesian position (m), ECEF axes, finite
     * @return geodetic position: latitude in [-pi/2, pi/2], longitude in [-pi, pi] (rad), height (m)
     * @throws IllegalArgumentException if a component is NaN or infinite
     */
    public LatLonHeight toGeodetic(Vector3D position) {
        Arguments.finite("position", position);
        double x = position.getX();
        double y = position.getY();
        double zs = position.getZ();
        double big = Math.max(Math.abs(x), Math.max(Math.abs(y), Math.abs(zs)));
        if (big > FAR_DISTANCE) {
            // far away the squares below would overflow (from about 1e150 m); scale by a power of
            // two (exact) to about 1e99 m, where latitude and longitude have reached their limits
            // (they move by about e^2 a / r, below 1e-94 rad) and the height is the distance less
            // a few semi-axes, so h(X) = s h(X / s) to rounding (the neglected part is (s - 1) a,
            // below 1e-92 of h)
            double scale = Math.scalb(1.0, Math.getExponent(big) - Math.getExponent(FAR_DISTANCE) + 1);
            LatLonHeight near = toGeodetic(new Vector3D(x / scale, y / scale, zs / scale));
            double h = near.height() * scale;
            if (Double.isInfinite(h)) {
                throw new IllegalArgumentException("position " + position + " m is farther than the largest double"
                        + " (" + Double.MAX_VALUE + " m) from the ellipsoid: its height cannot be represented");
            }
            return new LatLonHeight(near.latitude(), near.longitude(), h);
        }
        double z = Math.abs(zs);
        double pp = x * x + y * y;
        double rr = pp + z * z;
        double aa = a * a;
        // fast path: Earth-like flattening, from half the equatorial radius out to a thousand of
        // them; there the squares neither overflow nor underflow (pp is a normal number with room
        // for the exact low parts of x*x and y*y), the evolute is far and one Newton step from
        // Bowring's start already converges
        if (f <= FAST_MAX_FLATTENING && rr >= 0.25 * aa && rr <= 1.0e6 * aa && pp >= 0x1p-900) {
            LatLonHeight fast = toGeodeticOutside(x, y, zs, z, pp);
            if (fast != null) {
                return fast;
            }
        }
        double p = Math.hypot(x, y);
        double lon = p == 0.0 ? 0.0 : longitude(x, y);
        double lat;
        if (p == 0.0) {
            lat = 0.5 * Math.PI;
        } else if (z == 0.0 && a * p <= linear2) {
            // on the equatorial plane inside the evolute: the nearest foot points are off the
            // plane (two mirror images); the northern one is reported
            double fp = a * p / linear2;                      // cos of the parametric latitude
            double sinBeta = Math.sqrt((1.0 - fp) * (1.0 + fp));
            lat = Math.atan2(a * sinBeta, b * fp);
        } else {
            lat = footLatitude(p, z);
        }
        double pl = p == 0.0 ? 0.0 : lowPart(x, y, p);
        double h = height(p, pl, z, Math.sin(lat), Math.cos(lat));
        return new LatLonHeight(zs < 0 ? -lat : lat, lon, h);
    }

    /**
     * The fast path of {@link #toGeodetic} away from the centre: Bowring's one-step latitude,
     * with the cube of the parametric latitude's sine and cosine taken from ratios of the
     * coordinates (no trigonometric call), seeds Newton's method on the normal condition
     * {@code p sin(lat) - z cos(lat) - e^2 N sin(lat) cos(lat) = 0}, whose residual is evaluated
     * with the large products split exactly; the height is then formed as on the general path,
     * with the sine and cosine of the corrected latitude obtained from those already at hand.
     * Near the surface one Newton step suffices. Returns null where three steps do not
     * converge, so that the general path decides.
     */
    private LatLonHeight toGeodeticOutside(double x, double y, double zs, double z, double pp) {
        // no overflow or underflow here (range checked by the caller), so sqrt of the sum of
        // squares replaces hypot; its last-bit error is carried by the low part pl
        double p = Math.sqrt(pp);
        double pl = lowPart(x, y, p);
        // Bowring: tan(beta) = a z / (b p) for the parametric latitude beta, then
        // tan(lat0) = (z + e'^2 b sin^3 beta) / (p - e^2 a cos^3 beta)
        double az = a * z;
        double bp = b * p;
        double rr = az * az + bp * bp;
        double inv3 = 1.0 / (rr * Math.sqrt(rr));
        double lat = seedAtan2(z + ep2 * b * (az * az * az) * inv3, p - e2 * a * (bp * bp * bp) * inv3);
        double sl = Math.sin(lat);
        double cl = Math.cos(lat);
        for (int k = 0; k < 3; k++) {
            // W^2 = 1 - e^2 sin^2 lat as a double-double (as in height), W and 1/W
            double ss = sl * sl;
            double ssl = Math.fma(sl, sl, -ss);
            double q = e2 * ss;
            double ql = Math.fma(e2, ss, -q) + e2 * ssl;
            double t = 1.0 - q;
            double tl = ((1.0 - t) - q) - ql;
            double w = Math.sqrt(t);
            double iw = 1.0 / w;
            double en = e2 * a * iw;
            double zc = z * cl;
            double zcl = Math.fma(z, cl, -zc);
            double residual = Math.fma(p, sl, -zc) - zcl + pl * sl - en * sl * cl;
            // exact derivative, so that the error left is second order: about e^2/2 d^2
            double slope = p * cl + z * sl - en * ((cl * cl - ss) + e2 * ss * cl * cl * iw * iw);
            if (!(slope > 0.0)) {
                return null;
            }
            double corrected = lat - residual / slope;
            if (!(corrected >= 0.0 && corrected <= 0.5 * Math.PI)) {
                return null;
            }
            double dl = corrected - lat;
            if (Math.abs(dl) < 1e-8) {
                // a step below 1e-8 rad leaves below 1e-18 rad; sin and cos of lat + dl to
                // second order in dl (the third-order term is below 2e-25), and W moved by its
                // derivative -e^2 sin cos / W times dl (the second-order term is below 4e-19,
                // 3e-12 m on a W), added to its low part
                double wl = (Math.fma(-w, w, t) + tl) * (0.5 * iw) - e2 * sl * cl * iw * dl;
                double keep = 1.0 - 0.5 * dl * dl;
                double sNew = sl * keep + cl * dl;
                cl = cl * keep - sl * dl;
                sl = sNew;
                double h = height(p, pl, z, sl, cl, w, wl);
                return new LatLonHeight(zs < 0 ? -corrected : corrected, longitude(x, y), h);
            }
            lat = corrected;
            sl = Math.sin(lat);
            cl = Math.cos(lat);
        }
        return null;
    }

    /**
     * Low part of {@code p = sqrt(x^2 + y^2)} for p &gt; 0: {@code (x^2 + y^2 - p^2) / (2 p)} with
     * the squares split exactly with fused multiply-add, so that p + pl carries p to about
     * twice the double precision.
     */
    private static double lowPart(double x, double y, double p) {
        double xx = x * x;
        double xxl = Math.fma(x, x, -xx);
        double yy = y * y;
        double yyl = Math.fma(y, y, -yy);
        double pp = xx + yy;
        double ppl = Math.abs(yy) > Math.abs(xx) ? (yy - pp) + xx + xxl + yyl : (xx - pp) + yy + xxl + yyl;
        return (Math.fma(-p, p, pp) + ppl) / (2.0 * p);
    }

    /**
     * Height {@code h = p cos lat + z sin lat - a sqrt(1 - e^2 sin^2 lat)}: projection of (p, z)
     * on the normal minus the foot point's own projection. Near the surface the three terms are
     * about 6e6 m and cancel, so each is carried as an unevaluated sum of two doubles (products
     * split exactly with fused multiply-add); this keeps the height to about 0.3 nm instead of
     * about 2 nm. {@code pl} is the low part of p.
     */
    private double height(double p, double pl, double z, double sLat, double cLat) {
        // W^2 = 1 - e^2 sin^2 lat as a double-double, then W
        double ss = sLat * sLat;
        double ssl = Math.fma(sLat, sLat, -ss);
        double q = e2 * ss;
        double ql = Math.fma(e2, ss, -q) + e2 * ssl;
        double t = 1.0 - q;
        double tl = ((1.0 - t) - q) - ql;
        double w = Math.sqrt(t);
        double wl = (Math.fma(-w, w, t) + tl) / (2.0 * w);
        return height(p, pl, z, sLat, cLat, w, wl);
    }

    /** The height as above, with {@code W = sqrt(1 - e^2 sin^2 lat)} given as w + wl. */
    private double height(double p, double pl, double z, double sLat, double cLat, double w, double wl) {
        double aw = a * w;
        double awl = Math.fma(a, w, -aw) + a * wl;
        // p cos + z sin - a W with exact products and a compensated sum
        double r1 = p * cLat;
        double r1l = Math.fma(p, cLat, -r1) + pl * cLat;
        double r2 = z * sLat;
        double r2l = Math.fma(z, sLat, -r2);
        double s1 = r1 + r2;
        double s1l = twoSumError(r1, r2, s1);
        double s2 = s1 - aw;
        double s2l = twoSumError(s1, -aw, s2);
        return s2 + (s2l + s1l + r1l + r2l - awl);
    }

    /**
     * Longitude from a seed angle plus one Newton correction on {@code y cos(lon) - x sin(lon) = 0}
     * with the products split exactly. The correction is {@code tan} of the seed's error, so a
     * seed error e leaves about e^3 / 3: any seed within 1e-6 rad would do. Without the
     * correction even atan2 would not be enough: it can be 2 ulp off, which near lon = +-pi is
     * 3 nm on the equator.
     */
    private static double longitude(double x, double y) {
        double lon = seedAtan2(y, x);
        double c = Math.cos(lon);
        double s = Math.sin(lon);
        double xs = x * s;
        double xsl = Math.fma(x, s, -xs);
        double residual = Math.fma(y, c, -xs) - xsl;
        double correction = residual / (x * c + y * s);
        double corrected = lon + correction;
        // keep the documented range [-pi, pi]: beyond it the exact angle lies between the
        // double nearest pi and pi itself, whose nearest double in range is Math.PI
        return Math.abs(corrected) <= Math.PI ? corrected : Math.copySign(Math.PI, corrected);
    }

    /** Sixteen equal parts of [0, 1]: the centres t_k = (k + 1/2) / 16, exact in binary. */
    private static final double[] SEED_TAN = new double[16];

    /** atan(t_k), from the platform's atan once at class loading. */
    private static final double[] SEED_ATAN = new double[16];

    static {
        for (int k = 0; k < 16; k++) {
            SEED_TAN[k] = (k + 0.5) / 16.0;
            SEED_ATAN[k] = Math.atan(SEED_TAN[k]);
        }
    }

    /**
     * An angle within about 1e-15 rad of {@code atan2(y, x)} (not both zero), for seeding the
     * Newton corrections, at a fraction of the cost of {@link Math#atan2}: octant reduction to
     * t in [0, 1], then {@code atan(t) = atan(t_k) + atan((t - t_k) / (1 + t t_k))} with the
     * nearest centre t_k and the Taylor series of atan to the 9th power for an argument below
     * 1/32 (truncation below 3e-18). It does not need to be correctly rounded: every caller
     * corrects it with an exactly split residual.
     */
    static double seedAtan2(double y, double x) {
        double ax = Math.abs(x);
        double ay = Math.abs(y);
        boolean steep = ay > ax;
        double t = steep ? ax / ay : ay / ax;
        int k = Math.min(15, (int) (t * 16.0));
        double tk = SEED_TAN[k];
        double u = (t - tk) / (1.0 + t * tk);
        double uu = u * u;
        double angle = SEED_ATAN[k]
                + u * (1.0 - uu * (1.0 / 3 - uu * (1.0 / 5 - uu * (1.0 / 7 - uu * (1.0 / 9)))));
        if (steep) {
            angle = 0.5 * Math.PI - angle;
        }
        if (x < 0.0) {
            angle = Math.PI - angle;
        }
        return Math.copySign(angle, y);
    }

    /** Rounding error of {@code s = u + v} (Knuth's two-sum). */
    private static double twoSumError(double u, double v, double s) {
        double vv = s - u;
        return (u - (s - vv)) + (v - vv);
    }

    /** Geodetic latitude in [0, pi/2] of the foot point of (p &gt; 0, z &gt;= 0). */
    private double footLatitude(double p, double z) {
        double ap = a * p;
        double bz = b * z;
        // bracket of the root of G(sigma) = (ap/(E2+sigma))^2 + (bz/sigma)^2 - 1 (see Javadoc)
        double lo = Math.max(bz, ap - linear2);
        double hi = Math.hypot(ap, bz);
        // starting value: Bowring's one-step latitude, then sigma = b^2 + h a^2 / N
        double beta = Math.atan2(a * z, b * p);
        double sb = Math.sin(beta);
        double cb = Math.cos(beta);
        double lat0 = Math.atan2(z + ep2 * b * sb * sb * sb, p - e2 * a * cb * cb * cb);
        double s0 = Math.sin(lat0);
        double w0 = Math.sqrt(1.0 - e2 * s0 * s0);
        double h0 = p * Math.cos(lat0) + z * s0 - a * w0;
        double sigma = b * b + h0 * a * w0;
        if (!(sigma > lo)) {
            sigma = lo;
        } else if (sigma > hi) {
            sigma = hi;
        }
        if (sigma <= 0.0) {
            // only when z == 0 and ap == E2 exactly (on the evolute's cusp): foot point on the equator
            return 0.0;
        }
        for (int k = 0; k < 60; k++) {
            double u = ap / (linear2 + sigma);
            double v = bz / sigma;
            double g = u * u + v * v - 1.0;
            double slope = -2.0 * (u * u / (linear2 + sigma) + v * v / sigma);
            double next = sigma - g / slope;
            if (k > 0 && g <= 0.0) {
                break; // convex and decreasing: from below, reaching G <= 0 means converged
            }
            if (!(next > lo)) {
                next = lo;
            }
            if (next == sigma) {
                break;
            }
            sigma = next;
        }
        double lat = Math.atan2(z * (linear2 + sigma), p * sigma);
        return polish(p, z, lat);
    }

    /**
     * One Newton correction of the latitude on the normal condition
     * {@code p sin(lat) - z cos(lat) - RN e^2 sin(lat) cos(lat) = 0}, with the two large
     * products split exactly: the atan2 above can be 1 to 2 ulp off, 1.5 nm on the surface.
     */
    private double polish(double p, double z, double lat) {
        double s = Math.sin(lat);
        double c = Math.cos(lat);
        double w2 = 1.0 - e2 * s * s;
        double n = a / Math.sqrt(w2);
        double zc = z * c;
        double zcl = Math.fma(z, c, -zc);
        double residual = Math.fma(p, s, -zc) - zcl - n * e2 * s * c;
        double slope = p * c + z * s - n * e2 * (c * c - s * s);
        if (!(slope > 0.0)) {
            return lat; // inside the evolute the condition is not monotonic: keep the bracketed root
        }
        double corrected = lat - residual / slope;
        return Math.abs(corrected - lat) < 1e-12 && corrected <= 0.5 * Math.PI && corrected >= 0.0
                ? corrected : lat;
    }

    // ------------------------------------------------------------------ normal and local axes

    /**
     * Outward unit normal of the ellipsoid through a geodetic position ("up"), in ECEF axes:
     * {@code (cos lat cos lon, cos lat sin lon, sin lat)}. It does not depend on the height.
     *
     * @param position geodetic position (rad)
     * @return unit up vector, ECEF axes
     */
    public Vector3D normal(LatLonHeight position) {
        Arguments.nonNull("position", position);
        double c = Math.cos(position.latitude());
        return new Vector3D(c * Math.cos(position.longitude()), c * Math.sin(position.longitude()),
                Math.sin(position.latitude()));
    }

    /**
     * Orientation of the local-level axes at a geodetic position relative to ECEF axes.
     *
     * <p>Convention (the library's): the returned rotation's {@code applyTo} maps ECEF components
     * to local components, {@code v_local = R v_ECEF}. With east
     * {@code e = (-sin lon, cos lon, 0)}, north {@code n = (-sin lat cos lon, -sin lat sin lon, cos lat)}
     * and up {@code u} the normal: the rows of R are (e, n, u) for {@link LocalAxes#ENU} and
     * (n, e, -u) for {@link LocalAxes#NED}.
     *
     * @param position geodetic position (rad); the height plays no part
     * @param axes axis order
     * @return orientation of the local-level frame in ECEF
     */
    public Rotation localOrientation(LatLonHeight position, LocalAxes axes) {
        Arguments.nonNull("position", position);
        return Orientations.fromMatrix(localRows(position.latitude(), position.longitude(), axes));
    }

    /**
     * Re-resolves a free vector (a wind, a force) given in local-level axes at a geodetic position
     * in ECEF axes: {@code R^T u}, with R of {@link #localOrientation(LatLonHeight, LocalAxes)}
     * ({@code v_local = R v_ECEF}). No origin term is involved.
     *
     * @param position geodetic position (rad); the height plays no part
     * @param axes axis order of {@code local}
     * @param local components in the local-level axes
     * @return components in ECEF axes
     * @throws IllegalArgumentException if a component of {@code local} is not finite
     */
    public Vector3D localToEarthFixed(LatLonHeight position, LocalAxes axes, Vector3D local) {
        Arguments.nonNull("position", position);
        Arguments.finite("local", local);
        double[] r = new double[9];
        localRows(position.latitude(), position.longitude(), axes, r);
        double x = local.getX();
        double y = local.getY();
        double z = local.getZ();
        return new Vector3D(r[0] * x + r[3] * y + r[6] * z, r[1] * x + r[4] * y + r[7] * z,
                r[2] * x + r[5] * y + r[8] * z);
    }

    /** Rows of the ECEF-to-local matrix at (lat, lon). */
    static double[][] localRows(double lat, double lon, LocalAxes axes) {
        double[] r = new double[9];
        localRows(lat, lon, axes, r);
        return new double[][] {{r[0], r[1], r[2]}, {r[3], r[4], r[5]}, {r[6], r[7], r[8]}};
    }

    /** Rows of the ECEF-to-local matrix at (lat, lon), row by row into out[0..8]. */
    private static void localRows(double lat, double lon, LocalAxes axes, double[] out) {
        Arguments.nonNull("axes", axes);
        double sLat = Math.sin(lat);
        double cLat = Math.cos(lat);
        double sLon = Math.sin(lon);
        double cLon = Math.cos(lon);
        // east e, north n, up u: rows (e, n, u) for ENU, (n, e, -u) for NED
        int e = axes == LocalAxes.ENU ? 0 : 3;
        int n = axes == LocalAxes.ENU ? 3 : 0;
        double up = axes == LocalAxes.ENU ? 1.0 : -1.0;
        out[e] = -sLon;
        out[e + 1] = cLon;
        out[e + 2] = 0.0;
        out[n] = -sLat * cLon;
        out[n + 1] = -sLat * sLon;
        out[n + 2] = cLat;
        out[6] = up * (cLat * cLon);
        out[7] = up * (cLat * sLon);
        out[8] = up * sLat;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof Ellipsoid
                && Double.compare(a, ((Ellipsoid) other).a) == 0
                && Double.compare(f, ((Ellipsoid) other).f) == 0;
    }

    @Override
    public int hashCode() {
        return 31 * Double.hashCode(a) + Double.hashCode(f);
    }

    /**
     * Replaces this ellipsoid in a stream by its defining constants.
     *
     * @return the proxy
     */
    private Object writeReplace() {
        return new Proxy(a, f);
    }

    /**
     * Refuses a stream that bypasses the proxy (it could hold derived constants that disagree
     * with a and f).
     *
     * @param in the stream
     * @throws InvalidObjectException always
     */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw new InvalidObjectException("an Ellipsoid is read only through its serialization proxy");
    }

    /**
     * The serialized form: semi-major axis and flattening; reading calls {@link #of(double, double)}.
     *
     * @param semiMajorAxis a (m)
     * @param flattening f
     */
    private record Proxy(double semiMajorAxis, double flattening) implements Serializable {

        /**
         * Rebuilds the ellipsoid with the checks of {@link Ellipsoid#of(double, double)}.
         *
         * @return the ellipsoid
         * @throws InvalidObjectException if the constants are refused
         */
        private Object readResolve() throws InvalidObjectException {
            try {
                return of(semiMajorAxis, flattening);
            } catch (IllegalArgumentException e) {
                throw Arguments.refusedStream(Ellipsoid.class, e);
            }
        }
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "Ellipsoid{a=%.4f m, 1/f=%.9f}", a, f == 0 ? Double.POSITIVE_INFINITY : 1 / f);
    }
}
