/**
 * Import and export of an oedometer test as CSV (RFC 4180, UTF-8), a format of this library.
 *
 * <p>A test is three files, usually side by side in one directory. In each, lines starting with
 * {@code #} are comments, blank lines (empty, or only spaces and tabs) are ignored, white space
 * around cells is removed, and the first record is the header. A column or property that carries a
 * quantity declares its unit at the end of its name, after an underscore: {@code elapsed_min},
 * {@code settlement_mm}, {@code stress_after_kPa}. The unit tokens are those of {@link
 * org.oedometry.core.LabUnit} ({@code s, min, h, d, yr}; {@code m, mm, um}; {@code m2, cm2, mm2};
 * {@code Pa, kPa, MPa}; {@code kg, g}; {@code kg_m3, Mg_m3}; {@code ratio, percent}),
 * case-sensitive; any other token is an error. Numbers are plain decimals ({@code 12}, {@code
 * -0.5}, {@code 1.5e-3}); NaN, infinity and hexadecimal are errors.
 *
 * <h2>{@code properties.csv}: the specimen and the test (key/value)</h2>
 *
 * <pre>
 * property,value
 * initial_height_mm,20.0
 * diameter_mm,75.0
 * specific_gravity,2.70
 * dry_mass_g,120.0
 * initial_water_content_percent,32.0
 * bulk_density_Mg_m3,1.90
 * drainage,double
 * drainage_path_rule,height_at_half_consolidation
 * project,Invented example
 * borehole,BH-A
 * sample,S1
 * depth,4.50-4.95 m
 * </pre>
 *
 * Required: {@code initial_height_<length>}, {@code diameter_<length>} or {@code area_<area>},
 * {@code specific_gravity} (no unit), and {@code dry_mass_<mass>} or {@code
 * final_water_content_<ratio|percent>} or both (with both, the dry mass defines the solids and the
 * final water content checks the final degree of saturation). Optional: {@code
 * initial_water_content_<ratio|percent>}, {@code bulk_density_<density>}, {@code drainage} ({@code
 * double} (default) or {@code single}), {@code drainage_path_rule} ({@code start_height}, {@code
 * height_at_half_consolidation} (default), {@code mean_height}), the identifiers {@code project},
 * {@code borehole}, {@code sample}, {@code depth}, and, with gauge readings only, {@code
 * gauge_zero_<length>} and {@code gauge_direction} ({@code increases_with_compression} or {@code
 * decreases_with_compression}). Each property at most once; unknown properties are errors.
 *
 * <h2>{@code increments.csv}: one row per increment</h2>
 *
 * <pre>
 * increment,stress_before_kPa,stress_after_kPa,apparatus_deflection_mm
 * 1,0,25,0.010
 * 2,25,50,0.018
 * </pre>
 *
 * Increments are numbered 1, 2, 3, ... in the order applied; the stress before each is the stress
 * after the one before; the two stresses of an increment differ (loading or unloading follows from
 * them). The optional {@code apparatus_deflection_<length>} is the calibrated deflection of the
 * apparatus under the increment's stress after, relative to its state at the start of the test;
 * each increment's change of it is subtracted from that increment's readings (see {@link
 * org.oedometry.core.GaugeConversion}).
 *
 * <h2>{@code readings.csv}: one row per reading (long format)</h2>
 *
 * <pre>
 * increment,elapsed_min,settlement_mm
 * 1,0,0
 * 1,0.1,0.052
 * 1,0.25,0.071
 * </pre>
 *
 * The third column is either {@code settlement_<length>}, measured from the specimen height at the
 * start of the increment and positive for compression, or {@code gauge_<length>}, raw gauge
 * readings converted with the gauge properties (the start of the first increment is the gauge zero,
 * the start of each later increment is the last reading of the one before). Rows are grouped by
 * increment in order; within an increment, elapsed times (t = 0 at load application) strictly
 * increase; every increment has at least two readings.
 *
 * <p>The writer uses SI units throughout so that a written test reads back equal. Errors are {@link
 * org.oedometry.core.io.TestDataException}s naming the file, line, column and value.
 */
package org.oedometry.core.io;
