package org.oedometry.fitting;

import java.util.Arrays;
import org.oedometry.core.SettlementCurve;

/**
 * Readings grouped into equal bins of log t for the search stage of {@link FullCurveMethod}: each
 * non-empty bin becomes one point at the weighted mean time &Sigma;w t / W and weighted mean
 * settlement &Sigma;w d / W, with weight W = &Sigma;w.
 *
 * <p>Why this is a good stand-in for the readings: within a bin write each model value as f(t) =
 * f(t&#772;) + f'(t&#772;)(t - t&#772;) + O((t - t&#772;)<sup>2</sup>); then &Sigma;<sub>bin</sub>
 * w (d - f)<sup>2</sup> = W (d&#772; - f(t&#772;))<sup>2</sup> + &Sigma; w (d - d&#772; - f'(t -
 * t&#772;))<sup>2</sup> + O(curvature), because the cross term vanishes at the weighted means. The
 * first term is what the grouped fit minimises; the second depends on the parameters only through
 * the slope within the bin and is small for narrow bins. The grouped optimum is therefore close to
 * the optimum over all readings, which {@link FullCurveMethod} then reaches from it.
 *
 * <p>With no more readings than the limit, the groups are the readings themselves. Immutable.
 */
final class ReadingGroups {

  private final double[] times;
  private final double[] settlements;
  private final double[] weights;
  private final boolean grouped;

  private ReadingGroups(double[] times, double[] settlements, double[] weights, boolean grouped) {
    this.times = times;
    this.settlements = settlements;
    this.weights = weights;
    this.grouped = grouped;
  }

  /**
   * Groups the readings.
   *
   * @param t times, s, &gt; 0 and increasing
   * @param y settlements, m
   * @param w weights, &gt; 0
   * @param limit up to this many readings are kept as they are
   * @param bins number of equal log-time bins above the limit
   * @return the groups
   */
  static ReadingGroups of(double[] t, double[] y, double[] w, int limit, int bins) {
    int n = t.length;
    if (n <= limit) {
      return new ReadingGroups(t.clone(), y.clone(), w.clone(), false);
    }
    // Bin edges 10^(log t_first + k span / bins), k = 1 .. bins - 1, walked in time order.
    double low = Math.log10(t[0]);
    double span = Math.log10(t[n - 1]) - low;
    double[] upperEdge = new double[bins];
    for (int b = 0; b < bins - 1; b++) {
      upperEdge[b] = Math.pow(10, low + span * (b + 1) / bins);
    }
    upperEdge[bins - 1] = Double.POSITIVE_INFINITY;
    double[] weightSum = new double[bins];
    double[] weightedTime = new double[bins];
    double[] weightedSettlement = new double[bins];
    int bin = 0;
    for (int i = 0; i < n; i++) {
      while (t[i] >= upperEdge[bin]) {
        bin++;
      }
      weightSum[bin] += w[i];
      weightedTime[bin] += w[i] * t[i];
      weightedSettlement[bin] += w[i] * y[i];
    }
    double[] times = new double[bins];
    double[] settlements = new double[bins];
    double[] weights = new double[bins];
    int count = 0;
    for (int b = 0; b < bins; b++) {
      if (weightSum[b] > 0) {
        times[count] = weightedTime[b] / weightSum[b];
        settlements[count] = weightedSettlement[b] / weightSum[b];
        weights[count] = weightSum[b];
        count++;
      }
    }
    return new ReadingGroups(
        Arrays.copyOf(times, count),
        Arrays.copyOf(settlements, count),
        Arrays.copyOf(weights, count),
        true);
  }

  /** Whether readings were grouped (false: the groups are the readings). */
  boolean grouped() {
    return grouped;
  }

  /** Mean times of the groups, s (not copied: read only). */
  double[] times() {
    return times;
  }

  /** Mean settlements of the groups, m, in the sign used for fitting (not copied: read only). */
  double[] settlements() {
    return settlements;
  }

  /** Weights of the groups (not copied: read only). */
  double[] weights() {
    return weights;
  }

  /**
   * The groups as a settlement curve in the input's sign (with its reading at t = 0, if it had
   * one), for the constructions that give start values; the original curve if not grouped.
   *
   * @param original the increment's readings
   * @param first 1 if the original starts with a reading at t = 0, else 0
   * @param sign +1, or -1 for a swelling increment fitted on the magnitude
   * @return the curve
   */
  SettlementCurve asCurve(SettlementCurve original, int first, double sign) {
    if (!grouped) {
      return original;
    }
    int m = times.length + first;
    double[] curveTimes = new double[m];
    double[] curveSettlements = new double[m];
    if (first == 1) {
      curveSettlements[0] = original.settlementMetres()[0];
    }
    for (int k = 0; k < times.length; k++) {
      curveTimes[first + k] = times[k];
      curveSettlements[first + k] = sign * settlements[k];
    }
    return SettlementCurve.of(curveTimes, curveSettlements);
  }
}
