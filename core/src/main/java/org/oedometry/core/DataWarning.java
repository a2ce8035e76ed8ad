package org.oedometry.core;

import java.util.Objects;

/**
 * A remark about input data that is valid but unusual enough to check before trusting the results.
 * A warning never replaces an error: impossible data is rejected.
 *
 * @param kind what kind of remark this is
 * @param message a sentence for the technician, naming the value
 */
public record DataWarning(Kind kind, String message) {

  /** The kinds of remark about input data. */
  public enum Kind {
    /**
     * The specific gravity of the solids is outside 2.0 to 3.2, the range of most mineral soils
     * (common practice); organic soils and peat lie below it, soils with heavy minerals above.
     */
    UNUSUAL_SPECIFIC_GRAVITY,
    /**
     * A degree of saturation S = w G<sub>s</sub> / e (initial, or final where both the dry mass and
     * the final water content were given) is above {@link OedometerTest#SATURATION_WARNING_ABOVE}:
     * the water content, specific gravity, height or dry mass is probably wrong.
     */
    SATURATION_ABOVE_ONE,
    /**
     * The final degree of saturation (dry mass and final water content both given) is below {@link
     * OedometerTest#FINAL_SATURATION_WARNING_BELOW}: a specimen kept under water should end
     * saturated.
     */
    FINAL_SATURATION_BELOW_ONE,
    /**
     * The initial void ratio from the heights and the one from the bulk density and initial water
     * content differ by more than {@link OedometerTest#VOID_RATIO_AGREEMENT} of 1 + e<sub>0</sub>.
     */
    VOID_RATIO_DISAGREEMENT
  }

  /**
   * Validates the warning.
   *
   * @param kind what kind of remark this is
   * @param message a sentence for the technician, naming the value
   * @throws NullPointerException if kind or message is null
   */
  public DataWarning {
    Objects.requireNonNull(kind, "kind must not be null");
    Objects.requireNonNull(message, "message must not be null");
  }
}
