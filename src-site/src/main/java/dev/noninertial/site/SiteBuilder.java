package dev.noninertial.site;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Builds the documentation site into a folder of static files that work offline:
 * <ol>
 *   <li>every {@code pages/*.html} body fragment, wrapped in the {@link PageLayout};</li>
 *   <li>{@code accuracy.html}, concatenated from {@code accuracy/*.html} sorted by file name;</li>
 *   <li>a placeholder {@code benchmarks.html} while the benchmark report is missing;</li>
 *   <li>the plots, computed by calling the library ({@link SitePlots});</li>
 *   <li>the API reference, by the JDK's Javadoc tool with doclint ({@link ApiReference});</li>
 *   <li>files under {@code static/} (to the site root), under {@code data/} (to {@code data/}) and
 *       non-page files beside the pages, copied as they are;</li>
 *   <li>a check of every local link and anchor ({@link LinkAudit}): the build fails with the list
 *       of broken links.</li>
 * </ol>
 * Usage: {@code SiteBuilder <site-source-folder> <output-folder>}.
 */
public final class SiteBuilder {

    private static final Pattern H2 = Pattern.compile("<h2\\b[^>]*\\bid=\"([^\"]*)\"[^>]*>(.*?)</h2>",
            Pattern.DOTALL | Pattern.CASE_INSENSITIVE);

    private SiteBuilder() {
    }

    /**
     * Entry point.
     *
     * @param args the site source folder ({@code src-site}) and the output folder
     * @throws Exception on any failure; the message says what to fix
     */
    public static void main(String[] args) throws Exception {
        if (args.length != 2) {
            throw new IllegalArgumentException("usage: SiteBuilder <site-source-folder> <output-folder>, got "
                    + args.length + " argument(s)");
        }
        long start = System.nanoTime();
        Path source = Path.of(args[0]).toAbsolutePath().normalize();
        Path output = Path.of(args[1]).toAbsolutePath().normalize();
        try {
            build(source, output, System.getProperty("java.class.path"));
        } catch (IllegalStateException | IllegalArgumentException e) {
            // a convention or link problem: the message is the whole story, no stack trace needed
            System.err.println("site build failed: " + e.getMessage());
            System.exit(1);
        }
        System.out.printf("site written to %s in %.1f s%n", output, (System.nanoTime() - start) * 1e-9);
    }

    /**
     * Builds the site.
     *
     * @param source the site source folder, holding {@code pages/} and {@code accuracy/}; its
     *        parent is the repository root
     * @param output the output folder, emptied first
     * @param classPath class path for the Javadoc run
     * @throws IOException if a file cannot be read or written
     * @throws IllegalStateException if a page breaks the convention, Javadoc reports errors, or
     *         a local link is broken
     */
    public static void build(Path source, Path output, String classPath) throws IOException {
        Path pagesDir = source.resolve("pages");
        if (!Files.isDirectory(pagesDir)) {
            throw new IllegalStateException("missing page folder " + pagesDir);
        }
        deleteTree(output);
        Files.createDirectories(output);

        List<Page> pages = new ArrayList<>();
        for (Path f : list(pagesDir, ".html")) {
            String name = f.getFileName().toString();
            if (name.equals("accuracy.html")) {
                throw new IllegalStateException("pages/accuracy.html must not exist: accuracy.html is assembled"
                        + " from the fragments in accuracy/");
            }
            String fragment = Files.readString(f, StandardCharsets.UTF_8);
            if (fragment.contains(SourceList.MARKER)) {
                Path list = source.getParent().resolve("REFERENCES.md");
                fragment = fragment.replace(SourceList.MARKER,
                        SourceList.toHtml(Files.readString(list, StandardCharsets.UTF_8)));
            }
            pages.add(Page.fromFragment(name, fragment));
        }
        pages.add(accuracyPage(source.resolve("accuracy")));
        if (pages.stream().noneMatch(p -> p.fileName().equals("benchmarks.html"))) {
            pages.add(Page.fromFragment("benchmarks.html", BENCHMARKS_PLACEHOLDER));
        }

        PageLayout layout = PageLayout.of(pages);
        for (Page p : layout.pages()) {
            Files.writeString(output.resolve(p.fileName()), layout.render(p), StandardCharsets.UTF_8);
        }
        Files.writeString(output.resolve("style.css"), PageLayout.styleSheet(), StandardCharsets.UTF_8);
        copyStatic(source.resolve("static"), output);
        if (Files.isDirectory(source.resolve("data"))) {
            copyStatic(source.resolve("data"), output.resolve("data"));
        }
        copyPageAssets(pagesDir, output);

        long t0 = System.nanoTime();
        List<String> plots = SitePlots.writeAll(output.resolve("plots"));
        System.out.printf("plots (%.1f s): %s%n", (System.nanoTime() - t0) * 1e-9, String.join(", ", plots));

        long t1 = System.nanoTime();
        ApiReference.Result api = ApiReference.write(source.getParent(), output.resolve("api"), classPath);
        System.out.printf("API reference (%.1f s): %d packages %s%n", (System.nanoTime() - t1) * 1e-9,
                api.packages().size(), api.packages());
        Path warningsFile = output.getParent().resolve("javadoc-warnings.txt");
        Files.write(warningsFile, api.warnings(), StandardCharsets.UTF_8);
        if (!api.warnings().isEmpty()) {
            System.out.println("Javadoc doclint: " + api.warnings().size() + " warning(s), all listed in " + warningsFile
                    + "; the first ones:");
            api.warnings().stream().limit(5).forEach(w -> System.out.println("  " + w));
        }

        LinkAudit.Result links = LinkAudit.audit(output);
        if (!links.broken().isEmpty()) {
            throw new IllegalStateException(links.broken().size() + " broken link(s) in the site:\n  "
                    + String.join("\n  ", links.broken()));
        }
        System.out.println("links: " + links.checked() + " local links and anchors checked, all good; "
                + links.external() + " external link(s) not followed");
    }

    /** The accuracy report: an introduction, a contents list and the fragments in file-name order. */
    static Page accuracyPage(Path folder) throws IOException {
        StringBuilder body = new StringBuilder();
        StringBuilder parts = new StringBuilder();
        List<Path> fragments = Files.isDirectory(folder) ? list(folder, ".html") : List.of();
        for (Path f : fragments) {
            String html = Files.readString(f, StandardCharsets.UTF_8);
            if (!Pattern.compile("<h2\\b", Pattern.CASE_INSENSITIVE).matcher(html).find()) {
                throw new IllegalStateException("accuracy fragment " + f.getFileName()
                        + " has no <h2> heading (site convention: each fragment starts with one <h2>)");
            }
            if (Pattern.compile("<h1\\b", Pattern.CASE_INSENSITIVE).matcher(html).find()) {
                throw new IllegalStateException("accuracy fragment " + f.getFileName()
                        + " has an <h1>: the page title belongs to the report; start the fragment with <h2>");
            }
            parts.append("\n<!-- from accuracy/").append(f.getFileName()).append(" -->\n")
                 .append("<section class=\"accuracy-area\">\n").append(html.strip()).append("\n</section>\n");
        }
        body.append("<h1>Accuracy report</h1>\n")
            .append("<p>Each area of the library reports here how closely it reproduces values from outside the")
            .append(" project (published standards, worked examples, analytic results, independent computations).")
            .append(" Only measured figures appear, each with how and when it was measured.</p>\n");
        String merged = Page.withHeadingAnchors(parts.toString());
        if (fragments.isEmpty()) {
            body.append("<p class=\"note\">No area has reported measured figures yet.</p>\n");
        } else {
            body.append("<nav class=\"toc\" aria-label=\"Areas\"><ul>\n");
            Matcher m = H2.matcher(merged);
            while (m.find()) {
                body.append("<li><a href=\"#").append(m.group(1)).append("\">").append(Markup.text(m.group(2)))
                    .append("</a></li>\n");
            }
            body.append("</ul></nav>\n").append(merged);
        }
        return Page.fromFragment("accuracy.html", body.toString());
    }

    static final String BENCHMARKS_PLACEHOLDER = """
            <h1>Benchmark report</h1>
            <p class="note">The benchmark report has not been written for this build yet. Speed is measured
            with JMH in the <code>frames-bench</code> module, always as a ratio against a hand-written baseline
            measured in the same run; figures will appear here once they have been measured.</p>
            """;

    private static List<Path> list(Path folder, String suffix) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.filter(f -> f.getFileName().toString().endsWith(suffix) && Files.isRegularFile(f))
                    .sorted(Comparator.comparing(f -> f.getFileName().toString()))
                    .toList();
        }
    }

    private static void copyStatic(Path folder, Path output) throws IOException {
        if (!Files.isDirectory(folder)) {
            return;
        }
        try (Stream<Path> s = Files.walk(folder)) {
            for (Path f : (Iterable<Path>) s::iterator) {
                Path target = output.resolve(folder.relativize(f).toString());
                if (Files.isDirectory(f)) {
                    Files.createDirectories(target);
                } else if (Files.exists(target)) {
                    throw new IllegalStateException("static/" + folder.relativize(f) + " would overwrite a generated file");
                } else {
                    Files.copy(f, target);
                }
            }
        }
    }

    /** Pictures and other non-page files placed beside the pages are published beside them. */
    private static void copyPageAssets(Path pagesDir, Path output) throws IOException {
        try (Stream<Path> s = Files.walk(pagesDir)) {
            for (Path f : (Iterable<Path>) s.filter(Files::isRegularFile)::iterator) {
                Path rel = pagesDir.relativize(f);
                if (rel.getNameCount() == 1 && rel.toString().endsWith(".html")) {
                    continue;
                }
                Path target = output.resolve(rel.toString());
                if (Files.exists(target)) {
                    throw new IllegalStateException("pages/" + rel + " would overwrite a generated file");
                }
                Files.createDirectories(target.getParent());
                Files.copy(f, target);
            }
        }
    }

    private static void deleteTree(Path folder) throws IOException {
        if (!Files.exists(folder)) {
            return;
        }
        try (Stream<Path> s = Files.walk(folder)) {
            for (Path f : (Iterable<Path>) s.sorted(Comparator.reverseOrder())::iterator) {
                Files.delete(f);
            }
        }
    }
}
