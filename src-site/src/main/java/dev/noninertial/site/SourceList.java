package dev.noninertial.site;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The repository's list of sources, {@code REFERENCES.md}, as an HTML body fragment for the
 * references page, so that the page and the file can never disagree. Reads the small Markdown
 * subset the file is written in: {@code ##} headings (consecutive heading lines make one
 * heading), paragraphs, {@code -} lists with indented continuation lines, pipe tables with a
 * {@code |---|} separator row, and {@code `code`} spans. The file's own {@code #} title is dropped
 * (the page has its own). Everything else is escaped and shown as text.
 *
 * <p>Thread-safe: stateless.
 */
public final class SourceList {

    /** The marker a page writes where the list goes. */
    public static final String MARKER = "<!-- REFERENCES.md -->";

    private static final Pattern CODE = Pattern.compile("`([^`]+)`");

    private SourceList() {
    }

    /**
     * Renders the list.
     *
     * @param markdown the text of {@code REFERENCES.md}
     * @return the HTML fragment: {@code <h2>} per section, paragraphs, lists and tables
     */
    public static String toHtml(String markdown) {
        List<String> lines = List.of(markdown.replace("\r\n", "\n").split("\n", -1));
        StringBuilder out = new StringBuilder();
        int i = 0;
        while (i < lines.size()) {
            String line = lines.get(i);
            if (line.isBlank() || line.startsWith("# ")) {
                i++;
            } else if (line.startsWith("## ")) {
                StringBuilder heading = new StringBuilder(line.substring(3).strip());
                i++;
                while (i < lines.size() && lines.get(i).startsWith("## ")) {
                    heading.append(' ').append(lines.get(i).substring(3).strip());
                    i++;
                }
                out.append("<h2>").append(inline(heading.toString())).append("</h2>\n");
            } else if (line.startsWith("|")) {
                List<String> rows = new ArrayList<>();
                while (i < lines.size() && lines.get(i).startsWith("|")) {
                    rows.add(lines.get(i));
                    i++;
                }
                table(rows, out);
            } else if (line.startsWith("- ")) {
                out.append("<ul>\n");
                while (i < lines.size() && lines.get(i).startsWith("- ")) {
                    StringBuilder item = new StringBuilder(lines.get(i).substring(2).strip());
                    i++;
                    while (i < lines.size() && lines.get(i).startsWith("  ") && !lines.get(i).isBlank()) {
                        item.append(' ').append(lines.get(i).strip());
                        i++;
                    }
                    out.append("<li>").append(inline(item.toString())).append("</li>\n");
                }
                out.append("</ul>\n");
            } else {
                StringBuilder paragraph = new StringBuilder(line.strip());
                i++;
                while (i < lines.size() && !lines.get(i).isBlank() && !lines.get(i).startsWith("#")
                        && !lines.get(i).startsWith("|") && !lines.get(i).startsWith("- ")) {
                    paragraph.append(' ').append(lines.get(i).strip());
                    i++;
                }
                out.append("<p>").append(inline(paragraph.toString())).append("</p>\n");
            }
        }
        return out.toString();
    }

    private static void table(List<String> rows, StringBuilder out) {
        out.append("<table>\n");
        boolean header = rows.size() > 1 && rows.get(1).matches("\\|[-|: ]+\\|?\\s*");
        for (int r = 0; r < rows.size(); r++) {
            if (header && r == 1) {
                continue;
            }
            String tag = header && r == 0 ? "th" : "td";
            out.append("<tr>");
            for (String cell : cells(rows.get(r))) {
                out.append('<').append(tag).append('>').append(inline(cell)).append("</").append(tag).append('>');
            }
            out.append("</tr>\n");
        }
        out.append("</table>\n");
    }

    private static List<String> cells(String row) {
        String s = row.strip();
        if (s.startsWith("|")) {
            s = s.substring(1);
        }
        if (s.endsWith("|")) {
            s = s.substring(0, s.length() - 1);
        }
        List<String> cells = new ArrayList<>();
        for (String c : s.split("\\|", -1)) {
            cells.add(c.strip());
        }
        return cells;
    }

    /** Escapes the text and turns {@code `code`} spans into {@code <code>} elements. */
    private static String inline(String text) {
        Matcher m = CODE.matcher(text);
        StringBuilder b = new StringBuilder();
        int last = 0;
        while (m.find()) {
            b.append(Markup.escape(text.substring(last, m.start())));
            b.append("<code>").append(Markup.escape(m.group(1))).append("</code>");
            last = m.end();
        }
        b.append(Markup.escape(text.substring(last)));
        return b.toString();
    }
}
