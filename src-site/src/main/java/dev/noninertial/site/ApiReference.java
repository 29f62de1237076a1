package dev.noninertial.site;

import java.io.File;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import java.util.stream.Stream;

import javax.tools.Diagnostic;
import javax.tools.DiagnosticCollector;
import javax.tools.DocumentationTool;
import javax.tools.JavaFileObject;
import javax.tools.ToolProvider;

/**
 * Runs the JDK's own Javadoc tool (in process, through {@link ToolProvider}) over the public
 * packages of the library modules, with every doclint check enabled.
 *
 * <p>Doclint errors and warnings are returned with their list, never switched off; the site build
 * fails on either ({@link SiteBuilder}).
 */
public final class ApiReference {

    /** Library modules whose packages make up the public API, in the order shown. */
    static final List<String> LIBRARY_MODULES = List.of("frames-core", "frames-geodesy");

    /** Where the JDK's API documentation lives (the release we compile for); parent POM: javadoc.link.jdk. */
    static final String JDK_API = "https://docs.oracle.com/en/java/javase/17/docs/api/";
    /** Where Hipparchus's API documentation lives; parent POM: javadoc.link.hipparchus. */
    static final String HIPPARCHUS_API = "https://www.hipparchus.org/apidocs/";

    private ApiReference() {
    }

    /**
     * The outcome of a Javadoc run.
     *
     * @param packages the packages documented
     * @param warnings one line per doclint warning (file:line: message)
     */
    public record Result(List<String> packages, List<String> warnings) {
    }

    /**
     * Writes the API reference.
     *
     * @param repositoryRoot root of the project (holding the module folders)
     * @param target output folder, for example {@code target/site/api}
     * @param classPath class path the library compiles against (Hipparchus)
     * @return the packages documented and the warnings
     * @throws IllegalStateException if the JDK has no Javadoc tool or doclint reports errors
     */
    public static Result write(Path repositoryRoot, Path target, String classPath) {
        DocumentationTool tool = ToolProvider.getSystemDocumentationTool();
        if (tool == null) {
            throw new IllegalStateException("this Java runtime has no Javadoc tool: run the build on a full JDK 17+");
        }
        List<String> sourceRoots = new ArrayList<>();
        TreeSet<String> packages = new TreeSet<>();
        for (String module : LIBRARY_MODULES) {
            Path src = repositoryRoot.resolve(module).resolve("src/main/java");
            if (Files.isDirectory(src)) {
                int before = packages.size();
                packages.addAll(packagesUnder(src));
                if (packages.size() > before) {
                    sourceRoots.add(src.toString());
                }
            }
        }
        if (packages.isEmpty()) {
            throw new IllegalStateException("no Java sources found under " + LIBRARY_MODULES + " in " + repositoryRoot);
        }
        List<String> args = new ArrayList<>(List.of(
                "-d", target.toString(),
                "-sourcepath", String.join(File.pathSeparator, sourceRoots),
                "-classpath", classPath,
                "-encoding", "UTF-8", "-docencoding", "UTF-8", "-charset", "UTF-8",
                "-Xdoclint:all",
                "-quiet", "-notimestamp", "-notree", "-nohelp", "-nodeprecatedlist",
                // links to the JDK's and Hipparchus's API from the package lists checked in under
                // javadoc-links/ (nothing is fetched); the same lists as the Javadoc jars use
                "--no-platform-links",
                "-linkoffline", JDK_API, repositoryRoot.resolve("javadoc-links/jdk-17").toString(),
                "-linkoffline", HIPPARCHUS_API, repositoryRoot.resolve("javadoc-links/hipparchus").toString(),
                "-noqualifier", "all",
                // each class page links to its source, shown as HTML inside the API reference
                "-linksource",
                "-windowtitle", "noninertial frames API",
                "-doctitle", "noninertial frames 0.1.0-SNAPSHOT: API reference",
                "-bottom", "Results are for simulation and analysis only: see the cautions of the guide."));
        args.addAll(packages);
        DiagnosticCollector<JavaFileObject> diagnostics = new DiagnosticCollector<>();
        StringWriter out = new StringWriter();
        boolean ok = tool.getTask(out, null, diagnostics, null, args, null).call();
        List<String> errors = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        for (Diagnostic<? extends JavaFileObject> d : diagnostics.getDiagnostics()) {
            String where = d.getSource() == null ? "" : repositoryRoot.relativize(Path.of(d.getSource().toUri()))
                    + ":" + d.getLineNumber() + ": ";
            String line = where + d.getMessage(Locale.ROOT).lines().findFirst().orElse("");
            if (isJdk17RecordFalseReport(d)) {
                continue;
            }
            if (d.getKind() == Diagnostic.Kind.ERROR) {
                errors.add(line);
            } else if (d.getKind() == Diagnostic.Kind.WARNING || d.getKind() == Diagnostic.Kind.MANDATORY_WARNING) {
                warnings.add(line);
            }
        }
        if (!ok || !errors.isEmpty()) {
            throw new IllegalStateException("Javadoc failed with " + errors.size() + " error(s):\n  "
                    + String.join("\n  ", errors) + (out.toString().isBlank() ? "" : "\n" + out));
        }
        return new Result(List.copyOf(packages), warnings);
    }

    /**
     * JDK 17's doclint reports each component of a Serializable record as "no comment" (for its
     * serialized field), although the record's {@code @param} documents it; later JDKs do not.
     * True for exactly that report: JDK 17, "no comment", pointing at a record declaration.
     */
    private static boolean isJdk17RecordFalseReport(Diagnostic<? extends JavaFileObject> d) {
        if (Runtime.version().feature() >= 18 || d.getSource() == null || d.getLineNumber() < 1
                || !d.getMessage(Locale.ROOT).strip().equals("no comment")) {
            return false;
        }
        try {
            List<String> lines = Files.readAllLines(Path.of(d.getSource().toUri()));
            // the report points at the component, on the declaration's first line or a continuation (up to 10 lines)
            for (long k = d.getLineNumber() - 1; k >= 0 && k >= d.getLineNumber() - 10; k--) {
                String text = lines.get((int) k);
                if (text.matches(".*\\brecord\\s+\\w+\\s*[(<].*")) {
                    return true;
                }
                if (text.contains(";") || text.contains("}")) {
                    return false;
                }
            }
            return false;
        } catch (IOException e) {
            return false;
        }
    }

    private static List<String> packagesUnder(Path src) {
        TreeSet<String> names = new TreeSet<>();
        try (Stream<Path> files = Files.walk(src)) {
            files.filter(f -> f.getFileName().toString().endsWith(".java")
                            && !f.getFileName().toString().equals("module-info.java"))
                 .forEach(f -> names.add(src.relativize(f.getParent()).toString().replace(File.separatorChar, '.')));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        names.remove("");
        return new ArrayList<>(names);
    }
}
