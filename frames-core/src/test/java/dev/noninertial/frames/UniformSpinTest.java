package dev.noninertial.frames;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

import dev.noninertial.frames.motion.Motions;

class UniformSpinTest {

    @Test
    void centrifugalAndCoriolisOfUniformSpinMatchTextbook() {
        // Taylor, Classical Mechanics, ch. 9: centrifugal w^2 r outward, Coriolis -2 w x v.
        double w = 2.0;
        double r = 1.5;
        double v = 0.7;
        ReferenceFrame lab = ReferenceFrame.inertialRoot("lab");
        ReferenceFrame disk = lab.attach("disk", Motions.spin(Vector3D.PLUS_K, 0.3, w));
        PointState s = PointState.of(new Vector3D(r, 0, 0), new Vector3D(0, v, 0));
        FictitiousAccelerations f = disk.placementIn(lab, 1.7).fictitious(s);
        // tolerance: a few ulps of the values (relative 1e-12)
        assertEquals(w * w * r, f.centrifugal().getX(), 1e-12 * w * w * r);
        assertEquals(2 * w * v, f.coriolis().getX(), 1e-12 * 2 * w * v);
        assertEquals(0.0, f.euler().getNorm(), 0.0);
    }
}
