package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class CompressibilityProperties {

  @Test
  @DisplayName("m_v > 0 and a_v > 0 on loading when e falls (m_v = a_v / (1 + e1), FACTS)")
  void mvPositiveOnLoading() {
    qt().forAll(
            integers().between(2, 12),
            doubles().between(1e3, 1e5),
            doubles().between(1.1, 4.0),
            doubles().between(1e-4, 0.15))
        .checkAssert(
            (n, first, ratio, drop) -> {
              double[] s = new double[n];
              double[] e = new double[n];
              for (int i = 0; i < n; i++) {
                s[i] = first * Math.pow(ratio, i);
                e[i] = 2.0 - drop * (i + 1);
              }
              for (IncrementCompressibility inc :
                  Compressibility.increments(CompressionCurve.of(2.0, s, e), first)) {
                assertThat(inc.isLoading()).isTrue();
                assertThat(inc.mv()).isPositive();
                assertThat(inc.coefficientOfCompressibility()).isPositive();
                assertThat(inc.mv()).isLessThanOrEqualTo(inc.coefficientOfCompressibility());
              }
            });
  }

  @Test
  @DisplayName("The log-mean stress lies between the increment's stresses, below the arithmetic")
  void logMeanBetweenStresses() {
    qt().forAll(doubles().between(1e3, 1e6), doubles().between(1.01, 10.0))
        .checkAssert(
            (s1, ratio) -> {
              CompressionCurve c =
                  CompressionCurve.of(1.0, new double[] {s1, s1 * ratio}, new double[] {0.9, 0.8});
              IncrementCompressibility inc = Compressibility.increments(c, s1).get(1);
              double m = inc.logMeanStress().getAsDouble();
              assertThat(m).isGreaterThan(s1).isLessThan(s1 * ratio);
              assertThat(m).isLessThanOrEqualTo(inc.arithmeticMeanStress());
            });
  }
}
