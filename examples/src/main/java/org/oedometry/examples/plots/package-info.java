/**
 * Charts of a reduced oedometer test, drawn with JFreeChart and written as PNG files: the log-time
 * and root-time constructions, the full-curve fit with its residuals, e &ndash; log &sigma;' with
 * the preconsolidation constructions, c<sub>v</sub> &ndash; log &sigma;', e &ndash; log k with the
 * C<sub>k</sub> line, and a field time-settlement forecast. Each chart class takes the library's
 * own result values and draws the geometry the library returns; the library itself draws nothing.
 * {@link org.oedometry.examples.plots.PlotGallery} draws them all for the invented demo test.
 *
 * <p>Colours, markers and wording are our own. Charts illustrate results that must be reviewed by a
 * qualified engineer; local codes and standards govern. Not public API.
 */
package org.oedometry.examples.plots;
