package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.fitting.CvMethod;

class ReportUnitsTest {

  @Test
  @DisplayName(
      "Lab units [FACTS, exact]: 1 mm2/min = 0.52596 m2/yr (Julian year); 1 m2/MN = 1e-6 /Pa")
  void convertsToLabUnits() {
    double mm2PerMinute = 1e-6 / 60;
    assertThat(ReportUnits.squareMetresPerYear(mm2PerMinute)).isCloseTo(0.52596, within(5e-6));
    assertThat(ReportUnits.squareMetresPerMeganewton(1e-6)).isCloseTo(1.0, within(1e-15));
    assertThat(ReportUnits.kilopascals(12_500)).isEqualTo(12.5);
    assertThat(ReportUnits.minutes(90)).isEqualTo(1.5);
    assertThat(ReportUnits.millimetres(0.02)).isCloseTo(20.0, within(1e-12));
  }

  @Test
  @DisplayName("Each method has its own short column name")
  void shortNamesAreDistinct() {
    Set<String> names = new HashSet<>();
    for (CvMethod m : CvMethod.values()) {
      assertThat(names.add(ReportUnits.shortName(m))).isTrue();
    }
  }
}
