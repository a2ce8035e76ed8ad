package org.oedometry.core.compressibility;

/**
 * The published constructions for the preconsolidation pressure &sigma;'<sub>p</sub> that this
 * package implements, each with its reference. The bibliographic details are given from memory and
 * should be checked against the originals before being quoted.
 */
public enum PreconsolidationMethod {
  /**
   * Maximum curvature, tangent, horizontal, bisector and virgin line; see {@link CasagrandeMethod}.
   */
  CASAGRANDE(
      "Casagrande, A. (1936). The determination of the pre-consolidation load and its practical"
          + " significance. Proc. 1st Int. Conf. Soil Mech. Found. Eng., Cambridge, Mass., Vol. 3,"
          + " 60-64."),
  /**
   * Virgin line up to e<sub>0</sub>, down to the curve, across to the virgin line; see {@link
   * PachecoSilvaMethod}.
   */
  PACHECO_SILVA(
      "Pacheco Silva, F. (1970). A new graphical construction for determination of the"
          + " pre-consolidation stress of a soil sample. Proc. 4th Brazilian Conf. Soil Mech."
          + " Found. Eng., Rio de Janeiro, Vol. 2, 225-232."),
  /** Two straight lines on ln(1 + e) &ndash; ln &sigma;'; see {@link BilinearVolumeMethod}. */
  BUTTERFIELD(
      "Butterfield, R. (1979). A natural compression law for soils (an advance on e-log p')."
          + " Geotechnique 29(4), 469-480."),
  /** Two straight lines on log(1 + e) &ndash; log &sigma;'; see {@link BilinearVolumeMethod}. */
  ONITSUKA(
      "Onitsuka, K., Hong, Z., Hara, Y. and Yoshitake, S. (1995). Interpretation of oedometer"
          + " test data for natural clays. Soils and Foundations 35(3), 61-70."),
  /**
   * Two straight lines on the work per unit volume &ndash; &sigma;' plot; see {@link WorkMethod}.
   */
  BECKER_WORK(
      "Becker, D.E., Crooks, J.H.A., Been, K. and Jefferies, M.G. (1987). Work as a criterion for"
          + " determining in situ and yield stresses in clays. Canadian Geotechnical Journal"
          + " 24(4), 549-564.");

  private final String reference;

  PreconsolidationMethod(String reference) {
    this.reference = reference;
  }

  /**
   * The published source of the construction (from memory; check before quoting).
   *
   * @return a bibliographic reference
   */
  public String reference() {
    return reference;
  }
}
