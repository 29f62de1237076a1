package dev.noninertial.bench;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.Motion;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;
import dev.noninertial.frames.motion.Motions;

/**
 * Invented inputs shared by every benchmark and by the gate, so that the library and both
 * baselines always work on the same numbers. Every term of the placement is non-zero, so no
 * path can skip work.
 */
public final class Scenario {

    /** Origin of the measured frame in its base (m). */
    public static final Vector3D ORIGIN = new Vector3D(120.0, -35.0, 8.0);
    /** Origin velocity (m/s). */
    public static final Vector3D ORIGIN_VELOCITY = new Vector3D(3.1, -0.4, 0.9);
    /** Origin acceleration (m/s^2). */
    public static final Vector3D ORIGIN_ACCELERATION = new Vector3D(0.05, 0.2, -0.1);
    /** Orientation: applyTo maps base components to frame components. */
    public static final Rotation ORIENTATION = new Rotation(new Vector3D(0.3, -0.5, 0.8), 0.7,
            RotationConvention.FRAME_TRANSFORM);
    /** Angular velocity of the frame in its base, in frame axes (rad/s). */
    public static final Vector3D ANGULAR_VELOCITY = new Vector3D(0.01, -0.02, 0.3);
    /** Angular acceleration, in frame axes (rad/s^2). */
    public static final Vector3D ANGULAR_ACCELERATION = new Vector3D(0.001, 0.002, -0.003);

    /** Position of the point (m). */
    public static final Vector3D POSITION = new Vector3D(12.5, -4.0, 2.0);
    /** Velocity of the point (m/s). */
    public static final Vector3D VELOCITY = new Vector3D(1.2, 0.3, -0.4);
    /** Acceleration of the point (m/s^2). */
    public static final Vector3D ACCELERATION = new Vector3D(0.02, -0.01, 0.005);

    /** Axis of the spin-up motion used by the bulk-through-motion benchmarks. */
    public static final Vector3D SPIN_AXIS = new Vector3D(0.2, -0.3, 1.0).normalize();
    /** Spin angle at t = 0 (rad). */
    public static final double SPIN_ANGLE0 = 0.1;
    /** Spin rate at t = 0 (rad/s). */
    public static final double SPIN_RATE0 = 0.4;
    /** Spin angular acceleration (rad/s^2). */
    public static final double SPIN_ACCELERATION = 0.01;

    /** Longest chain benchmarked. */
    public static final int MAX_DEPTH = 6;

    private Scenario() {
    }

    /** @return the placement of the scenario */
    public static Placement placement() {
        return Placement.of(ORIGIN, ORIGIN_VELOCITY, ORIGIN_ACCELERATION, ORIENTATION,
                ANGULAR_VELOCITY, ANGULAR_ACCELERATION);
    }

    /** @return the point state of the scenario */
    public static PointState state() {
        return PointState.of(POSITION, VELOCITY, ACCELERATION);
    }

    /** @return the spin-up motion of the bulk-through-motion benchmarks */
    public static Motion spinUp() {
        return Motions.spinUp(SPIN_AXIS, SPIN_ANGLE0, SPIN_RATE0, SPIN_ACCELERATION);
    }

    /**
     * The six time-varying link motions of the chain benchmarks, outermost first; the baselines
     * hand-code exactly these laws (see {@link ChainLaws}).
     *
     * @return the motions
     */
    public static Motion[] chainMotions() {
        return new Motion[] {
            Motions.spin(ChainLaws.AXIS0, ChainLaws.ANGLE0, ChainLaws.RATE0),
            Motions.heave(ChainLaws.DIRECTION1, ChainLaws.AMPLITUDE1, ChainLaws.FREQUENCY1, ChainLaws.PHASE1),
            Motions.oscillation(ChainLaws.AXIS2, ChainLaws.AMPLITUDE2, ChainLaws.FREQUENCY2, ChainLaws.PHASE2),
            Motions.spinUp(ChainLaws.AXIS3, ChainLaws.ANGLE3, ChainLaws.RATE3, ChainLaws.ACCELERATION3),
            Motions.translation(ChainLaws.C0, ChainLaws.C1, ChainLaws.C2),
            Motions.oscillation(ChainLaws.AXIS5, ChainLaws.AMPLITUDE5, ChainLaws.FREQUENCY5, ChainLaws.PHASE5),
        };
    }

    /**
     * A frame tree rooted at an inertial "yard" with a chain of {@code depth} moving frames.
     *
     * @param depth number of links, 1 to {@link #MAX_DEPTH}
     * @return the frames, index 0 the root, index {@code depth} the leaf
     * @throws IllegalArgumentException if depth is outside [1, 6]
     */
    public static ReferenceFrame[] chain(int depth) {
        if (depth < 1 || depth > MAX_DEPTH) {
            throw new IllegalArgumentException("depth must be in [1, " + MAX_DEPTH + "], got " + depth);
        }
        String[] names = {"dock", "hull", "deck", "turntable", "carriage", "arm"};
        Motion[] motions = chainMotions();
        ReferenceFrame[] frames = new ReferenceFrame[depth + 1];
        frames[0] = ReferenceFrame.inertialRoot("yard");
        for (int i = 0; i < depth; i++) {
            frames[i + 1] = frames[i].attach(names[i], motions[i]);
        }
        return frames;
    }
}
