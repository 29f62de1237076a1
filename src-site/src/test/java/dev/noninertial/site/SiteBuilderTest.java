package dev.noninertial.site;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The generator's own rules: titles, anchors, accuracy assembly and the link audit. */
class SiteBuilderTest {

    @TempDir
    Path dir;

    private void write(String relative, String text) throws IOException {
        Path f = dir.resolve(relative);
        Files.createDirectories(f.getParent());
        Files.writeString(f, text, StandardCharsets.UTF_8);
    }

    @Test
    void pageTitleComesFromTheOneH1AndHeadingsGetAnchors() {
        Page p = Page.fromFragment("x.html", "<h1>Spin &amp; <em>roll</em></h1><h2>Set up</h2><h2 id=\"keep\">B</h2>"
                + "<h3>Set up</h3>");
        assertEquals("Spin & roll", p.title());
        assertTrue(p.body().contains("<h2 id=\"set-up\">Set up</h2>"), p.body());
        assertTrue(p.body().contains("<h2 id=\"keep\">B</h2>"), p.body());
        assertTrue(p.body().contains("<h3 id=\"set-up-2\">Set up</h3>"), p.body());
        assertThrows(IllegalArgumentException.class, () -> Page.fromFragment("y.html", "<h2>none</h2>"));
        assertThrows(IllegalArgumentException.class, () -> Page.fromFragment("z.html", "<h1>a</h1><h1>b</h1>"));
    }

    @Test
    void accuracyFragmentsAreJoinedInFileNameOrder() throws IOException {
        write("accuracy/b-geodesy.html", "<h2>Geodesy</h2><p>second</p>");
        write("accuracy/a-core.html", "<h2>Core</h2><p>first</p>");
        Page p = SiteBuilder.accuracyPage(dir.resolve("accuracy"));
        assertEquals("Accuracy report", p.title());
        int first = p.body().indexOf("first");
        int second = p.body().indexOf("second");
        assertTrue(first > 0 && second > first, p.body());
        assertTrue(p.body().contains("<a href=\"#core\">Core</a>"), "contents entry with anchor");
        write("accuracy/c-bad.html", "<h1>Wrong level</h1>");
        assertThrows(IllegalStateException.class, () -> SiteBuilder.accuracyPage(dir.resolve("accuracy")));
    }

    @Test
    void auditFindsMissingFilesAndAnchorsAndAcceptsGoodLinks() throws IOException {
        write("site/index.html", "<a href=\"other.html#there\">ok</a> <a href=\"#top\">ok</a> <p id=\"top\"></p>"
                + "<a href=\"missing.html\">bad</a> <a href=\"other.html#nowhere\">bad</a>"
                + "<img src=\"plots/p.svg\"> <a href=\"https://example.org/\">external</a>"
                + "<a href=\"api/a/B.html#of(double,double)\">ok</a> <a href=\"/abs.html\">bad</a>");
        write("site/other.html", "<h2 id=\"there\">t</h2>");
        write("site/plots/p.svg", "<svg xmlns=\"http://www.w3.org/2000/svg\"/>");
        write("site/api/a/B.html", "<section id=\"of(double,double)\"></section><a href=\"nowhere.html\">x</a>");
        LinkAudit.Result r = LinkAudit.audit(dir.resolve("site"));
        assertEquals(1, r.external());
        assertEquals(7, r.checked(), r.toString());
        List<String> broken = r.broken();
        assertEquals(3, broken.size(), broken.toString());
        assertTrue(broken.get(0).contains("missing.html"), broken.toString());
        assertTrue(broken.get(1).contains("#nowhere"), broken.toString());
        assertTrue(broken.get(2).contains("absolute"), broken.toString());
    }

    @Test
    void linkShownAsTextInsidePreIsNotALink() throws IOException {
        // bug 1 (regular expressions): the href in this text was read as a link and reported broken
        write("site/index.html", "<pre>&lt;a href=\"nowhere.html\"&gt;see&lt;/a&gt; and href=\"gone.html\"</pre>"
                + "<pre><code>&lt;img src=\"missing.svg\"&gt;</code></pre><a href=\"#top\" id=\"top\">ok</a>");
        LinkAudit.Result r = LinkAudit.audit(dir.resolve("site"));
        assertEquals(List.of(), r.broken());
        assertEquals(1, r.checked(), "only the real link counts");
    }

