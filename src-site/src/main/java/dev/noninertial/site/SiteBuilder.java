package dev.noninertial.site;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;

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

    /**
     * The module documented by its own Javadoc jar rather than by the site's Javadoc run: it needs
     * Spark on the class path, which only frames-spark has.
     */
    static final String SPARK_MODULE = "frames-spark";
    /** Where the site holds frames-spark's API reference. */
    static final String SPARK_API = "api-spark";

    /** A code text that names a type, optionally with a member: {@code Placement}, {@code Placement.toBase(...)}. */
    private static final Pattern TYPE_REFERENCE = Pattern.compile(
            "([A-Z][A-Za-z0-9]*)(?:[.#][A-Za-z_][A-Za-z0-9_]*(?:\\(.*\\))?)?");
    private static final Pattern PUBLIC_TYPE = Pattern.compile(
            "(?m)^public\\s+(?:(?:final|abstract|sealed|non-sealed|static|strictfp)\\s+)*(?:class|interface|record|enum|@interface)\\s+([A-Z][A-Za-z0-9]*)");

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
        Path root = source.getParent();
        String version = System.getProperty("site.version", PageLayout.DEFAULT_VERSION);
        deleteTree(output);
        Files.createDirectories(output);

        List<Page> pages = new ArrayList<>();
        Map<String, String> sources = new HashMap<>();
        for (Path f : list(pagesDir, ".html")) {
            String name = f.getFileName().toString();
            if (name.equals("accuracy.html") || GENERATED.contains(name)) {
                throw new IllegalStateException("pages/" + name + " must not exist: " + name + " is written by the"
                        + " generator" + (name.equals("accuracy.html") ? " from the fragments in accuracy/" : ""));
            }
            String fragment = Files.readString(f, StandardCharsets.UTF_8);
            if (fragment.contains(SourceList.MARKER)) {
                Path list = source.getParent().resolve("REFERENCES.md");
                fragment = fragment.replace(SourceList.MARKER,
                        SourceList.toHtml(Files.readString(list, StandardCharsets.UTF_8)));
                sources.put(name, "src-site/pages/" + name + " and REFERENCES.md");
            }
            if (name.equals("benchmarks.html")) {
                fragment = BenchmarkPage.fill(fragment, root, source.resolve("data").resolve("jmh"));
            }
            pages.add(Page.fromFragment(name, fragment));
            sources.putIfAbsent(name, "src-site/pages/" + name);
        }
        pages.add(accuracyPage(source.resolve("accuracy")));
        sources.put("accuracy.html", "src-site/accuracy/*.html");
        if (pages.stream().noneMatch(p -> p.fileName().equals("benchmarks.html"))) {
            pages.add(Page.fromFragment("benchmarks.html", BENCHMARKS_PLACEHOLDER));
        }
        pages.addAll(generatedPages(root, version, pages, sources));

        Map<String, String> apiTypes = apiTypes(root);
        List<Page> finished = new ArrayList<>();
        for (Page p : pages) {
            finished.add(finish(p, apiTypes));
        }
        PageLayout layout = PageLayout.of(finished, version, sources);
        for (Page p : layout.pages()) {
            Files.writeString(output.resolve(p.fileName()), layout.render(p), StandardCharsets.UTF_8);
        }
        Files.writeString(output.resolve("search-index.js"), SearchIndex.script(layout.pages()), StandardCharsets.UTF_8);
        Files.writeString(output.resolve("style.css"), PageLayout.styleSheet(), StandardCharsets.UTF_8);
        Files.writeString(output.resolve("site.js"), PageLayout.script(), StandardCharsets.UTF_8);
        copyStatic(source.resolve("static"), output);
        if (Files.isDirectory(source.resolve("data"))) {
            copyStatic(source.resolve("data"), output.resolve("data"));
        }
        copyPageAssets(pagesDir, output);

        long t0 = System.nanoTime();
        List<String> plots = SitePlots.writeAll(output.resolve("plots"));
        System.out.printf("plots (%.1f s): %s%n", (System.nanoTime() - t0) * 1e-9, String.join(", ", plots));

        long t1 = System.nanoTime();
        ApiReference.Result api = ApiReference.write(root, output.resolve("api"), classPath);
        System.out.printf("API reference (%.1f s): %d packages %s%n", (System.nanoTime() - t1) * 1e-9,
                api.packages().size(), api.packages());
        Path warningsFile = output.getParent().resolve("javadoc-warnings.txt");
        Files.write(warningsFile, api.warnings(), StandardCharsets.UTF_8);
        if (!api.warnings().isEmpty()) {
            // none on JDK 17 and 25 since 2026-12-04: a new one fails the build, with the list
            throw new IllegalStateException("Javadoc doclint: " + api.warnings().size() + " warning(s), all listed in "
                    + warningsFile + ":\n  " + String.join("\n  ", api.warnings()));
        }
        System.out.println("Javadoc doclint: no warnings");

        Path sparkApi = Path.of(System.getProperty("site.sparkApi", source.resolve("target/spark-apidocs").toString()));
        if (!Files.isRegularFile(sparkApi.resolve("index.html"))) {
            throw new IllegalStateException("missing the Javadoc of frames-spark in " + sparkApi + " (unpacked from its"
                    + " javadoc jar): build the site with the modules it documents, mvn -pl src-site -am package");
        }
        copyStatic(sparkApi, output.resolve(SPARK_API));
        System.out.println("API reference of frames-spark: its Javadoc jar, in " + SPARK_API + "/");

        LinkAudit.Result links = LinkAudit.audit(output);
        if (!links.broken().isEmpty()) {
            throw new IllegalStateException(links.broken().size() + " broken link(s) in the site:\n  "
                    + String.join("\n  ", links.broken()));
        }
        System.out.println("links: " + links.checked() + " local links and anchors checked, all good; "
                + links.external() + " external link(s) not followed");
    }

    /** Pages the generator writes itself; a fragment of the same name in pages/ is refused. */
    static final List<String> GENERATED = List.of("install.html", "changelog.html", "license.html", "source.html",
            "search.html");

    /**
     * The pages made from the repository's own files: install, changelog, license, references
     * (from REFERENCES.md, unless {@code pages/references.html} exists), source and search.
     */
    static List<Page> generatedPages(Path root, String version, List<Page> existing, Map<String, String> sources)
            throws IOException {
        List<Page> out = new ArrayList<>();
        out.add(Page.fromFragment("install.html", GeneratedPages.install(version)));
        sources.put("install.html", "src-site/src/main/java/dev/noninertial/site/GeneratedPages.java");
        Path changelog = root.resolve("CHANGELOG.md");
        if (Files.isRegularFile(changelog)) {
            out.add(Page.fromFragment("changelog.html", MarkdownText.toHtml(Files.readString(changelog,
                    StandardCharsets.UTF_8)).replaceFirst("<h1>Changelog</h1>", "<h1>Changelog</h1>")));
            sources.put("changelog.html", "CHANGELOG.md");
        }
        Path license = root.resolve("LICENSE");
        if (Files.isRegularFile(license)) {
            out.add(Page.fromFragment("license.html", GeneratedPages.license(Files.readString(license,
                    StandardCharsets.UTF_8))));
            sources.put("license.html", "LICENSE");
        }
        Path references = root.resolve("REFERENCES.md");
        if (existing.stream().noneMatch(p -> p.fileName().equals("references.html")) && Files.isRegularFile(references)) {
            String html = MarkdownText.toHtml(Files.readString(references, StandardCharsets.UTF_8));
            out.add(Page.fromFragment("references.html", html.replaceFirst("<h1>[^<]*</h1>", "<h1>References</h1>")));
            sources.put("references.html", "REFERENCES.md");
        }
        out.add(Page.fromFragment("source.html", GeneratedPages.source(System.getProperty("site.repository", ""))));
        sources.put("source.html", "src-site/src/main/java/dev/noninertial/site/GeneratedPages.java");
        out.add(Page.fromFragment("search.html", GeneratedPages.SEARCH));
        return out;
    }

    /**
     * The last touches on a page body: every table in a box that scrolls sideways on a narrow
     * screen, and every {@code <code>} that names a public type of the library (outside code
     * blocks, links and headings) linked to its page of the API reference.
     */
    static Page finish(Page page, Map<String, String> apiTypes) {
        Document doc = Markup.parseFragment(page.body());
        for (Element table : doc.body().select("table")) {
            Element parent = table.parent();
            if (parent == null || !parent.hasClass("scroll")) {
                table.wrap("<div class=\"scroll\"></div>");
            }
        }
        for (Element code : doc.body().select("code")) {
            if (code.parents().stream().anyMatch(e -> e.normalName().matches("pre|a|h[1-6]"))) {
                continue;
            }
            Matcher m = TYPE_REFERENCE.matcher(code.text().strip());
            if (m.matches() && apiTypes.containsKey(m.group(1))) {
                code.wrap("<a class=\"api-link\" href=\"" + apiTypes.get(m.group(1)) + "\"></a>");
            }
        }
        return new Page(page.fileName(), page.title(), Markup.html(doc.body()));
    }

    /**
     * Simple name of each public top-level type of the library modules (and of frames-spark, whose
     * reference is its own Javadoc jar in {@link #SPARK_API}), to its API page; ambiguous names left out.
     */
    static Map<String, String> apiTypes(Path root) throws IOException {
        Map<String, String> found = new TreeMap<>();
        Set<String> ambiguous = new HashSet<>();
        List<String> modules = new ArrayList<>(ApiReference.LIBRARY_MODULES);
        modules.add(SPARK_MODULE);
        for (String module : modules) {
            String folder = module.equals(SPARK_MODULE) ? SPARK_API + "/" : "api/";
            Path src = root.resolve(module).resolve("src/main/java");
            if (!Files.isDirectory(src)) {
                continue;
            }
            try (Stream<Path> files = Files.walk(src)) {
                for (Path f : (Iterable<Path>) files.filter(x -> x.toString().endsWith(".java"))::iterator) {
                    String name = f.getFileName().toString().replace(".java", "");
                    if (name.contains("-")) {
                        continue;
                    }
                    Matcher m = PUBLIC_TYPE.matcher(Files.readString(f, StandardCharsets.UTF_8));
                    if (!m.find() || !m.group(1).equals(name)) {
                        continue;
                    }
                    String page = folder + src.relativize(f).toString().replace('\\', '/').replace(".java", ".html");
                    if (found.containsKey(name) && !found.get(name).equals(page)) {
                        ambiguous.add(name);
                    }
                    found.put(name, page);
                }
            }
        }
        ambiguous.forEach(found::remove);
        return new LinkedHashMap<>(found);
    }

    /** The accuracy report: an introduction, a contents list and the fragments in file-name order. */
    static Page accuracyPage(Path folder) throws IOException {
        StringBuilder body = new StringBuilder();
        StringBuilder parts = new StringBuilder();
        List<Path> fragments = Files.isDirectory(folder) ? list(folder, ".html") : List.of();
        for (Path f : fragments) {
            String html = Files.readString(f, StandardCharsets.UTF_8);
            Document parsed = Markup.parseFragment(html);
            if (parsed.body().select("h2").isEmpty()) {
                throw new IllegalStateException("accuracy fragment " + f.getFileName()
                        + " has no <h2> heading (site convention: each fragment starts with one <h2>)");
            }
            if (!parsed.body().select("h1").isEmpty()) {
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
            for (Element h : Markup.parseFragment(merged).body().select("h2[id]")) {
                body.append("<li><a href=\"#").append(Markup.escape(h.id())).append("\">")
                    .append(Markup.escape(h.text().strip())).append("</a></li>\n");
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
