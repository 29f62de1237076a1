package dev.noninertial.site;

import dev.noninertial.examples.AirdropStudy;
import dev.noninertial.examples.chart.Curve;
import dev.noninertial.examples.chart.CurveSheet;
import dev.noninertial.frames.dispersion.ConfidenceEllipse;
import dev.noninertial.frames.dispersion.DispersionResult;

/**
 * The footprint of the invented airdrop study ({@link AirdropStudy}), run with the library's
 * local runner when the site is built: landing points, the 50 % and 95 % ellipses of the fitted
 * bivariate normal and the CEP circle about the mean point. Invented place and numbers; not for
 * planning drops or safety areas.
 */
final class DispersionPlots {

    /** Cases drawn for the site's footprint. */
    static final int CASES = 1500;
    /** Master seed of the site's footprint (the README command's default seed). */
    static final long SEED = 20261202L;

    private DispersionPlots() {
    }

    /** @return the footprint sheet */
    static CurveSheet footprint() {
        DispersionResult r = AirdropStudy.study(CASES, SEED).run();
        String e = AirdropStudy.EAST;
        String n = AirdropStudy.NORTH;
        CurveSheet sheet = CurveSheet.titled("Airdrop footprint, Tollan Heath (invented): " + CASES + " bundles")
                .withHorizontalAxis("east of the marker", "m")
                .withVerticalAxis("north of the marker", "m")
                .withSize(720, 640)
                .withCurve(Curve.points("landing points", r.column(e), r.column(n)));
        for (double p : new double[] {0.5, 0.95}) {
            ConfidenceEllipse ellipse = r.ellipse(e, n, p);
            sheet = sheet.withCurve(closed(String.format(java.util.Locale.ROOT, "%.0f %% ellipse", 100 * p),
                    ellipse.boundary(120)));
        }
        double cep = r.cep(e, n);
        double cx = r.mean(e);
        double cy = r.mean(n);
        double[][] circle = new double[120][2];
        for (int i = 0; i < circle.length; i++) {
            double t = 2 * Math.PI * i / circle.length;
            circle[i][0] = cx + cep * Math.cos(t);
            circle[i][1] = cy + cep * Math.sin(t);
        }
        return sheet.withCurve(closed(String.format(java.util.Locale.ROOT, "CEP circle about the mean point, %.0f m", cep),
                circle));
    }

    private static Curve closed(String label, double[][] points) {
        double[] x = new double[points.length + 1];
        double[] y = new double[points.length + 1];
        for (int i = 0; i <= points.length; i++) {
            x[i] = points[i % points.length][0];
            y[i] = points[i % points.length][1];
        }
        return Curve.of(label, x, y);
    }
}
