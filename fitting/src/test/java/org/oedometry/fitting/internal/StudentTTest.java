package org.oedometry.fitting.internal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * {@link StudentT} against a 25-digit table made with mpmath (the generator {@code
 * student_t_quantiles.py} beside the table in the test resources: the regularized incomplete beta
 * function of mpmath at 50 digits), against the closed forms of 1 and 2 degrees of freedom, and a
 * printed table.
 */
class StudentTTest {

  /** One row of the mpmath table. */
  private record Row(
      int freedom,
      double probability,
      double quantile,
      double quantileDouble,
      double upperTail,
      double centralHalf) {}

  private static List<Row> table() throws IOException {
    List<String> lines =
        Files.readAllLines(
            Path.of("src/test/resources/org/oedometry/fitting/student-t-quantiles.csv"),
            StandardCharsets.UTF_8);
    return lines.subList(1, lines.size()).stream()
        .map(line -> line.split(","))
        .map(
            f ->
                new Row(
                    Integer.parseInt(f[0]),
                    Double.parseDouble(f[1]),
                    Double.parseDouble(f[2]),
                    Double.parseDouble(f[3]),
                    Double.parseDouble(f[4]),
                    Double.parseDouble(f[5])))
        .toList();
  }

  @Test
  @DisplayName(
      "Quantiles within 1e-13 relative of the 25-digit mpmath table: 20 degrees of freedom from 1"
          + " to 100 000, P from 1/2 + 1e-7 to 1 - 1e-14 [mpmath]")
  void quantilesMatchTheTable() throws IOException {
    List<Row> rows = table();
    assertThat(rows).hasSize(220);
    for (Row r : rows) {
      assertThat(StudentT.quantile(r.probability(), r.freedom()))
          .as("P = %s, %d degrees of freedom", r.probability(), r.freedom())
          .isCloseTo(r.quantile(), within(1e-13 * r.quantile()));
    }
  }

  @Test
  @DisplayName(
      "Upper tail and central half within 5e-14 relative of the mpmath table at each tabled"
          + " quantile up to 100 degrees of freedom (the closed forms), 1e-12 up to 1000 and 5e-11"
          + " beyond (Commons Math's incomplete beta function) [mpmath]")
  void halvesMatchTheTable() throws IOException {
    for (Row r : table()) {
      // Beyond the closed forms, the accuracy of Commons Math's continued fraction (measured
      // when this class was written: 1.8e-14 at most below 100 degrees of freedom, 2e-12 at
      // 8,636, 3e-11 at 100,000).
      double tolerance =
          r.freedom() <= StudentT.CLOSED_FORM_LIMIT ? 5e-14 : r.freedom() <= 1000 ? 1e-12 : 5e-11;
      assertThat(StudentT.upperTail(r.quantileDouble(), r.freedom()))
          .as("Q at %s, %d degrees of freedom", r.quantileDouble(), r.freedom())
          .isCloseTo(r.upperTail(), within(tolerance * r.upperTail()));
      assertThat(StudentT.centralHalf(r.quantileDouble(), r.freedom()))
          .as("F - 1/2 at %s, %d degrees of freedom", r.quantileDouble(), r.freedom())
          .isCloseTo(r.centralHalf(), within(tolerance * r.centralHalf()));
    }
  }

  @Test
  @DisplayName(
      "Closed forms: 1 degree of freedom (Cauchy) Q = atan(1/t)/pi and t(P) = 1/tan(pi (1 - P));"
          + " 2 degrees Q = 1/(r (r + t)) with r = sqrt(2 + t^2) and t(P) = (1 - 2q)/sqrt(2q(1 -"
          + " q)), q = 1 - P [Johnson, Kotz & Balakrishnan, Continuous Univariate Distributions"
          + " vol. 2, ch. 28, from memory; the tail forms rearranged by hand]")
  void closedFormsOfOneAndTwoDegrees() {
    for (double t : new double[] {1e-9, 0.01, 0.5, 1, 3, 50, 1e4, 1e9, 1e15}) {
      double cauchy = Math.atan(1 / t) / Math.PI;
      // A few units in the last place: both sides round.
      assertThat(StudentT.upperTail(t, 1)).isCloseTo(cauchy, within(1e-15 * cauchy));
      double r = Math.sqrt(2 + t * t);
      double two = 1 / (r * (r + t));
      assertThat(StudentT.upperTail(t, 2)).isCloseTo(two, within(1e-15 * two));
    }
    for (double q : new double[] {0.4, 0.1, 0.025, 1e-3, 1e-6, 1e-10, 1e-15}) {
      double p = 1 - q;
      double exactQ = 1 - p;
      double cauchy = 1 / Math.tan(Math.PI * exactQ);
      assertThat(StudentT.quantile(p, 1)).isCloseTo(cauchy, within(1e-14 * cauchy));
      double two = (1 - 2 * exactQ) / Math.sqrt(2 * exactQ * (1 - exactQ));
      assertThat(StudentT.quantile(p, 2)).isCloseTo(two, within(1e-14 * two));
    }
  }

