package dev.noninertial.examples;

import java.time.Instant;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Placement;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.dynamics.SpecificForce;
import dev.noninertial.geodesy.EarthFrames;
import dev.noninertial.geodesy.EarthModel;
import dev.noninertial.geodesy.LatLonHeight;
import dev.noninertial.geodesy.LocalAxes;

/**
 * The shared, invented setting of the worked scenarios: the Kelvaro Point trials range on the
 * coast of the (invented) Quessany Sound, on the WGS84 Earth, with time counted from an epoch.
 */
final class DemoSetting {

    /** Epoch of t = 0 (read as UT1). */
    static final Instant EPOCH = Instant.parse("2026-06-21T09:30:00Z");

    /** The range's reference point (invented place; coordinates chosen for the demo). */
    static final LatLonHeight KELVARO_POINT = LatLonHeight.ofDegrees(57.62, 11.31, 12.0);

    final EarthModel model = EarthModel.WGS84;
    final EarthFrames earth = EarthFrames.of(model, EPOCH);
    final ReferenceFrame site = earth.localLevel("Kelvaro Point ENU", KELVARO_POINT, LocalAxes.ENU);
    /** The site's fixed placement in the Earth-fixed frame (time-independent). */
    final Placement siteInEarth = site.placementIn(earth.earthFixed(), 0.0);

    /**
     * Gravitation of the normal Earth at a point given in site axes, resolved in site axes: the
     * force to integrate there (not gravity, which already holds the centrifugal term).
     */
    SpecificForce gravitationInSite() {
        return (t, s) -> siteInEarth.vectorFromBase(model.gravitation(siteInEarth.positionToBase(s.position())));
    }

    /** Normal gravity (gravitation plus centrifugal) at a point in site axes, resolved in site axes. */
    Vector3D normalGravityInSite(Vector3D positionInSite) {
        return siteInEarth.vectorFromBase(model.normalGravityVector(siteInEarth.positionToBase(positionInSite)));
    }

    /** Ellipsoidal height (m) of a point given in site axes. */
    double heightOf(Vector3D positionInSite) {
        return model.ellipsoid().toGeodetic(siteInEarth.positionToBase(positionInSite)).height();
    }
}
