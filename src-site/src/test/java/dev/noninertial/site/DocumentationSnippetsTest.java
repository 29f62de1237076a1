package dev.noninertial.site;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayOutputStream;
import java.io.File;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Enumeration;
import java.util.List;
import java.util.TreeSet;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import jdk.jshell.Diag;
import jdk.jshell.JShell;
import jdk.jshell.Snippet.Status;
import jdk.jshell.SnippetEvent;
import jdk.jshell.SourceCodeAnalysis;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * Runs every Java block of the site pages ({@code <pre><code class="language-java">}) and of the
 * root README ({@code ```java}) through JShell with the project's class path, so that the
 * documentation cannot drift from the API. The blocks of one file run in order in one JShell
 * session, as a reader following the page would type them; each file starts a fresh session.
 * When a block is followed directly by a {@code <pre class="output">} block, what the block prints
 * must equal that text (line by line, trailing blanks ignored), so quoted results cannot drift.
 *
 * <p>Imports given to every session: all packages of the project found on the class path
 * ({@code dev.noninertial.*}, except this generator), Hipparchus 3-D geometry, and
 * {@code java.time}, plus the default imports of the jshell tool ({@code java.util}, {@code java.io} ...),
 * which the JShell API does not add by itself.
 */
class DocumentationSnippetsTest {

    private static final Path MODULE = Path.of(System.getProperty("basedir", ".")).toAbsolutePath().normalize();

    static List<String> classPath() {
        return Stream.of(System.getProperty("java.class.path").split(File.pathSeparator))
                .filter(s -> !s.isBlank()).collect(Collectors.toList());
    }

    /** Packages of the project on the class path: the public API the snippets may use. */
    static List<String> projectPackages() throws IOException {
        TreeSet<String> names = new TreeSet<>();
        for (String entry : classPath()) {
            Path p = Path.of(entry);
            if (Files.isDirectory(p)) {
                try (Stream<Path> s = Files.walk(p)) {
                    s.filter(f -> f.toString().endsWith(".class"))
                     .forEach(f -> names.add(p.relativize(f.getParent()).toString().replace(File.separatorChar, '.')));
                }
            } else if (entry.endsWith(".jar") && Files.isRegularFile(p)) {
                try (JarFile jar = new JarFile(p.toFile())) {
                    for (Enumeration<JarEntry> e = jar.entries(); e.hasMoreElements();) {
                        String n = e.nextElement().getName();
                        if (n.endsWith(".class") && n.startsWith("dev/noninertial/") && n.lastIndexOf('/') > 0) {
                            names.add(n.substring(0, n.lastIndexOf('/')).replace('/', '.'));
                        }
                    }
                }
            }
        }
        return names.stream().filter(n -> n.startsWith("dev.noninertial."))
                .filter(n -> !n.equals("dev.noninertial.site") && !n.startsWith("dev.noninertial.site."))
                .collect(Collectors.toList());
    }

    /** The imports the jshell tool gives every session by default (its DEFAULT start-up). */
    static final List<String> JSHELL_DEFAULT_IMPORTS = List.of("java.io", "java.math", "java.net", "java.nio.file",
            "java.util", "java.util.concurrent", "java.util.function", "java.util.prefs", "java.util.regex",
            "java.util.stream");

    static List<String> imports() throws IOException {
        List<String> imports = new ArrayList<>();
        for (String pkg : JSHELL_DEFAULT_IMPORTS) {
            imports.add("import " + pkg + ".*;");
        }
        for (String pkg : projectPackages()) {
            imports.add("import " + pkg + ".*;");
        }
        imports.add("import org.hipparchus.geometry.euclidean.threed.*;");
        imports.add("import java.time.*;");
        return imports;
    }

    /** Every documentation file with Java blocks: the README, then the pages in name order. */
    static List<List<Snippet>> documents() throws IOException {
        List<List<Snippet>> docs = new ArrayList<>();
        Path readme = MODULE.getParent().resolve("README.md");
        if (Files.isRegularFile(readme)) {
            docs.add(Snippet.fromMarkdown("README.md", Files.readString(readme, StandardCharsets.UTF_8)));
        }
        try (Stream<Path> s = Files.list(MODULE.resolve("pages"))) {
            for (Path f : (Iterable<Path>) s.filter(f -> f.toString().endsWith(".html"))
                    .sorted(Comparator.comparing(Path::toString))::iterator) {
                docs.add(Snippet.fromHtml("pages/" + f.getFileName(), Files.readString(f, StandardCharsets.UTF_8)));
            }
        }
        return docs;
    }

    @Test
    void findsTheBlocksAndTheProjectPackages() throws IOException {
        long blocks = documents().stream().mapToLong(List::size).sum();
        assertTrue(blocks >= 3, "expected Java blocks in README.md and pages/, found " + blocks);
        assertTrue(projectPackages().contains("dev.noninertial.frames"),
                "frames-core is not on the test class path: " + projectPackages());
    }

    @Test
    void extractsBlocksAndReadsBackReferences() {
        // the site convention: '<' written as &lt; and '&' as &amp; inside the code
        List<Snippet> s = Snippet.fromHtml("t.html", "<p>x</p>\n<pre><code class=\"language-java\">"
                + "int a = 1 &lt; 2 &amp;&amp; true ? 1 : 0;</code></pre><pre><code>skipped</code></pre>");
        assertEquals(1, s.size());
        assertEquals("int a = 1 < 2 && true ? 1 : 0;", s.get(0).code());
        assertEquals(2, s.get(0).line());
        List<Snippet> withOutput = Snippet.fromHtml("t.html", "<pre><code class=\"language-java\">"
                + "System.out.println(1 &lt; 2);</code></pre>\n  <pre class=\"output\"><code>true\n</code></pre>"
                + "<pre><code class=\"language-java\">int q = 1;</code></pre><p>x</p><pre class=\"output\"><code>no"
                + "</code></pre>");
        assertEquals("true\n", withOutput.get(0).expectedOutput());
        assertEquals(null, withOutput.get(1).expectedOutput(), "output block not directly after: not compared");
        List<Snippet> md = Snippet.fromMarkdown("r.md", "a\n```java\nint b = 2;\n```\n```\nnot java\n```\n");
        assertEquals(1, md.size());
        assertEquals("int b = 2;\n", md.get(0).code());
    }

    @TestFactory
    Stream<DynamicTest> everyBlockRunsInJShell() throws IOException {
        List<String> imports = imports();
        return documents().stream().filter(d -> !d.isEmpty())
                .map(d -> DynamicTest.dynamicTest(d.get(0).origin(), () -> runDocument(d, imports)));
    }

    private static void runDocument(List<Snippet> blocks, List<String> imports) {
        ByteArrayOutputStream printed = new ByteArrayOutputStream();
        PrintStream out = new PrintStream(printed, true, StandardCharsets.UTF_8);
        // the local execution engine runs snippets in this JVM: catch what they print for the report
        PrintStream realOut = System.out;
        PrintStream realErr = System.err;
        System.setOut(out);
        System.setErr(out);
        try (JShell shell = JShell.builder().executionEngine("local").out(out).err(out).build()) {
            for (String entry : classPath()) {
                shell.addToClasspath(entry);
            }
            for (String imp : imports) {
                List<SnippetEvent> ev = shell.eval(imp);
                if (ev.isEmpty() || ev.get(0).status() != Status.VALID) {
                    fail("JShell refused '" + imp + "': " + diagnostics(shell, ev));
                }
            }
            // check that JShell really sees the project class path before blaming a page
            List<SnippetEvent> probe = shell.eval("ReferenceFrame.class.getName()");
            if (probe.isEmpty() || !"\"dev.noninertial.frames.ReferenceFrame\"".equals(probe.get(0).value())) {
                fail("JShell does not see the project class path " + classPath() + ": " + diagnostics(shell, probe));
            }
            List<String> failures = new ArrayList<>();
            for (Snippet block : blocks) {
                out.flush();
                printed.reset();
                String problem = run(shell, block.code());
                out.flush();
                if (problem == null && block.expectedOutput() != null) {
                    String expected = normalized(block.expectedOutput());
                    String actual = normalized(printed.toString(StandardCharsets.UTF_8));
                    if (!expected.equals(actual)) {
                        problem = "prints other text than the output block that follows it on the page."
                                + "\n--- page shows ---\n" + expected + "\n--- block prints ---\n" + actual;
                    }
                }
                if (problem != null) {
                    failures.add(block + ":\n" + problem + "\n--- block ---\n" + block.code().strip());
                }
            }
            if (!failures.isEmpty()) {
                fail(failures.size() + " failing Java block(s):\n\n" + String.join("\n\n", failures));
            }
        } finally {
            System.setOut(realOut);
            System.setErr(realErr);
        }
    }

    /** Text compared line by line: line ends unified, trailing blanks and blank edge lines dropped. */
    static String normalized(String text) {
        return text.replace("\r\n", "\n").lines().map(String::stripTrailing)
                .collect(Collectors.joining("\n")).strip();
    }

    /**
     * Runs one block as a reader pasting it into the jshell tool would: line by line, each
     * statement run as soon as the lines so far complete it. A line that starts with
     * {@code .method(...)} after a complete statement therefore fails here as it fails there.
     * Returns what went wrong, or null.
     */
    private static String run(JShell shell, String code) {
        SourceCodeAnalysis analysis = shell.sourceCodeAnalysis();
        String pending = "";
        for (String line : code.split("\n", -1)) {
            pending = pending + line + "\n";
            while (!pending.isBlank()) {
                SourceCodeAnalysis.CompletionInfo info = analysis.analyzeCompletion(pending);
                if (info.completeness() == SourceCodeAnalysis.Completeness.EMPTY) {
                    pending = "";
                    break;
                }
                if (!info.completeness().isComplete() && info.completeness() != SourceCodeAnalysis.Completeness.UNKNOWN) {
                    break; // wait for more lines
                }
                String problem = evaluate(shell, info.source());
                if (problem != null) {
                    return problem;
                }
                pending = info.remaining();
            }
        }
        if (!pending.isBlank()) {
            return "incomplete source at the end of the block: " + pending.strip();
        }
        return null;
    }

    /** Evaluates one complete snippet; returns what went wrong, or null. */
    private static String evaluate(JShell shell, String source) {
        for (SnippetEvent e : shell.eval(source)) {
            if (e.causeSnippet() != null) {
                continue; // an update of an earlier snippet, not this statement
            }
            if (e.status() == Status.REJECTED) {
                return "does not compile: " + source.strip() + "\n" + diagnostics(shell, List.of(e));
            }
            if (e.status() == Status.RECOVERABLE_DEFINED || e.status() == Status.RECOVERABLE_NOT_DEFINED) {
                return "refers to something undefined: " + source.strip() + "\n"
                        + shell.unresolvedDependencies((jdk.jshell.DeclarationSnippet) e.snippet())
                               .collect(Collectors.joining(", "));
            }
            if (e.exception() != null) {
                Throwable x = e.exception();
                String type = x instanceof jdk.jshell.EvalException
                        ? ((jdk.jshell.EvalException) x).getExceptionClassName() : x.getClass().getName();
                return "throws " + type + ": " + x.getMessage() + "\n  at: " + source.strip();
            }
        }
        return null;
    }

    private static String diagnostics(JShell shell, List<SnippetEvent> events) {
        StringBuilder b = new StringBuilder();
        for (SnippetEvent e : events) {
            for (Diag d : (Iterable<Diag>) shell.diagnostics(e.snippet())::iterator) {
                b.append("  ").append(d.getMessage(null).replace('\n', ' ')).append('\n');
            }
        }
        return b.toString();
    }
}
