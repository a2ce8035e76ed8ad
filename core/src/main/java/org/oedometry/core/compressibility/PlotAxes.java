package org.oedometry.core.compressibility;

/**
 * The coordinates in which a construction's points and lines are given, so that a host program can
 * draw them over the matching plot of the test.
 */
public enum PlotAxes {
  /** x = log<sub>10</sub>(&sigma;' / 1 Pa), y = void ratio e. */
  LOG10_STRESS_VOID_RATIO,
  /** x = log<sub>10</sub>(&sigma;' / 1 Pa), y = log<sub>10</sub>(1 + e). */
  LOG10_STRESS_LOG10_ONE_PLUS_VOID_RATIO,
  /** x = ln(&sigma;' / 1 Pa), y = ln(1 + e). */
  LN_STRESS_LN_ONE_PLUS_VOID_RATIO,
  /** x = &sigma;' in Pa, y = work per unit volume W in J/m^3 (= Pa), both on arithmetic axes. */
  STRESS_WORK
}
