package dev.noninertial.geodesy;

import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.hipparchus.dfp.DfpMath;

/**
 * Independent high-precision reference (Hipparchus Dfp, 50 decimal digits) for the geodetic
 * conversions: the textbook forward formula evaluated far beyond double precision.
 */
final class DfpGeodesy {

    static final DfpField FIELD = new DfpField(50);

    private final Dfp a;
    private final Dfp e2;

    /** @param a semi-major axis (exact decimal text), @param inverseFlattening exact decimal text */
    DfpGeodesy(String a, String inverseFlattening) {
        this.a = FIELD.newDfp(a);
        Dfp f = FIELD.getOne().divide(FIELD.newDfp(inverseFlattening));
        this.e2 = f.multiply(FIELD.getTwo().subtract(f));
    }

    static DfpGeodesy wgs84() {
        return new DfpGeodesy("6378137", "298.257223563"); // NIMA TR8350.2 Table 3.1
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
