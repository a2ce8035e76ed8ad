package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.LoadDirection;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.LogTimeResult;
import org.oedometry.fitting.RootTimeResult;

class IncrementReportTest {

  private static final IncrementReport ROW = ReductionFixtures.mixedReport().increments().get(1);

  @Test
  @DisplayName(
      "Accessors read the methods' own results: t50 log-time, t90 root-time, d0/d100 preferred")
  void accessorsReadTheResults() {
    LogTimeResult log = (LogTimeResult) ROW.estimate(CvMethod.LOG_TIME).orElseThrow();
    RootTimeResult root = (RootTimeResult) ROW.estimate(CvMethod.ROOT_TIME).orElseThrow();
    assertThat(ROW.preferredMethod()).contains(CvMethod.LOG_TIME);
    assertThat(ROW.t50()).hasValue(log.t50());
    assertThat(ROW.t90()).hasValue(root.t90());
    assertThat(ROW.d0()).hasValue(log.d0());
    assertThat(ROW.d100()).hasValue(log.d100());
    assertThat(ROW.preferredCv()).hasValue(log.cv());
    assertThat(ROW.primaryRatio()).isEqualTo(log.primaryRatio());
    assertThat(ROW.direction()).isEqualTo(LoadDirection.LOADING);
    assertThat(ROW.toString()).contains("preferred LOG_TIME");
  }

  @Test
  @DisplayName("A preferred method without a value is refused")
  void refusesAPreferredMethodWithoutValue() {
    assertThatThrownBy(
            () ->
                new IncrementReport(
                    ROW.index(),
                    ROW.stressBeforePascals(),
                    ROW.stressAfterPascals(),
                    ROW.heightAtStartMetres(),
                    ROW.heightAtEndMetres(),
                    ROW.drainagePath(),
                    List.of(),
                    Optional.of(CvMethod.LOG_TIME),
                    ROW.deformationBasis(),
                    ROW.compressibility(),
                    ROW.stressHistory(),
                    ROW.secondaryCompression(),
                    ROW.warnings()))
        .hasMessageContaining("preferred method LOG_TIME");
    assertThatThrownBy(
            () ->
                new IncrementReport(
                    -1,
                    ROW.stressBeforePascals(),
                    ROW.stressAfterPascals(),
                    ROW.heightAtStartMetres(),
                    ROW.heightAtEndMetres(),
                    ROW.drainagePath(),
                    ROW.methods(),
                    ROW.preferredMethod(),
                    ROW.deformationBasis(),
                    ROW.compressibility(),
                    ROW.stressHistory(),
                    ROW.secondaryCompression(),
                    ROW.warnings()))
        .hasMessageContaining("increment index (-1)");
  }
}