    @Test
    void commentedOutLinkIsNotChecked() throws IOException {
        // bug 2: a link inside an HTML comment was checked and reported broken
        write("site/index.html", "<!-- <a href=\"old-page.html\">removed</a> -->\n<p>text</p>"
                + "<!--\n<img src=\"plots/gone.svg\">\n--><a href=\"missing.html\">real</a>");
        LinkAudit.Result r = LinkAudit.audit(dir.resolve("site"));
        assertEquals(1, r.checked(), r.toString());
        assertEquals(1, r.broken().size(), r.broken().toString());
        assertTrue(r.broken().get(0).contains("missing.html"), r.broken().toString());
    }

    @Test
    void singleQuotedIdIsKeptAndNotWrittenTwice() throws IOException {
        // bug 3: <h2 id='x'> was given a second id attribute, made from its text
        Page p = Page.fromFragment("x.html", "<h1>T</h1><h2 id='kept'>Some heading</h2><h3 id = \"spaced\">S</h3>");
        Element h2 = Markup.parseFragment(p.body()).selectFirst("h2");
        assertEquals("kept", h2.id());
        assertEquals(1, h2.attributes().size(), p.body());
        assertEquals(1, countOf(p.body(), "id="), p.body().replaceAll("<h3.*", ""));
        assertTrue(p.body().contains("id=\"spaced\""), p.body());
        // and a link to it resolves in the audit
        write("site/x.html", p.body() + "<a href=\"#kept\">to it</a><a href=\"#spaced\">and</a>");
        assertEquals(List.of(), LinkAudit.audit(dir.resolve("site")).broken());
    }

    private static int countOf(String text, String piece) {
        int n = 0;
        for (int i = text.indexOf(piece); i >= 0; i = text.indexOf(piece, i + 1)) {
            n++;
        }
        return n - (text.contains("id=\"spaced\"") ? 1 : 0);
    }

    @Test
    void tablesScrollAndTypeNamesLinkToTheApiReference() {
        Page p = Page.fromFragment("x.html", "<h1>T</h1><p>Use <code>Placement</code> and <code>Placement.toBase(s)</code>,"
                + " not <code>Unknown</code> or <code>x + y</code>.</p><pre><code>Placement p;</code></pre>"
                + "<table><tr><td>1</td></tr></table>");
        Page done = SiteBuilder.finish(p, java.util.Map.of("Placement", "api/dev/noninertial/frames/Placement.html"));
        Document d = Markup.parseFragment(done.body());
        assertEquals(2, d.select("a.api-link[href=api/dev/noninertial/frames/Placement.html] > code").size(), done.body());
        assertEquals(0, d.select("pre a").size(), "code blocks are left alone");
        assertEquals(1, d.select("div.scroll > table").size(), done.body());
    }

    @Test
    void markdownOfTheRepositoryDocuments() {
        String html = MarkdownText.toHtml("# Changelog\n\n## [Unreleased]\n\n### Added\n- `A` and **b**,\n  continued\n"
                + "  - nested *one*\n- second [link](LICENSE)\n\n| q | v |\n|---|---|\n| a < b | 1 |\n");
        Document d = Markup.parseFragment(html);
        assertEquals("Changelog", d.selectFirst("h1").text());
        Element item = d.select("ul").first().child(0);
        assertTrue(item.text().startsWith("A and b, continued"), html);
        assertEquals("A", item.selectFirst("code").text());
        assertEquals("b", item.selectFirst("b").text());
        assertEquals("nested one", d.select("ul ul li").text());
        assertEquals("LICENSE", d.selectFirst("a").attr("href"));
        assertEquals("a < b", d.select("td").first().text());
        assertEquals(2, d.select("th").size());
    }

