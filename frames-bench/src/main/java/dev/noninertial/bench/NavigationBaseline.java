package dev.noninertial.bench;

/**
 * A hand-written strapdown step on primitives, the way a user would write it without the library:
 * the same mechanization as {@code LevelNavigator} (coning, closed-form rotation compensation and
 * sculling, second-order level-frame turn, velocity with Coriolis, transport-rate term and the
 * exact WGS84 normal gravity at the predicted midpoint, position with the radii of curvature,
 * quaternion attitude) with every formula written inline, no checks, no calls, NED only. Its
 * state array: time, lat, lon, h, vN, vE, vD, q0..q3, previous delta-angle (3), previous
 * delta-velocity (3), previous gravity (3), history flag, previous rate sum 2 w_ie + w_en (3),
 * previous RM, previous w_ie + w_en (3): {@link #LENGTH} doubles.
 */
public final class NavigationBaseline {

    /** Length of the state array. */
    public static final int LENGTH = 28;

    // WGS84 (NIMA TR8350.2, Table 3.1)
    private static final double A = 6378137.0;
    private static final double F = 1.0 / 298.257223563;
    private static final double GM = 3.986004418e14;
    private static final double W = 7.292115e-5;
    private static final double B = A * (1 - F);
    private static final double E2 = F * (2 - F);
    private static final double LIN2 = A * A * E2;
    private static final double LIN = Math.sqrt(LIN2);
    private static final double Q0 = q(LIN / B);

    private NavigationBaseline() {
    }

    /**
     * A state array at rest at a position with an attitude quaternion (body in NED).
     *
     * @param lat latitude (rad)
     * @param lon longitude (rad)
     * @param h height (m)
     * @param q attitude quaternion, scalar first
     * @return the state array
     */
    public static double[] atRest(double lat, double lon, double h, double[] q) {
        double[] s = new double[LENGTH];
        s[1] = lat;
        s[2] = lon;
        s[3] = h;
        System.arraycopy(q, 0, s, 7, 4);
        return s;
    }

