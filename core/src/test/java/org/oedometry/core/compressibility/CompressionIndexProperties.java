package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class CompressionIndexProperties {

  @Test
  @DisplayName(
      "C_c is invariant under scaling all stresses by a constant (C_c = -de/dlog10 s', FACTS)")
  void invariantUnderStressScaling() {
    qt().forAll(longs().all(), doubles().between(1e-3, 1e3))
        .checkAssert(
            (seed, factor) -> {
              SplittableRandom rnd = new SplittableRandom(seed);
              int n = 8;
              double[] s = new double[n];
              double[] scaled = new double[n];
              double[] e = new double[n];
              double stress = 10e3;
              double voidRatio = 1.5;
              for (int i = 0; i < n; i++) {
                stress *= 1.5 + rnd.nextDouble() * 2;
                voidRatio -= rnd.nextDouble() * 0.1;
                s[i] = stress;
                scaled[i] = stress * factor;
                e[i] = voidRatio;
              }
              CompressionCurve a = CompressionCurve.of(1.6, s, e);
              CompressionCurve b = CompressionCurve.of(1.6, scaled, e);
              double pc = s[2];
              IndexFit fa = CompressionIndex.virginLine(a, pc).value().orElseThrow();
              IndexFit fb = CompressionIndex.virginLine(b, pc * factor).value().orElseThrow();
              assertThat(fb.index()).isCloseTo(fa.index(), within(1e-9));
              assertThat(fb.increments()).isEqualTo(fa.increments());
            });
  }

  @Test
  @DisplayName("Points exactly on a line give that slope and R^2 = 1 (least squares, exact data)")
  void exactLineRecovered() {
    qt().forAll(doubles().between(0.01, 2.0), doubles().between(1e3, 1e5))
        .checkAssert(
            (cc, first) -> {
              double[] s = new double[6];
              double[] e = new double[6];
              for (int i = 0; i < 6; i++) {
                s[i] = first * Math.pow(2, i);
                e[i] = 20.0 - cc * Math.log10(s[i]);
              }
              IndexFit fit = CompressionIndex.ofPoints(20, s, e);
              assertThat(fit.index()).isCloseTo(cc, within(1e-9));
              assertThat(fit.line().rSquared()).isCloseTo(1.0, within(1e-9));
            });
  }
}
