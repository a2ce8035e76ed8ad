package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;

import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;

class ReadingGroupsTest {

  @Test
  @DisplayName("Up to the limit the groups are the readings themselves")
  void identityBelowLimit() {
    double[] t = {1, 2, 4, 8};
    double[] y = {0.1, 0.2, 0.3, 0.4};
    double[] w = {1, 2, 3, 4};
    ReadingGroups groups = ReadingGroups.of(t, y, w, 4, 2, 1);
    assertThat(groups.grouped()).isFalse();
    assertThat(groups.times()).containsExactly(t);
    assertThat(groups.settlements()).containsExactly(y);
    assertThat(groups.weights()).containsExactly(w);
    assertThat(groups.meanTimes()).containsExactly(t);
    SettlementCurve curve = SettlementCurve.of(new double[] {0, 1, 2, 4, 8}, new double[5]);
    assertThat(groups.asCurve(curve, 1, 1.0)).isSameAs(curve);
  }

  @Test
  @DisplayName(
      "Each reading falls in bin floor(B log(t/t_1) / log(t_n/t_1)); each bin becomes the two"
          + " points t_mean -/+ sigma on the bin's weighted least-squares line, weight W/2 each;"
          + " the start-value means are those of three bins merged"
          + " [direct computation with logarithms and textbook weighted regression]")
  void groupsByLogTime() {
    int n = 3000;
    int bins = 40;
    double[] t = new double[n];
    double[] y = new double[n];
    double[] w = new double[n];
    SplittableRandom random = new SplittableRandom(3);
    for (int i = 0; i < n; i++) {
      t[i] = 5.0 * (i + 1);
      y[i] = Math.log(t[i]) + 0.01 * random.nextDouble();
      w[i] = 0.5 + random.nextDouble();
    }
    int[] binOf = new int[n];
    double[] sum = new double[bins];
    double[] sumT = new double[bins];
    double[] sumY = new double[bins];
    double span = Math.log(t[n - 1] / t[0]);
    for (int i = 0; i < n; i++) {
      int b = (int) Math.min(bins - 1, Math.floor(bins * Math.log(t[i] / t[0]) / span));
      binOf[i] = b;
      sum[b] += w[i];
      sumT[b] += w[i] * t[i];
      sumY[b] += w[i] * y[i];
    }
    double[] stt = new double[bins];
    double[] sty = new double[bins];
    for (int i = 0; i < n; i++) {
      int b = binOf[i];
      double dt = t[i] - sumT[b] / sum[b];
      stt[b] += w[i] * dt * dt;
      sty[b] += w[i] * dt * (y[i] - sumY[b] / sum[b]);
    }
    ReadingGroups groups = ReadingGroups.of(t, y, w, 100, bins, 3);
    assertThat(groups.grouped()).isTrue();
    int k = 0;
    for (int b = 0; b < bins; b++) {
      if (sum[b] == 0) {
        continue;
      }
      double meanT = sumT[b] / sum[b];
      double meanY = sumY[b] / sum[b];
      if (stt[b] == 0) {
        assertThat(groups.weights()[k]).isCloseTo(sum[b], within(1e-9 * sum[b]));
        assertThat(groups.times()[k]).isCloseTo(meanT, within(1e-9 * meanT));
        k++;
        continue;
      }
      double sigma = Math.sqrt(stt[b] / sum[b]);
      double slope = sty[b] / stt[b];
      for (int side = -1; side <= 1; side += 2) {
        assertThat(groups.weights()[k]).isCloseTo(sum[b] / 2, within(1e-9 * sum[b]));
        assertThat(groups.times()[k]).isCloseTo(meanT + side * sigma, within(1e-9 * meanT));
        assertThat(groups.settlements()[k]).isCloseTo(meanY + side * slope * sigma, within(1e-9));
        k++;
      }
    }
    assertThat(groups.times()).hasSize(k);
    int m = 0;
    for (int b = 0; b < bins; b += 3) {
      double coarse = 0;
      double coarseT = 0;
      double coarseY = 0;
      for (int f = b; f < Math.min(bins, b + 3); f++) {
        coarse += sum[f];
        coarseT += sumT[f];
        coarseY += sumY[f];
      }
      if (coarse > 0) {
        assertThat(groups.meanWeights()[m]).isCloseTo(coarse, within(1e-9 * coarse));
        assertThat(groups.meanTimes()[m])
            .isCloseTo(coarseT / coarse, within(1e-9 * coarseT / coarse));
        assertThat(groups.meanSettlements()[m]).isCloseTo(coarseY / coarse, within(1e-9));
        m++;
      }
    }
    assertThat(groups.meanTimes()).hasSize(m);
  }