    /**
     * One step, in place.
     *
     * @param s state array
     * @param end end time (s)
     * @param dvx delta-velocity x (m/s)
     * @param dvy delta-velocity y
     * @param dvz delta-velocity z
     * @param dax delta-angle x (rad)
     * @param day delta-angle y
     * @param daz delta-angle z
     */
    public static void step(double[] s, double end, double dvx, double dvy, double dvz, double dax, double day,
                            double daz) {
        double h = end - s[0];
        boolean hist = s[20] != 0.0;
        double pax = s[11];
        double pay = s[12];
        double paz = s[13];
        double cx = 0;
        double cy = 0;
        double cz = 0;
        double scx = 0;
        double scy = 0;
        double scz = 0;
        if (hist) {
            cx = (pay * daz - paz * day) / 12.0;
            cy = (paz * dax - pax * daz) / 12.0;
            cz = (pax * day - pay * dax) / 12.0;
            double pvx = s[14];
            double pvy = s[15];
            double pvz = s[16];
            scx = ((pay * dvz - paz * dvy) + (pvy * daz - pvz * day)) / 12.0;
            scy = ((paz * dvx - pax * dvz) + (pvz * dax - pvx * daz)) / 12.0;
            scz = ((pax * dvy - pay * dvx) + (pvx * day - pvy * dax)) / 12.0;
        }
        double phx = dax + cx;
        double phy = day + cy;
        double phz = daz + cz;
        double a2 = dax * dax + day * day + daz * daz;
        double c1;
        double c2;
        if (a2 < 1e-4) {
            c1 = 0.5 - a2 / 24.0 + a2 * a2 / 720.0;
            c2 = 1.0 / 6.0 - a2 / 120.0 + a2 * a2 / 5040.0;
        } else {
            double an = Math.sqrt(a2);
            c1 = (1.0 - Math.cos(an)) / a2;
            c2 = (1.0 - Math.sin(an) / an) / a2;
        }
        double ux = day * dvz - daz * dvy;
        double uy = daz * dvx - dax * dvz;
        double uz = dax * dvy - day * dvx;
        double bx = dvx + c1 * ux + c2 * (day * uz - daz * uy) + scx;
        double by = dvy + c1 * uy + c2 * (daz * ux - dax * uz) + scy;
        double bz = dvz + c1 * uz + c2 * (dax * uy - day * ux) + scz;
        double q0 = s[7];
        double q1 = s[8];
        double q2 = s[9];
        double q3 = s[10];
        // C v = v + 2 q0 (qv x v) + 2 qv x (qv x v), three times
        double tx = 2 * (q2 * bz - q3 * by);
        double ty = 2 * (q3 * bx - q1 * bz);
        double tz = 2 * (q1 * by - q2 * bx);
        double nx = bx + q0 * tx + (q2 * tz - q3 * ty);
        double ny = by + q0 * ty + (q3 * tx - q1 * tz);
        double nz = bz + q0 * tz + (q1 * ty - q2 * tx);
        tx = 2 * (q2 * dvz - q3 * dvy);
        ty = 2 * (q3 * dvx - q1 * dvz);
        tz = 2 * (q1 * dvy - q2 * dvx);
        double mx = dvx + q0 * tx + (q2 * tz - q3 * ty);
        double my = dvy + q0 * ty + (q3 * tx - q1 * tz);
        double mz = dvz + q0 * tz + (q1 * ty - q2 * tx);
        tx = 2 * (q2 * uz - q3 * uy);
        ty = 2 * (q3 * ux - q1 * uz);
        tz = 2 * (q1 * uy - q2 * ux);
        double kx = ux + q0 * tx + (q2 * tz - q3 * ty);
        double ky = uy + q0 * ty + (q3 * tx - q1 * tz);
        double kz = uz + q0 * tz + (q1 * ty - q2 * tx);

        double lat0 = s[1];
        double h0 = s[3];
        double vn0 = s[4];
        double ve0 = s[5];
        double vd0 = s[6];
        double sl;
        double cl;
        double w2;
        if (!hist) {
            sl = Math.sin(lat0);
            cl = Math.cos(lat0);
            w2 = 1 - E2 * sl * sl;
            double rn0 = A / Math.sqrt(w2) + h0;
            s[24] = A * (1 - E2) / (w2 * Math.sqrt(w2));
            s[21] = 2 * W * cl + ve0 / rn0;
            s[22] = -vn0 / (s[24] + h0);
            s[23] = -2 * W * sl - ve0 * Math.tan(lat0) / rn0;
            s[25] = s[21] - W * cl;
            s[26] = s[22];
            s[27] = s[23] + W * sl;
            gravity(lat0, h0, s);
        }
        double ox = s[21];
        double oy = s[22];
        double oz = s[23];
        double rm0 = s[24] + h0;
        // first-order level turn from the lagged rates (w_ie + w_en) h / 2
        double yx = 0.5 * h * s[25];
        double yy = 0.5 * h * s[26];
        double yz = 0.5 * h * s[27];
        double ax = s[17] - (oy * vd0 - oz * ve0);
        double ay = s[18] - (oz * vn0 - ox * vd0);
        double az = s[19] - (ox * ve0 - oy * vn0);
        double vnm = vn0 + 0.5 * (nx - (yy * mz - yz * my) + ax * h);
        double vem = ve0 + 0.5 * (ny - (yz * mx - yx * mz) + ay * h);
        double vdm = vd0 + 0.5 * (nz - (yx * my - yy * mx) + az * h);
        double latm = lat0 + 0.25 * h * (vn0 + vnm) / rm0;
        double hm = h0 - 0.25 * h * (vd0 + vdm);

        gravity(latm, hm, s);
        sl = Math.sin(latm);
        cl = Math.cos(latm);
        w2 = 1 - E2 * sl * sl;
        double rn = A / Math.sqrt(w2) + hm;
        double rm = A * (1 - E2) / (w2 * Math.sqrt(w2)) + hm;
        double ex = W * cl;
        double ez = -W * sl;
        double rx = vem / rn;
        double ry = -vnm / rm;
        double rz = -vem * Math.tan(latm) / rn;
        double zx = (ex + rx) * h;
        double zy = ry * h;
        double zz = (ez + rz) * h;
        double zmx = zy * mz - zz * my;
        double zmy = zz * mx - zx * mz;
        double zmz = zx * my - zy * mx;
        double fx = nx - 0.5 * zmx - (zy * kz - zz * ky) / 3.0 + (zy * zmz - zz * zmy) / 6.0;
        double fy = ny - 0.5 * zmy - (zz * kx - zx * kz) / 3.0 + (zz * zmx - zx * zmz) / 6.0;
        double fz = nz - 0.5 * zmz - (zx * ky - zy * kx) / 3.0 + (zx * zmy - zy * zmx) / 6.0;
        double px = 2 * ex + rx;
        double py = ry;
        double pz = 2 * ez + rz;
        s[21] = px;
        s[22] = py;
        s[23] = pz;
        s[24] = rm - hm;
        s[25] = ex + rx;
        s[26] = ry;
        s[27] = ez + rz;
        double vn1 = vn0 + fx + (s[17] - (py * vdm - pz * vem)) * h;
        double ve1 = ve0 + fy + (s[18] - (pz * vnm - px * vdm)) * h;
        double vd1 = vd0 + fz + (s[19] - (px * vem - py * vnm)) * h;
        s[1] = lat0 + 0.5 * h * (vn0 + vn1) / rm;
        s[2] = s[2] + 0.5 * h * (ve0 + ve1) / (rn * cl);
        s[3] = h0 - 0.5 * h * (vd0 + vd1);
        s[4] = vn1;
        s[5] = ve1;
        s[6] = vd1;

        double ang2 = phx * phx + phy * phy + phz * phz;
        double cc;
        double ss;
        if (ang2 < 1e-8) {
            cc = 1 - ang2 / 8 + ang2 * ang2 / 384;
            ss = 0.5 - ang2 / 48 + ang2 * ang2 / 3840;
        } else {
            double ang = Math.sqrt(ang2);
            cc = Math.cos(0.5 * ang);
            ss = Math.sin(0.5 * ang) / ang;
        }
        double r1 = ss * phx;
        double r2 = ss * phy;
        double r3 = ss * phz;
        double p0 = q0 * cc - q1 * r1 - q2 * r2 - q3 * r3;
        double p1 = q0 * r1 + q1 * cc + q2 * r3 - q3 * r2;
        double p2 = q0 * r2 + q2 * cc + q3 * r1 - q1 * r3;
        double p3 = q0 * r3 + q3 * cc + q1 * r2 - q2 * r1;
        ang2 = zx * zx + zy * zy + zz * zz;
        cc = 1 - ang2 / 8 + ang2 * ang2 / 384;
        ss = -(0.5 - ang2 / 48 + ang2 * ang2 / 3840);
        double z1 = ss * zx;
        double z2 = ss * zy;
        double z3 = ss * zz;
        double n0 = cc * p0 - z1 * p1 - z2 * p2 - z3 * p3;
        double n1 = cc * p1 + z1 * p0 + z2 * p3 - z3 * p2;
        double n2 = cc * p2 + z2 * p0 + z3 * p1 - z1 * p3;
        double n3 = cc * p3 + z3 * p0 + z1 * p2 - z2 * p1;
        double norm = 1 / Math.sqrt(n0 * n0 + n1 * n1 + n2 * n2 + n3 * n3);
        s[7] = n0 * norm;
        s[8] = n1 * norm;
        s[9] = n2 * norm;
        s[10] = n3 * norm;
        s[11] = dax;
        s[12] = day;
        s[13] = daz;
        s[14] = dvx;
        s[15] = dvy;
        s[16] = dvz;
        s[20] = 1.0;
        s[0] = end;
    }

