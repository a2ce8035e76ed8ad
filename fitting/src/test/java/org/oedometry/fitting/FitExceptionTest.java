package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class FitExceptionTest {

  @Test
  void keepsReasonAndCause() {
    IllegalStateException cause = new IllegalStateException("singular matrix");
    FitException e = new FitException("no inflection on the log-time curve", cause);
    assertThat(e).hasMessage("no inflection on the log-time curve").hasCause(cause);
    assertThat(new FitException("t50 lies after the last reading"))
        .isInstanceOf(RuntimeException.class)
        .hasMessage("t50 lies after the last reading");
  }

  @Test
  void rejectsBlankReason() {
    assertThatThrownBy(() -> new FitException(" "))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("reason of a FitException must not be blank");
    assertThatThrownBy(() -> new FitException(null, new RuntimeException()))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
