package org.oedometry.core.compressibility;

import java.util.List;

/**
 * Secondary compression of one increment; see {@link SecondaryCompression} for the formulas.
 *
 * @param secondaryCompressionIndex C<sub>&alpha;e</sub> = &minus;de / dlog<sub>10</sub>t,
 *     dimensionless
 * @param modifiedSecondaryCompressionIndex C<sub>&alpha;&epsilon;</sub> = C<sub>&alpha;e</sub> / (1
 *     + e<sub>p</sub>), strain per log<sub>10</sub> cycle of time
 * @param mesriRatio C<sub>&alpha;e</sub> / C<sub>c</sub>, dimensionless, or why it is absent
 * @param warnings warnings, empty when there is nothing to say
 */
public record SecondaryCompressionResult(
    double secondaryCompressionIndex,
    double modifiedSecondaryCompressionIndex,
    Derived<Double> mesriRatio,
    List<CompressibilityWarning> warnings) {

  /**
   * Validates and copies.
   *
   * @param secondaryCompressionIndex C<sub>&alpha;e</sub> = &minus;de / dlog<sub>10</sub>t,
   *     dimensionless
   * @param modifiedSecondaryCompressionIndex C<sub>&alpha;&epsilon;</sub> = C<sub>&alpha;e</sub> /
   *     (1 + e<sub>p</sub>), strain per log<sub>10</sub> cycle of time
   * @param mesriRatio C<sub>&alpha;e</sub> / C<sub>c</sub>, dimensionless, or why it is absent
   * @param warnings warnings, empty when there is nothing to say
   * @throws IllegalArgumentException if a number is not finite or an argument is null
   */
  public SecondaryCompressionResult {
    Checks.finite("secondary compression index", secondaryCompressionIndex, "");
    Checks.finite("modified secondary compression index", modifiedSecondaryCompressionIndex, "");
    Checks.notNull("Mesri ratio", mesriRatio);
    warnings = List.copyOf(Checks.notNull("warnings", warnings));
  }
}
