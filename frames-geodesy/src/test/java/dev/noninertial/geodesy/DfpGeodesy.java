package dev.noninertial.geodesy;

import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.hipparchus.dfp.DfpMath;

/**
 * Independent high-precision reference (Hipparchus Dfp, 50 decimal digits) for the geodetic
 * conversions: the textbook forward formula evaluated far beyond double precision.
 */
final class DfpGeodesy {

    static final DfpField FIELD = new DfpField(Integer.getInteger("geodesy.dfp.digits", 50));

    private final Dfp a;
    private final Dfp e2;

    /** @param a semi-major axis (exact decimal text), @param inverseFlattening exact decimal text */
    DfpGeodesy(String a, String inverseFlattening) {
        this.a = FIELD.newDfp(a);
        Dfp f = FIELD.getOne().divide(FIELD.newDfp(inverseFlattening));
        this.e2 = f.multiply(FIELD.getTwo().subtract(f));
    }

    static DfpGeodesy wgs84() {
        return new DfpGeodesy("6378137", "298.257223563"); // NIMA TR8350.2 Table 3.1 (REFERENCES.md, Earth models)
    }

    /** Forward conversion of the exact double inputs, result as Dfp {x, y, z}. */
    Dfp[] toCartesian(double lat, double lon, double h) {
        Dfp phi = FIELD.newDfp(lat);
        Dfp lam = FIELD.newDfp(lon);
        Dfp s = DfpMath.sin(phi);
        Dfp c = DfpMath.cos(phi);
        Dfp n = a.divide(FIELD.getOne().subtract(e2.multiply(s).multiply(s)).sqrt());
        Dfp hh = FIELD.newDfp(h);
        Dfp rp = n.add(hh).multiply(c);
        return new Dfp[] {rp.multiply(DfpMath.cos(lam)), rp.multiply(DfpMath.sin(lam)),
            n.multiply(FIELD.getOne().subtract(e2)).add(hh).multiply(s)};
    }

    /**
     * Forward conversion of angles {@code lat = lat0 + dLat}, {@code lon = lon0 + dLon} given a
     * previous evaluation's sines and cosines of lat0, lon0 (the addition theorems with the exact
     * Dfp differences; used when the differences are tiny, to halve the trigonometric work).
     */
    Dfp[] toCartesianNear(Dfp[] trig0, double lat0, double lon0, double lat, double lon, double h) {
        Dfp dLat = FIELD.newDfp(lat).subtract(FIELD.newDfp(lat0));
        Dfp dLon = FIELD.newDfp(lon).subtract(FIELD.newDfp(lon0));
        Dfp[] sc = shift(trig0[0], trig0[1], dLat);
        Dfp[] scl = shift(trig0[2], trig0[3], dLon);
        return forward(sc[0], sc[1], scl[0], scl[1], FIELD.newDfp(h));
    }

    /** sin and cos of (x0 + d) from sin x0, cos x0 and a small d (|d| &lt; 1e-6: series to d^7). */
    private static Dfp[] shift(Dfp s0, Dfp c0, Dfp d) {
        Dfp d2 = d.multiply(d);
        // cos d = 1 - d^2/2 + d^4/24 - d^6/720, sin d = d (1 - d^2/6 + d^4/120 - d^6/5040)
        Dfp cosD = FIELD.getOne().subtract(d2.divide(2)).add(d2.multiply(d2).divide(24))
                .subtract(d2.multiply(d2).multiply(d2).divide(720));
        Dfp sinD = d.multiply(FIELD.getOne().subtract(d2.divide(6)).add(d2.multiply(d2).divide(120))
                .subtract(d2.multiply(d2).multiply(d2).divide(5040)));
        return new Dfp[] {s0.multiply(cosD).add(c0.multiply(sinD)), c0.multiply(cosD).subtract(s0.multiply(sinD))};
    }

    /** sin lat, cos lat, sin lon, cos lon of exact doubles. */
    Dfp[] trig(double lat, double lon) {
        Dfp phi = FIELD.newDfp(lat);
        Dfp lam = FIELD.newDfp(lon);
        return new Dfp[] {DfpMath.sin(phi), DfpMath.cos(phi), DfpMath.sin(lam), DfpMath.cos(lam)};
    }

    Dfp[] forward(Dfp s, Dfp c, Dfp sl, Dfp cl, Dfp hh) {
        Dfp n = a.divide(FIELD.getOne().subtract(e2.multiply(s).multiply(s)).sqrt());
        Dfp rp = n.add(hh).multiply(c);
        return new Dfp[] {rp.multiply(cl), rp.multiply(sl), n.multiply(FIELD.getOne().subtract(e2)).add(hh).multiply(s)};
    }

    static double distance(Dfp[] u, Dfp[] v) {
        Dfp dx = u[0].subtract(v[0]);
        Dfp dy = u[1].subtract(v[1]);
        Dfp dz = u[2].subtract(v[2]);
        return dx.multiply(dx).add(dy.multiply(dy)).add(dz.multiply(dz)).sqrt().toDouble();
    }

    static double norm(Dfp[] u) {
        return u[0].multiply(u[0]).add(u[1].multiply(u[1])).add(u[2].multiply(u[2])).sqrt().toDouble();
    }
}
