package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class SecondaryCompressionTest {

  @Test
  @DisplayName(
      "C_alpha_eps = C_alpha_e / (1 + e_p) equals settlement per cycle / H_p (two independent"
          + " formulas, FACTS: secondary)")
  void twoFormulasAgree() {
    // Invented specimen: H0 = 20 mm, e0 = 1.2; end of primary after 2.4 mm; 0.05 mm per cycle.
    SpecimenPhases p = SpecimenPhases.fromInitialVoidRatio(0.020, 1.2);
    double ep = p.voidRatio(0.0024);
    SecondaryCompressionResult r = SecondaryCompression.of(0.05e-3, p.solidsHeight(), ep);
    assertThat(r.modifiedSecondaryCompressionIndex())
        .isCloseTo(0.05e-3 / (0.020 - 0.0024), within(1e-15));
    // C_alpha_e = -de/dlog t: e falls by (1 + e0) ds / H0 per cycle.
    assertThat(r.secondaryCompressionIndex()).isCloseTo(2.2 * 0.05e-3 / 0.020, within(1e-15));
    assertThat(r.mesriRatio().isPresent()).isFalse();
    assertThat(r.mesriRatio().absenceReason()).isEqualTo("no compression index given");
  }

  @Test
  @DisplayName(
      "Mesri's C_alpha / C_c inside 0.03..0.07 [Mesri and Castro 1987, from memory]: no warning")
  void mesriRatioTypical() {
    SecondaryCompressionResult r = SecondaryCompression.of(0.1e-3, 0.01, 1.0, 0.25);
    assertThat(r.mesriRatio().value().orElseThrow()).isCloseTo(0.04, within(1e-15));
    assertThat(r.warnings()).isEmpty();
  }

  @Test
  @DisplayName("Mesri's ratio outside the typical range: a warning, not an error")
  void mesriRatioUnusual() {
    SecondaryCompressionResult r = SecondaryCompression.of(0.1e-3, 0.01, 1.0, 0.05);
    assertThat(r.mesriRatio().value().orElseThrow()).isCloseTo(0.2, within(1e-15));
    assertThat(r.warnings())
        .extracting(CompressibilityWarning::kind)
        .containsExactly(WarningKind.OUTSIDE_TYPICAL_RANGE);
  }

  @Test
  @DisplayName("No secondary compression or a non-positive C_c: ratio absent with a reason")
  void ratioAbsent() {
    assertThat(SecondaryCompression.of(0, 0.01, 1.0, 0.3).mesriRatio().absenceReason())
        .startsWith("the secondary compression index (0.0) is not positive");
    assertThat(SecondaryCompression.of(1e-5, 0.01, 1.0, 0).mesriRatio().absenceReason())
        .startsWith("the compression index (0.0) is not positive");
  }

  @Test
  @DisplayName("Bad input: messages name the field and the value")
  void badInput() {
    assertThatThrownBy(() -> SecondaryCompression.of(Double.NaN, 0.01, 1.0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("settlement per log cycle (NaN m) must be finite");
    assertThatThrownBy(() -> SecondaryCompression.of(1e-5, 0, 1.0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("height of solids (0.0 m) must be finite and > 0");
    assertThatThrownBy(() -> SecondaryCompression.of(1e-5, 0.01, 1.0, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("compression index (NaN) must be finite");
  }

  @Test
  @DisplayName(
      "Regression: C_alpha_e = 1 m per cycle over a height of solids of 1e-310 m is beyond the"
          + " double range: an IllegalArgumentException naming both numbers, not 'Infinity'")
  void indexBeyondTheDoubleRange() {
    assertThatThrownBy(() -> SecondaryCompression.of(1.0, 1e-310, 1.0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "the secondary compression index from 1.0 m per log cycle over a height of solids of"
                + " 1.0E-310 m is beyond the double range");
  }
}
