package dev.noninertial.site;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.nodes.Node;
import org.jsoup.nodes.TextNode;
import org.jsoup.parser.Parser;

/**
 * A Java code block of the documentation, with where it came from, so that the snippet test can
 * run it and name the page and block when it fails.
 *
 * @param origin file the block was read from, for example {@code pages/examples.html}
 * @param index 1-based number of the block within that file
 * @param line 1-based line of the file where the code starts
 * @param code the Java source, character references read back
 * @param expectedOutput what the block must print, from a {@code <pre class="output">} block that
 *        follows it directly (only white space between); null when there is none
 */
public record Snippet(String origin, int index, int line, String code, String expectedOutput) {

    private static final Pattern MARKDOWN_BLOCK = Pattern.compile("(?m)^```java[ \\t]*\\n(.*?)^```[ \\t]*$",
            Pattern.DOTALL);

    /**
     * The blocks {@code <pre><code class="language-java">...</code></pre>} of an HTML page.
     *
     * @param origin name of the page, for messages
     * @param html page text
     * @return the blocks in page order
     */
    public static List<Snippet> fromHtml(String origin, String html) {
        Parser parser = Parser.htmlParser().setTrackPosition(true);
        Document doc = parser.parseInput(html, "");
        List<Snippet> found = new ArrayList<>();
        for (Element code : doc.select("pre > code.language-java")) {
            Element pre = code.parent();
            String expected = null;
            Element next = nextElementAfterBlanks(pre);
            if (next != null && next.normalName().equals("pre") && next.hasClass("output")) {
                Element out = next.selectFirst("> code");
                expected = (out == null ? next : out).wholeText();
            }
            int line = code.sourceRange().isTracked() ? code.sourceRange().end().lineNumber() : 1;
            found.add(new Snippet(origin, found.size() + 1, line, code.wholeText(), expected));
        }
        return found;
    }

    /** The element right after this one when only white space stands between them, else null. */
    private static Element nextElementAfterBlanks(Element e) {
        for (Node n = e.nextSibling(); n != null; n = n.nextSibling()) {
            if (n instanceof Element el) {
                return el;
            }
            if (!(n instanceof TextNode t) || !t.isBlank()) {
                return null;
            }
        }
        return null;
    }

    /**
     * The fenced {@code ```java} blocks of a Markdown file.
     *
     * @param origin name of the file, for messages
     * @param markdown file text
     * @return the blocks in file order
     */
    public static List<Snippet> fromMarkdown(String origin, String markdown) {
        List<Snippet> found = new ArrayList<>();
        Matcher m = MARKDOWN_BLOCK.matcher(markdown);
        while (m.find()) {
            found.add(new Snippet(origin, found.size() + 1, lineOf(markdown, m.start(1)), m.group(1), null));
        }
        return found;
    }

    private static int lineOf(String text, int offset) {
        int line = 1;
        for (int i = 0; i < offset; i++) {
            if (text.charAt(i) == '\n') {
                line++;
            }
        }
        return line;
    }

    @Override
    public String toString() {
        return origin + " block " + index + " (line " + line + ")";
    }
}
