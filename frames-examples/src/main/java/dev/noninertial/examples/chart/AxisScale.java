package dev.noninertial.examples.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A linear axis span widened to round tick values (steps of 1, 2 or 5 times a power of ten),
 * with the tick texts.
 *
 * <p>Immutable and thread-safe.
 */
final class AxisScale {

    /** Aim for about this many intervals between ticks. */
    private static final int TARGET_INTERVALS = 5;

    final double low;
    final double high;
    final double step;
    private final int decimals;
    private final boolean scientific;

    private AxisScale(double low, double high, double step) {
        this.low = low;
        this.high = high;
        this.step = step;
        double largest = Math.max(Math.abs(low), Math.abs(high));
        this.scientific = step < 1e-3 || largest >= 1e6;
        this.decimals = Math.max(0, (int) -Math.floor(Math.log10(step) + 1e-9));
    }

    /**
     * The scale covering [min, max]. An empty span (min == max) is widened around the value, so
     * that a constant curve (for example a zero Coriolis term) still gets a readable axis.
     */
    static AxisScale covering(double min, double max) {
        if (!(min <= max)) {
            throw new IllegalArgumentException("min must be <= max, got " + min + " and " + max);
        }
        if (min == max) {
            double pad = min == 0.0 ? 1.0 : Math.abs(min) * 0.1;
            min -= pad;
            max += pad;
        }
        double step = niceStep((max - min) / TARGET_INTERVALS);
        double low = Math.floor(min / step + 1e-9) * step;
        double high = Math.ceil(max / step - 1e-9) * step;
        return new AxisScale(low, high, step);
    }

    /**
     * The scale spanning exactly [min, max] (for a horizontal axis such as time, whose data
     * range is meaningful), with round ticks inside it.
     */
    static AxisScale spanning(double min, double max) {
        if (!(min < max)) {
            return covering(min, max);
        }
        return new AxisScale(min, max, niceStep((max - min) / TARGET_INTERVALS));
    }

    private static double niceStep(double raw) {
        double power = Math.pow(10, Math.floor(Math.log10(raw)));
        double mantissa = raw / power;
        double nice;
        if (mantissa <= 1.0 + 1e-9) {
            nice = 1;
        } else if (mantissa <= 2.0 + 1e-9) {
            nice = 2;
        } else if (mantissa <= 5.0 + 1e-9) {
            nice = 5;
        } else {
            nice = 10;
        }
        return nice * power;
    }

    /** Tick values from low to high inclusive. */
    List<Double> ticks() {
        List<Double> ticks = new ArrayList<>();
        long first = (long) Math.ceil(low / step - 1e-9);
        long last = (long) Math.floor(high / step + 1e-9);
        for (long k = first; k <= last; k++) {
            double v = k * step;
            // print 0 as 0, not as a rounding residue such as -1.1e-17
            ticks.add(Math.abs(v) < step * 1e-9 ? 0.0 : v);
        }
        return ticks;
    }

    /** Text of one tick value. */
    String label(double value) {
        if (value == 0.0) {
            return "0";
        }
        if (scientific) {
            return String.format(Locale.ROOT, "%.2e", value).replace("e-0", "e-").replace("e+0", "e")
                    .replace("e+", "e");
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }

    /** Maps a value to a pixel coordinate between {@code from} (at low) and {@code to} (at high). */
    double toPixel(double value, double from, double to) {
        return from + (value - low) / (high - low) * (to - from);
    }
}
