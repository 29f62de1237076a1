package dev.noninertial.frames;

import java.util.Random;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

import dev.noninertial.frames.motion.Motions;

/**
 * Random but reproducible frame trees for property tests: every link is a time-varying motion
 * with non-zero angular acceleration and origin acceleration, built from the library's analytic
 * motions. Callers pass a seeded {@link Random}.
 */
final class RandomFrames {

    private RandomFrames() {
    }

    static Vector3D vector(Random rng, double scale) {
        return new Vector3D(scale * (2 * rng.nextDouble() - 1), scale * (2 * rng.nextDouble() - 1),
                scale * (2 * rng.nextDouble() - 1));
    }

    static Vector3D axis(Random rng) {
        Vector3D v;
        do {
            v = vector(rng, 1.0);
        } while (v.getNorm() < 0.1);
        return v.normalize();
    }

    static Rotation orientation(Random rng) {
        return Orientations.aboutAxis(axis(rng), Math.PI * (2 * rng.nextDouble() - 1));
    }

    /** A random motion mixing spin-up, oscillation, heave and polynomial translation. */
    static Motion motion(Random rng) {
        Motion spin = Motions.spinUp(axis(rng), rng.nextGaussian(), 2 * rng.nextGaussian(), rng.nextGaussian());
        Motion rock = Motions.oscillation(axis(rng), 0.5 * rng.nextGaussian(), 0.5 + 2 * rng.nextDouble(),
                rng.nextGaussian());
        Motion heave = Motions.heave(axis(rng), 3 * rng.nextDouble(), 0.5 + rng.nextDouble(), rng.nextGaussian());
        Motion drift = Motions.translation(vector(rng, 10), vector(rng, 3), vector(rng, 1), vector(rng, 0.2));
        Motion offset = Motions.stationary(vector(rng, 5), orientation(rng));
        switch (rng.nextInt(4)) {
            case 0:
                return drift.then(spin);
            case 1:
                return offset.then(rock).then(heave);
            case 2:
                return heave.then(spin).then(offset).then(rock);
            default:
                return drift.then(rock).then(spin);
        }
    }

    /** A chain of {@code depth} random links below {@code root}; returns the deepest frame. */
    static ReferenceFrame chain(Random rng, ReferenceFrame root, int depth) {
        ReferenceFrame f = root;
        for (int i = 0; i < depth; i++) {
            f = f.attach(root.name() + "-link" + (i + 1), motion(rng));
        }
        return f;
    }

    static PointState state(Random rng) {
        return PointState.of(vector(rng, 20), vector(rng, 5), vector(rng, 2));
    }
}
