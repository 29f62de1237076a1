/**
 * The generator of the documentation site: a small program of our own rather than a site
 * framework, so that the site builds offline wherever the project builds.
 *
 * <p>{@link dev.noninertial.site.SiteBuilder} wraps the page fragments of {@code src-site/pages/}
 * in the {@link dev.noninertial.site.PageLayout} (navigation, previous and next links, search
 * box), assembles the accuracy report from {@code src-site/accuracy/}, draws the plots by calling
 * the library ({@link dev.noninertial.site.SitePlots}), writes the API reference with the JDK's
 * Javadoc tool ({@link dev.noninertial.site.ApiReference}), and fails the build on any broken
 * local link or anchor ({@link dev.noninertial.site.LinkAudit}). HTML is read and written with
 * jsoup, never with regular expressions. The tests run every Java snippet of the pages and the
 * README through JShell.
 */
package dev.noninertial.site;
