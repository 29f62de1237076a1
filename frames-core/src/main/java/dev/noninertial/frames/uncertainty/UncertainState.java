package dev.noninertial.frames.uncertainty;

import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Arrays;
import java.util.Optional;

import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

import dev.noninertial.frames.Arguments;
import dev.noninertial.frames.Formats;
import dev.noninertial.frames.FramedState;
import dev.noninertial.frames.Placement;
import dev.noninertial.frames.PointState;
import dev.noninertial.frames.ReferenceFrame;

/**
 * A mean {@link FramedState} with the covariance of its error: frame, time and state layout are
 * carried together, so a covariance cannot be applied in the wrong frame or at the wrong time.
 *
 * <h2>Conventions</h2>
 * The covariance is over the state components seen in and resolved in {@link #frame()}, in the
 * order of {@link StateLayout}: position (m), velocity (m/s) and, for the nine-component layout,
 * acceleration (m/s^2). The layout follows from the matrix size (6x6 or 9x9). For a six-component
 * layout the mean's acceleration is converted with the mean but carries no uncertainty.
 *
 * <h2>Conversion</h2>
 * {@link #in(ReferenceFrame)} converts the mean with {@link Placement#toBase(PointState)} of
 * {@code frame().placementIn(target, time())} and the covariance by {@code J P J^T}, with J the
 * exact Jacobian of that conversion ({@link StateJacobians#toBase(Placement, StateLayout)}).
 * Conversions between frames are affine in the state, so this propagation is exact (no
 * linearisation) whatever the size of the covariance. The result is symmetrised,
 * {@code (M + M^T) / 2}, to remove rounding asymmetry.
 *
 * <p>{@link #toParent(PlacementUncertainty)} and
 * {@link #toChild(ReferenceFrame, PlacementUncertainty)} also add, to first order, the uncertainty
 * of the placement of a frame in its parent (see {@link PlacementUncertainty} for the
 * perturbation convention). Only these steps across one link of the tree take a placement
 * uncertainty, so that it is always clear which placement it belongs to.
 *
 * <p>The results are only as good as the covariance given; for navigation and safety-relevant
 * tracking, validate the whole filter against local practice and the applicable standards.
 *
 * <p>Immutable and thread-safe.
 */
public final class UncertainState implements Serializable {

    private static final long serialVersionUID = 1L;

    /** The mean state with its frame and time. */
    private final FramedState mean;
    /** Which components the covariance covers. */
    private final StateLayout layout;
    /** The covariance, symmetric positive semidefinite, {@code layout.size()} square. */
    private final double[][] covariance;

    private UncertainState(FramedState mean, StateLayout layout, double[][] covariance) {
        this.mean = mean;
        this.layout = layout;
        this.covariance = covariance;
    }

    /**
     * A state with its covariance.
     *
     * @param mean the mean state, with its frame and time
     * @param covariance 6x6 (position, velocity) or 9x9 (position, velocity, acceleration)
     *        covariance, in the frame of {@code mean}
     * @return the uncertain state
     * @throws NullPointerException if an argument is null
     * @throws IllegalArgumentException if the covariance is not 6x6 or 9x9 or is refused by
     *         {@link CovarianceCheck}
     */
    public static UncertainState of(FramedState mean, RealMatrix covariance) {
        Arguments.nonNull("mean", mean);
        Arguments.nonNull("covariance", covariance);
        if (covariance.getRowDimension() != covariance.getColumnDimension()) {
            throw new IllegalArgumentException("covariance must be square (6x6 or 9x9), got "
                    + covariance.getRowDimension() + "x" + covariance.getColumnDimension());
        }
        StateLayout layout = StateLayout.ofSize("covariance", covariance.getRowDimension());
        return new UncertainState(mean, layout, CovarianceCheck.checkedCopy("covariance", covariance, layout.size()));
    }

    /**
     * Returns the mean state, tagged with frame and time.
     *
     * @return the mean state, tagged with frame and time
     */
    public FramedState mean() {
        return mean;
    }

    /**
     * Returns the frame the mean and the covariance are seen in and resolved in.
     *
     * @return the frame the mean and the covariance are seen in and resolved in
     */
    public ReferenceFrame frame() {
        return mean.frame();
    }

    /**
     * Returns time (s).
     *
     * @return time (s)
     */
    public double time() {
        return mean.time();
    }

    /**
     * Returns which components the covariance covers.
     *
     * @return which components the covariance covers
     */
    public StateLayout layout() {
        return layout;
    }

    /**
     * Returns a new copy of the covariance, {@code layout().size()} square.
     *
     * @return a new copy of the covariance, {@code layout().size()} square
     */
    public RealMatrix covariance() {
        return MatrixUtils.createRealMatrix(covariance);
    }

    /**
     * The standard deviations of the components.
     *
     * @return a new array of the square roots of the variances, in layout order (m, m/s, m/s^2)
     */
    public double[] standardDeviations() {
        double[] s = new double[layout.size()];
        for (int i = 0; i < s.length; i++) {
            s[i] = Math.sqrt(covariance[i][i]);
        }
        return s;
    }

    /**
     * A copy with the same mean and another covariance of the same layout.
     *
     * @param newCovariance covariance in {@link #frame()}
     * @return the copy
     * @throws IllegalArgumentException if the matrix is refused by {@link CovarianceCheck}
     */
    public UncertainState withCovariance(RealMatrix newCovariance) {
        return new UncertainState(mean, layout, CovarianceCheck.checkedCopy("newCovariance", newCovariance, layout.size()));
    }

