package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.DrainagePathRule;
import org.oedometry.core.compressibility.DeformationBasis;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FullCurveOptions;

class ReductionOptionsTest {

  @Test
  @DisplayName(
      "Defaults as documented: test's rule, all methods, 9.81 kN/m3, log-root-full, end of primary, 1.5, 0.5-1.0")
  void defaults() {
    ReductionOptions o = ReductionOptions.defaults();
    assertThat(o.drainagePathRule()).isEmpty();
    assertThat(o.methods()).containsExactly(CvMethod.values());
    assertThat(o.waterUnitWeight()).isEqualTo(9810.0);
    assertThat(o.preferredMethods())
        .containsExactly(CvMethod.LOG_TIME, CvMethod.ROOT_TIME, CvMethod.FULL_CURVE);
    assertThat(o.deformationBasis()).isEqualTo(DeformationBasis.END_OF_PRIMARY);
    assertThat(o.disagreementFactor()).isEqualTo(1.5);
    assertThat(o.primaryRatioLow()).isEqualTo(0.5);
    assertThat(o.primaryRatioHigh()).isEqualTo(1.0);
    assertThat(o.fullCurveOptions()).isEqualTo(FullCurveOptions.defaults());
    assertThat(o)
        .isEqualTo(ReductionOptions.builder().build())
        .hasSameHashCodeAs(o.toBuilder().build());
    assertThat(o.toString()).contains("the test's own");
  }

  @Test
  @DisplayName("The builder sets every option and copies the lists")
  void builderSetsAndCopies() {
    List<CvMethod> methods = new java.util.ArrayList<>(List.of(CvMethod.ROOT_TIME));
    ReductionOptions o =
        ReductionOptions.builder()
            .drainagePathRule(DrainagePathRule.MEAN_HEIGHT)
            .methods(methods)
            .waterUnitWeight(9800)
            .preferredMethods(List.of())
            .deformationBasis(DeformationBasis.END_OF_INCREMENT)
            .disagreementFactor(2)
            .usualPrimaryRatio(0.4, 0.95)
            .fullCurveOptions(FullCurveOptions.defaults().withSecondaryOnset(1.5))
            .build();
    methods.add(CvMethod.LOG_TIME);
    assertThat(o.methods()).containsExactly(CvMethod.ROOT_TIME);
    assertThat(o.drainagePathRule()).contains(DrainagePathRule.MEAN_HEIGHT);
    assertThat(o.preferredMethods()).isEmpty();
    assertThat(o.waterUnitWeight()).isEqualTo(9800);
    assertThat(o.disagreementFactor()).isEqualTo(2);
    assertThat(o.primaryRatioLow()).isEqualTo(0.4);
    assertThat(o.fullCurveOptions().secondaryOnset()).isEqualTo(1.5);
    assertThat(o).isNotEqualTo(ReductionOptions.defaults());
    assertThat(o.toBuilder().build()).isEqualTo(o);
  }

  @Test
  @DisplayName("Bad options name the field and the value")
  void rejectsBadOptions() {
    assertThatThrownBy(() -> ReductionOptions.builder().methods(List.of()).build())
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("methods");
    assertThatThrownBy(
            () ->
                ReductionOptions.builder()
                    .methods(List.of(CvMethod.LOG_TIME, CvMethod.LOG_TIME))
                    .build())
        .hasMessageContaining("LOG_TIME at index 1 is repeated");
    assertThatThrownBy(
            () ->
                ReductionOptions.builder().methods(Arrays.asList(CvMethod.LOG_TIME, null)).build())
        .hasMessageContaining("index 1 is null");
    assertThatThrownBy(() -> ReductionOptions.builder().waterUnitWeight(Double.NaN).build())
        .hasMessageContaining("unit weight of water (NaN N/m^3)");
    assertThatThrownBy(() -> ReductionOptions.builder().disagreementFactor(1).build())
        .hasMessageContaining("disagreement factor (1.0)");
    assertThatThrownBy(() -> ReductionOptions.builder().usualPrimaryRatio(0.9, 0.5).build())
        .hasMessageContaining("0.9 to 0.5");
    assertThatThrownBy(() -> ReductionOptions.builder().deformationBasis(null).build())
        .isInstanceOf(NullPointerException.class);
  }

  @Test
  @DisplayName(
      "Infinite and out-of-range numbers are refused too, each naming the field; options that"
          + " differ in any one field are not equal")
  void refusesInfinitiesAndComparesEveryField() {
    assertThatThrownBy(
            () -> ReductionOptions.builder().waterUnitWeight(Double.POSITIVE_INFINITY).build())
        .hasMessageContaining("unit weight of water (Infinity N/m^3) must be finite and > 0");
    assertThatThrownBy(() -> ReductionOptions.builder().waterUnitWeight(0).build())
        .hasMessageContaining("unit weight of water (0.0 N/m^3)");
    assertThatThrownBy(
            () -> ReductionOptions.builder().disagreementFactor(Double.POSITIVE_INFINITY).build())
        .hasMessageContaining("disagreement factor (Infinity) must be finite and > 1");
    assertThatThrownBy(() -> ReductionOptions.builder().usualPrimaryRatio(-0.1, 0.5).build())
        .hasMessageContaining("-0.1 to 0.5");
    assertThatThrownBy(
            () ->
                ReductionOptions.builder().usualPrimaryRatio(0.5, Double.POSITIVE_INFINITY).build())
        .hasMessageContaining("0.5 to Infinity");
    ReductionOptions base = ReductionOptions.defaults();
    List<ReductionOptions> changed =
        List.of(
            base.toBuilder().drainagePathRule(DrainagePathRule.MEAN_HEIGHT).build(),
            base.toBuilder().methods(List.of(CvMethod.LOG_TIME)).build(),
            base.toBuilder().waterUnitWeight(9800).build(),
            base.toBuilder().preferredMethods(List.of(CvMethod.ROOT_TIME)).build(),
            base.toBuilder().deformationBasis(DeformationBasis.END_OF_INCREMENT).build(),
            base.toBuilder().disagreementFactor(3).build(),
            base.toBuilder().usualPrimaryRatio(0.4, base.primaryRatioHigh()).build(),
            base.toBuilder().usualPrimaryRatio(base.primaryRatioLow(), 0.99).build(),
            base.toBuilder()
                .fullCurveOptions(FullCurveOptions.defaults().withSecondaryOnset(1.5))
                .build());
    for (ReductionOptions o : changed) {
      assertThat(o).as("%s", o).isNotEqualTo(base);
      assertThat(o.toBuilder().build()).isEqualTo(o).hasSameHashCodeAs(o);
    }
  }
}
