package dev.noninertial.examples.chart;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

import dev.noninertial.frames.Arguments;

/**
 * A line chart drawn as a self-contained SVG document: title, two linear axes with round ticks,
 * axis labels with units, one polyline per {@link Curve} and a legend. The SVG needs no fonts,
 * scripts or style sheets from outside, so it displays offline.
 *
 * <p>Built by copies, for example
 * <pre>{@code
 * String svg = CurveSheet.titled("Spin-up")
 *         .withHorizontalAxis("time", "s")
 *         .withVerticalAxis("rate", "rad/s")
 *         .withCurve(Curve.of("table", new double[] {0, 1, 2}, new double[] {0, 0.5, 1.0}))
 *         .toSvg();
 * }</pre>
 *
 * <p>Immutable and thread-safe.
 */
public final class CurveSheet {

    /** Line colours, picked to stay apart for common colour-vision deficiencies. */
    private static final String[] COLOURS = {"#1b5e9e", "#c0392b", "#2b8a3e", "#b8860b", "#6b3fa0", "#444444"};
    /** Dash patterns paired with the colours, so curves stay apart in grey print too. */
    private static final String[] DASHES = {"", "8 4", "2 3", "10 3 2 3", "5 5", "1 2"};

    private static final int MARGIN_LEFT = 78;
    private static final int MARGIN_RIGHT = 24;
    private static final int MARGIN_TOP = 44;
    private static final int AXIS_BAND = 52;
    private static final int LEGEND_ROW = 20;

    private final String title;
    private final String horizontalQuantity;
    private final String horizontalUnit;
    private final String verticalQuantity;
    private final String verticalUnit;
    private final int width;
    private final int height;
    private final List<Curve> curves;

    private CurveSheet(String title, String horizontalQuantity, String horizontalUnit, String verticalQuantity,
                       String verticalUnit, int width, int height, List<Curve> curves) {
        this.title = title;
        this.horizontalQuantity = horizontalQuantity;
        this.horizontalUnit = horizontalUnit;
        this.verticalQuantity = verticalQuantity;
        this.verticalUnit = verticalUnit;
        this.width = width;
        this.height = height;
        this.curves = curves;
    }

    /**
     * An empty sheet, 720 by 420 pixels, with axes named "x" and "y" without units.
     *
     * @param title heading drawn above the plot, not null (may be empty)
     * @return the sheet
     */
    public static CurveSheet titled(String title) {
        Arguments.nonNull("title", title);
        return new CurveSheet(title, "x", "", "y", "", 720, 420, List.of());
    }

    /**
     * A copy with another horizontal axis label.
     *
     * @param quantity name of the quantity, for example "time"
     * @param unit unit text, for example "s"; empty for a dimensionless quantity
     * @return the copy
     */
    public CurveSheet withHorizontalAxis(String quantity, String unit) {
        Arguments.nonNull("quantity", quantity);
        Arguments.nonNull("unit", unit);
        return new CurveSheet(title, quantity, unit, verticalQuantity, verticalUnit, width, height, curves);
    }

    /**
     * A copy with another vertical axis label.
     *
     * @param quantity name of the quantity, for example "acceleration"
     * @param unit unit text, for example "m/s^2"; empty for a dimensionless quantity
     * @return the copy
     */
    public CurveSheet withVerticalAxis(String quantity, String unit) {
        Arguments.nonNull("quantity", quantity);
        Arguments.nonNull("unit", unit);
        return new CurveSheet(title, horizontalQuantity, horizontalUnit, quantity, unit, width, height, curves);
    }

    /**
     * A copy with another size.
     *
     * @param widthPixels width, in [320, 4000]
     * @param heightPixels height, in [200, 4000]
     * @return the copy
     * @throws IllegalArgumentException if a size is outside its range
     */
    public CurveSheet withSize(int widthPixels, int heightPixels) {
        Arguments.inRange("widthPixels", widthPixels, 320, 4000);
        Arguments.inRange("heightPixels", heightPixels, 200, 4000);
        return new CurveSheet(title, horizontalQuantity, horizontalUnit, verticalQuantity, verticalUnit,
                widthPixels, heightPixels, curves);
    }

    /**
     * A copy with one more curve, drawn after (on top of) the existing ones.
     *
     * @param curve the curve, in the units of the axes
     * @return the copy
     * @throws IllegalArgumentException if the sheet already holds six curves (the legend and the
     *         line styles stay readable up to six)
     */
    public CurveSheet withCurve(Curve curve) {
        Arguments.nonNull("curve", curve);
        if (curves.size() >= COLOURS.length) {
            throw new IllegalArgumentException("a sheet holds at most " + COLOURS.length + " curves, got one more than that");
        }
        List<Curve> more = new ArrayList<>(curves);
        more.add(curve);
        return new CurveSheet(title, horizontalQuantity, horizontalUnit, verticalQuantity, verticalUnit, width,
                height, Collections.unmodifiableList(more));
    }

