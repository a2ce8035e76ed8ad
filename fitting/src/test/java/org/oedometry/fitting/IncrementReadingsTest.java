package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;

class IncrementReadingsTest {

  @Test
  @DisplayName(
      "A scaled value in decimal beyond the double range: the same 4 significant digits and"
          + " power of 10 as java.math.BigDecimal's exact product with 2^exponent, for 2,000"
          + " random values and exponents up to +/-2,000")
  void decimalMatchesBigDecimal() {
    SplittableRandom random = new SplittableRandom(20261204L);
    MathContext four = new MathContext(4);
    for (int trial = 0; trial < 2000; trial++) {
      double scaled = random.nextDouble(-1e6, 1e6);
      int exponent = random.nextInt(-2000, 2001);
      // Independent reference: the exact product in java.math.BigDecimal, rounded to 4 digits.
      BigDecimal product =
          exponent >= 0
              ? new BigDecimal(scaled).multiply(BigDecimal.valueOf(2).pow(exponent))
              : new BigDecimal(scaled)
                  .divide(BigDecimal.valueOf(2).pow(-exponent), new MathContext(40));
      BigDecimal rounded = product.round(four);
      String text = IncrementReadings.decimal(scaled, exponent);
      int e = text.indexOf('e');
      BigDecimal mantissa = new BigDecimal(text.substring(0, e));
      int power = Integer.parseInt(text.substring(e + 1));
      // The last digit may differ by one: the text comes from double logarithms (common practice
      // for a message, not a result).
      BigDecimal difference = mantissa.scaleByPowerOfTen(power).subtract(rounded).abs();
      BigDecimal unit = BigDecimal.ONE.scaleByPowerOfTen(rounded.precision() - rounded.scale() - 4);
      assertThat(difference)
          .as("%s x 2^%d -> %s", scaled, exponent, text)
          .isLessThanOrEqualTo(unit);
    }
    assertThat(IncrementReadings.decimal(0, 5000)).isEqualTo("0");
  }

  @Test
  @DisplayName(
      "Back in metres: the value itself where it is a double (Double.toString, the same text as"
          + " the unscaled value), the decimal text where it lies beyond the range, and a"
          + " FitException, not an infinity, for a result beyond it")
  void backInMetres() {
    // 1.5 x 2^-1000 is a normal double, 1.5 x 2^1100 is not (IEEE 754 binary64: exponents up to
    // 1023).
    assertThat(IncrementReadings.metresText(1.5, -1000, "%s"))
        .isEqualTo(Double.toString(Math.scalb(1.5, -1000)));
    assertThat(IncrementReadings.metresText(1.5, 1100, "%s")).doesNotContain("Infinity");
    assertThat(IncrementReadings.inMetres(1.5, -1000, "d100", "m"))
        .isEqualTo(Math.scalb(1.5, -1000));
    assertThatThrownBy(() -> IncrementReadings.inMetres(1.5, 1100, "d100", "m"))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("d100")
        .hasMessageNotContaining("Infinity");
  }

  @Test
  @DisplayName(
      "The exponent brings the largest |movement| into [1, 2) (Math.getExponent, IEEE 754), and"
          + " the scaled movement times 2^exponent is the movement exactly")
  void exponentAndScaledMovement() {
    double[] t = {1, 2, 3, 4, 5};
    double[] d = {1e-300, 2e-300, 3e-300, 3.5e-300, 4e-300};
    IncrementReadings r = IncrementReadings.of(SettlementCurve.of(t, d), 0.01, 5, "test");
    int exponent = r.movementExponent();
    double[] scaled = r.scaledMovement(exponent);
    double largest = 0;
    for (int i = 0; i < d.length; i++) {
      largest = Math.max(largest, scaled[i]);
      assertThat(Math.scalb(scaled[i], exponent)).isEqualTo(d[i]);
    }
    assertThat(largest).isGreaterThanOrEqualTo(1).isLessThan(2);
  }
}
