package dev.noninertial.frames.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.PointState;

/**
 * {@link TermBudget} and {@link TrajectorySolver#withoutTerm}: the drop of
 * {@link EastwardDeflectionTest} on a body turning at the Earth's rate, budgeted term by term.
 * Checks: leaving Coriolis out removes the textbook eastward deflection (1/3) w g t^3 cos(lat)
 * (Landau and Lifshitz, Mechanics, sec. 39; REFERENCES.md, Analytic results of mechanics);
 * leaving the frame acceleration out removes the site's centripetal acceleration
 * w^2 rho (rho the distance from the axis), whose horizontal part w^2 rho sin(lat) then moves the
 * impact by half of it times t^2 (uniform acceleration, textbook kinematics); Euler is zero for a
 * constant spin (exactly no shift); the centrifugal term about the site is bounded by
 * w^2 h t^2 / 2.
 */
class TermBudgetTest {

    private static final double W = EastwardDeflectionTest.EARTH_RATE;
    private static final double RADIUS = EastwardDeflectionTest.RADIUS;

    @Test
    void budgetOfADropMatchesTheTextbookTerms() {
        double lat = 49.0;
        double g = 9.81;
        double h = 150.0;
        SpinningSite earth = new SpinningSite(W, lat, RADIUS);
        TrajectorySolver solver = TrajectorySolver.of(earth.site)
                .plusForce(SpecificForce.uniform(earth.plumbGravitation(g)))
                .withTolerance(1e-11, 1e-11, 1e-13)
                .plusEvent(TrajectoryEvent.groundImpact(Vector3D.PLUS_K, 0.0));
        TermBudget budget = TermBudget.of(solver, PointState.stationary(new Vector3D(0, 0, h)), 0.0, 60.0);
        System.out.print("MEASURED term budget of a 150 m drop at 49 deg:\n" + budget);

        double t = Math.sqrt(2 * h / g);
        double c = Math.cos(Math.toRadians(lat));
        double s = Math.sin(Math.toRadians(lat));
        double east = W * g * t * t * t * c / 3.0;
        // without Coriolis the body lands at the plumb point: the shift is minus the deflection. The
        // first-order formula leaves out (w t)^2 ~ 1.6e-7 relative terms; 1e-5 relative is ample
        Vector3D coriolis = budget.shift(InertialTerm.CORIOLIS);
        assertEquals(-east, coriolis.getX(), 1e-5 * east);
        // frame acceleration: its horizontal (north) part w^2 rho sin(lat), rho = R cos(lat), acts
        // unopposed for the fall time; the vertical part changes the fall time by ~w^2 R c^2/(2 g)
        // ~ 8e-4 relative, so t^2 by 1.7e-3: a 1 % tolerance covers it
        double north = 0.5 * W * W * RADIUS * c * s * t * t;
        Vector3D frame = budget.shift(InertialTerm.FRAME_ACCELERATION);
        // the frame term at the origin, w^2 rho away from the axis, is (0, -sin, cos) w^2 rho in
        // east-north-up; plumbGravitation holds its opposite, which acts alone once the term is
        // left out: northward (and downward)
        assertEquals(north, frame.getY(), 0.01 * north);
        // a constant spin has al = 0: leaving Euler out changes nothing, bit for bit
        assertEquals(0.0, budget.distance(InertialTerm.EULER), 0.0);
        // the CSV holds the same shifts: header, one line per term in enum order, ten significant
        // digits (%.9e: relative rounding 5e-10)
        String[] lines = budget.toCsv().split("\n");
        assertEquals("term,dx_m,dy_m,dz_m,distance_m,dt_s", lines[0]);
        assertEquals(1 + InertialTerm.values().length, lines.length);
        String[] coriolisRow = lines[1 + InertialTerm.CORIOLIS.ordinal()].split(",");
        assertEquals("CORIOLIS", coriolisRow[0]);
        assertEquals(coriolis.getX(), Double.parseDouble(coriolisRow[1]), 5e-10 * Math.abs(coriolis.getX()));
        assertEquals(coriolis.getNorm(), Double.parseDouble(coriolisRow[4]), 5e-10 * coriolis.getNorm());
        assertTrue(budget.toString().startsWith("Term budget: end point with every term at t = "), budget.toString());
        // centrifugal about the site origin: at most w^2 h for t seconds, w^2 h t^2 / 2 ~ 1.2e-5 m
        assertTrue(budget.distance(InertialTerm.CENTRIFUGAL) < W * W * h * t * t / 2 * 1.01,
                () -> "centrifugal shift " + budget.distance(InertialTerm.CENTRIFUGAL));
    }

    @Test
    void leftOutTermsShowAsZeroInTheBreakdownAndTheDefaultIsUnchanged() {
        SpinningSite earth = new SpinningSite(0.3, 30.0, 50.0);
        TrajectorySolver full = TrajectorySolver.of(earth.site).plusForce(SpecificForce.uniform(new Vector3D(0, 0, -9.81)));
        PointState start = PointState.of(new Vector3D(1, 2, 3), new Vector3D(4, -5, 6));
        Trajectory a = full.solve(start, 0.0, 2.0);
        // the default solver adds all four terms, and withTerms(all) is the same run, bit for bit
        Trajectory b = full.withTerms(EnumSet.allOf(InertialTerm.class)).solve(start, 0.0, 2.0);
        assertEquals(a.finalState(), b.finalState());
        Trajectory noCoriolis = full.withoutTerm(InertialTerm.CORIOLIS).solve(start, 0.0, 2.0);
        FictitiousAccelerations f = noCoriolis.fictitiousAt(1.0);
        assertEquals(Vector3D.ZERO, f.coriolis());
        assertTrue(f.centrifugal().getNorm() > 0.0);
        // the breakdown is what was integrated: acceleration = real force + kept terms (round-off)
        TrajectorySample sample = noCoriolis.sampleAt(1.0);
        Vector3D sum = sample.realForce().add(f.total());
        assertEquals(0.0, sum.distance(sample.state().state().acceleration()), 1e-12);
        // a free particle with no terms at all moves in a straight line in the frame (Newton's
        // first law applied to the budget's equations)
        Trajectory none = TrajectorySolver.of(earth.site).withTerms(EnumSet.noneOf(InertialTerm.class))
                .solve(start, 0.0, 2.0);
        Vector3D line = new Vector3D(1, 2, 3).add(2.0, new Vector3D(4, -5, 6));
        assertEquals(0.0, none.finalState().state().position().distance(line), 1e-9);
        assertThrows(IllegalArgumentException.class, () -> TermBudget.of(TrajectorySolver.of(earth.site)
                .withoutTerm(InertialTerm.EULER), start, 0.0, 1.0).shift(InertialTerm.EULER));
    }
}
