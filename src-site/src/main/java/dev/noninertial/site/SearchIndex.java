package dev.noninertial.site;

import java.util.List;

import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.nodes.Node;
import org.jsoup.nodes.TextNode;
import org.jsoup.select.NodeTraversor;
import org.jsoup.select.NodeVisitor;

/**
 * The offline search index of the guide, written as {@code search-index.js} when the site is
 * built: one entry per section (the text under each {@code <h1>}, {@code <h2>} and {@code <h3>}
 * up to the next such heading) with its page, heading, address and plain text. It is a script
 * that sets {@code window.FRAMES_SEARCH_INDEX}, so that it loads from files opened offline, where
 * browsers refuse to fetch a JSON file.
 *
 * <p>Thread-safe: stateless.
 */
public final class SearchIndex {

    private SearchIndex() {
    }

    /**
     * The index script for a set of pages (the search page itself is left out).
     *
     * @param pages the pages of the site
     * @return the JavaScript text
     */
    public static String script(List<Page> pages) {
        StringBuilder b = new StringBuilder("// Search index of the guide, written by the site generator.\n"
                + "window.FRAMES_SEARCH_INDEX = [\n");
        boolean first = true;
        for (Page p : pages) {
            if (p.fileName().equals("search.html")) {
                continue;
            }
            Document doc = Markup.parseFragment(p.body());
            String[] heading = {p.title()};
            String[] anchor = {""};
            StringBuilder text = new StringBuilder();
            boolean[] open = {first};
            // every heading, at any depth (accuracy areas sit in sections), starts a new entry
            NodeTraversor.traverse(new NodeVisitor() {
                @Override
                public void head(Node n, int depth) {
                    if (n instanceof Element e && e.normalName().matches("h[123]")) {
                        open[0] = entry(b, open[0], p, heading[0], anchor[0], text);
                        heading[0] = e.normalName().equals("h1") ? p.title() : e.text().strip();
                        anchor[0] = e.normalName().equals("h1") ? "" : e.id();
                        text.setLength(0);
                    } else if (n instanceof TextNode t && !insideHeading(t)) {
                        text.append(' ').append(t.getWholeText());
                    }
                }
            }, doc.body());
            first = open[0];
            first = entry(b, first, p, heading[0], anchor[0], text);
        }
        return b.append("\n];\n").toString();
    }

    private static boolean insideHeading(Node n) {
        for (Node up = n.parent(); up != null; up = up.parent()) {
            if (up instanceof Element e && e.normalName().matches("h[1-6]")) {
                return true;
            }
        }
        return false;
    }

    private static boolean entry(StringBuilder b, boolean first, Page p, String heading, String anchor,
                                 CharSequence text) {
        String body = text.toString().replaceAll("\\s+", " ").strip();
        if (body.isEmpty() && anchor.isEmpty()) {
            return first;
        }
        if (!first) {
            b.append(",\n");
        }
        String title = anchor.isEmpty() ? p.title() : heading;
        b.append("{\"u\":").append(quote(p.fileName() + (anchor.isEmpty() ? "" : "#" + anchor)))
         .append(",\"t\":").append(quote(title)).append(",\"p\":").append(quote(p.title()))
         .append(",\"x\":").append(quote(body)).append('}');
        return false;
    }

    /** A JSON string literal, safe inside a script element too. */
    static String quote(String s) {
        StringBuilder b = new StringBuilder(s.length() + 2).append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                case '<' -> b.append("\\u003c");
                default -> {
                    if (c < 0x20 || c == '\u2028' || c == '\u2029') {
                        b.append(String.format("\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.append('"').toString();
    }
}
