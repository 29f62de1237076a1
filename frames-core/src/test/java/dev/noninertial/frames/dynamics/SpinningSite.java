package dev.noninertial.frames.dynamics;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Orientations;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;

/**
 * Test fixture built only from core motions: an inertial root, a body spinning at rate w about
 * the root z axis, and a local east-north-up site frame at latitude lat (longitude 0) at distance
 * {@code radius} from the body centre. Spherical body: "up" is the radial direction.
 */
final class SpinningSite {

    final ReferenceFrame inertial;
    final ReferenceFrame body;
    final ReferenceFrame site;
    final double rate;
    final double latitude;

    SpinningSite(double rate, double latitudeDegrees, double radius) {
        this.rate = rate;
        this.latitude = Math.toRadians(latitudeDegrees);
        double s = Math.sin(latitude);
        double c = Math.cos(latitude);
        inertial = ReferenceFrame.inertialRoot("inertial");
        body = inertial.attach("body", Motions.spin(Vector3D.PLUS_K, 0.0, rate));
        // rows: east, north, up in body axes (v_site = M v_body)
        double[][] enu = {{0, 1, 0}, {-s, 0, c}, {c, 0, s}};
        site = body.attach("site", Motions.stationary(new Vector3D(radius * c, 0, radius * s),
                Orientations.fromMatrix(enu)));
    }

    /**
     * Gravitation (site axes) for which a point at rest at the site origin feels exactly
     * {@code -g} along up: the plumb line is the local vertical and g the plumb-line gravity.
     * It is gravity minus every inertial term at the origin (here the frame acceleration, the
     * centrifugal pull of the site's circle about the axis).
     */
    Vector3D plumbGravitation(double g) {
        Vector3D inertialTerms = site.placementIn(inertial, 0.0).fictitious(PointState.stationary(Vector3D.ZERO)).total();
        return new Vector3D(0, 0, -g).subtract(inertialTerms);
    }
}
