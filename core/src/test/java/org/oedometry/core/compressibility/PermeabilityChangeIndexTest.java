package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class PermeabilityChangeIndexTest {

  @Test
  @DisplayName("e = e_ref + C_k log10(k / k_ref) exactly (invented): C_k recovered, R^2 = 1")
  void exactLine() {
    double ck = 0.6;
    double[] k = {3e-9, 1.5e-9, 7e-10, 3e-10, 1.2e-10};
    double[] e = new double[k.length];
    for (int i = 0; i < k.length; i++) {
      e[i] = 1.2 + ck * Math.log10(k[i] / 3e-9);
    }
    PermeabilityChangeFit fit = PermeabilityChangeIndex.ofPoints(e, k).value().orElseThrow();
    assertThat(fit.permeabilityChangeIndex()).isCloseTo(ck, within(1e-12));
    assertThat(fit.rSquared()).isCloseTo(1.0, within(1e-12));
  }

  @Test
  @DisplayName("Scattered points: slope and R^2 agree with Commons Math SimpleRegression")
  void againstIndependentRegression() {
    double[] k = {3e-9, 1.5e-9, 7e-10, 3e-10, 1.2e-10};
    double[] e = {1.21, 1.02, 0.83, 0.61, 0.40};
    PermeabilityChangeFit fit = PermeabilityChangeIndex.ofPoints(e, k).value().orElseThrow();
    SimpleRegression reg = new SimpleRegression();
    for (int i = 0; i < k.length; i++) {
      reg.addData(Math.log10(k[i]), e[i]);
    }
    assertThat(fit.permeabilityChangeIndex()).isCloseTo(reg.getSlope(), within(1e-12));
    assertThat(fit.rSquared()).isCloseTo(reg.getRSquare(), within(1e-12));
  }

  @Test
  @DisplayName("Over increments: fits each increment's mean e against its k")
  void overIncrements() {
    List<IncrementPermeability> incs =
        List.of(
            new IncrementPermeability(3, 1.10, 2e-8, 1e-6, 2e-8 * 1e-6 * 9810),
            new IncrementPermeability(4, 0.95, 1.5e-8, 6e-7, 1.5e-8 * 6e-7 * 9810),
            new IncrementPermeability(5, 0.80, 1.2e-8, 3e-7, 1.2e-8 * 3e-7 * 9810));
    PermeabilityChangeFit fit = PermeabilityChangeIndex.fit(incs).value().orElseThrow();
    SimpleRegression reg = new SimpleRegression();
    for (IncrementPermeability inc : incs) {
      reg.addData(Math.log10(inc.permeability()), inc.meanVoidRatio());
    }
    assertThat(fit.permeabilityChangeIndex()).isCloseTo(reg.getSlope(), within(1e-12));
    assertThat(fit.increments()).containsExactly(3, 4, 5);
  }

  @Test
  @DisplayName("Absent with a reason: one increment, or all k equal")
  void absentCases() {
    assertThat(
            PermeabilityChangeIndex.ofPoints(new double[] {1.0}, new double[] {1e-9})
                .absenceReason())
        .isEqualTo("a permeability change index needs at least 2 increments (1 given)");
    assertThat(
            PermeabilityChangeIndex.ofPoints(new double[] {1.0, 0.9}, new double[] {1e-9, 1e-9})
                .absenceReason())
        .isEqualTo(
            "all 2 increments have the same permeability (1.0E-9 m/s): no slope can be fitted");
  }

  @Test
  @DisplayName("Bad input: messages name the field, the index and the value")
  void badInput() {
    assertThatThrownBy(
            () -> PermeabilityChangeIndex.ofPoints(new double[] {1.0, 0.9}, new double[] {1e-9}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("void ratios has 2 values but permeabilities has 1: the lengths must match");
    assertThatThrownBy(
            () ->
                PermeabilityChangeIndex.ofPoints(
                    new double[] {1.0, 0.9}, new double[] {1e-9, -1e-9}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("permeability at index 1 (-1.0E-9 m/s) must be finite and > 0");
  }
}
