package dev.noninertial.bench;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Baseline (a): the straightforward code a user writes today with Hipparchus {@link Vector3D}
 * and {@link Rotation} objects, one object per intermediate result. Same formulas and conventions
 * as the library ({@code R} maps base components to frame components: {@code rot.applyTo});
 * w and al of the frame relative to its base, resolved in the frame).
 */
public final class ObjectBaseline {

    private ObjectBaseline() {
    }

    /**
     * Where a frame sits in its base, as a user would hold it.
     *
     * @param origin o in base axes (m)
     * @param originVelocity o' in base axes (m/s)
     * @param originAcceleration o'' in base axes (m/s^2)
     * @param rotation R, applyTo maps base components to frame components
     * @param angularVelocity w in frame axes (rad/s)
     * @param angularAcceleration al in frame axes (rad/s^2)
     */
    public record Pose(Vector3D origin, Vector3D originVelocity, Vector3D originAcceleration, Rotation rotation,
                       Vector3D angularVelocity, Vector3D angularAcceleration) {
    }

    /**
     * Position, velocity and acceleration of a point, as a user would hold them.
     *
     * @param position position (m)
     * @param velocity velocity (m/s)
     * @param acceleration acceleration (m/s^2)
     */
    public record Kinematics(Vector3D position, Vector3D velocity, Vector3D acceleration) {
    }

    /**
     * The four fictitious terms, as a user would hold them.
     *
     * @param frame -R o'' (m/s^2)
     * @param euler -al x r (m/s^2)
     * @param coriolis -2 w x v (m/s^2)
     * @param centrifugal -w x (w x r) (m/s^2)
     */
    public record Inertial(Vector3D frame, Vector3D euler, Vector3D coriolis, Vector3D centrifugal) {
    }

    /** @return the scenario's placement as a pose */
    public static Pose scenarioPose() {
        return new Pose(Scenario.ORIGIN, Scenario.ORIGIN_VELOCITY, Scenario.ORIGIN_ACCELERATION,
                Scenario.ORIENTATION, Scenario.ANGULAR_VELOCITY, Scenario.ANGULAR_ACCELERATION);
    }

    /**
     * Frame to base.
     *
     * @param p pose of the frame in the base
     * @param r position in the frame
     * @param v velocity seen in the frame
     * @param a acceleration seen in the frame
     * @return the state seen in the base
     */
    public static Kinematics toBase(Pose p, Vector3D r, Vector3D v, Vector3D a) {
        Rotation rot = p.rotation();
        Vector3D w = p.angularVelocity();
        Vector3D wr = Vector3D.crossProduct(w, r);
        Vector3D rb = p.origin().add(rot.applyInverseTo(r));
        Vector3D vb = p.originVelocity().add(rot.applyInverseTo(v.add(wr)));
        Vector3D af = a.add(Vector3D.crossProduct(p.angularAcceleration(), r))
                .add(Vector3D.crossProduct(w, v).scalarMultiply(2))
                .add(Vector3D.crossProduct(w, wr));
        Vector3D ab = p.originAcceleration().add(rot.applyInverseTo(af));
        return new Kinematics(rb, vb, ab);
    }

    /**
     * Base to frame.
     *
     * @param p pose of the frame in the base
     * @param rb position in the base
     * @param vb velocity seen in the base
     * @param ab acceleration seen in the base
     * @return the state seen in the frame
     */
    public static Kinematics fromBase(Pose p, Vector3D rb, Vector3D vb, Vector3D ab) {
        Rotation rot = p.rotation();
        Vector3D w = p.angularVelocity();
        Vector3D r = rot.applyTo(rb.subtract(p.origin()));
        Vector3D wr = Vector3D.crossProduct(w, r);
        Vector3D v = rot.applyTo(vb.subtract(p.originVelocity())).subtract(wr);
        Vector3D a = rot.applyTo(ab.subtract(p.originAcceleration()))
                .subtract(Vector3D.crossProduct(p.angularAcceleration(), r))
                .subtract(Vector3D.crossProduct(w, v).scalarMultiply(2))
                .subtract(Vector3D.crossProduct(w, wr));
        return new Kinematics(r, v, a);
    }

    /**
     * The fictitious accelerations in the frame.
     *
     * @param p pose of the frame in the base
     * @param r position in the frame
     * @param v velocity seen in the frame
     * @return the four terms in frame axes
     */
    public static Inertial fictitious(Pose p, Vector3D r, Vector3D v) {
        Vector3D w = p.angularVelocity();
        return new Inertial(p.rotation().applyTo(p.originAcceleration()).negate(),
                Vector3D.crossProduct(p.angularAcceleration(), r).negate(),
                Vector3D.crossProduct(w, v).scalarMultiply(-2),
                Vector3D.crossProduct(w, Vector3D.crossProduct(w, r)).negate());
    }

