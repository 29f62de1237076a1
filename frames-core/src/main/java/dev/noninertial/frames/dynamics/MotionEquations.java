package dev.noninertial.frames.dynamics;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.OrdinaryDifferentialEquation;

import dev.noninertial.frames.FictitiousAccelerations;
import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;

/**
 * Newton's law written in a possibly non-inertial frame F, state y = (r, v) seen in F:
 * r' = v, v' = f_real - R o'' - al x r - 2 w x v - w x (w x r), with the placement of F in the
 * inertial root. Stateless after construction, so one instance serves a run and every later
 * query of its trajectory, from any thread.
 */
final class MotionEquations implements OrdinaryDifferentialEquation {

    private final ReferenceFrame frame;
    private final ReferenceFrame root;
    private final SpecificForce[] forces;
    /** Inertial terms left out (budget runs only; empty for physical runs). */
    private final Set<InertialTerm> omitted;

    MotionEquations(ReferenceFrame frame, List<SpecificForce> forces) {
        this(frame, forces, EnumSet.allOf(InertialTerm.class));
    }

    MotionEquations(ReferenceFrame frame, List<SpecificForce> forces, Set<InertialTerm> included) {
        this.frame = frame;
        this.root = frame.root();
        this.forces = forces.toArray(new SpecificForce[0]);
        EnumSet<InertialTerm> out = EnumSet.allOf(InertialTerm.class);
        out.removeAll(included);
        this.omitted = out;
    }

    ReferenceFrame frame() {
        return frame;
    }

    @Override
    public int getDimension() {
        return 6;
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        checkState(t, y);
        PointState s = PointState.of(new Vector3D(y[0], y[1], y[2]), new Vector3D(y[3], y[4], y[5]));
        Vector3D f = realForce(t, y, s);
        // the four terms come from the kinematics kernel, the one formula of the library
        // left-out terms (budget runs only) are zero here
        FictitiousAccelerations k = kept(placement(t, y).fictitious(s));
        Vector3D fr = k.frameAcceleration();
        Vector3D eu = k.euler();
        Vector3D co = k.coriolis();
        Vector3D ce = k.centrifugal();
        double[] d = {y[3], y[4], y[5],
            f.getX() + fr.getX() + eu.getX() + co.getX() + ce.getX(),
            f.getY() + fr.getY() + eu.getY() + co.getY() + ce.getY(),
            f.getZ() + fr.getZ() + eu.getZ() + co.getZ() + ce.getZ()};
        if (!Double.isFinite(d[3]) || !Double.isFinite(d[4]) || !Double.isFinite(d[5])) {
            throw new TrajectoryFailure("the acceleration overflows: real forces " + f + " m/s^2 plus the inertial terms "
                    + k + " of frame '" + frame.path() + "'", t, y, null);
        }
        return d;
    }

    /** The four terms with the left-out ones set to zero. */
    private FictitiousAccelerations kept(FictitiousAccelerations f) {
        if (omitted.isEmpty()) {
            return f;
        }
        return new FictitiousAccelerations(
                omitted.contains(InertialTerm.FRAME_ACCELERATION) ? Vector3D.ZERO : f.frameAcceleration(),
                omitted.contains(InertialTerm.EULER) ? Vector3D.ZERO : f.euler(),
                omitted.contains(InertialTerm.CORIOLIS) ? Vector3D.ZERO : f.coriolis(),
                omitted.contains(InertialTerm.CENTRIFUGAL) ? Vector3D.ZERO : f.centrifugal());
    }

    /** The point with its acceleration from the equations of motion, tagged with F and t. */
    FramedState framed(double t, double[] y) {
        TrajectorySample s = sample(t, y);
        return s.state();
    }

    /** Full breakdown at (t, y). */
    TrajectorySample sample(double t, double[] y) {
        checkState(t, y);
        PointState bare = PointState.of(new Vector3D(y[0], y[1], y[2]), new Vector3D(y[3], y[4], y[5]));
        Vector3D f = realForce(t, y, bare);
        FictitiousAccelerations fict = kept(placement(t, y).fictitious(bare));
        PointState full = bare.withAcceleration(f.add(fict.total()));
        return new TrajectorySample(FramedState.of(frame, t, full), f, fict);
    }

    /** Sum of the real forces at (t, y). */
    Vector3D realForce(double t, double[] y) {
        return realForce(t, y, PointState.of(new Vector3D(y[0], y[1], y[2]), new Vector3D(y[3], y[4], y[5])));
    }

    /** Sum of the real forces, refused with time and state when a force misbehaves. */
    Vector3D realForce(double t, double[] y, PointState s) {
        if (forces.length == 0) {
            return Vector3D.ZERO;
        }
        double fx = 0;
        double fy = 0;
        double fz = 0;
        for (int i = 0; i < forces.length; i++) {
            Vector3D f;
            try {
                f = forces[i].at(t, s);
            } catch (TrajectoryFailure e) {
                throw e;
            } catch (RuntimeException e) {
                // an argument refusal may come from a trial step probing past the force's region:
                // the solver then adds the hint about a step limit (not for other exceptions)
                throw new TrajectoryFailure("specific force #" + i + " (" + forces[i] + ") threw " + e, t, y, e,
                        e instanceof IllegalArgumentException);
            }
            if (f == null) {
                throw new TrajectoryFailure("specific force #" + i + " returned null", t, y, null);
            }
            if (!Double.isFinite(f.getX()) || !Double.isFinite(f.getY()) || !Double.isFinite(f.getZ())) {
                throw new TrajectoryFailure("specific force #" + i + " returned a non-finite value ("
                        + f.getX() + ", " + f.getY() + ", " + f.getZ() + ") m/s^2", t, y, null);
            }
            fx += f.getX();
            fy += f.getY();
            fz += f.getZ();
            if (!Double.isFinite(fx) || !Double.isFinite(fy) || !Double.isFinite(fz)) {
                throw new TrajectoryFailure("the sum of the specific forces overflows when force #" + i + " ("
                        + forces[i] + ") adds (" + f.getX() + ", " + f.getY() + ", " + f.getZ() + ") m/s^2", t, y, null);
            }
        }
        return new Vector3D(fx, fy, fz);
    }

    private Placement placement(double t, double[] y) {
        try {
            return frame.placementIn(root, t);
        } catch (RuntimeException e) {
            throw new TrajectoryFailure("motion of frame '" + frame.path() + "' failed (" + e.getMessage() + ")",
                    t, y, e);
        }
    }

    static void checkState(double t, double[] y) {
        for (double c : y) {
            if (!Double.isFinite(c)) {
                throw new TrajectoryFailure("state became non-finite", t, y, null);
            }
        }
    }
}
