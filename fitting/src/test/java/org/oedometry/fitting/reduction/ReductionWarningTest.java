package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FitWarning;

class ReductionWarningTest {

  @Test
  @DisplayName("The message names the method that raised the warning, if any")
  void messageNamesItsSource() {
    FitWarning w = new FitWarning(FitWarning.Kind.FEW_EARLY_READINGS, "d0 rests on 1 pair");
    assertThat(new ReductionWarning(Optional.of(CvMethod.LOG_TIME), w).message())
        .isEqualTo("log-time (Casagrande): d0 rests on 1 pair");
    ReductionWarning own = new ReductionWarning(Optional.empty(), w);
    assertThat(own.message()).isEqualTo("d0 rests on 1 pair");
    assertThat(own.kind()).isEqualTo(FitWarning.Kind.FEW_EARLY_READINGS);
  }
}
