package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

import java.util.OptionalDouble;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class IncrementCompressibilityTest {

  @Test
  @DisplayName(
      "Regression: void ratios near the top of the double range (1.5e308 and 1.4e308): the mean"
          + " void ratio is their mean, 1.45e308, not an overflow of their sum")
  void meanOfHugeVoidRatios() {
    IncrementCompressibility increment =
        new IncrementCompressibility(
            1,
            1e5,
            2e5,
            1.5e308,
            1.4e308,
            0.1,
            1e303,
            1e-5,
            OptionalDouble.empty(),
            1.5e5,
            OptionalDouble.empty(),
            IncrementClass.NORMALLY_CONSOLIDATED);
    assertThat(increment.meanVoidRatio()).isCloseTo(1.45e308, withinPercentage(1e-12));
  }
}
