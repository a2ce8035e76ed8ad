package org.oedometry.fitting;

/**
 * The published methods that find the coefficient of consolidation c<sub>v</sub> from one
 * increment's time-settlement readings, each with the reference it follows.
 */
public enum CvMethod {
  /** Log-time construction, Casagrande &amp; Fadum (1940): t50 from d0 and d100 on log t. */
  LOG_TIME("log-time (Casagrande)", "Casagrande & Fadum (1940)"),
  /** Root-time construction, Taylor (1942, 1948): t90 from the 1.15 line on the root of t. */
  ROOT_TIME("root-time (Taylor)", "Taylor (1942, 1948)"),
  /** Least-squares fit of the whole curve with secondary compression (Barros &amp; Pinto 2008). */
  FULL_CURVE("full-curve least squares", "after Barros & Pinto (2008)"),
  /** Inflection point on the log-time curve, Cour (1971); Mesri, Feng &amp; Shahien (1999). */
  INFLECTION_POINT("inflection point", "Cour (1971); Mesri, Feng & Shahien (1999)"),
  /** Rectangular hyperbola, Sridharan &amp; Sreepada Rao (1981); Sridharan et al. (1987). */
  RECTANGULAR_HYPERBOLA(
      "rectangular hyperbola",
      "Sridharan & Sreepada Rao (1981); Sridharan, Murthy & Prakash (1987)"),
  /** Early slope on the root of t with the primary compression, Al-Zoubi (2008). */
  EARLY_SLOPE("early slope", "Al-Zoubi (2008)"),
  /** Asaoka (1978): settlements at equal time steps, s_n = b0 + b1 s_(n-1). */
  ASAOKA("Asaoka", "Asaoka (1978)");

  private final String label;
  private final String reference;

  CvMethod(String label, String reference) {
    this.label = label;
    this.reference = reference;
  }

  /**
   * A short name for reports and plots.
   *
   * @return e.g. "log-time (Casagrande)"
   */
  public String label() {
    return label;
  }

  /**
   * The published source the method follows.
   *
   * @return authors and year
   */
  public String reference() {
    return reference;
  }
}
