package dev.noninertial.site;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The small part of Markdown that the repository's own documents use (CHANGELOG.md,
 * REFERENCES.md), turned into an HTML body fragment for the site: headings, paragraphs, bullet
 * lists with indented continuation lines, pipe tables, fenced code blocks, and inline code, bold,
 * emphasis and links. Anything else is kept as text, escaped.
 *
 * <p>Thread-safe: stateless.
 */
public final class MarkdownText {

    private static final Pattern HEADING = Pattern.compile("^(#{1,4})\\s+(.*)$");
    private static final Pattern BULLET = Pattern.compile("^(\\s*)[-*]\\s+(.*)$");
    private static final Pattern INLINE = Pattern.compile(
            "`([^`]+)`|\\*\\*([^*]+)\\*\\*|\\*([^*\\s][^*]*)\\*|\\[([^\\]]+)\\]\\(([^)\\s]+)\\)");

    private MarkdownText() {
    }

    /**
     * Converts Markdown text to an HTML fragment. The first level-1 heading becomes the page's
     * {@code <h1>}; deeper headings shift by {@code 0} levels (## is h2).
     *
     * @param markdown the document
     * @return the HTML fragment
     */
    public static String toHtml(String markdown) {
        List<String> lines = markdown.lines().toList();
        StringBuilder out = new StringBuilder();
        List<String> paragraph = new ArrayList<>();
        int i = 0;
        while (i < lines.size()) {
            String line = lines.get(i);
            if (line.isBlank()) {
                flush(paragraph, out);
                i++;
                continue;
            }
            if (line.startsWith("```")) {
                flush(paragraph, out);
                StringBuilder code = new StringBuilder();
                i++;
                while (i < lines.size() && !lines.get(i).startsWith("```")) {
                    code.append(lines.get(i)).append('\n');
                    i++;
                }
                i++;
                out.append("<pre><code>").append(Markup.escape(code.toString())).append("</code></pre>\n");
                continue;
            }
            Matcher h = HEADING.matcher(line);
            if (h.matches()) {
                flush(paragraph, out);
                int level = h.group(1).length();
                out.append("<h").append(level).append('>').append(inline(h.group(2))).append("</h").append(level)
                   .append(">\n");
                i++;
                continue;
            }
            if (line.startsWith("|")) {
                flush(paragraph, out);
                List<String> rows = new ArrayList<>();
                while (i < lines.size() && lines.get(i).startsWith("|")) {
                    rows.add(lines.get(i));
                    i++;
                }
                table(rows, out);
                continue;
            }
            if (BULLET.matcher(line).matches()) {
                flush(paragraph, out);
                i = list(lines, i, out);
                continue;
            }
            paragraph.add(line.strip());
            i++;
        }
        flush(paragraph, out);
        return out.toString();
    }

    private static void flush(List<String> paragraph, StringBuilder out) {
        if (!paragraph.isEmpty()) {
            out.append("<p>").append(inline(String.join(" ", paragraph))).append("</p>\n");
            paragraph.clear();
        }
    }

    /** A bullet list from line {@code i}; items continue on lines indented deeper than the bullet. */
    private static int list(List<String> lines, int i, StringBuilder out) {
        Matcher first = BULLET.matcher(lines.get(i));
        first.matches();
        int indent = first.group(1).length();
        out.append("<ul>\n");
        StringBuilder item = null;
        while (i < lines.size()) {
            String line = lines.get(i);
            Matcher b = BULLET.matcher(line);
            int lead = line.length() - line.stripLeading().length();
            if (line.isBlank()) {
                break;
            }
            if (b.matches() && b.group(1).length() == indent) {
                if (item != null) {
                    out.append("<li>").append(inline(item.toString())).append("</li>\n");
                }
                item = new StringBuilder(b.group(2).strip());
                i++;
            } else if (b.matches() && b.group(1).length() > indent) {
                // a nested list: rendered inside the current item
                StringBuilder nested = new StringBuilder();
                i = list(lines, i, nested);
                out.append("<li>").append(inline(item == null ? "" : item.toString())).append('\n').append(nested)
                   .append("</li>\n");
                item = null;
            } else if (lead > indent) {
                if (item == null) {
                    item = new StringBuilder();
                }
                item.append(' ').append(line.strip());
                i++;
            } else {
                break;
            }
        }
        if (item != null) {
            out.append("<li>").append(inline(item.toString())).append("</li>\n");
        }
        out.append("</ul>\n");
        return i;
    }

    private static void table(List<String> rows, StringBuilder out) {
        out.append("<table>\n");
        boolean header = rows.size() > 1 && rows.get(1).matches("^\\|[\\s:|-]+\\|?\\s*$");
        for (int r = 0; r < rows.size(); r++) {
            if (header && r == 1) {
                continue;
            }
            String row = rows.get(r).strip();
            row = row.substring(1, row.endsWith("|") && row.length() > 1 ? row.length() - 1 : row.length());
            String cell = header && r == 0 ? "th" : "td";
            out.append("<tr>");
            for (String c : row.split("\\|", -1)) {
                out.append('<').append(cell).append('>').append(inline(c.strip())).append("</").append(cell).append('>');
            }
            out.append("</tr>\n");
        }
        out.append("</table>\n");
    }

    /** Inline code, bold, emphasis and links; everything else escaped. */
    static String inline(String text) {
        StringBuilder b = new StringBuilder();
        Matcher m = INLINE.matcher(text);
        int last = 0;
        while (m.find()) {
            b.append(Markup.escape(text.substring(last, m.start())));
            if (m.group(1) != null) {
                b.append("<code>").append(Markup.escape(m.group(1))).append("</code>");
            } else if (m.group(2) != null) {
                b.append("<b>").append(Markup.escape(m.group(2))).append("</b>");
            } else if (m.group(3) != null) {
                b.append("<em>").append(Markup.escape(m.group(3))).append("</em>");
            } else {
                b.append("<a href=\"").append(Markup.escape(m.group(5))).append("\">").append(Markup.escape(m.group(4)))
                 .append("</a>");
            }
            last = m.end();
        }
        return b.append(Markup.escape(text.substring(last))).toString();
    }
}
