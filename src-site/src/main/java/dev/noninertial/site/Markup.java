package dev.noninertial.site;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The few text operations the generator needs on HTML written by hand: escaping, reading back
 * character references, dropping tags, and making anchor names.
 *
 * <p>Thread-safe: stateless.
 */
public final class Markup {

    private static final Pattern TAG = Pattern.compile("<[^>]*>");
    private static final Pattern NUMERIC = Pattern.compile("&#(x?)([0-9a-fA-F]+);");

    private Markup() {
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
     * Reads back the character references that appear in hand-written pages: the five XML ones,
     * {@code &nbsp;}, and numeric references.
     *
     * @param html text with references
     * @return plain text
     */
    public static String unescape(String html) {
        if (html.indexOf('&') < 0) {
            return html;
        }
        Matcher m = NUMERIC.matcher(html);
        StringBuilder b = new StringBuilder();
        while (m.find()) {
            int code = Integer.parseInt(m.group(2), m.group(1).isEmpty() ? 10 : 16);
            m.appendReplacement(b, Matcher.quoteReplacement(new String(Character.toChars(code))));
        }
        m.appendTail(b);
        // &amp; last, so that "&amp;lt;" reads back as "&lt;" and not as "<"
        return b.toString().replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"")
                .replace("&apos;", "'").replace("&nbsp;", "\u00a0").replace("&amp;", "&");
    }

    /**
     * The text of an HTML piece: tags dropped, references read back, white space collapsed.
     *
     * @param html an HTML piece
     * @return its plain text
     */
    public static String text(String html) {
        return unescape(TAG.matcher(html).replaceAll("")).replaceAll("\\s+", " ").strip();
    }

    /**
     * An anchor name made from a heading text: lower case letters, digits and hyphens.
     *
     * @param text heading text
     * @return the anchor name, "section" if nothing is left
     */
    public static String slug(String text) {
        String s = text.toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z0-9]+", "-")
                .replaceAll("(^-+|-+$)", "");
        return s.isEmpty() ? "section" : s;
    }
}
