package dev.noninertial.frames.fuzz;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import dev.noninertial.frames.Placement;

/**
 * The reflection fuzz of frames-core's public API (issue 15): see {@link ApiFuzz} for the rule.
 * The counts are printed and written to {@code target/api-fuzz.txt}.
 */
class CoreApiFuzzTest {

    @Test
    void everyPublicCallRefusesOrReturnsFiniteResults() {
        long start = System.nanoTime();
        ApiFuzz.Report report = new ApiFuzz("frames-core", Placement.class, "dev.noninertial.frames",
                CoreSamples.table()).run();
        FuzzReports.write("frames-core", report, (System.nanoTime() - start) * 1e-9);
        assertTrue(report.failures.isEmpty() && report.exposures.isEmpty(), report.details());
        assertTrue(report.untabled.isEmpty(), () -> "valid calls given for no executable: " + report.untabled);
    }
}
