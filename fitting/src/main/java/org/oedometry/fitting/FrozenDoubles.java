package org.oedometry.fitting;

import java.util.AbstractList;
import java.util.List;
import java.util.RandomAccess;

/**
 * An unmodifiable list of doubles backed by a private array, so that thousands of residuals are not
 * boxed until someone reads them. Results accept it without copying; it holds no nulls.
 */
final class FrozenDoubles extends AbstractList<Double> implements RandomAccess {

  private final double[] values;

  private FrozenDoubles(double[] values) {
    this.values = values;
  }

  /**
   * A list over the given array, which it takes over: the caller must not keep or change it.
   *
   * @param values the values
   * @return the list
   */
  static FrozenDoubles owning(double[] values) {
    return new FrozenDoubles(values);
  }

  /**
   * The list itself if it is a frozen one, otherwise {@link List#copyOf}.
   *
   * @param list a list without nulls
   * @return an unmodifiable list with the same values
   */
  static List<Double> copyOf(List<Double> list) {
    return list instanceof FrozenDoubles ? list : List.copyOf(list);
  }

  @Override
  public Double get(int index) {
    return values[index];
  }

  @Override
  public int size() {
    return values.length;
  }
}