    /**
     * The same uncertain state seen in another frame of the same tree, at the same time; the
     * placements along the tree are taken as exact.
     *
     * @param target frame to convert to
     * @return mean and covariance seen in and resolved in {@code target}
     * @throws IllegalArgumentException if the frames share no root
     */
    public UncertainState in(ReferenceFrame target) {
        Arguments.nonNull("target", target);
        if (target == frame()) {
            return this;
        }
        return convert(target, frame().placementIn(target, time()), true, PlacementUncertainty.none());
    }

    /**
     * Converts to the parent frame, adding the uncertainty of this frame's placement in its parent.
     *
     * @param uncertainty uncertainty of the placement of {@link #frame()} in its parent
     *        (attitude error resolved in {@link #frame()}, origin error resolved in the parent)
     * @return mean and covariance seen in and resolved in the parent
     * @throws IllegalArgumentException if {@link #frame()} is a root
     */
    public UncertainState toParent(PlacementUncertainty uncertainty) {
        Arguments.nonNull("uncertainty", uncertainty);
        Optional<ReferenceFrame> parent = frame().parent();
        if (parent.isEmpty()) {
            throw new IllegalArgumentException("frame '" + frame().path() + "' is a root and has no parent");
        }
        return convert(parent.get(), frame().placementIn(parent.get(), time()), true, uncertainty);
    }

    /**
     * Converts to a child frame of {@link #frame()}, adding the uncertainty of the child's
     * placement in this frame.
     *
     * @param child a frame whose parent is {@link #frame()}
     * @param uncertainty uncertainty of the placement of {@code child} in {@link #frame()}
     *        (attitude error resolved in {@code child}, origin error resolved in {@link #frame()})
     * @return mean and covariance seen in and resolved in {@code child}
     * @throws IllegalArgumentException if {@code child} is not a child of {@link #frame()}
     */
    public UncertainState toChild(ReferenceFrame child, PlacementUncertainty uncertainty) {
        Arguments.nonNull("child", child);
        Arguments.nonNull("uncertainty", uncertainty);
        if (child.parent().orElse(null) != frame()) {
            throw new IllegalArgumentException("child '" + child.path() + "' must have '" + frame().path()
                    + "' as parent, its parent is " + child.parent().map(ReferenceFrame::path).orElse("none (a root)"));
        }
        return convert(child, child.placementIn(frame(), time()), false, uncertainty);
    }

    private UncertainState convert(ReferenceFrame target, Placement placement, boolean toBase,
                                   PlacementUncertainty uncertainty) {
        PointState state = mean.state();
        RealMatrix j = toBase ? StateJacobians.toBase(placement, layout) : StateJacobians.fromBase(placement, layout);
        RealMatrix out = j.multiply(MatrixUtils.createRealMatrix(covariance)).multiplyTransposed(j);
        if (!uncertainty.equals(PlacementUncertainty.none())) {
            RealMatrix je = toBase ? StateJacobians.attitudeToBase(placement, state, layout)
                    : StateJacobians.attitudeFromBase(placement, state, layout);
            RealMatrix jd = toBase ? StateJacobians.originToBase(placement, layout)
                    : StateJacobians.originFromBase(placement, layout);
            out = out.add(je.multiply(uncertainty.attitudeCovariance()).multiplyTransposed(je))
                    .add(jd.multiply(uncertainty.originCovariance()).multiplyTransposed(jd));
        }
        double[][] m = out.getData();
        for (int i = 0; i < m.length; i++) {
            for (int k = i + 1; k < m.length; k++) {
                double s = 0.5 * (m[i][k] + m[k][i]);
                m[i][k] = s;
                m[k][i] = s;
            }
        }
        PointState converted = toBase ? placement.toBase(state) : placement.fromBase(state);
        return new UncertainState(FramedState.of(target, time(), converted), layout, m);
    }

    /**
     * Reads the fields and re-checks them as {@link #of(FramedState, RealMatrix)} does: a mean, a
     * layout matching the covariance's size, and a covariance that {@link CovarianceCheck} accepts
     * (finite, non-negative variances, symmetric, positive semidefinite).
     *
     * @param in the stream
     * @throws IOException if the stream fails or holds a state the factory refuses
     * @throws ClassNotFoundException if a class of the stream is missing
     */
    private void readObject(ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        try {
            Arguments.nonNull("mean", mean);
            Arguments.nonNull("layout", layout);
            CovarianceCheck.checkStored("covariance", covariance, layout.size());
        } catch (IllegalArgumentException | NullPointerException e) {
            throw Arguments.refusedStream(UncertainState.class, e);
        }
    }

    @Override
    public boolean equals(Object other) {
        if (this == other) {
            return true;
        }
        if (!(other instanceof UncertainState)) {
            return false;
        }
        UncertainState u = (UncertainState) other;
        return mean.equals(u.mean) && layout == u.layout && Arrays.deepEquals(covariance, u.covariance);
    }

    @Override
    public int hashCode() {
        return (mean.hashCode() * 31 + layout.hashCode()) * 31 + Arrays.deepHashCode(covariance);
    }

    @Override
    public String toString() {
        double[] s = standardDeviations();
        StringBuilder text = new StringBuilder("UncertainState{frame=").append(frame().path())
                .append(", t=").append(Formats.number(time())).append(" s, r=")
                .append(Formats.vector(mean.state().position(), "m")).append(" sigma ")
                .append(Formats.vector(s[0], s[1], s[2], "m")).append(", v=")
                .append(Formats.vector(mean.state().velocity(), "m/s")).append(" sigma ")
                .append(Formats.vector(s[3], s[4], s[5], "m/s"));
        if (layout == StateLayout.POSITION_VELOCITY_ACCELERATION) {
            text.append(", a=").append(Formats.vector(mean.state().acceleration(), "m/s^2")).append(" sigma ")
                    .append(Formats.vector(s[6], s[7], s[8], "m/s^2"));
        }
        return text.append('}').toString();
    }
}
