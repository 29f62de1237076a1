package dev.noninertial.site;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;

import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;

/**
 * The frame every page is shown in: a header with the project name, the version and the search
 * box; a navigation column listing all pages (titles from their {@code <h1>}) and the API
 * reference; the page body with previous and next links; and a footer repeating the short caution
 * and naming the page's source file.
 *
 * <p>On a phone (narrow window) the navigation moves below the page, reached by the "Pages" link
 * of the header, so that the first screen shows the page itself; tables and output blocks scroll
 * sideways instead of wrapping, and plots keep a readable size.
 */
public final class PageLayout {

    /** Pages listed first, in this order; any other page follows in file-name order. */
    static final List<String> PREFERRED_ORDER = List.of("index.html", "install.html", "conventions.html",
            "examples.html", "earth.html", "dynamics.html", "sampled-motion.html", "uncertainty.html",
            "navigation.html", "files.html", "accuracy.html", "benchmarks.html");

    /** Pages listed last, in this order, after the guide. */
    static final List<String> CLOSING_ORDER = List.of("references.html", "changelog.html", "source.html",
            "license.html");

    /** Pages written by the generator with no entry in the navigation. */
    static final List<String> UNLISTED = List.of("search.html");

    /** Project name shown in the header. */
    static final String PROJECT = "noninertial frames";
    /** Version shown in the header when the build does not say (system property {@code site.version}). */
    static final String DEFAULT_VERSION = "0.1.0-SNAPSHOT";

    private final List<Page> pages;
    private final String version;
    private final Map<String, String> sources;

    private PageLayout(List<Page> pages, String version, Map<String, String> sources) {
        this.pages = pages;
        this.version = version;
        this.sources = sources;
    }

    /**
     * A layout for a set of pages, ordered for the navigation, with the default version and no
     * source file names.
     *
     * @param pages all pages of the site
     * @return the layout
     */
    public static PageLayout of(List<Page> pages) {
        return of(pages, DEFAULT_VERSION, Map.of());
    }

    /**
     * A layout for a set of pages, ordered for the navigation.
     *
     * @param pages all pages of the site
     * @param version the version shown in the header
     * @param sources for each page file name, the repository file it is made from (shown in the footer)
     * @return the layout
     */
    public static PageLayout of(List<Page> pages, String version, Map<String, String> sources) {
        List<Page> sorted = new ArrayList<>(pages);
        sorted.sort(Comparator.comparingInt(PageLayout::rank).thenComparing(Page::fileName));
        return new PageLayout(List.copyOf(sorted), version, Map.copyOf(sources));
    }

    private static int rank(Page p) {
        int i = PREFERRED_ORDER.indexOf(p.fileName());
        if (i >= 0) {
            return i;
        }
        int j = CLOSING_ORDER.indexOf(p.fileName());
        if (j >= 0) {
            return 2000 + j;
        }
        return UNLISTED.contains(p.fileName()) ? 3000 : 1000;
    }

    /**
     * The pages in navigation order, the unlisted ones (search) last.
     *
     * @return the pages
     */
    public List<Page> pages() {
        return pages;
    }

    private List<Page> listed() {
        return pages.stream().filter(p -> !UNLISTED.contains(p.fileName())).toList();
    }

