/**
 * The oedometer test as immutable values, and the units of the laboratory.
 *
 * <ul>
 *   <li>{@link org.oedometry.core.SettlementCurve}: the readings of one increment.
 *   <li>{@link org.oedometry.core.LoadIncrement}: stresses before and after, and the curve.
 *   <li>{@link org.oedometry.core.Specimen}: height, cross-section, solids.
 *   <li>{@link org.oedometry.core.OedometerTest}: the whole test, with drainage, identifiers and
 *       the {@link org.oedometry.core.DrainagePathRule}.
 *   <li>{@link org.oedometry.core.GaugeConversion}: raw gauge readings to settlement.
 *   <li>{@link org.oedometry.core.Units} and {@link org.oedometry.core.LabUnit}: conversions.
 * </ul>
 *
 * <p>Every {@code double} is in SI units (s, m, m<sup>2</sup>, Pa, kg, kg/m<sup>3</sup>);
 * settlement is positive for compression. Invalid values are rejected with an {@link
 * java.lang.IllegalArgumentException} whose message names the value, its index where there is one,
 * and its unit.
 *
 * <p>Results derived from these values feed engineering decisions: they must be reviewed by a
 * qualified engineer, and local codes and standards govern.
 */
package org.oedometry.core;
