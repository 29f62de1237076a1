package dev.noninertial.site;

/**
 * The page fragments the generator writes itself, from the build's version and the repository's
 * own files: the install section, the license, the source page and the search page.
 *
 * <p>Thread-safe: stateless.
 */
public final class GeneratedPages {

    private GeneratedPages() {
    }

    /** The search page: the box, and the results filled in by {@code site.js} from {@code search-index.js}. */
    static final String SEARCH = """
            <h1>Search</h1>
            <p>Search the guide: every page and section of this site (the API reference has its own search).
            Every word must occur; results are ranked by where the words occur (section titles first). The
            index is built with the site and the search runs in the browser, offline.</p>
            <form class="search-page" action="search.html" method="get" role="search">
            <input type="search" id="search-page-input" name="q" placeholder="for example: coriolis bulk" \
            aria-label="Search the guide">
            </form>
            <div id="search-results" aria-live="polite"><p class="note">The search needs JavaScript; without it,
            use the page list.</p></div>
            """;

    /**
     * The install section: Maven and Gradle snippets that import the BOM.
     *
     * @param version the version of this build
     * @return the page fragment
     */
    static String install(String version) {
        String v = Markup.escape(version);
        String snapshot = version.endsWith("-SNAPSHOT")
                ? "<p class=\"note\">" + v + " is a snapshot: it is not published. Build it from the repository"
                  + " (see <a href=\"source.html\">Source</a>) and install it into your local repository with"
                  + " <code>mvn -B install</code>, or wait for the first release.</p>\n"
                : "";
        return """
                <h1>Install</h1>
                <p>The library needs Java 17 or newer and has one dependency, Hipparchus (core, geometry and ODE
                modules). It comes as two artifacts, <code>frames-core</code> (frames, motions, placements, the
                four inertial terms, integration, covariances) and <code>frames-geodesy</code> (WGS84 / GRS80,
                Earth frames, normal gravity), kept at one version by the bill of materials
                <code>frames-bom</code>: import it once, then name the artifacts without versions.</p>
                %s
                <h2 id="maven">Maven</h2>
                <pre><code class="language-xml">&lt;dependencyManagement&gt;
                  &lt;dependencies&gt;
                    &lt;dependency&gt;
                      &lt;groupId&gt;dev.noninertial&lt;/groupId&gt;
                      &lt;artifactId&gt;frames-bom&lt;/artifactId&gt;
                      &lt;version&gt;%s&lt;/version&gt;
                      &lt;type&gt;pom&lt;/type&gt;
                      &lt;scope&gt;import&lt;/scope&gt;
                    &lt;/dependency&gt;
                  &lt;/dependencies&gt;
                &lt;/dependencyManagement&gt;
                &lt;dependencies&gt;
                  &lt;dependency&gt;
                    &lt;groupId&gt;dev.noninertial&lt;/groupId&gt;
                    &lt;artifactId&gt;frames-core&lt;/artifactId&gt;
                  &lt;/dependency&gt;
                  &lt;dependency&gt;
                    &lt;groupId&gt;dev.noninertial&lt;/groupId&gt;
                    &lt;artifactId&gt;frames-geodesy&lt;/artifactId&gt;
                  &lt;/dependency&gt;
                &lt;/dependencies&gt;</code></pre>
                <h2 id="gradle">Gradle</h2>
                <p>Kotlin DSL (<code>build.gradle.kts</code>):</p>
                <pre><code class="language-kotlin">dependencies {
                    implementation(platform("dev.noninertial:frames-bom:%s"))
                    implementation("dev.noninertial:frames-core")
                    implementation("dev.noninertial:frames-geodesy")
                }</code></pre>
                <p>Groovy DSL (<code>build.gradle</code>):</p>
                <pre><code class="language-groovy">dependencies {
                    implementation platform('dev.noninertial:frames-bom:%s')
                    implementation 'dev.noninertial:frames-core'
                    implementation 'dev.noninertial:frames-geodesy'
                }</code></pre>
                <h2 id="module-path">Module path</h2>
                <p>Each jar names its module in its manifest (<code>Automatic-Module-Name</code>):
                <code>requires dev.noninertial.frames;</code> and <code>requires dev.noninertial.geodesy;</code>.
                Every package is sealed. Sources and Javadoc jars are published beside each jar.</p>
                <h2 id="jshell">Trying it in JShell</h2>
                <p>From a clone of the repository, <code>jshell/frames-jshell</code> (Windows:
                <code>jshell\\frames-jshell.cmd</code>) opens JShell with the library on the class path and every
                package imported. It builds the library the first time and whenever a source changed, showing
                each module as it goes; otherwise it starts at once from a cached class path.</p>
                <p><b>Continuation lines in JShell.</b> JShell runs a line as soon as it is a complete statement.
                A line that <em>starts</em> with an operator or a dot after a complete line becomes a statement of
                its own, and the value of the first line is used without it, silently:</p>
                <pre><code>double total = 1.0 + 2.0
                    - 3.0;            // JShell has already run the first line: total is 3.0, not 0.0</code></pre>
                <p>Keep the operator or the dot at the <em>end</em> of the line that continues (<code>2.0 -</code>
                then <code>3.0;</code>, or <code>TrajectorySolver.of(enu).</code> then <code>plusForce(...)</code>),
                as every snippet of this guide does; then JShell waits for the rest. In a Java source file either
                way is fine.</p>
                """.formatted(snapshot, v, v, v);
    }

