package dev.noninertial.site;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;

/** The references page shows REFERENCES.md as it is: every section and every table row. */
class SourceListTest {

    @Test
    void rendersTheMarkdownSubset() {
        String html = SourceList.toHtml("# Sources\n\nIntro `a<b`\nmore.\n\n## Two line\n## heading\n"
                + "| q | v |\n|---|---|\n| x | `1 & 2` |\n\n- item one\n  continued\n- item two\n");
        assertEquals("<p>Intro <code>a&lt;b</code> more.</p>\n<h2>Two line heading</h2>\n<table>\n"
                + "<tr><th>q</th><th>v</th></tr>\n<tr><td>x</td><td><code>1 &amp; 2</code></td></tr>\n</table>\n"
                + "<ul>\n<li>item one continued</li>\n<li>item two</li>\n</ul>\n", html);
    }

    @Test
    void theRepositoryListLosesNothing() throws IOException {
        Path file = Path.of(System.getProperty("basedir", ".")).toAbsolutePath().normalize().getParent()
                .resolve("REFERENCES.md");
        String markdown = Files.readString(file, StandardCharsets.UTF_8);
        String text = Markup.text(SourceList.toHtml(markdown));
        long sections = markdown.lines().filter(l -> l.startsWith("## ")).count();
        long rendered = SourceList.toHtml(markdown).lines().filter(l -> l.startsWith("<h2>")).count();
        assertTrue(rendered > 0 && rendered <= sections, rendered + " of " + sections);
        for (String line : markdown.lines().toList()) {
            if (line.startsWith("| ") && !line.startsWith("|---")) {
                String firstCell = line.substring(2, line.indexOf('|', 2)).strip().replace("`", "");
                assertTrue(text.contains(firstCell), "row '" + firstCell + "' missing from the page");
            }
        }
        assertTrue(text.contains("1852"), "the knot's definition is on the page");
    }
}
