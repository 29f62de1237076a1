package dev.noninertial.geodesy.navigation;

import java.io.Serializable;
import java.util.Locale;

import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.Ellipsoid;
import dev.noninertial.geodesy.LocalAxes;

/**
 * The allocation-free step of {@link LevelNavigator}, on a work array in NED axes. Method and
 * sources: see {@link LevelNavigator}.
 *
 * <p>Work array layout ({@link #LENGTH} doubles): time; latitude, longitude, height; vN, vE, vD;
 * quaternion of the body in the NED level frame (scalar first, {@code v_n = q v_b q*});
 * history flag; previous delta-angle (3), previous delta-velocity at the centre (3), previous
 * step length, gravity, Earth rate and transport rate of the last step's midpoint (3 each, NED),
 * radii of curvature RM, RN there, body rate estimated at the end of the last step (3) (together
 * the history); scratch (3); step count.
 */
final class LevelKernel implements Serializable {

    private static final long serialVersionUID = 1L;

    static final int T = 0;
    static final int LAT = 1;
    static final int LON = 2;
    static final int H = 3;
    static final int VN = 4;
    static final int VE = 5;
    static final int VD = 6;
    static final int Q0 = 7;
    static final int HIST = 11;
    static final int PREV_ANGLE = 12;
    static final int PREV_VELOCITY = 15;
    static final int PREV_STEP = 18;
    static final int GRAVITY = 19;
    static final int EARTH = 22;
    static final int TRANSPORT = 25;
    static final int RADII = 28;
    static final int RATE = 30;
    /**
     * Values of the history carried by a {@link NavigationState}: from HIST (1 after a step with
     * history, 2 after a first step) to RATE + 2.
     */
    static final int HISTORY = 22;
    static final int VELOCITY = 33;
    static final int STEP = 36;
    static final int LENGTH = 37;

    /** Number of values written by a step into a terms array. */
    static final int TERMS = 30;

    private static final double HALF_SQRT2 = Math.sqrt(0.5);

    private final EarthModel model;
    private final Ellipsoid ellipsoid;
    private final double maxLatitude;
    private final boolean earthRate;
    private final boolean transportRate;
    private final boolean coriolis;
    private final boolean gravityHeight;
    private final boolean gravityLatitude;
    private final boolean coning;
    private final boolean sculling;
    private final boolean sizeEffect;
    /** Offsets of the x, y, z accelerometers from the centre (body axes, m): 9 values. */
    private final double[] offsets;
    private final double referenceLatitude;
    private final double referenceHeight;

    LevelKernel(EarthModel model, double maxLatitude, boolean[] on, double[] offsets, double referenceLatitude,
                double referenceHeight) {
        this.model = model;
        this.ellipsoid = model.ellipsoid();
        this.maxLatitude = maxLatitude;
        this.earthRate = on[NavigationTerm.EARTH_RATE.ordinal()];
        this.transportRate = on[NavigationTerm.TRANSPORT_RATE.ordinal()];
        this.coriolis = on[NavigationTerm.CORIOLIS.ordinal()];
        this.gravityHeight = on[NavigationTerm.GRAVITY_HEIGHT.ordinal()];
        this.gravityLatitude = on[NavigationTerm.GRAVITY_LATITUDE.ordinal()];
        this.coning = on[NavigationTerm.CONING.ordinal()];
        this.sculling = on[NavigationTerm.SCULLING.ordinal()];
        boolean anyOffset = false;
        for (double o : offsets) {
            anyOffset |= o != 0.0;
        }
        this.sizeEffect = on[NavigationTerm.SIZE_EFFECT.ordinal()] && anyOffset;
        this.offsets = offsets.clone();
        this.referenceLatitude = referenceLatitude;
        this.referenceHeight = referenceHeight;
    }