  @Test
  @DisplayName(
      "The printed table t(0.975) = 12.706, 4.303, 2.571, 2.228, 2.042, 1.980 for 1, 2, 5, 10,"
          + " 30, 120 degrees of freedom [NIST/SEMATECH e-Handbook 1.3.6.7.2, from memory]")
  void printedTable() {
    int[] freedom = {1, 2, 5, 10, 30, 120};
    double[] printed = {12.706, 4.303, 2.571, 2.228, 2.042, 1.980};
    for (int k = 0; k < freedom.length; k++) {
      assertThat(StudentT.quantile(0.975, freedom[k])).isCloseTo(printed[k], within(5e-4));
    }
  }

  @Test
  @DisplayName(
      "Properties on 1 to 1,200 degrees of freedom: the two halves add to 1/2; Q falls and F - 1/2"
          + " rises as t grows;"
          + " the quantile gives back its probability (the tail for P >= 3/4, F - 1/2 below,"
          + " to 1e-13 relative up to 100 degrees of freedom and 1e-12 beyond)")
  void halvesAndQuantileAgree() {
    qt().withFixedSeed(20_261_202L)
        .withExamples(3_000)
        .forAll(integers().between(1, 1_200), doubles().between(-16, 2))
        .checkAssert(
            (freedom, logT) -> {
              double t = Math.pow(10, logT);
              double upper = StudentT.upperTail(t, freedom);
              double central = StudentT.centralHalf(t, freedom);
              // Each half carries its own rounding, some units in the last place of 1/2.
              assertThat(upper + central).isCloseTo(0.5, within(2e-15));
              // Each half moves strictly where it is small (elsewhere the change of 1/2 minus a
              // small value may lie below an ulp of 1/2), and never the wrong way.
              double upperLater = StudentT.upperTail(t * 1.001, freedom);
              double centralLater = StudentT.centralHalf(t * 1.001, freedom);
              assertThat(upperLater).isLessThanOrEqualTo(upper);
              assertThat(centralLater).isGreaterThanOrEqualTo(central);
              if (upper < 0.25 && upper > 0) {
                assertThat(upperLater).isLessThan(upper);
              }
              if (central < 0.25) {
                assertThat(centralLater).isGreaterThan(central);
              }
              // A probability from the central half (its tail comes out in the subtraction).
              double p = 0.5 + central;
              // The halves' own accuracy (see halvesMatchTheTable).
              double tolerance = freedom <= StudentT.CLOSED_FORM_LIMIT ? 1e-13 : 1e-12;
              if (p > 0.5 && p < 1) {
                double back = StudentT.quantile(p, freedom);
                if (p >= 0.75) {
                  double q = 1 - p;
                  assertThat(StudentT.upperTail(back, freedom)).isCloseTo(q, within(tolerance * q));
                } else {
                  double half = p - 0.5;
                  assertThat(StudentT.centralHalf(back, freedom))
                      .isCloseTo(half, within(tolerance * half));
                }
              }
            });
  }

  @Test
  @DisplayName("Bad arguments name the argument and its value")
  void badArguments() {
    assertThatThrownBy(() -> StudentT.upperTail(-1, 3))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("t must be >= 0")
        .hasMessageContaining("-1");
    assertThatThrownBy(() -> StudentT.centralHalf(Double.NaN, 3))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("NaN");
    assertThatThrownBy(() -> StudentT.upperTail(1, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("degrees of freedom")
        .hasMessageContaining("0");
    for (double p : new double[] {0.5, 1, 0.2, Double.NaN}) {
      assertThatThrownBy(() -> StudentT.quantile(p, 3))
          .isInstanceOf(IllegalArgumentException.class)
          .hasMessageContaining("probability")
          .hasMessageContaining(String.valueOf(p));
    }
    assertThatThrownBy(() -> StudentT.quantile(0.9, -2))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("-2");
  }
}
