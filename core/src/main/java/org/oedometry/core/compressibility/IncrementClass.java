package org.oedometry.core.compressibility;

/**
 * Where a load increment lies in the stress history of the specimen, relative to the
 * preconsolidation pressure &sigma;'<sub>p</sub> and to the largest stress applied earlier in the
 * test.
 *
 * <p>With &sigma;'<sub>c</sub> = max(&sigma;'<sub>p</sub>, largest stress applied up to the start
 * of the increment), a loading increment from &sigma;'<sub>1</sub> to &sigma;'<sub>2</sub> is
 * normally consolidated when &sigma;'<sub>1</sub> &ge; &sigma;'<sub>c</sub>, overconsolidated
 * (first recompression or reloading) when &sigma;'<sub>2</sub> &le; &sigma;'<sub>c</sub>, and
 * crosses the preconsolidation pressure otherwise.
 */
public enum IncrementClass {
  /** Loading below &sigma;'<sub>p</sub> before any unloading in the test: overconsolidated. */
  RECOMPRESSION,
  /** Loading below a larger stress applied earlier in the test, after unloading. */
  RELOADING,
  /** Loading that starts below and ends above &sigma;'<sub>c</sub>. */
  CROSSES_PRECONSOLIDATION,
  /** Loading that starts at or above &sigma;'<sub>c</sub>: on the virgin line. */
  NORMALLY_CONSOLIDATED,
  /** The stress decreases. */
  UNLOADING;

  /**
   * Whether the increment is overconsolidated throughout.
   *
   * @return true for {@link #RECOMPRESSION}, {@link #RELOADING} and {@link #UNLOADING}
   */
  public boolean isOverconsolidated() {
    return this == RECOMPRESSION || this == RELOADING || this == UNLOADING;
  }
}