    /** Exact WGS84 normal gravity in NED at (lat, h) into s[17..19] (closed form in ellipsoidal coordinates). */
    private static void gravity(double lat, double height, double[] s) {
        double sl = Math.sin(lat);
        double cl = Math.cos(lat);
        double n = A / Math.sqrt(1 - E2 * sl * sl);
        double px = (n + height) * cl;
        double pz = (n * (1 - E2) + height) * sl;
        double p2 = px * px;
        double d = p2 + pz * pz - LIN2;
        double u2 = 0.5 * (d + Math.sqrt(d * d + 4 * LIN2 * pz * pz));
        double u = Math.sqrt(u2);
        double u2e2 = u2 + LIN2;
        double cb2 = p2 / u2e2;
        double sb2 = pz * pz / u2;
        double x = LIN / u;
        double dqdu = -qPrime(x) * LIN / u2;
        double dUdu = -GM / u2e2 + 0.5 * W * W * A * A * dqdu / Q0 * (sb2 - 1.0 / 3) + W * W * u * cb2;
        double kb = W * W * A * A * q(x) / Q0 - W * W * u2e2;
        double metric = u2 + LIN2 * sb2;
        double ca = dUdu * u2e2 / metric;
        double cb = kb / metric;
        double sinBeta = pz / u;
        double gx = (ca * u / u2e2 - cb * sb2) * px;
        double gz = ca * sinBeta + cb * u * sinBeta * cb2;
        s[17] = -sl * gx + cl * gz;
        s[18] = 0.0;
        s[19] = -(cl * gx + sl * gz);
    }

    /** Q(x) = ((1 + 3/x^2) atan x - 3/x) / 2 by its series (x below 0.25 here). */
    private static double q(double x) {
        double x2 = x * x;
        double term = x * x2;
        double sum = 0;
        double sign = 1;
        for (int k = 1; k < 40; k++) {
            double add = sign * k * term / ((2.0 * k + 1) * (2.0 * k + 3));
            sum += add;
            if (Math.abs(add) < 1e-18 * Math.abs(sum)) {
                break;
            }
            term *= x2;
            sign = -sign;
        }
        return 2 * sum;
    }

    /** dQ/dx by the differentiated series. */
    private static double qPrime(double x) {
        double x2 = x * x;
        double term = x2;
        double sum = 0;
        double sign = 1;
        for (int k = 1; k < 40; k++) {
            double add = sign * k * term / (2.0 * k + 3);
            sum += add;
            if (Math.abs(add) < 1e-18 * Math.abs(sum)) {
                break;
            }
            term *= x2;
            sign = -sign;
        }
        return 2 * sum;
    }
}
