package org.oedometry.core;

import java.util.Objects;
import java.util.OptionalDouble;
import org.oedometry.core.internal.Checks;

/**
 * One load increment (or decrement) of an oedometer test: the vertical stress before and after it
 * and the settlement readings taken under the new stress.
 *
 * <p>The stresses are the applied vertical total stresses, which at the end of primary
 * consolidation are the vertical effective stresses. For the first increment the stress before may
 * be the seating stress, or 0. Whether the increment loads or unloads is derived from the stresses
 * ({@link #direction()}); the two stresses must differ.
 *
 * <p>The curve's settlements are measured from the specimen height at the start of this increment,
 * with t = 0 at load application (see {@link SettlementCurve}).
 *
 * @param stressBeforePascals vertical stress before the increment, Pa; finite, &ge; 0
 * @param stressAfterPascals vertical stress after the increment, Pa; finite, &gt; 0, different from
 *     the stress before
 * @param curve the readings under the stress after; not null
 */
public record LoadIncrement(
    double stressBeforePascals, double stressAfterPascals, SettlementCurve curve) {

  /**
   * Validates the increment.
   *
   * @param stressBeforePascals vertical stress before the increment, Pa; finite, &ge; 0
   * @param stressAfterPascals vertical stress after the increment, Pa; finite, &gt; 0, different
   *     from the stress before
   * @param curve the readings under the stress after; not null
   * @throws IllegalArgumentException if a stress is not finite, the stress before is negative, the
   *     stress after is not positive, or the two are equal
   * @throws NullPointerException if the curve is null
   */
  public LoadIncrement {
    Objects.requireNonNull(curve, "curve must not be null");
    stressBeforePascals = Checks.nonNegative(stressBeforePascals, "stress before", "Pa");
    Checks.positive(stressAfterPascals, "stress after", "Pa");
    if (stressBeforePascals == stressAfterPascals) {
      throw new IllegalArgumentException(
          Checks.format(
              "stress after (%s Pa) equals the stress before (%s Pa): an increment must change"
                  + " the stress",
              Checks.number(stressAfterPascals), Checks.number(stressBeforePascals)));
    }
  }

  /**
   * Creates an increment.
   *
   * @param stressBeforePascals vertical stress before the increment, Pa; finite, &ge; 0
   * @param stressAfterPascals vertical stress after the increment, Pa; finite, &gt; 0, not equal to
   *     the stress before
   * @param curve the readings; not null
   * @return the increment
   * @throws IllegalArgumentException as the constructor
   * @throws NullPointerException if the curve is null
   */
  public static LoadIncrement of(
      double stressBeforePascals, double stressAfterPascals, SettlementCurve curve) {
    return new LoadIncrement(stressBeforePascals, stressAfterPascals, curve);
  }

  /**
   * Whether the increment adds or removes load.
   *
   * @return {@link LoadDirection#LOADING} if the stress after is greater, else {@link
   *     LoadDirection#UNLOADING}
   */
  public LoadDirection direction() {
    return stressAfterPascals > stressBeforePascals
        ? LoadDirection.LOADING
        : LoadDirection.UNLOADING;
  }

  /**
   * Change of stress, after minus before.
   *
   * @return Pa; positive on loading, negative on unloading
   */
  public double stressChangePascals() {
    return stressAfterPascals - stressBeforePascals;
  }

  /**
   * Load-increment ratio, the change of stress divided by the stress before (1 when the stress is
   * doubled, the traditional schedule).
   *
   * @return the ratio (negative on unloading), or empty when the stress before is 0 (or so small
   *     that the ratio overflows)
   */
  public OptionalDouble loadIncrementRatio() {
    double ratio = stressChangePascals() / stressBeforePascals;
    return Double.isFinite(ratio) ? OptionalDouble.of(ratio) : OptionalDouble.empty();
  }

  /**
   * A one-line summary, e.g. {@code LoadIncrement[LOADING 50000.0 -> 100000.0 Pa, 9 readings, final
   * settlement 4.2E-4 m]}.
   *
   * @return the summary
   */
  @Override
  public String toString() {
    return Checks.format(
        "LoadIncrement[%s %s -> %s Pa, %d readings, final settlement %s m]",
        direction(),
        Checks.brief(stressBeforePascals),
        Checks.brief(stressAfterPascals),
        curve.size(),
        Checks.brief(curve.finalSettlementMetres()));
  }
}
