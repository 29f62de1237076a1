package dev.noninertial.site;

/**
 * The repository's list of sources, {@code REFERENCES.md}, as an HTML body fragment for the
 * references page, so that the page and the file can never disagree. The file is written in the
 * Markdown subset of {@link MarkdownText}, which renders it; this class only adapts two habits of the
 * file: its own {@code #} title is dropped (the page has its own) and consecutive {@code ##} heading
 * lines make one heading.
 *
 * <p>Thread-safe: stateless.
 */
public final class SourceList {

    /** The marker a page writes where the list goes. */
    public static final String MARKER = "<!-- REFERENCES.md -->";

    private SourceList() {
    }

    /**
     * Renders the list.
     *
     * @param markdown the text of {@code REFERENCES.md}
     * @return the HTML fragment: {@code <h2>} per section, paragraphs, lists and tables
     */
    public static String toHtml(String markdown) {
        StringBuilder prepared = new StringBuilder();
        boolean inHeading = false;
        for (String line : markdown.lines().toList()) {
            if (line.startsWith("# ")) {
                inHeading = false;
                continue;
            }
            boolean heading = line.startsWith("## ");
            if (heading && inHeading) {
                // a heading continued on the next line: one heading
                prepared.append(' ').append(line.substring(3).strip());
            } else {
                if (prepared.length() > 0) {
                    prepared.append('\n');
                }
                prepared.append(heading ? "## " + line.substring(3).strip() : line);
            }
            inHeading = heading;
        }
        return MarkdownText.toHtml(prepared.toString());
    }
}
