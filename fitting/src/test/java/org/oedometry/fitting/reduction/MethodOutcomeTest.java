package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.compressibility.Derived;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;

class MethodOutcomeTest {

  @Test
  @DisplayName("An outcome holds either an estimate of its own method or a reason, never both")
  void holdsEstimateOrReason() {
    CvEstimate log =
        ReductionFixtures.mixedReport()
            .increments()
            .get(0)
            .estimate(CvMethod.LOG_TIME)
            .orElseThrow();
    MethodOutcome ok = new MethodOutcome(CvMethod.LOG_TIME, Optional.of(log), "", Derived.of(1e-9));
    assertThat(ok.cv()).hasValue(log.cv());
    MethodOutcome none =
        new MethodOutcome(CvMethod.ASAOKA, Optional.empty(), "too few", Derived.absent("no c_v"));
    assertThat(none.cv()).isEmpty();
    assertThatThrownBy(
            () -> new MethodOutcome(CvMethod.LOG_TIME, Optional.of(log), "why", Derived.of(1.0)))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(
            () -> new MethodOutcome(CvMethod.LOG_TIME, Optional.empty(), "", Derived.of(1.0)))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(
            () -> new MethodOutcome(CvMethod.ROOT_TIME, Optional.of(log), "", Derived.of(1.0)))
        .hasMessageContaining("estimate of LOG_TIME given as the outcome of ROOT_TIME");
  }
}
