package org.oedometry.fitting;

import java.util.List;
import org.oedometry.fitting.internal.Checks;
import org.oedometry.theory.Terzaghi;

/**
 * The check of a construction against its own answer: the Terzaghi curve d<sub>0</sub> +
 * (d<sub>100</sub> - d<sub>0</sub>) U(c<sub>v</sub> t / H<sub>dr</sub><sup>2</sup>) that its
 * d<sub>0</sub>, d<sub>100</sub> and c<sub>v</sub> describe, compared with the readings up to 70 %
 * consolidation on that curve (the degree at the inflection, {@link
 * InflectionPointMethod#INFLECTION_DEGREE}, where secondary compression has barely begun). A
 * root-mean-square departure above {@link FitWarning#IMPLIED_CURVE_MISFIT_LIMIT} of the primary
 * compression raises {@link FitWarning.Kind#IMPLIED_CURVE_MISSES_READINGS}.
 */
final class ImpliedCurve {

  private ImpliedCurve() {}

  /**
   * Root mean square of (d - d<sub>0</sub>) / (d<sub>100</sub> - d<sub>0</sub>) - U(rate t) over
   * the readings with t &gt; 0 whose U(rate t) is at most 70 %.
   *
   * @param t elapsed times, s, increasing
   * @param d the readings, in any one unit (the same as d0 and d100)
   * @param d0 the construction's corrected zero
   * @param d100 its end of primary consolidation
   * @param rate c<sub>v</sub> / H<sub>dr</sub><sup>2</sup>, 1/s
   * @return the departure as a fraction of the primary compression; 0 where no reading qualifies or
   *     the numbers leave the double range
   */
  static double misfit(double[] t, double[] d, double d0, double d100, double rate) {
    double primary = d100 - d0;
    double sum = 0;
    int count = 0;
    for (int i = 0; i < t.length; i++) {
      if (!(t[i] > 0)) {
        continue;
      }
      double degree = Terzaghi.averageDegree(rate * t[i]);
      if (degree > InflectionPointMethod.INFLECTION_DEGREE) {
        break;
      }
      double miss = (d[i] - d0) / primary - degree;
      sum += miss * miss;
      count++;
    }
    double rms = count == 0 ? 0 : Math.sqrt(sum / count);
    return Double.isFinite(rms) ? rms : 0;
  }

  /**
   * Adds the warning where the departure exceeds the limit.
   *
   * @param t elapsed times, s
   * @param d the readings
   * @param d0 the corrected zero, same unit
   * @param d100 the end of primary, same unit
   * @param cv c<sub>v</sub>, m<sup>2</sup>/s
   * @param drainagePath H<sub>dr</sub>, m
   * @param warnings where the warning goes
   */
  static void check(
      double[] t,
      double[] d,
      double d0,
      double d100,
      double cv,
      double drainagePath,
      List<FitWarning> warnings) {
    double rate = cv / drainagePath / drainagePath;
    if (!(rate > 0) || rate == Double.POSITIVE_INFINITY) {
      return;
    }
    double misfit = misfit(t, d, d0, d100, rate);
    if (misfit > FitWarning.IMPLIED_CURVE_MISFIT_LIMIT) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.IMPLIED_CURVE_MISSES_READINGS,
              Checks.format(
                  "the Terzaghi curve of this d0, d100 and c_v misses the readings up to 70 %%"
                      + " consolidation by %.1f %% of the primary compression (root mean square;"
                      + " more than %.0f %%): the readings are noisy against the primary"
                      + " compression, or the construction is misplaced, and c_v is uncertain",
                  100 * misfit, 100 * FitWarning.IMPLIED_CURVE_MISFIT_LIMIT)));
    }
  }
}
