package dev.noninertial.site;

import java.util.HashSet;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One page of the site: its output file name, its title (the text of its {@code <h1>}) and its
 * body fragment.
 *
 * @param fileName output file name, for example {@code conventions.html}
 * @param title text of the page's first {@code <h1>}
 * @param body the HTML body fragment, with an {@code id} on every {@code <h2>} and {@code <h3>}
 */
public record Page(String fileName, String title, String body) {

    private static final Pattern H1 = Pattern.compile("<h1\\b[^>]*>(.*?)</h1>", Pattern.DOTALL | Pattern.CASE_INSENSITIVE);
    private static final Pattern HEADING = Pattern.compile("<(h[23])(\\b[^>]*)>(.*?)</\\1>",
            Pattern.DOTALL | Pattern.CASE_INSENSITIVE);
    private static final Pattern ID = Pattern.compile("\\bid\\s*=\\s*\"([^\"]*)\"");

    /**
     * Reads a page from a fragment that follows the site convention (one {@code <h1>} title).
     *
     * @param fileName output file name
     * @param fragment HTML body fragment
     * @return the page, with anchors added to headings that have none
     * @throws IllegalArgumentException if the fragment has no {@code <h1>} or more than one
     */
    public static Page fromFragment(String fileName, String fragment) {
        Matcher m = H1.matcher(fragment);
        if (!m.find()) {
            throw new IllegalArgumentException("page " + fileName + " has no <h1> title (site convention: each"
                    + " fragment starts with one <h1>)");
        }
        String title = Markup.text(m.group(1));
        if (m.find()) {
            throw new IllegalArgumentException("page " + fileName + " has more than one <h1>: '" + title
                    + "' and '" + Markup.text(m.group(1)) + "'");
        }
        return new Page(fileName, title, withHeadingAnchors(fragment));
    }

    /**
     * Gives every {@code <h2>} and {@code <h3>} without an {@code id} one made from its text, so
     * that sections can be linked; existing ids are kept.
     *
     * @param html a body fragment
     * @return the fragment with anchors
     */
    static String withHeadingAnchors(String html) {
        Set<String> used = new HashSet<>();
        Matcher ids = ID.matcher(html);
        while (ids.find()) {
            used.add(ids.group(1));
        }
        Matcher m = HEADING.matcher(html);
        StringBuilder b = new StringBuilder();
        while (m.find()) {
            String attributes = m.group(2);
            if (ID.matcher(attributes).find()) {
                m.appendReplacement(b, Matcher.quoteReplacement(m.group()));
                continue;
            }
            String base = Markup.slug(Markup.text(m.group(3)));
            String id = base;
            for (int k = 2; used.contains(id); k++) {
                id = base + "-" + k;
            }
            used.add(id);
            m.appendReplacement(b, Matcher.quoteReplacement("<" + m.group(1) + " id=\"" + id + "\"" + attributes
                    + ">" + m.group(3) + "</" + m.group(1) + ">"));
        }
        m.appendTail(b);
        return b.toString();
    }
}
