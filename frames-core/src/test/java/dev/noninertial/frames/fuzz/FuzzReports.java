package dev.noninertial.frames.fuzz;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/** Writes a fuzz report to {@code target/api-fuzz.txt} of the module under test and to the console. */
public final class FuzzReports {

    private FuzzReports() {
    }

    /**
     * Prints and writes the report.
     *
     * @param module module name
     * @param report the report
     * @param seconds wall time of the run
     */
    public static void write(String module, ApiFuzz.Report report, double seconds) {
        String text = module + ": " + String.format(Locale.ROOT, "%.1f s, ", seconds) + report.details();
        System.out.println(text);
        try {
            Path target = Path.of("target");
            Files.createDirectories(target);
            Files.writeString(target.resolve("api-fuzz.txt"), text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
