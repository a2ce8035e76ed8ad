package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class CompressionIndexTest {

  // Invented load path (kPa): 25, 50, 100, 200, 400, 800, 200, 50 (unload), 200, 800 (reload),
  // 1600. Built from straight lines: virgin slope Cc = 0.30 from 100 kPa, recompression 0.03,
  // unloading 0.05, reloading 0.05 back to the virgin line (no hysteresis loop, for simplicity).
  private static final double[] S = {
    25e3, 50e3, 100e3, 200e3, 400e3, 800e3, 200e3, 50e3, 200e3, 800e3, 1600e3
  };
  private static final double LOG2 = Math.log10(2);
  private static final double LOG4 = Math.log10(4);
  private static final double E100 = 1.00;
  private static final double E800 = E100 - 0.30 * 3 * LOG2;
  private static final double E50U = E800 + 0.05 * 2 * LOG4;
  private static final double E800R = E50U - 0.05 * 2 * LOG4;
  private static final double[] E = {
    E100 + 0.03 * 2 * LOG2,
    E100 + 0.03 * LOG2,
    E100,
    E100 - 0.30 * LOG2,
    E100 - 0.30 * 2 * LOG2,
    E800,
    E800 + 0.05 * LOG4,
    E50U,
    E50U - 0.05 * LOG4,
    E800R,
    E800R - 0.30 * LOG2
  };
  private static final CompressionCurve CURVE = CompressionCurve.of(1.10, S, E);

  @Test
  @DisplayName(
      "Worked check [published: Venkatramaiah, Geotechnical Engineering, Example 7.1]:"
          + " C_c = 0.166")
  void venkatramaiahExample() {
    IndexFit fit =
        CompressionIndex.ofPoints(0.75, new double[] {50e3, 100e3}, new double[] {0.70, 0.65});
    assertThat(fit.index()).isCloseTo(0.166, within(0.0005));
    assertThat(fit.modifiedIndex()).isCloseTo(fit.index() / 1.75, within(1e-15));
    assertThat(fit.line().rSquared()).isEqualTo(1.0);
  }

  @Test
  @DisplayName(
      "Virgin line over the normally consolidated increments recovers Cc = 0.30 (invented)")
  void virginLine() {
    Derived<IndexFit> cc = CompressionIndex.virginLine(CURVE, 100e3);
    assertThat(cc.isPresent()).isTrue();
    IndexFit fit = cc.value().orElseThrow();
    assertThat(fit.index()).isCloseTo(0.30, within(1e-12));
    assertThat(fit.modifiedIndex()).isCloseTo(0.30 / 2.10, within(1e-12));
    assertThat(fit.increments()).containsExactly(3, 4, 5, 10);
    assertThat(fit.line().rSquared()).isCloseTo(1.0, within(1e-12));
  }

  @Test
  @DisplayName("Recompression, unloading and reloading branches recover their slopes (invented)")
  void branches() {
    List<IndexBranch> branches = CompressionIndex.branches(CURVE, 100e3);
    assertThat(branches)
        .extracting(IndexBranch::kind)
        .containsExactly(
            IncrementClass.RECOMPRESSION, IncrementClass.UNLOADING, IncrementClass.RELOADING);
    // The first branch's increment 0 starts from zero stress and is left out of the fit.
    assertThat(branches.get(0).fit().value().orElseThrow().index()).isCloseTo(0.03, within(1e-12));
    assertThat(branches.get(0).fit().value().orElseThrow().increments()).containsExactly(1, 2);
    assertThat(branches.get(1).fit().value().orElseThrow().index()).isCloseTo(0.05, within(1e-12));
    assertThat(branches.get(2).fit().value().orElseThrow().index()).isCloseTo(0.05, within(1e-12));
    assertThat(branches.get(1).firstIncrement()).isEqualTo(6);
    assertThat(branches.get(1).lastIncrement()).isEqualTo(7);
  }

  @Test
  @DisplayName("A single recompression increment from zero stress: C_r absent with a reason")
  void branchWithoutLogPoint() {
    CompressionCurve c =
        CompressionCurve.of(1.0, new double[] {50e3, 100e3}, new double[] {0.98, 0.90});
    List<IndexBranch> branches = CompressionIndex.branches(c, 50e3);
    assertThat(branches).hasSize(1);
    assertThat(branches.get(0).fit().isPresent()).isFalse();
    assertThat(branches.get(0).fit().absenceReason()).contains("zero stress");
  }

  @Test
  @DisplayName(
      "Points one ulp apart in stress (equal log10 s'): C_c and C_r absent with a reason, as the"
          + " Javadoc and the package contract promise for valid input; overIncrements throws as"
          + " documented")
  void pointsWithEqualLogarithms() {
    // log10(1e5) = 5 exactly; log10 of the next double above 1e5 (relative step 1.5e-16) rounds to
    // 5 as well (the change, 6e-17, is below half an ulp of 5): no line through the two points.
    double above = Math.nextUp(100e3);
    CompressionCurve virgin =
        CompressionCurve.of(1.0, new double[] {100e3, above}, new double[] {0.95, 0.94});
    Derived<IndexFit> cc = CompressionIndex.virginLine(virgin, 100e3);
    assertThat(cc.isPresent()).isFalse();
    assertThat(cc.absenceReason())
        .startsWith("the normally consolidated points admit no straight line: ");
    // Load to 100 kPa, unload to 50 kPa, reload by one ulp: the reloading branch has no line.
    CompressionCurve loop =
        CompressionCurve.of(
            1.0, new double[] {100e3, 50e3, Math.nextUp(50e3)}, new double[] {0.95, 0.96, 0.96});
    List<IndexBranch> branches = CompressionIndex.branches(loop, 200e3);
    assertThat(branches)
        .extracting(IndexBranch::kind)
        .containsExactly(
            IncrementClass.RECOMPRESSION, IncrementClass.UNLOADING, IncrementClass.RELOADING);
    assertThat(branches.get(1).fit().isPresent()).isTrue();
    assertThat(branches.get(2).fit().isPresent()).isFalse();
    assertThat(branches.get(2).fit().absenceReason())
        .startsWith("the branch's points admit no straight line: ");
    assertThatThrownBy(() -> CompressionIndex.overIncrements(loop, 2))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("distinct abscissae");
  }

  @Test
  @DisplayName("No normally consolidated increment: C_c absent with the reason, no exception")
  void noVirginIncrement() {
    Derived<IndexFit> cc = CompressionIndex.virginLine(CURVE, 5e6);
    assertThat(cc.isPresent()).isFalse();
    assertThat(cc.absenceReason())
        .isEqualTo(
            "no normally consolidated increment: no loading increment starts at or above the"
                + " preconsolidation pressure (5000000.0 Pa) and the largest stress applied"
                + " before it");
  }

  @Test
  @DisplayName("Least squares over scattered points agrees with Commons Math SimpleRegression")
  void againstIndependentRegression() {
    double[] s = {100e3, 200e3, 400e3, 800e3, 1600e3};
    double[] e = {1.01, 0.905, 0.83, 0.71, 0.622};
    IndexFit fit = CompressionIndex.ofPoints(1.2, s, e);
    SimpleRegression reg = new SimpleRegression();
    for (int i = 0; i < s.length; i++) {
      reg.addData(Math.log10(s[i]), e[i]);
    }
    assertThat(fit.index()).isCloseTo(-reg.getSlope(), within(1e-13));
    assertThat(fit.line().intercept()).isCloseTo(reg.getIntercept(), within(1e-12));
    assertThat(fit.line().rSquared()).isCloseTo(reg.getRSquare(), within(1e-13));
    IndexFit over = CompressionIndex.overIncrements(CompressionCurve.of(1.2, s, e), 1, 2, 3, 4);
    assertThat(over.index()).isCloseTo(fit.index(), within(1e-13));
  }

  @Test
  @DisplayName("Bad input catalogue: messages name the field, the index and the value")
  void badInput() {
    assertThatThrownBy(
            () ->
                CompressionIndex.ofPoints(
                    1.0, new double[] {100e3, 200e3, 200e3}, new double[] {0.9, 0.8, 0.7}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "effective stress at index 2 (200000.0 Pa) is not above index 1 (200000.0 Pa): a"
                + " virgin-line fit needs increasing stress");
    assertThatThrownBy(
            () ->
                CompressionIndex.ofPoints(
                    1.0, new double[] {100e3, 200e3}, new double[] {0.9, 0.8, 0.7}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "effective stresses has 2 values but void ratios has 3: the lengths must match");
    assertThatThrownBy(
            () -> CompressionIndex.ofPoints(1.0, new double[] {100e3}, new double[] {0.9}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("a virgin-line fit needs at least 2 points (1 given)");
    assertThatThrownBy(
            () ->
                CompressionIndex.ofPoints(
                    1.0, new double[] {100e3, 200e3}, new double[] {0.9, Double.NaN}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("void ratio at index 1 (NaN) must be finite and > 0");
    assertThatThrownBy(() -> CompressionIndex.overIncrements(CURVE, 3, 11))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("increment at index 1 (11) is outside 0..10");
    assertThatThrownBy(() -> CompressionIndex.overIncrements(CURVE, 3, 3))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("increment at index 1 (3) is repeated");
    assertThatThrownBy(() -> CompressionIndex.overIncrements(CURVE, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "increment at index 0 (0) starts from zero stress, which has no place on a log axis");
    assertThatThrownBy(() -> CompressionIndex.overIncrements(CURVE))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("increments must name at least one increment (0 given)");
    assertThatThrownBy(() -> CompressionIndex.virginLine(CURVE, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("preconsolidation pressure (0.0 Pa) must be finite and > 0");
  }
}
