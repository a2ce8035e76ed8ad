package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.compressibility.Compressibility;
import org.oedometry.core.compressibility.CompressionCurve;
import org.oedometry.core.compressibility.CompressionPoint;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FitWarning;

class CvPointTest {

  @Test
  @DisplayName("of(...) takes the log-mean stress √(σ1 σ2) and the class from the increment")
  void fromIncrement() {
    // 100 -> 400 kPa: log mean 200 kPa (hand arithmetic); with σ'p = 150 kPa it crosses σ'p.
    CompressionCurve curve =
        CompressionCurve.of(
            1.0,
            100e3,
            List.of(new CompressionPoint(400e3, 0.9), new CompressionPoint(100e3, 0.92)));
    var increments = Compressibility.increments(curve, 150e3);
    CvEstimate estimate =
        new CvEstimate() {
          @Override
          public CvMethod method() {
            return CvMethod.ASAOKA;
          }

          @Override
          public double cv() {
            return 2e-8;
          }

          @Override
          public double drainagePath() {
            return 0.01;
          }

          @Override
          public List<FitWarning> warnings() {
            return List.of();
          }
        };
    CvPoint loading = CvPoint.of(increments.get(0), estimate);
    assertThat(loading.stress()).isCloseTo(200e3, within(1e-6));
    assertThat(loading.overconsolidated()).isFalse();
    assertThat(loading.method()).isEqualTo(CvMethod.ASAOKA);
    assertThat(loading.cv()).isEqualTo(2e-8);
    CvPoint unloading = CvPoint.of(increments.get(1), estimate);
    assertThat(unloading.overconsolidated()).isTrue();
  }
}