    @Test
    void benchmarkTablesComeFromTheJmhResultsWithTheSpreadOverForks() throws IOException {
        // two benchmarks, three forks each: ratio of means 2.0; per-fork ratios 1.8, 2.0, 2.25 (hand computed)
        write("repo/frames-bench/src/main/resources/dev/noninertial/bench/ratios.tsv",
                "# comment\nlib over base\tB.lib\tB.base\tat most 3\t3\t\n");
        write("repo/src-site/data/jmh/a.json", "[" + run("B.lib", 20.0, "[[18.0,18.0],[20.0,20.0],[22.5,22.5]]")
                + "," + run("B.base", 10.0, "[[10.0,10.0],[10.0,10.0],[10.0,10.0]]") + "]");
        String page = BenchmarkPage.fill("<h1>B</h1><div data-generated=\"jmh-ratios\"></div>"
                + "<div data-generated=\"jmh-scores\"></div><div data-generated=\"jmh-conditions\"></div>",
                dir.resolve("repo"), dir.resolve("repo/src-site/data/jmh"));
        Document d = Markup.parseFragment(page);
        List<String> cells = d.select("table.jmh-ratios tr").get(1).select("td").eachText();
        assertEquals(List.of("lib over base", "2.00", "1.80 to 2.25", "± 0.22", "at most 3", "yes"), cells);
        assertTrue(d.select("table.jmh-scores").text().contains("18.00 to 22.50"), d.text());
        assertTrue(d.text().contains("3 forks"), d.text());
    }

    private static String run(String name, double score, String raw) {
        // the shape of a JMH -rf json record (fields the page reads); error 1.0 on both
        return "{\"jmhVersion\":\"1.37\",\"benchmark\":\"dev.noninertial.bench." + name + "\",\"mode\":\"avgt\","
                + "\"forks\":3,\"jdkVersion\":\"17\",\"vmName\":\"VM\",\"vmVersion\":\"1\",\"warmupIterations\":1,"
                + "\"warmupTime\":\"1 s\",\"measurementIterations\":2,\"measurementTime\":\"1 s\",\"jvmArgs\":[],"
                + "\"primaryMetric\":{\"score\":" + score + ",\"scoreError\":1.0,\"scoreUnit\":\"ns/op\",\"rawData\":" + raw
                + "},\"secondaryMetrics\":{\"gc.alloc.rate.norm\":{\"score\":0.0,\"scoreError\":\"NaN\"}}}";
    }

    @Test
    void searchIndexHasOneEntryPerSection() {
        Page p = Page.fromFragment("x.html", "<h1>Spin</h1><p>Intro about Coriolis.</p><h2 id=\"a\">First</h2><p>alpha "
                + "\"quoted\" &lt;tag&gt;</p><h3>Deeper</h3><p>beta</p><section><h2 id=\"s\">Inside</h2><p>gamma</p></section>");
        String js = SearchIndex.script(List.of(p));
        assertTrue(js.startsWith("// Search index"), js);
        assertTrue(js.contains("{\"u\":\"x.html\",\"t\":\"Spin\",\"p\":\"Spin\",\"x\":\"Intro about Coriolis.\"}"), js);
        assertTrue(js.contains("\"u\":\"x.html#a\",\"t\":\"First\""), js);
        assertTrue(js.contains("alpha \\\"quoted\\\" \\u003ctag>"), js);
        assertTrue(js.contains("\"u\":\"x.html#deeper\""), js);
        // a heading nested in a section (as in the accuracy report) starts its own entry
        assertTrue(js.contains("{\"u\":\"x.html#s\",\"t\":\"Inside\",\"p\":\"Spin\",\"x\":\"gamma\"}"), js);
        assertTrue(js.contains("\"x\":\"beta\"}"), "the section's text is not in the entry before it: " + js);
    }

    @Test
    void snippetBlocksOfAFailingPageAreReported() {
        // a page block with a compile error must be found (the JShell test then names page and block)
        List<Snippet> s = Snippet.fromHtml("pages/x.html", "<h1>x</h1>\n\n<pre><code class=\"language-java\">"
                + "int x = ;</code></pre>");
        assertEquals("pages/x.html block 1 (line 3)", s.get(0).toString());
    }
}
