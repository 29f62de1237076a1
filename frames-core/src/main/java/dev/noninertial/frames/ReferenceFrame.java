package dev.noninertial.frames;

import java.io.Serializable;
import java.util.Optional;

/**
 * An immutable node of a frame tree: a name, a parent (none for a root) and the {@link Motion}
 * that places this frame in its parent.
 *
 * <p>A tree starts with {@link #inertialRoot(String)}; children are made with
 * {@link #attach(String, Motion)}. A frame never holds its children, so trees are immutable and
 * can be shared freely between threads. Frames compare by identity: two frames attached with the
 * same name and motion are still two frames.
 *
 * <p>Immutable and thread-safe, provided the motions are (all motions of this library are).
 */
public final class ReferenceFrame implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Readable name given at creation. */
    private final String name;
    /** Parent frame, null for a root. */
    private final ReferenceFrame parent;
    /** Placement of this frame in its parent over time, null for a root. */
    private final Motion motion;
    /** Number of links from the root. */
    private final int depth;

    private ReferenceFrame(String name, ReferenceFrame parent, Motion motion) {
        this.name = name;
        this.parent = parent;
        this.motion = motion;
        this.depth = parent == null ? 0 : parent.depth + 1;
    }

    /**
     * A root frame, declared inertial: fictitious accelerations of every frame in the tree are
     * measured against it.
     *
     * @param name readable name, not blank
     * @return the root
     */
    public static ReferenceFrame inertialRoot(String name) {
        return new ReferenceFrame(checkName(name), null, null);
    }

    /**
     * A child frame moving in this one.
     *
     * @param childName readable name, not blank
     * @param childMotion placement of the child in this frame as a function of time
     * @return the new child
     */
    public ReferenceFrame attach(String childName, Motion childMotion) {
        Arguments.nonNull("childMotion", childMotion);
        return new ReferenceFrame(checkName(childName), this, childMotion);
    }

    private static String checkName(String name) {
        Arguments.nonNull("name", name);
        if (name.isBlank()) {
            throw new IllegalArgumentException("name must not be blank");
        }
        return name;
    }

    /** @return the name given at creation */
    public String name() {
        return name;
    }

    /** @return the parent, empty for a root */
    public Optional<ReferenceFrame> parent() {
        return Optional.ofNullable(parent);
    }

    /** @return the motion in the parent, empty for a root */
    public Optional<Motion> motion() {
        return Optional.ofNullable(motion);
    }

    /** @return number of links from the root (0 for a root) */
    public int depth() {
        return depth;
    }

    /** @return the root of this frame's tree (itself for a root) */
    public ReferenceFrame root() {
        ReferenceFrame f = this;
        while (f.parent != null) {
            f = f.parent;
        }
        return f;
    }

    /** @return true for a root, which is inertial by declaration */
    public boolean isInertialRoot() {
        return parent == null;
    }

    /** @return names from the root down to this frame, separated by '/' */
    public String path() {
        return parent == null ? name : parent.path() + "/" + name;
    }

    /**
     * Placement of this frame in {@code base} at time {@code t}, through their nearest common
     * ancestor.
     *
     * @param base the base frame, in the same tree
     * @param t time (s)
     * @return this frame relative to {@code base}
     * @throws IllegalArgumentException if the frames have no common root or {@code t} is not finite
     */
    public Placement placementIn(ReferenceFrame base, double t) {
        Arguments.nonNull("base", base);
        Arguments.finite("t", t);
        ReferenceFrame a = this;
        ReferenceFrame b = base;
        while (a.depth > b.depth) {
            a = a.parent;
        }
        while (b.depth > a.depth) {
            b = b.parent;
        }
        while (a != b) {
            a = a.parent;
            b = b.parent;
            if (a == null) {
                throw new IllegalArgumentException("frames '" + path() + "' and '" + base.path()
                        + "' share no root: they belong to different frame trees");
            }
        }
        Placement self = placementInAncestor(a, t);
        if (base == a) {
            return self;
        }
        return base.placementInAncestor(a, t).inverse().then(self);
    }

    /** Placement of this frame in one of its ancestors (or itself). */
    private Placement placementInAncestor(ReferenceFrame ancestor, double t) {
        if (this == ancestor) {
            return Placement.identity();
        }
        if (parent != ancestor) {
            // two links or more: compose on primitives, one scratch array instead of two
            // placements per link; same arithmetic as then(), hence the same bits
            double[] work = new double[2 * Placement.COMPONENTS];
            placeInAncestor(ancestor, t, work);
            return Placement.fromArray(work, 0);
        }
        Placement local = motion.at(t);
        if (local == null) {
            throw new IllegalStateException("motion of frame '" + path() + "' returned null at t = " + t);
        }
        return local;
    }

    /** Writes the placement of this frame in a strict ancestor into work[0, 24); work[24, 48) is scratch. */
    private void placeInAncestor(ReferenceFrame ancestor, double t, double[] work) {
        if (parent == ancestor) {
            writeLocal(t, work, 0);
            return;
        }
        parent.placeInAncestor(ancestor, t, work);
        writeLocal(t, work, Placement.COMPONENTS);
        Placement.compose(work, 0, work, Placement.COMPONENTS, work, 0);
    }

    /** This frame's motion on primitives; a motion that returns null is reported with the frame's path. */
    private void writeLocal(double t, double[] work, int offset) {
        try {
            motion.at(t, work, offset);
        } catch (IllegalStateException e) {
            throw new IllegalStateException("motion of frame '" + path() + "' failed at t = " + t + ": "
                    + e.getMessage(), e);
        }
    }

    /**
     * Tags a state seen in this frame with the frame and a time.
     *
     * @param t time (s)
     * @param stateInThisFrame state seen in and resolved in this frame
     * @return the framed state
     */
    public FramedState stateAt(double t, PointState stateInThisFrame) {
        return new FramedState(this, t, stateInThisFrame);
    }

    @Override
    public String toString() {
        return "ReferenceFrame{" + path() + (parent == null ? ", inertial root}" : "}");
    }
}