    /** @return the curves, in drawing order */
    public List<Curve> curves() {
        return curves;
    }

    /** @return the title */
    public String title() {
        return title;
    }

    /**
     * Draws the sheet.
     *
     * @return a complete SVG 1.1 document (UTF-8 text)
     * @throws IllegalStateException if the sheet has no curve
     */
    public String toSvg() {
        if (curves.isEmpty()) {
            throw new IllegalStateException("sheet '" + title + "' has no curve to draw");
        }
        double xMin = Double.POSITIVE_INFINITY;
        double xMax = Double.NEGATIVE_INFINITY;
        double yMin = Double.POSITIVE_INFINITY;
        double yMax = Double.NEGATIVE_INFINITY;
        for (Curve c : curves) {
            for (int i = 0; i < c.size(); i++) {
                xMin = Math.min(xMin, c.xAt(i));
                xMax = Math.max(xMax, c.xAt(i));
                yMin = Math.min(yMin, c.yAt(i));
                yMax = Math.max(yMax, c.yAt(i));
            }
        }
        AxisScale xs = AxisScale.spanning(xMin, xMax);
        AxisScale ys = AxisScale.covering(yMin, yMax);

        int legendRows = (curves.size() + 1) / 2;
        double left = MARGIN_LEFT;
        double right = width - MARGIN_RIGHT;
        double top = MARGIN_TOP;
        double bottom = height - AXIS_BAND - legendRows * LEGEND_ROW - 8;

        StringBuilder svg = new StringBuilder(8192);
        svg.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n")
           .append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"").append(width)
           .append("\" height=\"").append(height).append("\" viewBox=\"0 0 ").append(width).append(' ')
           .append(height).append("\" font-family=\"sans-serif\" font-size=\"12\">\n")
           .append("<title>").append(escape(title)).append("</title>\n")
           .append("<rect x=\"0\" y=\"0\" width=\"").append(width).append("\" height=\"").append(height)
           .append("\" fill=\"#ffffff\"/>\n")
           .append("<text x=\"").append(fmt(left)).append("\" y=\"24\" font-size=\"15\" font-weight=\"bold\">")
           .append(escape(title)).append("</text>\n");

        // grid and ticks
        svg.append("<g stroke=\"#d9d9d9\" stroke-width=\"1\">\n");
        for (double v : xs.ticks()) {
            double px = xs.toPixel(v, left, right);
            svg.append("<line x1=\"").append(fmt(px)).append("\" y1=\"").append(fmt(top)).append("\" x2=\"")
               .append(fmt(px)).append("\" y2=\"").append(fmt(bottom)).append("\"/>\n");
        }
        for (double v : ys.ticks()) {
            double py = ys.toPixel(v, bottom, top);
            svg.append("<line x1=\"").append(fmt(left)).append("\" y1=\"").append(fmt(py)).append("\" x2=\"")
               .append(fmt(right)).append("\" y2=\"").append(fmt(py)).append("\"/>\n");
        }
        svg.append("</g>\n");
        if (ys.low < 0 && ys.high > 0) {
            double py = ys.toPixel(0.0, bottom, top);
            svg.append("<line x1=\"").append(fmt(left)).append("\" y1=\"").append(fmt(py)).append("\" x2=\"")
               .append(fmt(right)).append("\" y2=\"").append(fmt(py))
               .append("\" stroke=\"#8c8c8c\" stroke-width=\"1\"/>\n");
        }
        svg.append("<rect x=\"").append(fmt(left)).append("\" y=\"").append(fmt(top)).append("\" width=\"")
           .append(fmt(right - left)).append("\" height=\"").append(fmt(bottom - top))
           .append("\" fill=\"none\" stroke=\"#222222\" stroke-width=\"1\"/>\n");
        svg.append("<g fill=\"#222222\">\n");
        for (double v : xs.ticks()) {
            double px = xs.toPixel(v, left, right);
            svg.append("<line x1=\"").append(fmt(px)).append("\" y1=\"").append(fmt(bottom)).append("\" x2=\"")
               .append(fmt(px)).append("\" y2=\"").append(fmt(bottom + 5)).append("\" stroke=\"#222222\"/>\n")
               .append("<text x=\"").append(fmt(px)).append("\" y=\"").append(fmt(bottom + 19))
               .append("\" text-anchor=\"middle\">").append(escape(xs.label(v))).append("</text>\n");
        }
        for (double v : ys.ticks()) {
            double py = ys.toPixel(v, bottom, top);
            svg.append("<line x1=\"").append(fmt(left - 5)).append("\" y1=\"").append(fmt(py)).append("\" x2=\"")
               .append(fmt(left)).append("\" y2=\"").append(fmt(py)).append("\" stroke=\"#222222\"/>\n")
               .append("<text x=\"").append(fmt(left - 8)).append("\" y=\"").append(fmt(py + 4))
               .append("\" text-anchor=\"end\">").append(escape(ys.label(v))).append("</text>\n");
        }
        svg.append("<text x=\"").append(fmt((left + right) / 2)).append("\" y=\"").append(fmt(bottom + 40))
           .append("\" text-anchor=\"middle\" font-size=\"13\">")
           .append(escape(axisText(horizontalQuantity, horizontalUnit))).append("</text>\n");
        double midY = (top + bottom) / 2;
        svg.append("<text x=\"18\" y=\"").append(fmt(midY)).append("\" text-anchor=\"middle\" font-size=\"13\"")
           .append(" transform=\"rotate(-90 18 ").append(fmt(midY)).append(")\">")
           .append(escape(axisText(verticalQuantity, verticalUnit))).append("</text>\n");
        svg.append("</g>\n");

