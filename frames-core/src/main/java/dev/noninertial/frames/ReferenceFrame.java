package dev.noninertial.frames;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
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
 *
 * <p>Serialization goes through a proxy that rebuilds every frame with the same checks as
 * {@link #attach(String, Motion)}: a stream cannot make a frame its own ancestor, and chains of
 * any depth are written and read without deep recursion (each frame refers back to its
 * ancestors in a pattern that keeps the nesting of the stream logarithmic in the depth), while
 * frames shared in the object graph stay shared after reading.
 */
public final class ReferenceFrame implements Serializable {

    private static final long serialVersionUID = 1L;

    /** Readable name given at creation. */
    private final String name;
    /** Parent frame, null for a root. */
    private final ReferenceFrame parent;
    /** Placement of this frame in its parent over time, null for a root. */
    @SuppressWarnings("serial") // written with the frame: the library's motions are serializable, a user's must be too
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
        return new ReferenceFrame(checkName("name", name), null, null);
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
        return new ReferenceFrame(checkName("childName", childName), this, childMotion);
    }

    private static String checkName(String argument, String name) {
        Arguments.nonNull(argument, name);
        if (name.isBlank()) {
            throw new IllegalArgumentException(argument + " must not be blank");
        }
        return name;
    }

    /**
     * Returns the name given at creation.
     *
     * @return the name given at creation
     */
    public String name() {
        return name;
    }

    /**
     * Returns the parent, empty for a root.
     *
     * @return the parent, empty for a root
     */
    public Optional<ReferenceFrame> parent() {
        return Optional.ofNullable(parent);
    }

    /**
     * Returns the motion in the parent, empty for a root.
     *
     * @return the motion in the parent, empty for a root
     */
    public Optional<Motion> motion() {
        return Optional.ofNullable(motion);
    }

    /**
     * Returns number of links from the root (0 for a root).
     *
     * @return number of links from the root (0 for a root)
     */
    public int depth() {
        return depth;
    }

    /**
     * Returns the root of this frame's tree (itself for a root).
     *
     * @return the root of this frame's tree (itself for a root)
     */
    public ReferenceFrame root() {
        ReferenceFrame f = this;
        while (f.parent != null) {
            f = f.parent;
        }
        return f;
    }

    /**
     * Returns true for a root, which is inertial by declaration.
     *
     * @return true for a root, which is inertial by declaration
     */
    public boolean isInertialRoot() {
        return parent == null;
    }

    /**
     * The names from the root down to this frame, separated by '/'. Built by one walk up the
     * tree, in time linear in the length of the result (no recursion, so any depth works).
     *
     * @return the path, for example {@code "quay/crane/hook"}
     */
    public String path() {
        if (parent == null) {
            return name;
        }
        int length = -1;
        for (ReferenceFrame f = this; f != null; f = f.parent) {
            length += f.name.length() + 1;
        }
        char[] out = new char[length];
        int end = length;
        for (ReferenceFrame f = this; f != null; f = f.parent) {
            int start = end - f.name.length();
            f.name.getChars(0, f.name.length(), out, start);
            if (start > 0) {
                out[start - 1] = '/';
            }
            end = start - 1;
        }
        return new String(out);
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

    /**
     * Placement of this frame in one of its ancestors at time {@code t}, written on primitives in
     * the layout of {@link Placement#toArray(double[], int)} into
     * {@code work[offset, offset + Placement.COMPONENTS)}; the next {@link Placement#COMPONENTS}
     * doubles are used as scratch. Same arithmetic (hence the same bits) as
     * {@link #placementIn(ReferenceFrame, double)}; allocates nothing when the motions of the
     * chain override {@link Motion#at(double, double[], int)} (every motion of {@code Motions}
     * except {@code compose} does).
     *
     * <p>When to use it: on hot paths that need the placement in the inertial root (or another
     * ancestor) at many times, such as bulk sensor readings; elsewhere use
     * {@link #placementIn(ReferenceFrame, double)}.
     *
     * @param ancestor this frame or one of its ancestors (for example {@link #root()})
     * @param t time (s)
     * @param work destination and scratch, at least {@code offset + 2 * Placement.COMPONENTS} long
     * @param offset index where the result's o x component is written
     * @throws IllegalArgumentException if {@code ancestor} is not this frame or one of its ancestors,
     *         {@code t} is not finite, or the range does not fit the array
     */
    public void placementIn(ReferenceFrame ancestor, double t, double[] work, int offset) {
        Arguments.nonNull("ancestor", ancestor);
        Arguments.nonNull("work", work);
        Arguments.finite("t", t);
        if (offset < 0 || offset > work.length - 2 * Placement.COMPONENTS) {
            throw new IllegalArgumentException("offset must be in [0, " + (work.length - 2 * Placement.COMPONENTS)
                    + "] for a work array of length " + work.length + " (2 x " + Placement.COMPONENTS
                    + " doubles needed), got " + offset);
        }
        if (ancestor.depth > depth) {
            throw notAncestor(ancestor);
        }
        ReferenceFrame a = this;
        while (a.depth > ancestor.depth) {
            a = a.parent;
        }
        if (a != ancestor) {
            throw notAncestor(ancestor);
        }
        if (this == ancestor) {
            Placement.identity().toArray(work, offset);
            return;
        }
        // the same links composed in the same order as placeInAncestor, found by walking up
        // from this frame for each link (a few pointer steps) instead of collecting them in an array
        int links = depth - ancestor.depth;
        linkBelow(links - 1).writeLocal(t, work, offset);
        for (int i = links - 2; i >= 0; i--) {
            linkBelow(i).writeLocal(t, work, offset + Placement.COMPONENTS);
            Kinematics.compose(work, offset, work, offset + Placement.COMPONENTS, work, offset);
        }
        Kinematics.checkFinite(work, offset, Placement.COMPONENTS);
    }

    /** The frame {@code steps} links up from this one. */
    private ReferenceFrame linkBelow(int steps) {
        ReferenceFrame f = this;
        for (int k = 0; k < steps; k++) {
            f = f.parent;
        }
        return f;
    }

    private IllegalArgumentException notAncestor(ReferenceFrame ancestor) {
        return new IllegalArgumentException("ancestor '" + ancestor.path() + "' must be frame '" + path()
                + "' or one of its ancestors");
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
            return Placement.wrap(java.util.Arrays.copyOf(work, Placement.COMPONENTS));
        }
        Placement local = motion.at(t);
        if (local == null) {
            throw new IllegalStateException("motion of frame '" + path() + "' returned null at t = " + t);
        }
        return local;
    }

    /**
     * Writes the placement of this frame in a strict ancestor into work[0, 24); work[24, 48) is
     * scratch. Walks the tree iteratively (any depth, no recursion) and composes from the link
     * just below the ancestor down to this frame, in the order of successive {@code then} calls.
     */
    private void placeInAncestor(ReferenceFrame ancestor, double t, double[] work) {
        ReferenceFrame[] links = new ReferenceFrame[depth - ancestor.depth];
        int k = links.length;
        for (ReferenceFrame f = this; f != ancestor; f = f.parent) {
            links[--k] = f;
        }
        links[0].writeLocal(t, work, 0);
        for (int i = 1; i < links.length; i++) {
            links[i].writeLocal(t, work, Placement.COMPONENTS);
            Kinematics.compose(work, 0, work, Placement.COMPONENTS, work, 0);
        }
        // one check of the finished chain: a link's own primitive at may have written any value
        Kinematics.checkFinite(work, 0, Placement.COMPONENTS);
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
        Arguments.finite("t", t);
        Arguments.nonNull("stateInThisFrame", stateInThisFrame);
        return new FramedState(this, t, stateInThisFrame);
    }

    // ------------------------------------------------------------------ serialization

    /**
     * Replaces this frame in a stream by its proxy.
     *
     * @return the proxy
     */
    private Object writeReplace() {
        int from = depth & (depth - 1); // depth with its lowest set bit cleared
        Object[] ancestors = new Object[depth - from];
        ReferenceFrame f = parent;
        for (int i = ancestors.length - 1; i >= 0; i--) {
            ancestors[i] = f;
            f = f.parent;
        }
        return new Proxy(name, motion, depth, ancestors);
    }

    /**
     * Refuses a stream that bypasses the proxy.
     *
     * @param in the stream
     * @throws InvalidObjectException always
     */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw new InvalidObjectException("a ReferenceFrame is read only through its serialization proxy");
    }

    /**
     * The serialized form of a frame: its name, its motion, its depth and the ancestors from depth
     * {@code depth & (depth - 1)} to {@code depth - 1}, root side first. Writing them in that order
     * means every ancestor but the first was already written by an earlier element of the same
     * array, so the stream nests at most one level per set bit of the depth (17 levels for
     * 100,000 links) and holds about {@code n log2(n) / 2} references for a chain of n links.
     */
    private static final class Proxy implements Serializable {

        private static final long serialVersionUID = 1L;

        /** Name of the frame. */
        private final String name;
        /** Motion in the parent, null for a root. */
        @SuppressWarnings("serial") // written with the frame: the library's motions are serializable, a user's must be too
        private final Motion motion;
        /** Number of links from the root. */
        private final int depth;
        /** Ancestors at depths {@code depth & (depth - 1)} to {@code depth - 1}, root side first. */
        @SuppressWarnings("serial") // holds ReferenceFrame instances only
        private final Object[] ancestors;

        Proxy(String name, Motion motion, int depth, Object[] ancestors) {
            this.name = name;
            this.motion = motion;
            this.depth = depth;
            this.ancestors = ancestors;
        }

        /**
         * Rebuilds the frame with the checks of {@link ReferenceFrame#attach(String, Motion)}.
         *
         * @return the frame
         * @throws InvalidObjectException if the stream does not describe a frame of a tree
         */
        private Object readResolve() throws InvalidObjectException {
            try {
                if (depth < 0 || ancestors == null) {
                    throw new IllegalArgumentException("depth must be at least 0, got " + depth);
                }
                if (depth == 0) {
                    if (ancestors.length != 0 || motion != null) {
                        throw new IllegalArgumentException("a root has neither ancestors nor a motion");
                    }
                    return inertialRoot(name);
                }
                int from = depth & (depth - 1);
                if (ancestors.length != depth - from) {
                    throw new IllegalArgumentException("frame at depth " + depth + " must list "
                            + (depth - from) + " ancestors, got " + ancestors.length);
                }
                ReferenceFrame previous = null;
                for (int i = 0; i < ancestors.length; i++) {
                    if (!(ancestors[i] instanceof ReferenceFrame)) {
                        throw new IllegalArgumentException("ancestor " + i + " of frame '" + name
                                + "' is not a frame (a frame cannot be its own ancestor)");
                    }
                    ReferenceFrame a = (ReferenceFrame) ancestors[i];
                    if (a.depth != from + i || (previous != null && a.parent != previous)) {
                        throw new IllegalArgumentException("ancestor " + i + " of frame '" + name
                                + "' is not the parent of the ancestor before it");
                    }
                    previous = a;
                }
                return previous.attach(name, motion);
            } catch (IllegalArgumentException | NullPointerException e) {
                InvalidObjectException failure = new InvalidObjectException("corrupt frame: " + e.getMessage());
                failure.initCause(e);
                throw failure;
            }
        }
    }

    @Override
    public String toString() {
        return "ReferenceFrame{" + path() + (parent == null ? ", inertial root}" : "}");
    }
}
