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
    UNUSUAL_SPECIFIC_GRAVITY
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
