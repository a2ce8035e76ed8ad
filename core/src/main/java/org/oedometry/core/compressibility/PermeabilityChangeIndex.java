package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Permeability change index C<sub>k</sub> = de / dlog<sub>10</sub>k (Mesri et al. 1994), the slope
 * of the void ratio against log<sub>10</sub>(k / 1 m/s), fitted by ordinary least squares over the
 * chosen increments, with its R<sup>2</sup>.
 *
 * <p>Sanity range [published: Tavenas et al. 1983, Canadian Geotechnical Journal 20(4)]: soft clays
 * often show C<sub>k</sub> &asymp; 0.5 e<sub>0</sub>. Results feed engineering decisions: they must
 * be reviewed by a qualified engineer, and local codes and standards govern. Stateless and
 * thread-safe.
 */
public final class PermeabilityChangeIndex {

  private PermeabilityChangeIndex() {}

  /**
   * C<sub>k</sub> over the given increments, each contributing (its mean void ratio, its k).
   *
   * @param increments the chosen increments (e.g. the normally consolidated ones); no null element
   * @return the fit (x = log<sub>10</sub>(k / 1 m/s), y = e), or absent when fewer than two
   *     increments are given or all have the same k
   * @throws IllegalArgumentException if the list or an element is null
   */
  public static Derived<PermeabilityChangeFit> fit(List<IncrementPermeability> increments) {
    Checks.notNull("increments", increments);
    int n = increments.size();
    double[] e = new double[n];
    double[] k = new double[n];
    List<Integer> ids = new ArrayList<>(n);
    for (int i = 0; i < n; i++) {
      IncrementPermeability inc = increments.get(i);
      if (inc == null) {
        throw new IllegalArgumentException(
            String.format(Locale.ROOT, "increment at index %d must not be null", i));
      }
      e[i] = inc.meanVoidRatio();
      k[i] = inc.permeability();
      ids.add(inc.index());
    }
    return fitArrays(e, k, ids);
  }

  /**
   * C<sub>k</sub> from plain (void ratio, k) pairs.
   *
   * @param voidRatios e, dimensionless; finite, &gt; 0
   * @param permeabilities k, m/s; finite, &gt; 0; same length
   * @return the fit (x = log<sub>10</sub>(k / 1 m/s), y = e), or absent when fewer than two pairs
   *     are given or all k are equal
   * @throws IllegalArgumentException if the lengths differ or a value is out of range (the message
   *     names the index)
   */
  public static Derived<PermeabilityChangeFit> ofPoints(
      double[] voidRatios, double[] permeabilities) {
    Checks.notNull("void ratios", voidRatios);
    Checks.notNull("permeabilities", permeabilities);
    Checks.sameLength("void ratios", voidRatios.length, "permeabilities", permeabilities.length);
    for (int i = 0; i < voidRatios.length; i++) {
      Checks.positiveAt("void ratio", i, voidRatios[i], "");
      Checks.positiveAt("permeability", i, permeabilities[i], " m/s");
    }
    return fitArrays(voidRatios.clone(), permeabilities.clone(), List.of());
  }

  private static Derived<PermeabilityChangeFit> fitArrays(
      double[] e, double[] k, List<Integer> ids) {
    int n = e.length;
    if (n < 2) {
      return Derived.absent(
          String.format(
              Locale.ROOT,
              "a permeability change index needs at least 2 increments (%d given)",
              n));
    }
    double[] x = new double[n];
    boolean distinct = false;
    for (int i = 0; i < n; i++) {
      x[i] = Math.log10(k[i]);
      distinct |= x[i] != x[0];
    }
    if (!distinct) {
      return Derived.absent(
          String.format(
              Locale.ROOT,
              "all %d increments have the same permeability (%s m/s): no slope can be fitted",
              n,
              k[0]));
    }
    LineFit line = LineFit.through(x, e, 0, n);
    return Derived.of(new PermeabilityChangeFit(line.slope(), line, ids));
  }
}
