/**
 * Line charts of our own as self-contained SVG documents, shared by the worked scenarios and the
 * documentation site.
 *
 * <p>{@link dev.noninertial.examples.chart.CurveSheet} is built by copies (title, axes with units,
 * one {@link dev.noninertial.examples.chart.Curve} per series) and writes an SVG that needs no
 * fonts, scripts or style sheets from outside, so that it displays offline;
 * {@link dev.noninertial.examples.chart.AxisScale} chooses round tick values for an axis. Text is
 * sized in the chart's own units and scales with the picture.
 */
package dev.noninertial.examples.chart;
