package dev.noninertial.site;

import java.util.HashSet;
import java.util.Set;

import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;

/**
 * One page of the site: its output file name, its title (the text of its {@code <h1>}) and its
 * body fragment.
 *
 * @param fileName output file name, for example {@code conventions.html}
 * @param title text of the page's first {@code <h1>}
 * @param body the HTML body fragment, with an {@code id} on every {@code <h2>} and {@code <h3>}
 */
public record Page(String fileName, String title, String body) {

    /**
     * Reads a page from a fragment that follows the site convention (one {@code <h1>} title).
     *
     * @param fileName output file name
     * @param fragment HTML body fragment
     * @return the page, with anchors added to headings that have none
     * @throws IllegalArgumentException if the fragment has no {@code <h1>} or more than one
     */
    public static Page fromFragment(String fileName, String fragment) {
        Document doc = Markup.parseFragment(fragment);
        Elements h1 = doc.body().select("h1");
        if (h1.isEmpty()) {
            throw new IllegalArgumentException("page " + fileName + " has no <h1> title (site convention: each"
                    + " fragment starts with one <h1>)");
        }
        String title = h1.get(0).text().strip();
        if (h1.size() > 1) {
            throw new IllegalArgumentException("page " + fileName + " has more than one <h1>: '" + title
                    + "' and '" + h1.get(1).text().strip() + "'");
        }
        addHeadingAnchors(doc.body());
        return new Page(fileName, title, Markup.html(doc.body()));
    }

    /**
     * Gives every {@code <h2>} and {@code <h3>} without an {@code id} one made from its text, so
     * that sections can be linked; existing ids are kept, however they are quoted.
     *
     * @param html a body fragment
     * @return the fragment with anchors
     */
    static String withHeadingAnchors(String html) {
        Document doc = Markup.parseFragment(html);
        addHeadingAnchors(doc.body());
        return Markup.html(doc.body());
    }

    private static void addHeadingAnchors(Element root) {
        Set<String> used = new HashSet<>();
        for (Element e : root.select("[id]")) {
            used.add(e.id());
        }
        for (Element h : root.select("h2, h3")) {
            if (h.hasAttr("id")) {
                continue;
            }
            String base = Markup.slug(h.text());
            String id = base;
            for (int k = 2; used.contains(id); k++) {
                id = base + "-" + k;
            }
            used.add(id);
            h.attr("id", id);
        }
    }
}