  @Test
  @DisplayName(
      "Properties: total weight and weighted time are kept, group times increase, and the"
          + " curve of groups keeps the zero reading and the sign (grouped or, with too few bins,"
          + " kept as readings)")
  void invariants() {
    qt().forAll(integers().between(401, 5000), integers().between(2, 200))
        .checkAssert(
            (n, bins) -> {
              double[] t = new double[n];
              double[] y = new double[n];
              double[] w = new double[n];
              double total = 0;
              double weightedTime = 0;
              for (int i = 0; i < n; i++) {
                t[i] = 0.5 * Math.pow(1.003, i) + i;
                y[i] = -Math.sqrt(t[i]);
                w[i] = 1 + (i % 3);
                total += w[i];
                weightedTime += w[i] * t[i];
              }
              ReadingGroups groups = ReadingGroups.of(t, y, w, 400, bins, 1 + bins % 4);
              double groupTotal = 0;
              double groupTime = 0;
              for (int k = 0; k < groups.times().length; k++) {
                groupTotal += groups.weights()[k];
                groupTime += groups.weights()[k] * groups.times()[k];
                if (k > 0) {
                  assertThat(groups.times()[k]).isGreaterThan(groups.times()[k - 1]);
                }
              }
              assertThat(groupTotal).isCloseTo(total, within(1e-9 * total));
              assertThat(groupTime).isCloseTo(weightedTime, within(1e-9 * weightedTime));
              if (groups.grouped()) {
                assertThat(groups.times().length).isLessThanOrEqualTo(2 * bins);
              } else {
                // Too few bins for the minimum number of points or means: the readings are kept.
                assertThat(groups.times()).containsExactly(t);
              }
              double[] curveTimes = new double[n + 1];
              double[] curveSettlements = new double[n + 1];
              curveSettlements[0] = 0.25;
              for (int i = 0; i < n; i++) {
                curveTimes[i + 1] = t[i];
                curveSettlements[i + 1] = -y[i];
              }
              SettlementCurve curve =
                  groups.asCurve(SettlementCurve.of(curveTimes, curveSettlements), 1, -1.0);
              assertThat(curve.settlementMetres()[0]).isEqualTo(0.25);
              assertThat(curve.elapsedSeconds()[0]).isZero();
              assertThat(curve.settlementMetres()[1]).isEqualTo(-groups.meanSettlements()[0]);
              assertThat(curve.size()).isEqualTo(groups.meanTimes().length + 1);
            });
  }

  @Test
  @DisplayName(
      "Readings bunched in a few bins are not grouped (too few points or means would remain)")
  void bunchedReadingsAreKept() {
    int n = 1000;
    double[] t = new double[n];
    double[] y = new double[n];
    double[] w = new double[n];
    for (int i = 0; i < n; i++) {
      // Three readings early, the rest within one second at about a day.
      t[i] = i < 3 ? 10.0 * (i + 1) : 86_400 + 0.001 * i;
      y[i] = i;
      w[i] = 1;
    }
    ReadingGroups groups = ReadingGroups.of(t, y, w, 400, 100, 3);
    assertThat(groups.grouped()).isFalse();
    assertThat(groups.times()).containsExactly(t);
  }
}
