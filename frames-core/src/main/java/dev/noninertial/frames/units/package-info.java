/**
 * Named conversions between the units the trade writes (knots, rpm, deg/s, deg/h, g, mGal,
 * deg/sqrt(h), (m/s)/sqrt(h), degrees) and the SI units every other package computes in.
 */
package dev.noninertial.frames.units;
