package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.PointState;

/**
 * Foucault pendulum: the swing plane of a small-amplitude spherical pendulum turns at w sin(lat),
 * clockwise seen from above in the northern hemisphere (Taylor, Classical Mechanics, sec. 9.10;
 * Landau and Lifshitz, Mechanics, sec. 39, problem 3).
 *
 * <p>The pendulum is modelled as an isotropic 2-D restoring force -W^2 (x, y) in the horizontal
 * plane of a site on a body turning at rate w about an axis tilted to the latitude, with a stiff
 * vertical spring standing in for the string tension. The rate is exaggerated (w = 2e-3 rad/s,
 * W = pi rad/s) so that the plane turns by 0.3 rad within 200 s. This is valid because the
 * textbook rate is the first-order term of an expansion in w / W: the terms it drops (the
 * centrifugal pull w^2 r, anisotropic on a tilted axis, and the coupling through the vertical
 * spring) change the rate by a relative amount of order (w / W)^2 = 4e-7, still negligible while
 * w is much smaller than W. The site sits on the spin axis: an offset from the
 * axis only adds a constant centrifugal pull, which the plumb-line choice of gravitation cancels.
 * <p>Sources: REFERENCES.md, Analytic results of mechanics.
 */
class FoucaultPendulumTest {

    @Test
    void swingPlaneTurnsClockwiseAtRateTimesSinLatitude() {
        double w = 2e-3;
        double lat = 49.0;
        double pendulum = Math.PI;          // 2 s period
        double vertical = 5 * pendulum;
        SpinningSite site = new SpinningSite(w, lat, 0.0);
        SpecificForce restoring = (t, s) -> {
            Vector3D r = s.position();
            return new Vector3D(-pendulum * pendulum * r.getX(), -pendulum * pendulum * r.getY(),
                    -vertical * vertical * r.getZ());
        };
        // farthest points of the swing: r . v (horizontal) goes from positive to negative
        TrajectoryEvent turningPoint = TrajectoryEvent.of("turning point", (t, s) ->
                s.position().getX() * s.velocity().getX() + s.position().getY() * s.velocity().getY())
                .fallingOnly().withCheckInterval(0.05);
        Trajectory tr = TrajectorySolver.of(site.site)
                .plusForce(restoring)
                .withTolerance(1e-12, 1e-12, 1e-12)
                .plusEvent(turningPoint)
                .solve(PointState.stationary(new Vector3D(0.1, 0, 0)), 0.0, 200.0);

        List<EventMark> marks = tr.events("turning point");
        // least-squares slope of the swing-line angle (defined modulo pi) against time
        double sumT = 0;
        double sumA = 0;
        double sumTT = 0;
        double sumTA = 0;
        double previous = 0;
        double unwrapped = 0;
        for (int k = 0; k < marks.size(); k++) {
            Vector3D r = marks.get(k).state().state().position();
            double doubled = 2 * Math.atan2(r.getY(), r.getX());   // period 2 pi for a line
            if (k > 0) {
                double d = doubled - previous;
                d -= 2 * Math.PI * Math.rint(d / (2 * Math.PI));
                unwrapped += d;
            } else {
                unwrapped = doubled;
            }
            previous = doubled;
            double angle = 0.5 * unwrapped;
            double t = marks.get(k).time();
            sumT += t;
            sumA += angle;
            sumTT += t * t;
            sumTA += t * angle;
        }
        int n = marks.size();
        double slope = (n * sumTA - sumT * sumA) / (n * sumTT - sumT * sumT);
        double expected = -w * Math.sin(Math.toRadians(lat));   // negative: clockwise seen from +z (up)
        System.out.printf("MEASURED Foucault: %d turning points, plane rate %.9e rad/s, expected %.9e,"
                + " relative difference %.2e, steps %d%n", n, slope, expected, (slope - expected) / expected,
                tr.stepCount());
        // two turning points per 2 s period over 200 s
        assertTrue(n >= 195 && n <= 201, "turning points " + n);
        // 1e-5 relative: the neglected (w/W)^2 ~ 4e-7 terms, plus the fit over a finite number
        // of turning points, with a wide margin
        assertEquals(expected, slope, 1e-5 * Math.abs(expected));
    }
}
