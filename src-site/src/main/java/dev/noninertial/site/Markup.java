package dev.noninertial.site;

import java.util.Locale;

import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.parser.Parser;

/**
 * The few HTML operations the generator needs, all through a real HTML parser (jsoup): parsing a
 * hand-written fragment, escaping, reading back character references, the text of a piece, and
 * anchor names.
 *
 * <p>Thread-safe: stateless.
 */
public final class Markup {

    private Markup() {
    }

    /**
     * Parses a body fragment as a browser would, keeping the author's white space and layout
     * when written back ({@link #html(Element)}).
     *
     * @param html a body fragment
     * @return the document; the fragment is the content of its body
     */
    public static Document parseFragment(String html) {
        Document doc = Jsoup.parseBodyFragment(html);
        doc.outputSettings().prettyPrint(false).charset("UTF-8");
        return doc;
    }

    /**
     * Parses a complete HTML document (for example a generated page).
     *
     * @param html document text
     * @return the document
     */
    public static Document parseDocument(String html) {
        Document doc = Jsoup.parse(html);
        doc.outputSettings().prettyPrint(false).charset("UTF-8");
        return doc;
    }

    /**
     * The inner HTML of an element as written back by the parser.
     *
     * @param element an element, typically a fragment's body
     * @return its content as HTML
     */
    public static String html(Element element) {
        return element.html();
    }

    /**
     * Escapes text for use in HTML content or a double-quoted attribute.
     *
     * @param text plain text
     * @return text with {@code &}, {@code <}, {@code >} and {@code "} replaced by references
     */
    public static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    /**
     * Reads back every character reference, named or numeric, as the HTML standard defines them.
     *
     * @param html text with references
     * @return plain text
     */
    public static String unescape(String html) {
        return html.indexOf('&') < 0 ? html : Parser.unescapeEntities(html, false);
    }

    /**
     * The text of an HTML piece: tags dropped, references read back, white space collapsed.
     *
     * @param html an HTML piece
     * @return its plain text
     */
    public static String text(String html) {
        return Jsoup.parseBodyFragment(html).body().text().strip();
    }

    /**
     * An anchor name made from a heading text: lower case letters, digits and hyphens.
     *
     * @param text heading text
     * @return the anchor name, "section" if nothing is left
     */
    public static String slug(String text) {
        String s = text.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-")
                .replaceAll("(^-+|-+$)", "");
        return s.isEmpty() ? "section" : s;
    }
}