    /**
     * The complete HTML document of one page.
     *
     * @param page the page, one of this layout's
     * @return the document text
     */
    public String render(Page page) {
        StringBuilder b = new StringBuilder(page.body().length() + 6144);
        b.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
         .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
         .append("<title>").append(Markup.escape(page.title())).append(" | ").append(PROJECT).append("</title>\n")
         .append("<link rel=\"stylesheet\" href=\"style.css\">\n");
        if (page.fileName().equals("search.html")) {
            b.append("<script src=\"search-index.js\" defer></script>\n");
        }
        b.append("<script src=\"site.js\" defer></script>\n</head>\n<body>\n")
         .append("<header class=\"masthead\"><a class=\"project\" href=\"index.html\">").append(PROJECT)
         .append("</a> <span class=\"version\">").append(Markup.escape(version)).append("</span>")
         .append("<form class=\"search\" action=\"search.html\" method=\"get\" role=\"search\">")
         .append("<input type=\"search\" name=\"q\" placeholder=\"Search the guide\" aria-label=\"Search the guide\">")
         .append("</form>")
         .append("<a class=\"to-pages\" href=\"#pages\">Pages</a></header>\n")
         .append("<div class=\"frame\">\n<main>\n").append(page.body().strip()).append('\n');
        appendPager(b, page);
        b.append("</main>\n<nav class=\"pages\" id=\"pages\" aria-label=\"Pages\">\n<ul>\n");
        for (Page p : listed()) {
            b.append("<li><a href=\"").append(p.fileName()).append('"');
            if (p.fileName().equals(page.fileName())) {
                b.append(" aria-current=\"page\"");
            }
            b.append('>').append(Markup.escape(p.title())).append("</a>");
            if (p.fileName().equals(page.fileName())) {
                appendSections(b, p);
            }
            b.append("</li>\n");
        }
        b.append("<li class=\"api\"><a href=\"api/index.html\">API reference (Javadoc)</a></li>\n")
         .append("<li class=\"api\"><a href=\"api-spark/index.html\">API reference, frames-spark</a></li>\n")
         .append("</ul>\n</nav>\n</div>\n")
         .append("<footer><p>Results are for simulation and analysis. They are not for aiming weapons, lifting on")
         .append(" moving platforms, human-centrifuge or medical decisions, or primary navigation; local codes and")
         .append(" licensed practice take precedence. Plots on these pages are computed by the library when the")
         .append(" site is built.</p>\n<p>");
        String source = sources.get(page.fileName());
        if (source != null) {
            b.append("Made from <code>").append(Markup.escape(source)).append("</code> (see <a href=\"source.html\">")
             .append("Source</a>). ");
        }
        b.append("Licensed under the <a href=\"license.html\">Apache License, Version 2.0</a>.</p></footer>\n")
         .append("</body>\n</html>\n");
        return b.toString();
    }

    /** Links to the previous and next page of the navigation order. */
    private void appendPager(StringBuilder b, Page page) {
        List<Page> order = listed();
        int i = order.indexOf(page);
        if (i < 0) {
            return;
        }
        b.append("<nav class=\"pager\" aria-label=\"Previous and next page\">");
        if (i > 0) {
            Page prev = order.get(i - 1);
            b.append("<a class=\"prev\" rel=\"prev\" href=\"").append(prev.fileName()).append("\">&larr; ")
             .append(Markup.escape(prev.title())).append("</a>");
        }
        if (i + 1 < order.size()) {
            Page next = order.get(i + 1);
            b.append("<a class=\"next\" rel=\"next\" href=\"").append(next.fileName()).append("\">")
             .append(Markup.escape(next.title())).append(" &rarr;</a>");
        }
        b.append("</nav>\n");
    }

    /** The current page's sections, as a nested list under its entry, when there are several. */
    private static void appendSections(StringBuilder b, Page page) {
        Document doc = Markup.parseFragment(page.body());
        List<String> items = new ArrayList<>();
        for (Element h : doc.body().select("h2[id]")) {
            items.add("<li><a href=\"#" + Markup.escape(h.id()) + "\">" + Markup.escape(h.text().strip()) + "</a></li>");
        }
        if (items.size() >= 2) {
            b.append("\n<ul class=\"sections\">\n").append(String.join("\n", items)).append("\n</ul>\n");
        }
    }

    /**
     * The style sheet of the site.
     *
     * @return the CSS text
     */
    public static String styleSheet() {
        return resource("style.css");
    }

    /**
     * The one script of the site (our own, no libraries): syntax highlighting and a copy button
     * on code blocks, and the search page.
     *
     * @return the JavaScript text
     */
    public static String script() {
        return resource("site.js");
    }

    private static String resource(String name) {
        try (InputStream in = PageLayout.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing resource dev/noninertial/site/" + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
