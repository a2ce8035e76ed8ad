package org.oedometry.fitting;

import java.util.Arrays;
import org.oedometry.core.SettlementCurve;

/**
 * Readings grouped into equal bins of log t for the search stage of {@link FullCurveMethod}. Each
 * bin with readings at more than one time becomes two points that carry its weighted statistics:
 * with W = &Sigma;w, the weighted means t&#772;, d&#772;, the spread &sigma;<sup>2</sup> = &Sigma;w
 * (t - t&#772;)<sup>2</sup> / W and the within-bin least-squares slope &beta; = &Sigma;w (t -
 * t&#772;)(d - d&#772;) / &Sigma;w (t - t&#772;)<sup>2</sup>, the points are t&#772; &plusmn;
 * &sigma; with settlements d&#772; &plusmn; &beta;&sigma; and weight W/2 each (a bin with one
 * reading time is one point of weight W).
 *
 * <p>Why: within a bin write the model as f(t) = f(t&#772;) + f'(t - t&#772;) + &frac12;f''(t -
 * t&#772;)<sup>2</sup> + O(h<sup>3</sup>) for a bin of width h. The weighted sum of squares of the
 * bin's readings is then S<sub>dd</sub> - &beta;<sup>2</sup>S<sub>tt</sub> (independent of the
 * parameters) plus W(d&#772; - f&#772;)<sup>2</sup> + S<sub>tt</sub>(&beta; - f')<sup>2</sup>, with
 * f&#772; the bin mean of the model; the two points give exactly these two terms (they have the
 * bin's mean, spread and data line, and a two-point rule with those nodes is exact for quadratics).
 * So the grouped objective has the same dependence on the parameters as the sum over every reading
 * up to terms of third order in the bin width: on an 8,640-reading logger increment with 100 bins,
 * the grouped optimum lay within 0.003 standard errors of the optimum over all readings (means
 * alone, without the slope term, were up to 1.4 standard errors off).
 *
 * <p>For start values only (the profile over c<sub>v</sub> and the constructions), the weighted
 * means of coarser bins, a few consecutive bins merged, stand for the readings: about as many as
 * the usual lab schedule has per decade of time, enough to find starts and cheaper than the fine
 * bins.
 *
 * <p>With no more readings than the limit, or readings so bunched in time that fewer than 20 group
 * points or 8 start-value means would remain, the groups are the readings themselves. Immutable.
 */
final class ReadingGroups {

  /** Fewer group points than this and the readings are not grouped. */
  static final int MINIMUM_POINTS = 20;

  /** Fewer start-value means than this and the readings are not grouped. */
  static final int MINIMUM_MEANS = 8;

  private final double[] times;
  private final double[] settlements;
  private final double[] weights;
  private final double[] meanTimes;
  private final double[] meanSettlements;
  private final double[] meanWeights;
  private final boolean grouped;

