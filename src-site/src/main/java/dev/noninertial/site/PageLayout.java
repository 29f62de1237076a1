package dev.noninertial.site;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The frame every page is shown in: a header with the project name, a navigation column listing
 * all pages (titles from their {@code <h1>}) and the API reference, the page body, and a footer
 * repeating the short caution.
 */
public final class PageLayout {

    /** Pages listed first, in this order; any other page follows in file-name order. */
    static final List<String> PREFERRED_ORDER = List.of("index.html", "conventions.html", "examples.html",
            "earth.html", "dynamics.html", "sampled-motion.html", "uncertainty.html", "navigation.html",
            "accuracy.html", "benchmarks.html");

    /** Project name shown in the header. */
    static final String PROJECT = "noninertial frames";
    /** Version shown in the header. */
    static final String VERSION = "0.1.0-SNAPSHOT";

    private static final Pattern SECTION = Pattern.compile("<h2\\b[^>]*\\bid=\"([^\"]*)\"[^>]*>(.*?)</h2>",
            Pattern.DOTALL | Pattern.CASE_INSENSITIVE);

    private final List<Page> pages;

    private PageLayout(List<Page> pages) {
        this.pages = pages;
    }

    /**
     * A layout for a set of pages, ordered for the navigation.
     *
     * @param pages all pages of the site
     * @return the layout
     */
    public static PageLayout of(List<Page> pages) {
        List<Page> sorted = new ArrayList<>(pages);
        sorted.sort(Comparator.comparingInt((Page p) -> {
            int i = PREFERRED_ORDER.indexOf(p.fileName());
            return i < 0 ? PREFERRED_ORDER.size() : i;
        }).thenComparing(Page::fileName));
        return new PageLayout(List.copyOf(sorted));
    }

    /** @return the pages in navigation order */
    public List<Page> pages() {
        return pages;
    }