    /**
     * Advances the work array by one pair of increments, after the checks of the documented
     * domain (see {@link LevelNavigator}, Refusals), whose messages name the caller's inputs.
     *
     * @param w work array (NED), updated in place
     * @param end end time of the increments (s)
     * @param terms if not null, receives {@link #TERMS} values at {@code termsOffset} (NED / body)
     * @param names how the caller names the inputs
     * @param k index of this step in the caller's inputs
     */
    void step(double[] w, double end, double dvx, double dvy, double dvz, double dax, double day, double daz,
              double[] terms, int termsOffset, StepInputs names, int k) {
        double t0 = w[T];
        long step = (long) w[STEP];
        if (!(end > t0) || Double.isInfinite(end)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "step %d: %s = %s s must be finite and after the state's time %s s (time must increase)",
                    step, names.end(k), end, t0));
        }
        if (!(end - t0 <= LevelNavigator.MAX_STEP_SECONDS)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "step %d (t = %s s to %s s): %s makes a step of %s s, must be at most %s s (MAX_STEP_SECONDS)",
                    step, t0, end, names.end(k), end - t0, LevelNavigator.MAX_STEP_SECONDS));
        }
        int bad = firstNonFinite(dvx, dvy, dvz);
        if (bad >= 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "step %d (t = %s s to %s s): %s must be finite, got %s m/s", step, t0, end,
                    names.velocity(k, bad), bad == 0 ? dvx : bad == 1 ? dvy : dvz));
        }
        bad = firstNonFinite(dax, day, daz);
        if (bad >= 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "step %d (t = %s s to %s s): %s must be finite, got %s rad", step, t0, end,
                    names.angle(k, bad), bad == 0 ? dax : bad == 1 ? day : daz));
        }
        double maxVelocity = LevelNavigator.MAX_SPECIFIC_FORCE * (end - t0);
        double dvNorm = Math.sqrt(dvx * dvx + dvy * dvy + dvz * dvz);
        if (!(dvNorm <= maxVelocity)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "step %d (t = %s s to %s s): %s = (%s, %s, %s) m/s must have a norm of at most "
                            + "MAX_SPECIFIC_FORCE x step = %s m/s, got %s m/s", step, t0, end, names.velocity(k),
                    dvx, dvy, dvz, maxVelocity, dvNorm));
        }
        double daNorm = Math.sqrt(dax * dax + day * day + daz * daz);
        if (!(daNorm <= LevelNavigator.MAX_DELTA_ANGLE)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "step %d (t = %s s to %s s): %s = (%s, %s, %s) rad must have a norm of at most "
                            + "MAX_DELTA_ANGLE = pi rad, got %s rad", step, t0, end, names.angle(k),
                    dax, day, daz, daNorm));
        }
        double h = end - t0;
        boolean hist = w[HIST] != 0.0;
        double pax = w[PREV_ANGLE];
        double pay = w[PREV_ANGLE + 1];
        double paz = w[PREV_ANGLE + 2];

        // ---- size effect: specific force carried from each accelerometer to the centre
        // (Savage 1998 part 1, size effect): f_i(r_i) = e_i . (f + dw/dt x r_i + w x (w x r_i)).
        // The integral of dw/dt over the step is w(t1) - w(t0) with w at the step ends estimated
        // from a rate linear over the previous and this step, and w(t0) the estimate kept from the
        // previous step, so that the corrections telescope over a run (no drift from the
        // estimates); the integral of w x (w x r) from the mean rate of this step. A state
        // without history has no w(t0): its first step takes no dw/dt term.
        double sex = 0.0;
        double sey = 0.0;
        double sez = 0.0;
        if (sizeEffect) {
            double ex1 = dax / h;
            double ey1 = day / h;
            double ez1 = daz / h;
            double ddx = 0.0;
            double ddy = 0.0;
            double ddz = 0.0;
            if (hist) {
                double ph = w[PREV_STEP];
                double sx = (dax / h - pax / ph) / (0.5 * (ph + h));
                double sy = (day / h - pay / ph) / (0.5 * (ph + h));
                double sz = (daz / h - paz / ph) / (0.5 * (ph + h));
                ex1 += 0.5 * h * sx;
                ey1 += 0.5 * h * sy;
                ez1 += 0.5 * h * sz;
                if (w[HIST] == 2.0) {
                    // the previous step was the first of the run and took no dw/dt term: start
                    // from the rate extrapolated back to its start, which covers both steps
                    ddx = ex1 - (pax / ph - 0.5 * ph * sx);
                    ddy = ey1 - (pay / ph - 0.5 * ph * sy);
                    ddz = ez1 - (paz / ph - 0.5 * ph * sz);
                } else {
                    ddx = ex1 - w[RATE];
                    ddy = ey1 - w[RATE + 1];
                    ddz = ez1 - w[RATE + 2];
                }
            }
            w[RATE] = ex1;
            w[RATE + 1] = ey1;
            w[RATE + 2] = ez1;
            sex = -sizeTerm(0, 0, ddx, ddy, ddz, dax, day, daz, h);
            sey = -sizeTerm(3, 1, ddx, ddy, ddz, dax, day, daz, h);
            sez = -sizeTerm(6, 2, ddx, ddy, ddz, dax, day, daz, h);
            dvx += sex;
            dvy += sey;
            dvz += sez;
        }

        // ---- coning: rotation vector of the body over the step (Bortz 1971 equation with the
        // previous-interval coning term of Ignagni 1990 / Savage 1998 part 1 for a rate linear in time):
        // phi = da + (1/12) da_prev x da
        double cx = 0.0;
        double cy = 0.0;
        double cz = 0.0;
        if (coning && hist) {
            cx = (pay * daz - paz * day) / 12.0;
            cy = (paz * dax - pax * daz) / 12.0;
            cz = (pax * day - pay * dax) / 12.0;
        }
        double phx = dax + cx;
        double phy = day + cy;
        double phz = daz + cz;

        // ---- velocity increment in body axes at the start of the step (Savage 1998 part 1):
        // dv_b = dv + rotation compensation + sculling, the rotation compensation in its closed
        // form for a constant rate, (1 - cos a)/a^2 da x dv + (1 - sin(a)/a)/a^2 da x (da x dv)
        // with a = |da| (the second-order part matters: 1e-6 m/s^2 at 100 Hz in a rolling body),
        // sculling (1/12)(da_prev x dv + dv_prev x da) for rates and forces linear in time
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
        double rcx = c1 * ux + c2 * (day * uz - daz * uy);
        double rcy = c1 * uy + c2 * (daz * ux - dax * uz);
        double rcz = c1 * uz + c2 * (dax * uy - day * ux);
        double scx = 0.0;
        double scy = 0.0;
        double scz = 0.0;
        if (sculling && hist) {
            double pvx = w[PREV_VELOCITY];
            double pvy = w[PREV_VELOCITY + 1];
            double pvz = w[PREV_VELOCITY + 2];
            scx = ((pay * dvz - paz * dvy) + (pvy * daz - pvz * day)) / 12.0;
            scy = ((paz * dvx - pax * dvz) + (pvz * dax - pvx * daz)) / 12.0;
            scz = ((pax * dvy - pay * dvx) + (pvx * day - pvy * dax)) / 12.0;
        }
        double bx = dvx + rcx + scx;
        double by = dvy + rcy + scy;
        double bz = dvz + rcz + scz;

        // ---- resolve in the level axes at the start: v_n = q v_b q*
        double q0 = w[Q0];
        double q1 = w[Q0 + 1];
        double q2 = w[Q0 + 2];
        double q3 = w[Q0 + 3];
        double tx = 2.0 * (q2 * bz - q3 * by);
        double ty = 2.0 * (q3 * bx - q1 * bz);
        double tz = 2.0 * (q1 * by - q2 * bx);
        double nx = bx + q0 * tx + (q2 * tz - q3 * ty);
        double ny = by + q0 * ty + (q3 * tx - q1 * tz);
        double nz = bz + q0 * tz + (q1 * ty - q2 * tx);
        // the raw increment m = C dv and k = C (da x dv) in level axes, for the level-frame turn
        tx = 2.0 * (q2 * dvz - q3 * dvy);
        ty = 2.0 * (q3 * dvx - q1 * dvz);
        tz = 2.0 * (q1 * dvy - q2 * dvx);
        double mx = dvx + q0 * tx + (q2 * tz - q3 * ty);
        double my = dvy + q0 * ty + (q3 * tx - q1 * tz);
        double mz = dvz + q0 * tz + (q1 * ty - q2 * tx);
        tx = 2.0 * (q2 * uz - q3 * uy);
        ty = 2.0 * (q3 * ux - q1 * uz);
        tz = 2.0 * (q1 * uy - q2 * ux);
        double kx = ux + q0 * tx + (q2 * tz - q3 * ty);
        double ky = uy + q0 * ty + (q3 * tx - q1 * tz);
        double kz = uz + q0 * tz + (q1 * ty - q2 * tx);

        // ---- predictor for the midpoint of the step: gravity and rates of the last step's
        // midpoint (at the start of a run: evaluated at the start); their O(h) lag moves the
        // predicted midpoint velocity by O(h^2) only
        double lat0 = w[LAT];
        double h0 = w[H];
        double vn0 = w[VN];
        double ve0 = w[VE];
        double vd0 = w[VD];
        if (!hist) {
            model.earthRateIn(lat0, LocalAxes.NED, w, EARTH);
            model.transportRate(lat0, h0, w, VN, LocalAxes.NED, w, TRANSPORT);
            gravity(lat0, h0, w);
            ellipsoid.radiiOfCurvature(lat0, w, RADII);
        }
        double ax = w[GRAVITY];
        double ay = w[GRAVITY + 1];
        double az = w[GRAVITY + 2];
        double kc = coriolis ? 2.0 : 0.0;
        double kt = transportRate ? 1.0 : 0.0;
        double ox = kc * w[EARTH] + kt * w[TRANSPORT];
        double oy = kc * w[EARTH + 1] + kt * w[TRANSPORT + 1];
        double oz = kc * w[EARTH + 2] + kt * w[TRANSPORT + 2];
        ax -= oy * vd0 - oz * ve0;
        ay -= oz * vn0 - ox * vd0;
        az -= ox * ve0 - oy * vn0;
        // the level frame's turn to first order, from the same lagged rates, so that the
        // predicted velocity of a body at rest stays zero (else a 1e-12 m/s^2 Coriolis bias)
        double ke0 = earthRate ? 0.5 * h : 0.0;
        double kr0 = transportRate ? 0.5 * h : 0.0;
        double yx = ke0 * w[EARTH] + kr0 * w[TRANSPORT];
        double yy = ke0 * w[EARTH + 1] + kr0 * w[TRANSPORT + 1];
        double yz = ke0 * w[EARTH + 2] + kr0 * w[TRANSPORT + 2];
        double vnm = vn0 + 0.5 * (nx - (yy * mz - yz * my) + ax * h);
        double vem = ve0 + 0.5 * (ny - (yz * mx - yx * mz) + ay * h);
        double vdm = vd0 + 0.5 * (nz - (yx * my - yy * mx) + az * h);
        double latm = lat0 + 0.25 * h * (vn0 + vnm) / (w[RADII] + h0);
        double hm = h0 - 0.25 * h * (vd0 + vdm);
        if (!(Math.abs(latm) < maxLatitude)) {
            throw poleRefusal(step, t0, end, latm);
        }

        // ---- terms at the midpoint
        gravity(latm, hm, w);
        model.earthRateIn(latm, LocalAxes.NED, w, EARTH);
        w[VELOCITY] = vnm;
        w[VELOCITY + 1] = vem;
        w[VELOCITY + 2] = vdm;
        model.transportRate(latm, hm, w, VELOCITY, LocalAxes.NED, w, TRANSPORT);
        double ex = w[EARTH];
        double ey = w[EARTH + 1];
        double ez = w[EARTH + 2];
        double rx = w[TRANSPORT];
        double ry = w[TRANSPORT + 1];
        double rz = w[TRANSPORT + 2];
        double ke = earthRate ? h : 0.0;
        double kr = transportRate ? h : 0.0;
        double zx = ke * ex + kr * rx;
        double zy = ke * ey + kr * ry;
        double zz = ke * ez + kr * rz;
        // velocity increment of the specific force in the level frame at the end of the step:
        // C dv_b - 1/2 zeta x m (Savage 1998 part 1, frame rotation over the step), with the
        // second-order terms of the same integral for constant rates, -1/3 zeta x k + 1/6 zeta x (zeta x m)
        // (m = C dv, k = C (da x dv)); they make the terms cancel exactly at rest
        double zmx = zy * mz - zz * my;
        double zmy = zz * mx - zx * mz;
        double zmz = zx * my - zy * mx;
        double fx = nx - 0.5 * zmx - (zy * kz - zz * ky) / 3.0 + (zy * zmz - zz * zmy) / 6.0;
        double fy = ny - 0.5 * zmy - (zz * kx - zx * kz) / 3.0 + (zz * zmx - zx * zmz) / 6.0;
        double fz = nz - 0.5 * zmz - (zx * ky - zy * kx) / 3.0 + (zx * zmy - zy * zmx) / 6.0;
        // Coriolis -2 w_ie x v and transport-rate term -w_en x v at the midpoint
        // (Titterton & Weston Eq. 3.71; Groves Eq. 5.54)
        double ccx = 0.0;
        double ccy = 0.0;
        double ccz = 0.0;
        if (coriolis) {
            ccx = -2.0 * (ey * vdm - ez * vem);
            ccy = -2.0 * (ez * vnm - ex * vdm);
            ccz = -2.0 * (ex * vem - ey * vnm);
        }
        double ttx = 0.0;
        double tty = 0.0;
        double ttz = 0.0;
        if (transportRate) {
            ttx = -(ry * vdm - rz * vem);
            tty = -(rz * vnm - rx * vdm);
            ttz = -(rx * vem - ry * vnm);
        }
        double gx = w[GRAVITY];
        double gy = w[GRAVITY + 1];
        double gz = w[GRAVITY + 2];
        double vn1 = vn0 + fx + (gx + ccx + ttx) * h;
        double ve1 = ve0 + fy + (gy + ccy + tty) * h;
        double vd1 = vd0 + fz + (gz + ccz + ttz) * h;

        // ---- position from the mean velocity with the radii of curvature at the midpoint
        ellipsoid.radiiOfCurvature(latm, w, RADII);
        double rm = w[RADII] + hm;
        double rn = w[RADII + 1] + hm;
        double lat1 = lat0 + 0.5 * h * (vn0 + vn1) / rm;
        double lon1 = w[LON] + 0.5 * h * (ve0 + ve1) / (rn * Math.cos(latm));
        double h1 = h0 - 0.5 * h * (vd0 + vd1);
        if (!(Math.abs(lat1) < maxLatitude)) {
            throw poleRefusal(step, t0, end, lat1);
        }

        // ---- attitude: q1 = r(zeta)* (x) q0 (x) r(phi)  (Savage 1998 part 1, body and level updates)
        double p0;
        double p1;
        double p2;
        double p3;
        {
            double ang2 = phx * phx + phy * phy + phz * phz;
            double ang = Math.sqrt(ang2);
            double c = ang < 1e-4 ? 1.0 - ang2 / 8.0 + ang2 * ang2 / 384.0 : Math.cos(0.5 * ang);
            double s = ang < 1e-4 ? 0.5 - ang2 / 48.0 + ang2 * ang2 / 3840.0 : Math.sin(0.5 * ang) / ang;
            double r1 = s * phx;
            double r2 = s * phy;
            double r3 = s * phz;
            // q (x) r
            p0 = q0 * c - q1 * r1 - q2 * r2 - q3 * r3;
            p1 = q0 * r1 + q1 * c + q2 * r3 - q3 * r2;
            p2 = q0 * r2 + q2 * c + q3 * r1 - q1 * r3;
            p3 = q0 * r3 + q3 * c + q1 * r2 - q2 * r1;
        }
        {
            double ang2 = zx * zx + zy * zy + zz * zz;
            double c = 1.0 - ang2 / 8.0 + ang2 * ang2 / 384.0;
            double s = -(0.5 - ang2 / 48.0 + ang2 * ang2 / 3840.0);   // conjugate
            if (ang2 > 1e-8) {
                double ang = Math.sqrt(ang2);
                c = Math.cos(0.5 * ang);
                s = -Math.sin(0.5 * ang) / ang;
            }
            double z1 = s * zx;
            double z2 = s * zy;
            double z3 = s * zz;
            // z (x) p
            double n0 = c * p0 - z1 * p1 - z2 * p2 - z3 * p3;
            double n1 = c * p1 + z1 * p0 + z2 * p3 - z3 * p2;
            double n2 = c * p2 + z2 * p0 + z3 * p1 - z1 * p3;
            double n3 = c * p3 + z3 * p0 + z1 * p2 - z2 * p1;
            double norm = 1.0 / Math.sqrt(n0 * n0 + n1 * n1 + n2 * n2 + n3 * n3);
            w[Q0] = n0 * norm;
            w[Q0 + 1] = n1 * norm;
            w[Q0 + 2] = n2 * norm;
            w[Q0 + 3] = n3 * norm;
        }

        if (terms != null) {
            int o = termsOffset;
            double ih = 1.0 / h;
            put(terms, o, fx * ih, fy * ih, fz * ih);            // specific force (m/s^2, NED)
            put(terms, o + 3, ccx, ccy, ccz);                   // Coriolis
            put(terms, o + 6, ttx, tty, ttz);                   // transport-rate term
            put(terms, o + 9, gx, gy, gz);                      // gravity
            put(terms, o + 12, cx, cy, cz);                     // coning (rad, body)
            put(terms, o + 15, scx * ih, scy * ih, scz * ih);   // sculling (m/s^2, body)
            put(terms, o + 18, rcx * ih, rcy * ih, rcz * ih);   // rotation compensation (m/s^2, body)
            put(terms, o + 21, sex * ih, sey * ih, sez * ih);   // size effect (m/s^2, body)
            put(terms, o + 24, ke * ex, ke * ey, ke * ez);      // Earth rate angle (rad, NED)
            put(terms, o + 27, kr * rx, kr * ry, kr * rz);      // transport rate angle (rad, NED)
        }

        w[T] = end;
        w[LAT] = lat1;
        w[LON] = lon1;
        w[H] = h1;
        w[VN] = vn1;
        w[VE] = ve1;
        w[VD] = vd1;
        w[HIST] = hist ? 1.0 : 2.0;
        w[PREV_ANGLE] = dax;
        w[PREV_ANGLE + 1] = day;
        w[PREV_ANGLE + 2] = daz;
        w[PREV_VELOCITY] = dvx;
        w[PREV_VELOCITY + 1] = dvy;
        w[PREV_VELOCITY + 2] = dvz;
        w[PREV_STEP] = h;
        w[STEP] = step + 1;
    }

    /**
     * Component {@code axis} of {@code Dw x r + da x (da x r) / h + (h / 12) Dw x (Dw x r)} for the
     * accelerometer at offsets[base..]: the integrals of {@code dw/dt x r} and of
     * {@code w x (w x r)} over the step for a rate linear in time ({@code Dw} its change, {@code da}
     * its integral).
     */
    private double sizeTerm(int base, int axis, double ddx, double ddy, double ddz, double dax, double day,
                            double daz, double h) {
        double ox = offsets[base];
        double oy = offsets[base + 1];
        double oz = offsets[base + 2];
        // da x r and Dw x r
        double ux = day * oz - daz * oy;
        double uy = daz * ox - dax * oz;
        double uz = dax * oy - day * ox;
        double dx = ddy * oz - ddz * oy;
        double dy = ddz * ox - ddx * oz;
        double dz = ddx * oy - ddy * ox;
        double v;
        double c;
        double d;
        if (axis == 0) {
            v = day * uz - daz * uy;
            c = ddy * dz - ddz * dy;
            d = dx;
        } else if (axis == 1) {
            v = daz * ux - dax * uz;
            c = ddz * dx - ddx * dz;
            d = dy;
        } else {
            v = dax * uy - day * ux;
            c = ddx * dy - ddy * dx;
            d = dz;
        }
        return d + v / h + h * c / 12.0;
    }

    /** Normal gravity (exact field, NED) into w[GRAVITY..], with the left-out dependences frozen. */
    private void gravity(double lat, double height, double[] w) {
        model.normalGravityIn(gravityLatitude ? lat : referenceLatitude, gravityHeight ? height : referenceHeight,
                LocalAxes.NED, w, GRAVITY);
    }

    /** Index (0, 1, 2) of the first non-finite of three values, -1 if all are finite. */
    private static int firstNonFinite(double x, double y, double z) {
        return !Double.isFinite(x) ? 0 : !Double.isFinite(y) ? 1 : !Double.isFinite(z) ? 2 : -1;
    }

    private IllegalArgumentException poleRefusal(long step, double t0, double end, double lat) {
        return new IllegalArgumentException(String.format(Locale.ROOT,
                "step %d (t = %s s to %s s): the latitude would reach %.6f deg, beyond the +-%.6f deg limit of "
                        + "a north-pointing level frame (the path passes over or too near a pole)",
                step, t0, end, Math.toDegrees(lat), Math.toDegrees(maxLatitude)));
    }

    private static void put(double[] a, int o, double x, double y, double z) {
        a[o] = x;
        a[o + 1] = y;
        a[o + 2] = z;
    }

    /** Body-in-ENU quaternion to body-in-NED: left product with the half-turn about (1, 1, 0)/sqrt 2. */
    static void enuToNed(double q0, double q1, double q2, double q3, double[] out, int o) {
        swapLevel(q0, q1, q2, q3, out, o);
    }

    /** Body-in-NED quaternion to body-in-ENU (the same half-turn: it is its own inverse). */
    static void nedToEnu(double q0, double q1, double q2, double q3, double[] out, int o) {
        swapLevel(q0, q1, q2, q3, out, o);
    }

    private static void swapLevel(double q0, double q1, double q2, double q3, double[] out, int o) {
        double s = HALF_SQRT2;
        double a = -s * (q1 + q2);
        double b = s * (q0 + q3);
        double c = s * (q0 - q3);
        double d = s * (q2 - q1);
        if (a < 0) {
            a = -a;
            b = -b;
            c = -c;
            d = -d;
        }
        out[o] = a;
        out[o + 1] = b;
        out[o + 2] = c;
        out[o + 3] = d;
    }
}