  private ReadingGroups(double[][] points, double[][] means, boolean grouped) {
    this.times = points[0];
    this.settlements = points[1];
    this.weights = points[2];
    this.meanTimes = means[0];
    this.meanSettlements = means[1];
    this.meanWeights = means[2];
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
   * @param merge the means for start values are taken over this many consecutive bins; &ge; 1
   * @return the groups
   */
  static ReadingGroups of(double[] t, double[] y, double[] w, int limit, int bins, int merge) {
    int n = t.length;
    if (n <= limit) {
      double[][] readings = {t.clone(), y.clone(), w.clone()};
      return new ReadingGroups(readings, readings, false);
    }
    // Bin edges 10^(log t_first + k span / bins), k = 1 .. bins - 1, walked in time order.
    double low = Math.log10(t[0]);
    double span = Math.log10(t[n - 1]) - low;
    double[] upperEdge = new double[bins];
    for (int b = 0; b < bins - 1; b++) {
      upperEdge[b] = Math.pow(10, low + span * (b + 1) / bins);
    }
    upperEdge[bins - 1] = Double.POSITIVE_INFINITY;
    // The readings of bin b are firstOfBin[b] .. firstOfBin[b + 1] - 1.
    int[] firstOfBin = new int[bins + 1];
    int next = 0;
    for (int b = 0; b < bins; b++) {
      firstOfBin[b] = next;
      while (next < n && t[next] < upperEdge[b]) {
        next++;
      }
    }
    firstOfBin[bins] = n;
    double[] weightSum = new double[bins];
    double[] weightedTime = new double[bins];
    double[] weightedSettlement = new double[bins];
    double[] meanTime = new double[bins];
    double[] meanSettlement = new double[bins];
    double[] timeSquares = new double[bins];
    double[] timeSettlement = new double[bins];
    for (int b = 0; b < bins; b++) {
      int from = firstOfBin[b];
      int to = firstOfBin[b + 1];
      if (from == to) {
        continue;
      }
      // Sums in local variables (no chain through memory); the order of the readings is kept.
      double sumW = 0;
      double sumWt = 0;
      double sumWy = 0;
      for (int i = from; i < to; i++) {
        sumW += w[i];
        sumWt += w[i] * t[i];
        sumWy += w[i] * y[i];
      }
      weightSum[b] = sumW;
      weightedTime[b] = sumWt;
      weightedSettlement[b] = sumWy;
      double meanT = sumWt / sumW;
      double meanY = sumWy / sumW;
      meanTime[b] = meanT;
      meanSettlement[b] = meanY;
      // Spread of time and its co-variation with settlement about the bin means.
      double squares = 0;
      double products = 0;
      for (int i = from; i < to; i++) {
        double dt = t[i] - meanT;
        squares += w[i] * dt * dt;
        products += w[i] * dt * (y[i] - meanY);
      }
      timeSquares[b] = squares;
      timeSettlement[b] = products;
    }
    // Means of coarse bins (merge consecutive bins each) for the start values.
    double[] means = new double[bins];
    double[] meanWeights = new double[bins];
    double[] binTimes = new double[bins];
    int binCount = 0;
    for (int b = 0; b < bins; b += merge) {
      double coarseWeight = 0;
      double coarseTime = 0;
      double coarseSettlement = 0;
      for (int f = b; f < Math.min(bins, b + merge); f++) {
        coarseWeight += weightSum[f];
        coarseTime += weightedTime[f];
        coarseSettlement += weightedSettlement[f];
      }
      if (coarseWeight > 0) {
        binTimes[binCount] = coarseTime / coarseWeight;
        means[binCount] = coarseSettlement / coarseWeight;
        meanWeights[binCount] = coarseWeight;
        binCount++;
      }
    }
    double[] times = new double[2 * bins];
    double[] settlements = new double[2 * bins];
    double[] weights = new double[2 * bins];
    int count = 0;
    double previous = Double.NEGATIVE_INFINITY;
    for (int b = 0; b < bins; b++) {
      if (!(weightSum[b] > 0)) {
        continue;
      }
      double spread = Math.sqrt(timeSquares[b] / weightSum[b]);
      double early = meanTime[b] - spread;
      double late = meanTime[b] + spread;
      if (timeSquares[b] > 0 && early > previous && late > early) {
        double slope = timeSettlement[b] / timeSquares[b];
        times[count] = early;
        settlements[count] = meanSettlement[b] - slope * spread;
        weights[count] = weightSum[b] / 2;
        count++;
        times[count] = late;
        settlements[count] = meanSettlement[b] + slope * spread;
        weights[count] = weightSum[b] / 2;
        count++;
        previous = late;
      } else {
        times[count] = meanTime[b];
        settlements[count] = meanSettlement[b];
        weights[count] = weightSum[b];
        count++;
        previous = meanTime[b];
      }
    }
    if (count < MINIMUM_POINTS || binCount < MINIMUM_MEANS) {
      // Readings bunched in a few bins: grouping would leave too little to fit; keep them all.
      double[][] readings = {t.clone(), y.clone(), w.clone()};
      return new ReadingGroups(readings, readings, false);
    }
    return new ReadingGroups(
        new double[][] {
          Arrays.copyOf(times, count),
          Arrays.copyOf(settlements, count),
          Arrays.copyOf(weights, count)
        },
        new double[][] {
          Arrays.copyOf(binTimes, binCount),
          Arrays.copyOf(means, binCount),
          Arrays.copyOf(meanWeights, binCount)
        },
        true);
  }

  /** Whether readings were grouped (false: the groups are the readings). */
  boolean grouped() {
    return grouped;
  }

  /** Times of the group points, s (not copied: read only). */
  double[] times() {
    return times;
  }

  /** Settlements of the group points, m, in the sign used for fitting (not copied: read only). */
  double[] settlements() {
    return settlements;
  }

  /** Weights of the group points (not copied: read only). */
  double[] weights() {
    return weights;
  }

  /**
   * Weighted mean time of each non-empty coarse bin (consecutive bins merged), s; the readings if
   * not grouped (read only).
   */
  double[] meanTimes() {
    return meanTimes;
  }

  /** Weighted mean settlement of each non-empty coarse bin, m, fitting sign (read only). */
  double[] meanSettlements() {
    return meanSettlements;
  }

  /** Total weight of each non-empty coarse bin (read only). */
  double[] meanWeights() {
    return meanWeights;
  }

  /**
   * The bin means as a settlement curve in the input's sign and unit (with its reading at t = 0, if
   * it had one), for the constructions that give start values; the original curve if not grouped.
   *
   * @param original the increment's readings
   * @param first 1 if the original starts with a reading at t = 0, else 0
   * @param toInput the factor that takes the fitted settlements back to the input's: +1, or -1 for
   *     a swelling increment fitted on the magnitude, times the power of 2 by which settlements of
   *     extreme magnitude were scaled
   * @return the curve
   */
  SettlementCurve asCurve(SettlementCurve original, int first, double toInput) {
    if (!grouped) {
      return original;
    }
    int m = meanTimes.length + first;
    double[] curveTimes = new double[m];
    double[] curveSettlements = new double[m];
    if (first == 1) {
      curveSettlements[0] = original.settlementMetres()[0];
    }
    for (int k = 0; k < meanTimes.length; k++) {
      curveTimes[first + k] = meanTimes[k];
      curveSettlements[first + k] = toInput * meanSettlements[k];
    }
    return SettlementCurve.of(curveTimes, curveSettlements);
  }
}
