package dev.noninertial.bench;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Parameters of the six link motions of the chain benchmarks (invented). The library builds
 * them with {@code Motions}; both baselines hand-code the same laws from these numbers.
 */
final class ChainLaws {

    // link 0: constant spin
    static final Vector3D AXIS0 = new Vector3D(0.0, 0.1, 1.0).normalize();
    static final double ANGLE0 = 0.2;
    static final double RATE0 = 0.05;
    // link 1: heave
    static final Vector3D DIRECTION1 = new Vector3D(0.0, 0.1, 1.0).normalize();
    static final double AMPLITUDE1 = 1.5;
    static final double FREQUENCY1 = 0.6;
    static final double PHASE1 = 0.3;
    // link 2: roll oscillation
    static final Vector3D AXIS2 = new Vector3D(1.0, 0.05, 0.0).normalize();
    static final double AMPLITUDE2 = 0.12;
    static final double FREQUENCY2 = 0.8;
    static final double PHASE2 = 0.1;
    // link 3: spin-up
    static final Vector3D AXIS3 = new Vector3D(0.1, -0.2, 1.0).normalize();
    static final double ANGLE3 = 0.0;
    static final double RATE3 = 1.1;
    static final double ACCELERATION3 = 0.02;
    // link 4: polynomial translation
    static final Vector3D C0 = new Vector3D(2.0, -1.0, 0.5);
    static final Vector3D C1 = new Vector3D(0.3, 0.1, 0.0);
    static final Vector3D C2 = new Vector3D(0.01, -0.02, 0.005);
    // link 5: pitch oscillation
    static final Vector3D AXIS5 = new Vector3D(0.0, 1.0, 0.1).normalize();
    static final double AMPLITUDE5 = 0.3;
    static final double FREQUENCY5 = 1.7;
    static final double PHASE5 = 0.0;

    private ChainLaws() {
    }
}
