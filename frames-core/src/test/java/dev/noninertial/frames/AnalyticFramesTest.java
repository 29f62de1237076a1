package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.motion.Motions;

/**
 * Textbook rotating- and translating-frame results (Taylor, Classical Mechanics, ch. 9; Landau &amp;
 * Lifshitz, Mechanics, sec. 39). Tolerance 1e-12 relative: each term is a handful of products,
 * so only a few ulps of rounding are expected.
 * <p>Sources: REFERENCES.md, Analytic results of mechanics.
 */
class AnalyticFramesTest {

    private static final double RELATIVE = 1e-12;

    @Test
    void spinUpGivesEulerTermAlphaTimesRadiusOpposedToTheSpeedUp() {
        // disk speeding up at al about z; point at rest at radius r on the x axis of the disk:
        // Euler term -al x r = -al r y_hat (Taylor eq. 9.34), centrifugal -w^2 r x_hat with w = w0 + al t
        // sources: REFERENCES.md, Analytic results of mechanics
        double al = 0.8;
        double w0 = 0.5;
        double r = 2.5;
        double t = 1.75;
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame disk = lab.attach("disk", Motions.spinUp(Vector3D.PLUS_K, 0.2, w0, al));
        FictitiousAccelerations f = disk.placementIn(lab, t).fictitious(PointState.stationary(new Vector3D(r, 0, 0)));
        double w = w0 + al * t;
        assertEquals(-al * r, f.euler().getY(), RELATIVE * al * r);
        assertEquals(0.0, f.euler().getX(), 0.0);
        assertEquals(w * w * r, f.centrifugal().getX(), RELATIVE * w * w * r);
        assertEquals(0.0, f.coriolis().getNorm(), 0.0);
        assertEquals(0.0, f.frameAcceleration().getNorm(), 0.0);
    }

    @Test
    void uniformSpinCoriolisIsTwiceRateTimesSpeedAtRightAngles() {
        // Taylor eq. 9.35: F_cor = -2 m w x v; w = w z_hat, v = v x_hat  =>  -2 w v y_hat
        // sources: REFERENCES.md, Analytic results of mechanics
        double w = 3.0;
        double v = 1.25;
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame disk = lab.attach("disk", Motions.spin(Vector3D.PLUS_K, 0.0, w));
        FictitiousAccelerations f = disk.placementIn(lab, 0.4)
                .fictitious(PointState.of(Vector3D.ZERO, new Vector3D(v, 0, 0)));
        assertEquals(-2 * w * v, f.coriolis().getY(), RELATIVE * 2 * w * v);
        assertEquals(0.0, f.centrifugal().getNorm(), 0.0); // at the axis
    }

    @Test
    void translatingFrameFeelsMinusItsOriginAcceleration() {
        // a frame whose origin accelerates uniformly at A (no rotation): every point feels -A
        // (Taylor sec. 9.1, "inertial force" -m A)
        // sources: REFERENCES.md, Analytic results of mechanics
        Vector3D accel = new Vector3D(1.5, -0.25, 9.0);
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame cabin = lab.attach("cabin",
                Motions.translation(new Vector3D(3, 4, 5), new Vector3D(10, 0, 0), accel.scalarMultiply(0.5)));
        PointState s = PointState.of(new Vector3D(1, 2, 3), new Vector3D(-4, 5, 6));
        FictitiousAccelerations f = cabin.placementIn(lab, 7.0).fictitious(s);
        assertEquals(0.0, f.frameAcceleration().add(accel).getNorm(), RELATIVE * accel.getNorm());
        assertEquals(0.0, f.euler().getNorm() + f.coriolis().getNorm() + f.centrifugal().getNorm(), 0.0);
        // converting a point at rest in the lab gives acceleration -A in the cabin
        PointState inCabin = cabin.placementIn(lab, 7.0).fromBase(PointState.stationary(new Vector3D(9, 9, 9)));
        assertEquals(0.0, inCabin.acceleration().add(accel).getNorm(), RELATIVE * accel.getNorm());
    }

    @Test
    void pointAtRestOnSpinningDiskMovesOnACircleInTheLab() {
        // uniform circular motion: speed w r, centripetal acceleration w^2 r toward the axis
        double w = 2.0;
        double r = 1.5;
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame disk = lab.attach("disk", Motions.spin(Vector3D.PLUS_K, 0.0, w));
        double t = 0.3;
        PointState inLab = disk.stateAt(t, PointState.stationary(new Vector3D(r, 0, 0))).in(lab).state();
        assertEquals(r, inLab.position().getNorm(), RELATIVE * r);
        assertEquals(w * r, inLab.velocity().getNorm(), RELATIVE * w * r);
        assertEquals(-w * w * r, inLab.acceleration().dotProduct(inLab.position().normalize()), RELATIVE * w * w * r);
        // the disk turned by +w t about z (right-hand rule): the point sits at angle w t in the lab
        assertEquals(w * t, Math.atan2(inLab.position().getY(), inLab.position().getX()), 1e-15);
    }
}
