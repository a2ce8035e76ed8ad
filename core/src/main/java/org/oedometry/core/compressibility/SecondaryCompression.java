package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Secondary compression indices of one increment from the secondary slope of its settlement &ndash;
 * log time curve, and Mesri's ratio C<sub>&alpha;</sub> / C<sub>c</sub> as a check.
 *
 * <ul>
 *   <li>C<sub>&alpha;e</sub> = &minus;de / dlog<sub>10</sub>t = &Delta;H<sub>cycle</sub> /
 *       H<sub>s</sub>, where &Delta;H<sub>cycle</sub> is the settlement per log<sub>10</sub> cycle
 *       of time after the end of primary and H<sub>s</sub> the height of solids (since e = H /
 *       H<sub>s</sub> &minus; 1);
 *   <li>C<sub>&alpha;&epsilon;</sub> = C<sub>&alpha;e</sub> / (1 + e<sub>p</sub>), with
 *       e<sub>p</sub> the void ratio at the end of primary; it equals &Delta;H<sub>cycle</sub> /
 *       H<sub>p</sub> with H<sub>p</sub> the height at the end of primary;
 *   <li>C<sub>&alpha;</sub> / C<sub>c</sub> (Mesri and Castro 1987), with C<sub>c</sub> the
 *       compression index at the increment's stress (the increment's own slope on the virgin line,
 *       or the fitted C<sub>c</sub>). Published typical values [from memory]: inorganic clays and
 *       silts 0.04 &plusmn; 0.01, organic soils 0.05 &plusmn; 0.01, peat 0.06 &plusmn; 0.01; a
 *       ratio outside {@value #TYPICAL_RATIO_LOW}..{@value #TYPICAL_RATIO_HIGH} (the union of those
 *       ranges) gets a warning.
 * </ul>
 *
 * <p>Typical C<sub>&alpha;&epsilon;</sub> (Cernica 1982): overconsolidated clays 0.0005-0.0015,
 * normally consolidated 0.005-0.03, organic soils and peat 0.04-0.10. Results feed engineering
 * decisions: they must be reviewed by a qualified engineer, and local codes and standards govern.
 * Stateless and thread-safe.
 */
public final class SecondaryCompression {

  /** Lower end of the typical C<sub>&alpha;</sub> / C<sub>c</sub> range checked: {@value}. */
  public static final double TYPICAL_RATIO_LOW = 0.03;

  /** Upper end of the typical C<sub>&alpha;</sub> / C<sub>c</sub> range checked: {@value}. */
  public static final double TYPICAL_RATIO_HIGH = 0.07;

  private SecondaryCompression() {}

  /**
   * Indices without Mesri's ratio.
   *
   * @param settlementPerLogCycle secondary slope &Delta;H<sub>cycle</sub>, m of settlement per
   *     log<sub>10</sub> cycle of time, positive for continuing compression; finite
   * @param solidsHeight H<sub>s</sub>, m; finite, &gt; 0
   * @param endOfPrimaryVoidRatio e<sub>p</sub>, dimensionless; finite, &gt; 0
   * @return the indices; the ratio is absent with the reason "no compression index given"
   * @throws IllegalArgumentException if an argument is out of range, or C<sub>&alpha;e</sub> =
   *     &Delta;H<sub>cycle</sub> / H<sub>s</sub> is beyond the double range
   */
  public static SecondaryCompressionResult of(
      double settlementPerLogCycle, double solidsHeight, double endOfPrimaryVoidRatio) {
    return compute(settlementPerLogCycle, solidsHeight, endOfPrimaryVoidRatio, Double.NaN);
  }

  /**
   * Indices with Mesri's ratio.
   *
   * @param settlementPerLogCycle secondary slope, m per log<sub>10</sub> cycle of time; finite
   * @param solidsHeight H<sub>s</sub>, m; finite, &gt; 0
   * @param endOfPrimaryVoidRatio e<sub>p</sub>, dimensionless; finite, &gt; 0
   * @param compressionIndex C<sub>c</sub> at the increment's stress, dimensionless; finite
   * @return the indices and the ratio (absent with a reason when C<sub>c</sub> or
   *     C<sub>&alpha;e</sub> is not positive)
   * @throws IllegalArgumentException if an argument is out of range, or C<sub>&alpha;e</sub> =
   *     &Delta;H<sub>cycle</sub> / H<sub>s</sub> is beyond the double range
   */
  public static SecondaryCompressionResult of(
      double settlementPerLogCycle,
      double solidsHeight,
      double endOfPrimaryVoidRatio,
      double compressionIndex) {
    Checks.finite("compression index", compressionIndex, "");
    return compute(settlementPerLogCycle, solidsHeight, endOfPrimaryVoidRatio, compressionIndex);
  }

  private static SecondaryCompressionResult compute(
      double settlementPerLogCycle,
      double solidsHeight,
      double endOfPrimaryVoidRatio,
      double compressionIndex) {
    Checks.finite("settlement per log cycle", settlementPerLogCycle, " m");
    Checks.positive("height of solids", solidsHeight, " m");
    Checks.positive("end-of-primary void ratio", endOfPrimaryVoidRatio, "");
    double cAlpha =
        Checks.representable(
            settlementPerLogCycle / solidsHeight,
            "the secondary compression index from %s m per log cycle over a height of solids of"
                + " %s m",
            settlementPerLogCycle,
            solidsHeight);
    double cAlphaEps = cAlpha / (1.0 + endOfPrimaryVoidRatio);
    List<CompressibilityWarning> warnings = new ArrayList<>();
    Derived<Double> ratio;
    if (Double.isNaN(compressionIndex)) {
      ratio = Derived.absent("no compression index given");
    } else if (!(compressionIndex > 0)) {
      ratio =
          Derived.absent(
              String.format(
                  Locale.ROOT,
                  "the compression index (%s) is not positive: the ratio has no meaning",
                  compressionIndex));
    } else if (!(cAlpha > 0)) {
      ratio =
          Derived.absent(
              String.format(
                  Locale.ROOT,
                  "the secondary compression index (%s) is not positive: no secondary"
                      + " compression to compare",
                  cAlpha));
    } else if (!Double.isFinite(cAlpha / compressionIndex)) {
      ratio = Derived.absent("the ratio is too large to represent");
    } else {
      double r = cAlpha / compressionIndex;
      ratio = Derived.of(r);
      if (r < TYPICAL_RATIO_LOW || r > TYPICAL_RATIO_HIGH) {
        warnings.add(
            new CompressibilityWarning(
                WarningKind.OUTSIDE_TYPICAL_RANGE,
                String.format(
                    Locale.ROOT,
                    "C_alpha / C_c = %.4f lies outside the typical range %s..%s (Mesri and"
                        + " Castro 1987, from memory)",
                    r,
                    TYPICAL_RATIO_LOW,
                    TYPICAL_RATIO_HIGH)));
      }
    }
    return new SecondaryCompressionResult(cAlpha, cAlphaEps, ratio, warnings);
  }
}
