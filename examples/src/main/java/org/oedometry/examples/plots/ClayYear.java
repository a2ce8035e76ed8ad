package org.oedometry.examples.plots;

import org.oedometry.theory.ClayLayer;

/** The year the charts use for c<sub>v</sub> in m<sup>2</sup>/yr: the Julian year. */
final class ClayYear {

  /** Seconds in a Julian year (365.25 d). */
  static final double SECONDS = ClayLayer.SECONDS_PER_JULIAN_YEAR;

  private ClayYear() {}
}
