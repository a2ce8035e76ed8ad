package org.oedometry.fitting;

import org.oedometry.fitting.internal.Checks;

/**
 * Options of {@link AsaokaMethod}: immutable; start from {@link #defaults()} and change with the
 * {@code with...} methods.
 *
 * <p>Defaults: 10 time steps over the window from 50 % to 95 % consolidation.
 *
 * @param steps number of equal time steps over the window (the settlements s<sub>0</sub> ..
 *     s<sub>steps</sub>); in [4, 200]
 */
public record AsaokaOptions(int steps) {

  /**
   * Validates the options.
   *
   * @param steps in [4, 200]
   * @throws IllegalArgumentException if out of range
   */
  public AsaokaOptions {
    if (steps < 4 || steps > 200) {
      throw new IllegalArgumentException(
          Checks.format("number of time steps (%d) must be in [4, 200]", steps));
    }
  }

  /**
   * The defaults listed in the class description.
   *
   * @return the default options
   */
  public static AsaokaOptions defaults() {
    return new AsaokaOptions(10);
  }

  /**
   * A copy with another number of time steps.
   *
   * @param value in [4, 200]
   * @return the new options
   * @throws IllegalArgumentException if out of range
   */
  public AsaokaOptions withSteps(int value) {
    return new AsaokaOptions(value);
  }
}
