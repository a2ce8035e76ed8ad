package org.oedometry.core.compressibility;

/**
 * Which settlement of each increment defines the point of the compression curve.
 *
 * <p>ASTM D2435 and ISO 17892-5 allow either; the end-of-primary choice removes the secondary
 * compression accumulated during each increment and so depends on increment duration less.
 */
public enum DeformationBasis {
  /** The settlement at the end of the increment, just before the next load is applied. */
  END_OF_INCREMENT,
  /** The settlement at the end of primary consolidation (d100 of a c_v construction). */
  END_OF_PRIMARY
}