    /**
     * The license page: the full text, as it is in the repository.
     *
     * @param text the text of {@code LICENSE}
     * @return the page fragment
     */
    static String license(String text) {
        return "<h1>License</h1>\n<p>The library, its documentation and this site are licensed under the Apache"
                + " License, Version 2.0 (the license of Hipparchus, the library's one dependency). The full text"
                + " follows, as in the file <code>LICENSE</code> of the repository.</p>\n<pre class=\"license\">"
                + Markup.escape(text.strip()) + "</pre>\n";
    }

    /**
     * The source page: where the repository is, how it is laid out, and how to build it.
     *
     * @param repository address of the repository (from the build), empty when unknown
     * @return the page fragment
     */
    static String source(String repository) {
        String where = repository.isBlank()
                ? "<p>The address of the repository is given in the project's POM (<code>project.address.scm</code>).</p>"
                : "<p>Repository: <code>" + Markup.escape(repository) + "</code> (Git). The addresses are set in"
                  + " one place, the <code>project.address.*</code> properties of the parent <code>pom.xml</code>.</p>";
        return """
                <h1>Source</h1>
                %s
                <p>The source of every public class is also on this site: each page of the
                <a href="api/index.html">API reference</a> links its class name to the source, shown with line
                numbers. The footer of each guide page names the file it is made from.</p>
                <h2 id="layout">Layout of the repository</h2>
                <table>
                <tr><th>folder</th><th>what it holds</th></tr>
                <tr><td><code>frames-core</code></td><td>frames, motions, placements, the four inertial terms, integration, covariances</td></tr>
                <tr><td><code>frames-geodesy</code></td><td>ellipsoids, Earth frames, normal gravity, geodetic conversions</td></tr>
                <tr><td><code>frames-bom</code></td><td>the bill of materials</td></tr>
                <tr><td><code>frames-bench</code></td><td>JMH benchmarks and the CI allocation and speed gate (not deployed)</td></tr>
                <tr><td><code>frames-examples</code></td><td>worked scenarios in invented places (not deployed)</td></tr>
                <tr><td><code>src-site</code></td><td>this site: page fragments, accuracy fragments, data and the generator (not deployed)</td></tr>
                <tr><td><code>jshell</code></td><td>the JShell launchers and example scripts</td></tr>
                </table>
                <h2 id="build">Build and test</h2>
                <pre><code>mvn -B verify                                    # jars, sources and Javadoc jars, BOM, every test
                mvn -B -q -pl src-site -am package -DskipTests   # this site, into src-site/target/site/
                tools/check-reproducible                         # two clean builds give identical jars
                .ci/run                                          # what CI runs (JDK 17, and JDK 25 where installed)</code></pre>
                <p>The contributor guide, <code>DEVELOPERS.md</code>, has the conventions, the code rules and how
                to add pages, benchmarks and modules.</p>
                """.formatted(where);
    }
}
