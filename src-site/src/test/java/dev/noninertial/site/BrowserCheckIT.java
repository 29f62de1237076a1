package dev.noninertial.site;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.net.http.WebSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionStage;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The built site in a real browser: headless Chromium from the OS packages, driven over its
 * DevTools protocol (a WebSocket, with the JDK's own HTTP client). Runs after the site is built
 * (failsafe, in {@code mvn -B verify}) on {@code target/site}. Checks that search finds sections,
 * that Java blocks are highlighted without changing their text and every code block has a copy
 * button, and that on a phone-sized window the page comes first, nothing overflows the page
 * sideways, tables and output blocks scroll instead of wrapping, and plot text stays readable.
 *
 * <p>Where no Chromium can be found the tests are skipped and say so (install the OS packages
 * {@code chromium} and {@code chromium-driver}; {@code .ci/run} does where it is root). A
 * screenshot of each checked window is written to {@code target/browser/} for a person to look at.
 */
class BrowserCheckIT {

    private static final Path SITE = Path.of(System.getProperty("site.output", "target/site")).toAbsolutePath();
    private static final Path SHOTS = SITE.getParent().resolve("browser");
    /** Phone window: 390 x 844 CSS pixels, a common phone size (common practice). */
    private static final int PHONE_WIDTH = 390;
    private static final int PHONE_HEIGHT = 844;
    /** Smallest plot text we accept on a phone, in CSS pixels (common practice: about 10 px and up reads). */
    private static final double READABLE_PX = 10.0;

    private static Process browser;
    private static Path profile;
    private static DevTools tools;

    @BeforeAll
    static void startBrowser() throws Exception {
        Optional<Path> chromium = findChromium();
        if (chromium.isEmpty()) {
            String why = "no Chromium found on PATH (chromium, chromium-browser) or in FRAMES_CHROMIUM: the browser"
                    + " checks of search, highlighting and the phone layout are SKIPPED. Install the OS packages"
                    + " chromium and chromium-driver to run them.";
            System.out.println("BrowserCheckIT: " + why);
            Assumptions.abort(why);
        }
        assertTrue(Files.isRegularFile(SITE.resolve("index.html")), "the site is not built in " + SITE);
        Files.createDirectories(SHOTS);
        profile = Files.createTempDirectory("frames-chromium-profile");
        browser = new ProcessBuilder(chromium.get().toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--user-data-dir=" + profile, "--remote-debugging-port=0",
                "--remote-allow-origins=*", "about:blank")
                .redirectErrorStream(true).redirectOutput(profile.resolve("chromium.log").toFile()).start();
        Path portFile = profile.resolve("DevToolsActivePort");
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (!(Files.isRegularFile(portFile) && Files.readAllLines(portFile).size() >= 2)) {
            if (!browser.isAlive() || System.nanoTime() > deadline) {
                String log = Files.isRegularFile(profile.resolve("chromium.log"))
                        ? Files.readString(profile.resolve("chromium.log")) : "";
                throw new IllegalStateException("Chromium did not start its DevTools endpoint within 60 s:\n" + log);
            }
            Thread.sleep(100);
        }
        int port = Integer.parseInt(Files.readAllLines(portFile).get(0).strip());
        HttpClient http = HttpClient.newHttpClient();
        String list = http.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + "/json/list")).build(),
                HttpResponse.BodyHandlers.ofString()).body();
        Matcher page = Pattern.compile("\"type\"\\s*:\\s*\"page\"[^}]*?\"webSocketDebuggerUrl\"\\s*:\\s*\"([^\"]+)\"")
                .matcher(list);
        Matcher any = Pattern.compile("\"webSocketDebuggerUrl\"\\s*:\\s*\"(ws://[^\"]+/page/[^\"]+)\"").matcher(list);
        String ws = page.find() ? page.group(1) : any.find() ? any.group(1) : null;
        assertTrue(ws != null, "no page target in " + list);
        tools = new DevTools(http, ws);
        tools.call("Page.enable", "{}");
        tools.call("Runtime.enable", "{}");
    }

    @AfterAll
    static void stopBrowser() throws IOException {
        if (tools != null) {
            tools.close();
        }
        if (browser != null) {
            // Chromium runs helper processes that keep writing to the profile after the main one
            // is asked to stop: stop them too, then clean up without failing on files that vanish.
            browser.descendants().forEach(ProcessHandle::destroy);
            browser.destroy();
            try {
                if (!browser.waitFor(10, TimeUnit.SECONDS)) {
                    browser.destroyForcibly();
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
        if (profile != null) {
            try (Stream<Path> s = Files.walk(profile)) {
                s.sorted(java.util.Comparator.reverseOrder()).forEach(f -> f.toFile().delete());
            } catch (IOException | java.io.UncheckedIOException e) {
                // a temporary profile left behind is harmless; the browser checks themselves passed
                System.err.println("note: could not remove the temporary browser profile " + profile + ": " + e);
            }
        }
    }

    static Optional<Path> findChromium() {
        String given = System.getenv("FRAMES_CHROMIUM");
        if (given != null && !given.isBlank() && Files.isExecutable(Path.of(given))) {
            return Optional.of(Path.of(given));
        }
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            for (String name : List.of("chromium", "chromium-browser")) {
                Path p = Path.of(dir, name);
                if (Files.isExecutable(p)) {
                    return Optional.of(p);
                }
            }
        }
        return Optional.empty();
    }

    @Test
    void searchFindsSectionsOfTheGuideOffline() throws Exception {
        desktop();
        open("search.html?q=coriolis");
        waitFor("document.querySelectorAll('#search-results li').length > 0");
        int hits = ((Double) eval("document.querySelectorAll('#search-results li').length")).intValue();
        String first = (String) eval("document.querySelector('#search-results li a').getAttribute('href')");
        String marked = (String) eval("document.querySelector('#search-results mark').textContent");
        shot("search-coriolis");
        // the guide speaks of Coriolis on several pages (conventions, examples, dynamics at least)
        assertTrue(hits >= 3, "search for 'coriolis' found " + hits + " section(s)");
        assertTrue(Files.isRegularFile(SITE.resolve(first.replaceAll("#.*", ""))), "result links to a page: " + first);
        assertEquals("coriolis", marked.toLowerCase(java.util.Locale.ROOT));

        open("search.html?q=zzqqxx+nowhere");
        waitFor("document.querySelector('#search-results .count') !== null");
        assertEquals(0.0, eval("document.querySelectorAll('#search-results li').length"));
        assertTrue(((String) eval("document.querySelector('#search-results .count').textContent")).startsWith("0 "));

        // typing in the box updates the results as you type
        eval("(function(){var i=document.getElementById('search-page-input'); i.value='gravitation';"
                + " i.dispatchEvent(new Event('input')); return 1;})()");
        assertTrue(((Double) eval("document.querySelectorAll('#search-results li').length")) >= 1);
    }

    @Test
    void javaBlocksAreHighlightedUnchangedAndEveryCodeBlockCanBeCopied() throws Exception {
        desktop();
        open("examples.html");
        waitFor("document.querySelector('pre code[data-highlighted]') !== null");
        Document built = Markup.parseDocument(Files.readString(SITE.resolve("examples.html"), StandardCharsets.UTF_8));
        List<String> before = new ArrayList<>();
        for (Element c : built.select("main pre > code.language-java")) {
            before.add(c.wholeText());
        }
        List<?> after = (List<?>) eval("Array.from(document.querySelectorAll('main pre > code.language-java'))"
                + ".map(function(c){return c.textContent;})");
        assertEquals(before, after, "highlighting must not change the code's text");
        assertTrue(!before.isEmpty(), "examples.html has Java blocks");
        double keywords = (Double) eval("document.querySelectorAll('pre code.language-java .tok-kw').length");
        double types = (Double) eval("document.querySelectorAll('pre code.language-java .tok-type').length");
        double strings = (Double) eval("document.querySelectorAll('pre code.language-java .tok-str').length");
        assertTrue(keywords > 0 && types > 0 && strings > 0, keywords + " keywords, " + types + " types, "
                + strings + " strings highlighted");
        String kwColor = (String) eval("getComputedStyle(document.querySelector('.tok-kw')).color");
        String plain = (String) eval("getComputedStyle(document.querySelector('pre code.language-java')).color");
        assertTrue(!kwColor.equals(plain), "keywords are shown in their own colour: " + kwColor + " vs " + plain);
        double blocks = (Double) eval("document.querySelectorAll('main pre:not(.output) > code').length");
        double buttons = (Double) eval("document.querySelectorAll('main pre > button.copy').length");
        assertEquals(blocks, buttons, "one copy button per code block (output blocks have none)");
        assertEquals(0.0, eval("document.querySelectorAll('pre.output > button.copy').length"));
        shot("examples-desktop");
    }

    @Test
    void phoneLayoutShowsThePageFirstAndScrollsWideContentInsteadOfWrapping() throws Exception {
        phone();
        open("examples.html");
        waitFor("document.readyState === 'complete'");
        shot("phone-examples");
        double inner = (Double) eval("window.innerWidth");
        assertEquals(PHONE_WIDTH, inner, 1.0, "phone emulation in force");
        double navTop = (Double) eval("document.getElementById('pages').getBoundingClientRect().top");
        assertTrue(navTop >= PHONE_HEIGHT, "the page list starts at " + navTop + " px: it fills the first screen");
        double h1Top = (Double) eval("document.querySelector('main h1').getBoundingClientRect().top");
        assertTrue(h1Top < 200, "the page title is on the first screen (at " + h1Top + " px)");
        double pageWidth = (Double) eval("document.documentElement.scrollWidth");
        assertTrue(pageWidth <= inner + 1, "the page is " + pageWidth + " px wide: something overflows the screen");
        assertEquals(1.0, eval("document.querySelectorAll('a.to-pages').length"));
        assertTrue((Boolean) eval("getComputedStyle(document.querySelector('a.to-pages')).display !== 'none'"),
                "the header links to the page list");
        // plots: the smallest text of each SVG plot as rendered, in CSS pixels
        List<?> plots = (List<?>) eval("Array.from(document.querySelectorAll('main img[src$=\".svg\"]'))"
                + ".map(function(i){return [i.getAttribute('src'), i.getBoundingClientRect().width, i.naturalWidth];})");
        assertTrue(!plots.isEmpty(), "examples.html shows plots");
        for (Object o : plots) {
            List<?> p = (List<?>) o;
            double smallest = smallestFontSize(SITE.resolve((String) p.get(0)));
            double rendered = smallest * (Double) p.get(1) / (Double) p.get(2);
            assertTrue(rendered >= READABLE_PX, p.get(0) + ": smallest text " + String.format("%.1f", rendered)
                    + " px on a phone");
        }

        open("conventions.html");
        waitFor("document.readyState === 'complete'");
        shot("phone-conventions");
        assertTrue((Double) eval("document.documentElement.scrollWidth") <= inner + 1, "conventions.html overflows");
        // drawings inline in the page: smallest font size in SVG units times the drawing's scale on screen
        List<?> drawings = (List<?>) eval("Array.from(document.querySelectorAll('main svg[viewBox]')).map(function(s){"
                + "var sizes = Array.from(s.querySelectorAll('[font-size]')).concat([s]).map(function(e){"
                + "return parseFloat(e.getAttribute('font-size'));}).filter(function(x){return x > 0;});"
                + "return [Math.min.apply(null, sizes), s.getBoundingClientRect().width, s.viewBox.baseVal.width];})");
        assertTrue(!drawings.isEmpty(), "conventions.html has an inline drawing");
        for (Object o : drawings) {
            List<?> d = (List<?>) o;
            double rendered = (Double) d.get(0) * (Double) d.get(1) / (Double) d.get(2);
            assertTrue(rendered >= READABLE_PX, "inline drawing: smallest text " + String.format("%.1f", rendered)
                    + " px on a phone");
        }
        assertTrue((Boolean) eval("Array.from(document.querySelectorAll('main table')).every(function(t){"
                + "var s=t.parentElement; return s.classList.contains('scroll') &&"
                + " getComputedStyle(s).overflowX === 'auto';})"), "every table scrolls inside its own box");

        open("examples.html");
        waitFor("document.readyState === 'complete'");
        assertTrue((Boolean) eval("Array.from(document.querySelectorAll('main pre.output')).every(function(p){"
                + "var s=getComputedStyle(p); return s.whiteSpace === 'pre' && s.overflowX === 'auto';})"),
                "output blocks keep their lines and scroll sideways");
        double wide = (Double) eval("Array.from(document.querySelectorAll('main pre.output'))"
                + ".filter(function(p){return p.scrollWidth > p.clientWidth;}).length");
        assertTrue(wide >= 1, "at least one output table is wider than a phone and scrolls (found " + wide + ")");
    }

    @Test
    void desktopLayoutKeepsThePageListBesideThePage() throws Exception {
        desktop();
        open("index.html");
        waitFor("document.readyState === 'complete'");
        double navLeft = (Double) eval("document.getElementById('pages').getBoundingClientRect().left");
        double mainLeft = (Double) eval("document.querySelector('main').getBoundingClientRect().left");
        double navTop = (Double) eval("document.getElementById('pages').getBoundingClientRect().top");
        assertTrue(navLeft < mainLeft && navTop < 200, "page list at the left: nav " + navLeft + ", main " + mainLeft);
        assertEquals("none", eval("getComputedStyle(document.querySelector('a.to-pages')).display"));
        assertTrue((Double) eval("document.querySelectorAll('nav.pager a[rel=next]').length") == 1.0,
                "the first page links to the next");
        shot("desktop-index");
    }

    /** The smallest font-size attribute of an SVG file (its root's default included). */
    private static double smallestFontSize(Path svg) throws IOException {
        Matcher m = Pattern.compile("font-size=\"([0-9.]+)\"").matcher(Files.readString(svg, StandardCharsets.UTF_8));
        double smallest = Double.POSITIVE_INFINITY;
        while (m.find()) {
            smallest = Math.min(smallest, Double.parseDouble(m.group(1)));
        }
        assertTrue(Double.isFinite(smallest), svg + " states no font size");
        return smallest;
    }

    private static void phone() throws Exception {
        tools.call("Emulation.setDeviceMetricsOverride", "{\"width\":" + PHONE_WIDTH + ",\"height\":" + PHONE_HEIGHT
                + ",\"deviceScaleFactor\":1,\"mobile\":true}");
    }

    private static void desktop() throws Exception {
        tools.call("Emulation.setDeviceMetricsOverride",
                "{\"width\":1280,\"height\":900,\"deviceScaleFactor\":1,\"mobile\":false}");
    }

    private static void open(String page) throws Exception {
        String url = SITE.resolve(page.replaceAll("\\?.*", "")).toUri() + (page.contains("?")
                ? page.substring(page.indexOf('?')) : "");
        tools.call("Page.navigate", "{\"url\":" + SearchIndex.quote(url) + "}");
        Thread.sleep(200);
        waitFor("document.readyState === 'complete' && location.href === " + SearchIndex.quote(url));
    }

    private static void waitFor(String condition) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(20);
        while (true) {
            Object ok = eval("!!(" + condition + ")");
            if (Boolean.TRUE.equals(ok)) {
                return;
            }
            if (System.nanoTime() > deadline) {
                throw new AssertionError("not true within 20 s in the browser: " + condition);
            }
            Thread.sleep(100);
        }
    }

    private static Object eval(String expression) throws Exception {
        Map<?, ?> reply = tools.call("Runtime.evaluate", "{\"expression\":" + SearchIndex.quote(expression)
                + ",\"returnByValue\":true,\"awaitPromise\":true}");
        Map<?, ?> result = (Map<?, ?>) reply.get("result");
        if (result.containsKey("exceptionDetails")) {
            throw new AssertionError("script error in the browser for " + expression + ": "
                    + result.get("exceptionDetails"));
        }
        return ((Map<?, ?>) result.get("result")).get("value");
    }

    private static void shot(String name) throws Exception {
        Map<?, ?> reply = tools.call("Page.captureScreenshot", "{\"format\":\"png\"}");
        String data = (String) ((Map<?, ?>) reply.get("result")).get("data");
        Files.write(SHOTS.resolve(name + ".png"), Base64.getDecoder().decode(data));
    }

    /** A minimal DevTools protocol client: one command at a time, replies matched by id. */
    private static final class DevTools implements WebSocket.Listener {
        private final WebSocket socket;
        private final AtomicInteger ids = new AtomicInteger();
        private final Map<Integer, CompletableFuture<Map<?, ?>>> waiting = new ConcurrentHashMap<>();
        private final StringBuilder partial = new StringBuilder();

        DevTools(HttpClient http, String url) throws Exception {
            socket = http.newWebSocketBuilder().connectTimeout(Duration.ofSeconds(20))
                    .buildAsync(URI.create(url), this).get(30, TimeUnit.SECONDS);
        }

        Map<?, ?> call(String method, String params) throws Exception {
            int id = ids.incrementAndGet();
            CompletableFuture<Map<?, ?>> reply = new CompletableFuture<>();
            waiting.put(id, reply);
            socket.sendText("{\"id\":" + id + ",\"method\":\"" + method + "\",\"params\":" + params + "}", true)
                  .get(20, TimeUnit.SECONDS);
            Map<?, ?> r = reply.get(60, TimeUnit.SECONDS);
            if (r.containsKey("error")) {
                throw new AssertionError(method + " failed in the browser: " + r.get("error"));
            }
            return r;
        }

        @Override
        public CompletionStage<?> onText(WebSocket webSocket, CharSequence data, boolean last) {
            partial.append(data);
            if (last) {
                String text = partial.toString();
                partial.setLength(0);
                try {
                    Object message = JsonText.parse(text);
                    if (message instanceof Map<?, ?> m && m.get("id") instanceof Double id) {
                        CompletableFuture<Map<?, ?>> f = waiting.remove(id.intValue());
                        if (f != null) {
                            f.complete(m);
                        }
                    }
                } catch (RuntimeException e) {
                    fail(new IllegalStateException("unreadable DevTools message: " + e.getMessage() + ": "
                            + text.substring(0, Math.min(300, text.length())), e));
                }
            }
            webSocket.request(1);
            return null;
        }

        @Override
        public void onError(WebSocket webSocket, Throwable error) {
            fail(error);
        }

        @Override
        public CompletionStage<?> onClose(WebSocket webSocket, int statusCode, String reason) {
            fail(new IllegalStateException("DevTools connection closed: " + statusCode + " " + reason));
            return null;
        }

        private void fail(Throwable t) {
            waiting.values().forEach(f -> f.completeExceptionally(t));
            waiting.clear();
        }

        void close() {
            socket.sendClose(WebSocket.NORMAL_CLOSURE, "done");
        }
    }
}
