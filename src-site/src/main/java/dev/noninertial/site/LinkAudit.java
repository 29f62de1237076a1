package dev.noninertial.site;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.jsoup.Jsoup;
import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.parser.Parser;

/**
 * Checks every local link of the site: each {@code href} and {@code src} of our own pages and
 * plots (the Javadoc tree is checked only as a link target) must name an existing file inside
 * the site, and each {@code #anchor} must name an {@code id} (or {@code name}) in that file.
 *
 * <p>Links with a scheme ({@code https:}, {@code mailto:} ...) are not followed: the site must
 * work offline, so they are only counted.
 *
 * <p>HTML pages are parsed with jsoup as a browser would, and SVG files with its XML parser: only
 * real attributes of real elements count, so a link shown as text (inside {@code <pre>} or as
 * {@code &lt;a href=...&gt;}) and a link inside a comment are not links. Style sheets are scanned
 * for {@code url(...)}.
 */
public final class LinkAudit {

    private static final Pattern CSS_URL = Pattern.compile("url\\(\\s*(['\"]?)([^'\")]*)\\1\\s*\\)");
    private static final Pattern SCHEME = Pattern.compile("^[a-zA-Z][a-zA-Z0-9+.-]*:");
    private static final Set<String> LINK_ATTRIBUTES = Set.of("href", "src", "xlink:href");

    private final Path root;
    private final Map<Path, Set<String>> anchorCache = new HashMap<>();
    private int checked;
    private int external;

    private LinkAudit(Path root) {
        this.root = root.toAbsolutePath().normalize();
    }

    /**
     * The outcome of an audit.
     *
     * @param checked number of local links checked
     * @param external number of links with a scheme, not followed
     * @param broken one line per broken link: source file, link, reason
     */
    public record Result(int checked, int external, List<String> broken) {
    }

    /**
     * Audits the site under {@code siteRoot}; files under {@code siteRoot/api} and
     * {@code siteRoot/api-spark} (the JDK's Javadoc output) are link targets only.
     *
     * @param siteRoot the output folder of the site
     * @return the result
     */
    public static Result audit(Path siteRoot) {
        LinkAudit a = new LinkAudit(siteRoot);
        List<String> broken = new ArrayList<>();
        Path api = a.root.resolve("api");
        Path sparkApi = a.root.resolve(SiteBuilder.SPARK_API);
        try (Stream<Path> files = Files.walk(a.root)) {
            for (Path f : (Iterable<Path>) files.sorted()::iterator) {
                String n = f.getFileName().toString();
                if (!f.startsWith(api) && !f.startsWith(sparkApi) && (n.endsWith(".html") || n.endsWith(".svg") || n.endsWith(".css"))) {
                    a.auditFile(f, broken);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return new Result(a.checked, a.external, broken);
    }

    private void auditFile(Path file, List<String> broken) throws IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        String where = root.relativize(file).toString();
        for (String raw : links(file.getFileName().toString(), text)) {
            String link = raw.strip();
            if (SCHEME.matcher(link).find()) {
                external++;
                continue;
            }
            checked++;
            String problem = problem(file, link);
            if (problem != null) {
                broken.add(where + ": \"" + raw + "\" " + problem);
            }
        }
    }

    /** The link values of one file, character references already read back by the parser. */
    static List<String> links(String fileName, String text) {
        List<String> found = new ArrayList<>();
        if (fileName.endsWith(".css")) {
            Matcher m = CSS_URL.matcher(text);
            while (m.find()) {
                found.add(m.group(2));
            }
            return found;
        }
        Document doc = fileName.endsWith(".svg") ? Jsoup.parse(text, "", Parser.xmlParser()) : Jsoup.parse(text);
        for (Element e : doc.getAllElements()) {
            for (Attribute a : e.attributes()) {
                if (LINK_ATTRIBUTES.contains(a.getKey().toLowerCase(java.util.Locale.ROOT))) {
                    found.add(a.getValue());
                }
            }
        }
        return found;
    }

    /** Why a local link is broken, or null if it is fine. */
    private String problem(Path from, String link) throws IOException {
        if (link.isEmpty()) {
            return "is empty";
        }
        int hash = link.indexOf('#');
        String path = hash < 0 ? link : link.substring(0, hash);
        String fragment = hash < 0 ? null : decode(link.substring(hash + 1));
        int query = path.indexOf('?');
        if (query >= 0) {
            path = path.substring(0, query);
        }
        Path target;
        if (path.isEmpty()) {
            target = from;
        } else {
            if (path.startsWith("/")) {
                return "is absolute (the site must work from any folder: use a relative link)";
            }
            target = from.getParent().resolve(decode(path)).normalize();
            if (!target.startsWith(root)) {
                return "points outside the site";
            }
            if (Files.isDirectory(target)) {
                return "names a folder (browsers opening files offline show no index: link the file)";
            }
            if (!Files.isRegularFile(target)) {
                return "names a missing file " + root.relativize(target);
            }
        }
        if (fragment != null && !fragment.isEmpty()) {
            String n = target.getFileName().toString();
            if ((n.endsWith(".html") || n.endsWith(".svg")) && !anchors(target).contains(fragment)) {
                return "names a missing anchor #" + fragment + " in " + root.relativize(target);
            }
        }
        return null;
    }

    private Set<String> anchors(Path file) throws IOException {
        Set<String> cached = anchorCache.get(file);
        if (cached != null) {
            return cached;
        }
        Set<String> ids = new HashSet<>();
        String text = Files.readString(file, StandardCharsets.UTF_8);
        Document doc = file.getFileName().toString().endsWith(".svg") ? Jsoup.parse(text, "", Parser.xmlParser())
                : Jsoup.parse(text);
        for (Element e : doc.select("[id]")) {
            ids.add(e.id());
        }
        for (Element e : doc.select("a[name]")) {
            ids.add(e.attr("name"));
        }
        anchorCache.put(file, ids);
        return ids;
    }

    private static String decode(String s) {
        // '+' is a literal plus in a path or fragment, not a space
        return URLDecoder.decode(s.replace("+", "%2B"), StandardCharsets.UTF_8);
    }
}