    /**
     * The complete HTML document of one page.
     *
     * @param page the page, one of this layout's
     * @return the document text
     */
    public String render(Page page) {
        StringBuilder b = new StringBuilder(page.body().length() + 4096);
        b.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
         .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
         .append("<title>").append(Markup.escape(page.title())).append(" | ").append(PROJECT).append("</title>\n")
         .append("<link rel=\"stylesheet\" href=\"style.css\">\n</head>\n<body>\n")
         .append("<header class=\"masthead\"><a class=\"project\" href=\"index.html\">").append(PROJECT)
         .append("</a> <span class=\"version\">").append(VERSION).append("</span></header>\n")
         .append("<div class=\"frame\">\n<nav class=\"pages\" aria-label=\"Pages\">\n<ul>\n");
        for (Page p : pages) {
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
         .append("</ul>\n</nav>\n<main>\n").append(page.body().strip()).append("\n</main>\n</div>\n")
         .append("<footer>Results are for simulation and analysis. They are not for aiming weapons, lifting on")
         .append(" moving platforms, human-centrifuge or medical decisions, or primary navigation; local codes and")
         .append(" licensed practice take precedence. Plots on these pages are computed by the library when the")
         .append(" site is built.</footer>\n</body>\n</html>\n");
        return b.toString();
    }

    /** The current page's sections, as a nested list under its entry, when there are several. */
    private static void appendSections(StringBuilder b, Page page) {
        Matcher m = SECTION.matcher(page.body());
        List<String> items = new ArrayList<>();
        while (m.find()) {
            items.add("<li><a href=\"#" + m.group(1) + "\">" + Markup.escape(Markup.text(m.group(2))) + "</a></li>");
        }
        if (items.size() >= 2) {
            b.append("\n<ul class=\"sections\">\n").append(String.join("\n", items)).append("\n</ul>\n");
        }
    }

    /** @return the style sheet of the site */
    public static String styleSheet() {
        return """
            /* noninertial frames documentation: one plain, readable style, no web fonts, no scripts */
            :root { --ink: #1d2329; --muted: #5b6670; --rule: #d5dbe0; --tint: #f3f5f7; --link: #1b5e9e; }
            * { box-sizing: border-box; }
            html { font-size: 17px; }
            body { margin: 0; color: var(--ink); background: #ffffff;
                   font-family: "Iowan Old Style", "Palatino Linotype", Palatino, Georgia, serif; line-height: 1.55; }
            a { color: var(--link); }
            a:visited { color: #4b3f8f; }
            .masthead { padding: 0.7rem 1.4rem; border-bottom: 3px solid var(--ink);
                        font-family: system-ui, "Segoe UI", "DejaVu Sans", sans-serif; }
            .masthead .project { font-weight: 700; font-size: 1.15rem; color: var(--ink); text-decoration: none;
                                 letter-spacing: 0.02em; }
            .masthead .version { color: var(--muted); font-size: 0.85rem; margin-left: 0.4rem; }
            .frame { display: flex; align-items: flex-start; max-width: 80rem; }
            nav.pages { flex: 0 0 15rem; padding: 1.2rem 1rem 2rem 1.4rem; position: sticky; top: 0;
                        max-height: 100vh; overflow-y: auto;
                        font-family: system-ui, "Segoe UI", "DejaVu Sans", sans-serif; font-size: 0.9rem; }
            nav.pages ul { list-style: none; margin: 0; padding: 0; }
            nav.pages li { margin: 0 0 0.45rem 0; }
            nav.pages a { text-decoration: none; color: var(--ink); display: block; padding: 0.1rem 0.5rem;
                          border-left: 3px solid transparent; }
            nav.pages a:hover { border-left-color: var(--rule); }
            nav.pages a[aria-current="page"] { border-left-color: var(--link); font-weight: 700; }
            nav.pages ul.sections { margin: 0.3rem 0 0.6rem 0.9rem; font-size: 0.82rem; }
            nav.pages ul.sections li { margin: 0 0 0.2rem 0; }
            nav.pages ul.sections a { color: var(--muted); border-left: none; padding: 0 0.3rem; }
            nav.pages ul.sections a:hover { color: var(--ink); }
            nav.pages li.api { margin-top: 1rem; padding-top: 0.8rem; border-top: 1px solid var(--rule); }
            main { flex: 1 1 auto; min-width: 0; max-width: 56rem; padding: 0.5rem 1.8rem 3rem 1.8rem; }
            h1, h2, h3, h4 { font-family: system-ui, "Segoe UI", "DejaVu Sans", sans-serif; line-height: 1.25; }
            h1 { font-size: 1.9rem; margin: 1.2rem 0 1rem 0; }
            h2 { font-size: 1.35rem; margin: 2.2rem 0 0.6rem 0; padding-bottom: 0.2rem; border-bottom: 1px solid var(--rule); }
            h3 { font-size: 1.1rem; margin: 1.6rem 0 0.4rem 0; }
            p, li { max-width: 46rem; }
            code, pre { font-family: "DejaVu Sans Mono", Menlo, Consolas, monospace; font-size: 0.82rem; }
            code { background: var(--tint); padding: 0.05rem 0.25rem; border-radius: 3px; }
            pre { background: var(--tint); border-left: 3px solid var(--rule); padding: 0.7rem 0.9rem;
                  overflow-x: auto; line-height: 1.4; }
            pre code { background: none; padding: 0; }
            pre.output { background: #ffffff; border: 1px dashed var(--rule); border-left: 3px solid var(--rule);
                         white-space: pre-wrap; overflow-wrap: anywhere; }
            pre.equation { background: #ffffff; border-left: 3px solid var(--link); font-size: 0.88rem; }
            table { border-collapse: collapse; margin: 1rem 0; font-size: 0.9rem; }
            th, td { border: 1px solid var(--rule); padding: 0.3rem 0.6rem; text-align: left; vertical-align: top; }
            th { background: var(--tint); }
            td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; }
            figure { margin: 1.4rem 0; }
            figure img, figure svg { max-width: 100%; height: auto; border: 1px solid var(--rule); }
            figcaption { color: var(--muted); font-size: 0.88rem; margin-top: 0.3rem; }
            .caution { border: 1px solid #b8860b; border-left: 6px solid #b8860b; background: #fff8e6;
                       padding: 0.6rem 1rem; margin: 1.2rem 0; }
            .note { border-left: 4px solid var(--rule); padding: 0.2rem 1rem; color: var(--muted); }
            .toc { font-size: 0.92rem; }
            footer { border-top: 1px solid var(--rule); color: var(--muted); font-size: 0.8rem; padding: 1rem 1.4rem 2rem;
                     font-family: system-ui, "Segoe UI", "DejaVu Sans", sans-serif; }
            @media (max-width: 52rem) {
              .frame { display: block; }
              nav.pages { position: static; padding: 0.6rem 1rem; border-bottom: 1px solid var(--rule); }
              nav.pages li { display: inline-block; margin-right: 0.6rem; }
              nav.pages ul.sections { display: none; }
              main { padding: 0.5rem 1rem 2rem 1rem; }
            }
            """;
    }
}
