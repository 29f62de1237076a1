package dev.noninertial.site;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

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
    void snippetBlocksOfAFailingPageAreReported() {
        // a page block with a compile error must be found (the JShell test then names page and block)
        List<Snippet> s = Snippet.fromHtml("pages/x.html", "<h1>x</h1>\n\n<pre><code class=\"language-java\">"
                + "int x = ;</code></pre>");
        assertEquals("pages/x.html block 1 (line 3)", s.get(0).toString());
    }
}
