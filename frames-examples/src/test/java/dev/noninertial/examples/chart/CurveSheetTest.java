package dev.noninertial.examples.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class CurveSheetTest {

    private static Document parse(String svg) throws Exception {
        // the JDK's XML parser is the independent judge of well-formedness
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void drawsWellFormedSvgWithAxesLegendAndOnePolylinePerCurve() throws Exception {
        String svg = CurveSheet.titled("Spin <test> & check")
                .withHorizontalAxis("time", "s")
                .withVerticalAxis("acceleration", "m/s^2")
                .withCurve(Curve.of("Euler", new double[] {0, 1, 2}, new double[] {0, 1, 4}))
                .withCurve(Curve.of("Coriolis", new double[] {0, 1, 2}, new double[] {0, 0, 0}))
                .toSvg();
        Document doc = parse(svg);
        NodeList lines = doc.getElementsByTagName("polyline");
        assertEquals(2, lines.getLength());
        assertTrue(svg.contains("time [s]"), "horizontal label with unit");
        assertTrue(svg.contains("acceleration [m/s^2]"), "vertical label with unit");
        assertTrue(svg.contains(">Euler<") && svg.contains(">Coriolis<"), "legend entries");
        assertTrue(svg.contains("Spin &lt;test&gt; &amp; check"), "title escaped");
        // first curve: data spans exactly the round range [0, 2] x [0, 4], so its first point sits
        // on the lower-left corner and its last on the upper-right corner of the plot frame
        String[] pts = ((Element) lines.item(0)).getAttribute("points").split(" ");
        Element frame = (Element) doc.getElementsByTagName("rect").item(1);
        double left = Double.parseDouble(frame.getAttribute("x"));
        double top = Double.parseDouble(frame.getAttribute("y"));
        double right = left + Double.parseDouble(frame.getAttribute("width"));
        double bottom = top + Double.parseDouble(frame.getAttribute("height"));
        assertEquals(left + "," + bottom, pts[0].replace(".0,", ".0,"));
        String[] last = pts[2].split(",");
        // 0.1 px: coordinates are printed with one decimal
        assertEquals(right, Double.parseDouble(last[0]), 0.1);
        assertEquals(top, Double.parseDouble(last[1]), 0.1);
    }

    @Test
    void ticksAreRoundStepsCoveringTheData() {
        AxisScale s = AxisScale.covering(-0.37, 2.91);
        // round step: 1, 2 or 5 times a power of ten (the usual nice-number rule, common practice)
        assertEquals(1.0, s.step, 0.0);
        assertEquals(List.of(-1.0, 0.0, 1.0, 2.0, 3.0), s.ticks());
        AxisScale small = AxisScale.covering(0.0, 0.0137);
        assertEquals(0.005, small.step, 1e-15);
        assertEquals("0.010", small.label(0.01));
        AxisScale time = AxisScale.spanning(0.0, 9.0);
        assertEquals(0.0, time.low, 0.0);
        assertEquals(9.0, time.high, 0.0);
        assertEquals(List.of(0.0, 2.0, 4.0, 6.0, 8.0), time.ticks());
        AxisScale flat = AxisScale.covering(0.0, 0.0);
        assertTrue(flat.low < 0 && flat.high > 0, "constant zero curve still gets a span");
    }

    @Test
    void refusesBadCurves() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Curve.of("a", new double[] {0, Double.NaN}, new double[] {1, 2}));
        assertTrue(e.getMessage().contains("x[1]"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Curve.of("a", new double[] {0, 1}, new double[] {1}));
        assertThrows(IllegalStateException.class, () -> CurveSheet.titled("empty").toSvg());
    }
}