        // curves, clipped to the plot area
        svg.append("<clipPath id=\"plot-area\"><rect x=\"").append(fmt(left)).append("\" y=\"").append(fmt(top))
           .append("\" width=\"").append(fmt(right - left)).append("\" height=\"").append(fmt(bottom - top))
           .append("\"/></clipPath>\n<g clip-path=\"url(#plot-area)\" fill=\"none\" stroke-width=\"2\"")
           .append(" stroke-linejoin=\"round\">\n");
        for (int k = 0; k < curves.size(); k++) {
            Curve c = curves.get(k);
            if (c.markers()) {
                svg.append("<g fill=\"").append(COLOURS[k]).append("\" fill-opacity=\"0.55\" stroke=\"none\">\n");
                for (int i = 0; i < c.size(); i++) {
                    svg.append("<circle cx=\"").append(fmt(xs.toPixel(c.xAt(i), left, right))).append("\" cy=\"")
                       .append(fmt(ys.toPixel(c.yAt(i), bottom, top))).append("\" r=\"1.6\"/>\n");
                }
                svg.append("</g>\n");
                continue;
            }
            svg.append("<polyline stroke=\"").append(COLOURS[k]).append('"');
            if (!DASHES[k].isEmpty()) {
                svg.append(" stroke-dasharray=\"").append(DASHES[k]).append('"');
            }
            svg.append(" points=\"");
            for (int i = 0; i < c.size(); i++) {
                if (i > 0) {
                    svg.append(' ');
                }
                svg.append(fmt(xs.toPixel(c.xAt(i), left, right))).append(',')
                   .append(fmt(ys.toPixel(c.yAt(i), bottom, top)));
            }
            svg.append("\"/>\n");
        }
        svg.append("</g>\n");

        // legend: two entries per row below the axis label
        svg.append("<g>\n");
        double column = (right - left) / 2;
        for (int k = 0; k < curves.size(); k++) {
            double lx = left + (k % 2) * column;
            double ly = bottom + AXIS_BAND + (k / 2) * LEGEND_ROW + 6;
            if (curves.get(k).markers()) {
                svg.append("<circle cx=\"").append(fmt(lx + 15)).append("\" cy=\"").append(fmt(ly))
                   .append("\" r=\"3\" fill=\"").append(COLOURS[k]).append("\"/>\n<text x=\"").append(fmt(lx + 38))
                   .append("\" y=\"").append(fmt(ly + 4)).append("\">").append(escape(curves.get(k).label()))
                   .append("</text>\n");
                continue;
            }
            svg.append("<line x1=\"").append(fmt(lx)).append("\" y1=\"").append(fmt(ly)).append("\" x2=\"")
               .append(fmt(lx + 30)).append("\" y2=\"").append(fmt(ly)).append("\" stroke=\"").append(COLOURS[k])
               .append("\" stroke-width=\"2\"");
            if (!DASHES[k].isEmpty()) {
                svg.append(" stroke-dasharray=\"").append(DASHES[k]).append('"');
            }
            svg.append("/>\n<text x=\"").append(fmt(lx + 38)).append("\" y=\"").append(fmt(ly + 4)).append("\">")
               .append(escape(curves.get(k).label())).append("</text>\n");
        }
        svg.append("</g>\n</svg>\n");
        return svg.toString();
    }

    private static String axisText(String quantity, String unit) {
        return unit.isEmpty() ? quantity : quantity + " [" + unit + "]";
    }

    private static String fmt(double pixel) {
        return String.format(Locale.ROOT, "%.1f", pixel);
    }

    static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    @Override
    public boolean equals(Object other) {
        if (this == other) {
            return true;
        }
        if (!(other instanceof CurveSheet)) {
            return false;
        }
        CurveSheet s = (CurveSheet) other;
        return width == s.width && height == s.height && title.equals(s.title)
                && horizontalQuantity.equals(s.horizontalQuantity) && horizontalUnit.equals(s.horizontalUnit)
                && verticalQuantity.equals(s.verticalQuantity) && verticalUnit.equals(s.verticalUnit)
                && curves.equals(s.curves);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, horizontalQuantity, horizontalUnit, verticalQuantity, verticalUnit, width,
                height, curves);
    }

    @Override
    public String toString() {
        return "CurveSheet{" + title + ", " + width + "x" + height + " px, " + curves.size() + " curves}";
    }
}
