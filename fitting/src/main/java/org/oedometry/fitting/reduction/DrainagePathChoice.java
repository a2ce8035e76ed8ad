package org.oedometry.fitting.reduction;

import java.util.Locale;
import java.util.Objects;
import org.oedometry.core.DrainagePathRule;

/**
 * The drainage path of one increment, the rule that chose it and how: every c<sub>v</sub> of the
 * increment belongs to this H<sub>dr</sub> (c<sub>v</sub> = T H<sub>dr</sub><sup>2</sup> / t, so a
 * wrong H<sub>dr</sub> is a squared error in c<sub>v</sub>).
 *
 * @param rule the rule actually applied (the mean height when the chosen rule needed a fit that no
 *     method gave; see {@link #fellBack()})
 * @param drainagePathMetres H<sub>dr</sub>, m; finite, &gt; 0
 * @param heightMetres the specimen height the rule took, m; finite, &gt; 0
 * @param fellBack true when the rule in force could not be applied and the mean height was used
 * @param explanation how the height was found, in words, with the numbers (in mm)
 */
public record DrainagePathChoice(
    DrainagePathRule rule,
    double drainagePathMetres,
    double heightMetres,
    boolean fellBack,
    String explanation) {

  /**
   * Validates the choice.
   *
   * @param rule the rule actually applied; not null
   * @param drainagePathMetres H<sub>dr</sub>, m; finite, &gt; 0
   * @param heightMetres the specimen height the rule took, m; finite, &gt; 0
   * @param fellBack true when the rule in force could not be applied and the mean height was used
   * @param explanation how the height was found; not blank
   * @throws IllegalArgumentException if a number is not finite and positive or the explanation is
   *     blank
   * @throws NullPointerException if the rule or explanation is null
   */
  public DrainagePathChoice {
    Objects.requireNonNull(rule, "rule");
    Objects.requireNonNull(explanation, "explanation");
    if (!(drainagePathMetres > 0) || Double.isInfinite(drainagePathMetres)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT, "drainage path (%s m) must be finite and > 0", drainagePathMetres));
    }
    if (!(heightMetres > 0) || Double.isInfinite(heightMetres)) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "height (%s m) must be finite and > 0", heightMetres));
    }
    if (explanation.isBlank()) {
      throw new IllegalArgumentException("explanation of the drainage path must not be blank");
    }
  }
}