    /**
     * Composition: outer is F in B, inner is G in F; the result is G in B.
     *
     * @param outer F in B
     * @param inner G in F
     * @return G in B
     */
    public static Pose compose(Pose outer, Pose inner) {
        Kinematics origin = toBase(outer, inner.origin(), inner.originVelocity(), inner.originAcceleration());
        Rotation rq = inner.rotation();
        Vector3D tw = rq.applyTo(outer.angularVelocity());
        Vector3D ta = rq.applyTo(outer.angularAcceleration());
        Vector3D wq = inner.angularVelocity();
        return new Pose(origin.position(), origin.velocity(), origin.acceleration(),
                rq.applyTo(outer.rotation()), wq.add(tw),
                inner.angularAcceleration().add(ta).subtract(Vector3D.crossProduct(wq, tw)));
    }

    /**
     * Link {@code link} of the benchmark chain at time t, hand-coded from {@link ChainLaws}.
     *
     * @param link 0 to 5
     * @param t time (s)
     * @return the pose of the link in its parent
     */
    public static Pose link(int link, double t) {
        switch (link) {
            case 0:
                return turn(ChainLaws.AXIS0, ChainLaws.ANGLE0 + ChainLaws.RATE0 * t, ChainLaws.RATE0, 0.0);
            case 1: {
                double arg = ChainLaws.FREQUENCY1 * t + ChainLaws.PHASE1;
                double x = ChainLaws.AMPLITUDE1 * Math.sin(arg);
                double xd = ChainLaws.AMPLITUDE1 * ChainLaws.FREQUENCY1 * Math.cos(arg);
                double xdd = -ChainLaws.FREQUENCY1 * ChainLaws.FREQUENCY1 * x;
                Vector3D d = ChainLaws.DIRECTION1;
                return new Pose(d.scalarMultiply(x), d.scalarMultiply(xd), d.scalarMultiply(xdd), Rotation.IDENTITY,
                        Vector3D.ZERO, Vector3D.ZERO);
            }
            case 2:
                return swing(ChainLaws.AXIS2, ChainLaws.AMPLITUDE2, ChainLaws.FREQUENCY2, ChainLaws.PHASE2, t);
            case 3:
                return turn(ChainLaws.AXIS3,
                        ChainLaws.ANGLE3 + t * (ChainLaws.RATE3 + 0.5 * ChainLaws.ACCELERATION3 * t),
                        ChainLaws.RATE3 + ChainLaws.ACCELERATION3 * t, ChainLaws.ACCELERATION3);
            case 4:
                return new Pose(ChainLaws.C0.add(t, ChainLaws.C1).add(t * t, ChainLaws.C2),
                        ChainLaws.C1.add(2 * t, ChainLaws.C2), ChainLaws.C2.scalarMultiply(2), Rotation.IDENTITY,
                        Vector3D.ZERO, Vector3D.ZERO);
            case 5:
                return swing(ChainLaws.AXIS5, ChainLaws.AMPLITUDE5, ChainLaws.FREQUENCY5, ChainLaws.PHASE5, t);
            default:
                throw new IllegalArgumentException("link must be in [0, 5], got " + link);
        }
    }

    /**
     * The chain of the first {@code depth} links, composed from the outermost.
     *
     * @param depth 1 to 6
     * @param t time (s)
     * @return the pose of the innermost frame in the root
     */
    public static Pose chain(int depth, double t) {
        Pose p = link(0, t);
        for (int i = 1; i < depth; i++) {
            p = compose(p, link(i, t));
        }
        return p;
    }

    private static Pose swing(Vector3D axis, double amplitude, double frequency, double phase, double t) {
        double arg = frequency * t + phase;
        double s = Math.sin(arg);
        return turn(axis, amplitude * s, amplitude * frequency * Math.cos(arg), -amplitude * frequency * frequency * s);
    }

    private static Pose turn(Vector3D axis, double angle, double rate, double acceleration) {
        return new Pose(Vector3D.ZERO, Vector3D.ZERO, Vector3D.ZERO,
                new Rotation(axis, angle, RotationConvention.FRAME_TRANSFORM),
                axis.scalarMultiply(rate), axis.scalarMultiply(acceleration));
    }
}
