package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;

/**
 * Hydraulic conductivity (coefficient of permeability) back-calculated from consolidation: k =
 * c<sub>v</sub> m<sub>v</sub> &gamma;<sub>w</sub>.
 *
 * <p>In SI: c<sub>v</sub> in m^2/s, m<sub>v</sub> in 1/Pa and &gamma;<sub>w</sub> in N/m^3 give k
 * in m/s. The default unit weight of water is {@value #STANDARD_WATER_UNIT_WEIGHT} N/m^3 (9.81
 * kN/m^3); set another with the three-argument forms. Check value [FACTS, exact arithmetic]: with
 * c<sub>v</sub> in m^2/yr, m<sub>v</sub> in m^2/MN and &gamma;<sub>w</sub> = 9.81 kN/m^3, k [m/s] =
 * 3.109e-10 c<sub>v</sub> m<sub>v</sub> (Julian year of 365.25 days).
 *
 * <p>Caveat: k back-calculated from c<sub>v</sub> is known to underestimate the true k of
 * structured clays (Tavenas et al. 1983, Canadian Geotechnical Journal 20(4)); a direct
 * permeability test is the better measure. Results feed engineering decisions: they must be
 * reviewed by a qualified engineer, and local codes and standards govern. Stateless and
 * thread-safe.
 */
public final class Permeability {

  /** Unit weight of water used by default: {@value} N/m^3. */
  public static final double STANDARD_WATER_UNIT_WEIGHT = 9810.0;

  private Permeability() {}

  /**
   * k = c<sub>v</sub> m<sub>v</sub> &gamma;<sub>w</sub> with &gamma;<sub>w</sub> = {@value
   * #STANDARD_WATER_UNIT_WEIGHT} N/m^3.
   *
   * @param cv coefficient of consolidation, m^2/s; finite, &gt; 0
   * @param mv coefficient of volume compressibility, 1/Pa; finite, &gt; 0
   * @return k, m/s
   * @throws IllegalArgumentException if an argument is not finite and positive, or the product is
   *     not representable (overflows, or underflows to 0)
   */
  public static double fromConsolidation(double cv, double mv) {
    return fromConsolidation(cv, mv, STANDARD_WATER_UNIT_WEIGHT);
  }

  /**
   * k = c<sub>v</sub> m<sub>v</sub> &gamma;<sub>w</sub>.
   *
   * @param cv coefficient of consolidation, m^2/s; finite, &gt; 0
   * @param mv coefficient of volume compressibility, 1/Pa; finite, &gt; 0
   * @param waterUnitWeight &gamma;<sub>w</sub>, N/m^3; finite, &gt; 0
   * @return k, m/s
   * @throws IllegalArgumentException if an argument is not finite and positive, or the product is
   *     not representable
   */
  public static double fromConsolidation(double cv, double mv, double waterUnitWeight) {
    Checks.positive("cv", cv, " m^2/s");
    Checks.positive("mv", mv, " 1/Pa");
    Checks.positive("unit weight of water", waterUnitWeight, " N/m^3");
    double k = cv * mv * waterUnitWeight;
    if (!(k > 0) || Double.isInfinite(k)) {
      throw new IllegalArgumentException(
          "permeability from cv " + cv + " m^2/s and mv " + mv + " 1/Pa is not representable");
    }
    return k;
  }

  /**
   * k for each increment from its c<sub>v</sub> (as a c<sub>v</sub> construction gave it) and the
   * increment's m<sub>v</sub>, with the default unit weight of water.
   *
   * @param increments the increments' compressibility, from {@link Compressibility}
   * @param cv c<sub>v</sub> of each increment, m^2/s, same order and length; finite, &gt; 0
   * @return one value per increment
   * @throws IllegalArgumentException if the lengths differ, a c<sub>v</sub> is out of range, or an
   *     increment's m<sub>v</sub> is not positive (the message names the index)
   */
  public static List<IncrementPermeability> perIncrement(
      List<IncrementCompressibility> increments, double[] cv) {
    return perIncrement(increments, cv, STANDARD_WATER_UNIT_WEIGHT);
  }

  /**
   * k for each increment from its c<sub>v</sub> and m<sub>v</sub>.
   *
   * @param increments the increments' compressibility, from {@link Compressibility}
   * @param cv c<sub>v</sub> of each increment, m^2/s, same order and length; finite, &gt; 0
   * @param waterUnitWeight &gamma;<sub>w</sub>, N/m^3; finite, &gt; 0
   * @return one value per increment
   * @throws IllegalArgumentException if the lengths differ, a c<sub>v</sub> is out of range, or an
   *     increment's m<sub>v</sub> is not positive (the message names the index)
   */
  public static List<IncrementPermeability> perIncrement(
      List<IncrementCompressibility> increments, double[] cv, double waterUnitWeight) {
    Checks.notNull("increments", increments);
    Checks.notNull("cv", cv);
    Checks.sameLength("increments", increments.size(), "cv", cv.length);
    Checks.positive("unit weight of water", waterUnitWeight, " N/m^3");
    List<IncrementPermeability> out = new ArrayList<>(cv.length);
    for (int i = 0; i < cv.length; i++) {
      IncrementCompressibility inc = Checks.notNull("increment", increments.get(i));
      Checks.positiveAt("cv", i, cv[i], " m^2/s");
      Checks.positiveAt("mv", i, inc.mv(), " 1/Pa");
      out.add(
          new IncrementPermeability(
              inc.index(),
              inc.meanVoidRatio(),
              cv[i],
              inc.mv(),
              fromConsolidation(cv[i], inc.mv(), waterUnitWeight)));
    }
    return List.copyOf(out);
  }
}
