package dev.noninertial.frames.dispersion;

import dev.noninertial.frames.Arguments;

import java.util.Arrays;
import java.util.List;

import dev.noninertial.frames.Formats;

/**
 * The drawn inputs of one case of a {@link DispersionStudy}: the case index and one value per
 * named input, in the study's declaration order.
 *
 * <p>Immutable and thread-safe. Look-up by name is a linear search over the (few) input names;
 * models called millions of times can read {@link #value(int)} by position instead.
 */
public final class DispersionCase {

    private final long index;
    private final List<String> names;
    private final double[] values;

    DispersionCase(long index, List<String> names, double[] values) {
        this.index = index;
        this.names = names;
        this.values = values;
    }

    /**
     * The case index (0 for the first case).
     *
     * @return the index
     */
    public long index() {
        return index;
    }

    /**
     * The value of a named input.
     *
     * @param name the input's name as declared in the study
     * @return its drawn value
     * @throws IllegalArgumentException if the study has no input of that name
     */
    public double value(String name) {
        Arguments.nonNull("name", name);
        int i = names.indexOf(name);
        if (i < 0) {
            throw new IllegalArgumentException("name must be one of " + names + ", got '" + name + "'");
        }
        return values[i];
    }

    /**
     * The value of the input at a position.
     *
     * @param position position in the study's declaration order, in [0, count)
     * @return its drawn value
     * @throws IllegalArgumentException if {@code position} is out of range
     */
    public double value(int position) {
        if (position < 0 || position >= values.length) {
            throw new IllegalArgumentException(
                    "position must be in [0, " + (values.length - 1) + "], got " + position);
        }
        return values[position];
    }

    /**
     * The input names in declaration order.
     *
     * @return unmodifiable list
     */
    public List<String> names() {
        return names;
    }

    /**
     * A copy of the drawn values in declaration order.
     *
     * @return new array
     */
    public double[] values() {
        return values.clone();
    }

    /** Direct access for the runners (no copy). */
    double[] valuesUnsafe() {
        return values;
    }

    @Override
    public String toString() {
        StringBuilder text = new StringBuilder("DispersionCase[").append(index);
        for (int i = 0; i < values.length; i++) {
            text.append(", ").append(names.get(i)).append('=').append(Formats.number(values[i]));
        }
        return text.append(']').toString();
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof DispersionCase c && c.index == index && c.names.equals(names)
                && Arrays.equals(c.values, values);
    }

    @Override
    public int hashCode() {
        return Long.hashCode(index) * 31 + Arrays.hashCode(values);
    }
}
