package org.oedometry.fitting.internal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.oedometry.fitting.FitException;

/**
 * The least-squares machinery against the certified results of the NIST StRD nonlinear regression
 * datasets (files unchanged under test resources, nist/): parameters to 6 significant digits,
 * standard deviations to 4, residual sum of squares to 6, from both NIST starting points.
 */
class WeightedLeastSquaresTest {

  /** A NIST StRD file: data, both starts, certified values. */
  record Dataset(
      String name,
      double[] x,
      double[] y,
      double[][] starts,
      double[] certified,
      double[] certifiedDeviation,
      double certifiedResidualSumOfSquares) {

    static Dataset load(String name) throws IOException {
      String text;
      try (InputStream in =
          WeightedLeastSquaresTest.class.getResourceAsStream("nist/" + name + ".dat")) {
        text = new String(in.readAllBytes(), StandardCharsets.US_ASCII);
      }
      Pattern parameter =
          Pattern.compile(
              "^\\s*b(\\d+)\\s*=\\s*(\\S+)\\s+(\\S+)\\s+(\\S+)\\s+(\\S+)\\s*$", Pattern.MULTILINE);
      Matcher m = parameter.matcher(text);
      List<double[]> rows = new ArrayList<>();
      while (m.find()) {
        rows.add(
            new double[] {
              Double.parseDouble(m.group(2)),
              Double.parseDouble(m.group(3)),
              Double.parseDouble(m.group(4)),
              Double.parseDouble(m.group(5))
            });
      }
      int p = rows.size();
      double[][] starts = new double[2][p];
      double[] certified = new double[p];
      double[] deviation = new double[p];
      for (int j = 0; j < p; j++) {
        starts[0][j] = rows.get(j)[0];
        starts[1][j] = rows.get(j)[1];
        certified[j] = rows.get(j)[2];
        deviation[j] = rows.get(j)[3];
      }
      Matcher rss = Pattern.compile("Residual Sum of Squares:\\s+(\\S+)").matcher(text);
      assertThat(rss.find()).isTrue();
      double residualSum = Double.parseDouble(rss.group(1));
      // Data follow the second line that starts with "Data:" (the column header line).
      String[] lines = text.split("\\R");
      int dataHeader = -1;
      for (int i = 0, seen = 0; i < lines.length; i++) {
        if (lines[i].startsWith("Data:") && ++seen == 2) {
          dataHeader = i;
        }
      }
      List<double[]> data = new ArrayList<>();
      for (int i = dataHeader + 1; i < lines.length; i++) {
        String[] cells = lines[i].trim().split("\\s+");
        if (cells.length == 2) {
          data.add(new double[] {Double.parseDouble(cells[0]), Double.parseDouble(cells[1])});
        }
      }
      double[] x = new double[data.size()];
      double[] y = new double[data.size()];
      for (int i = 0; i < data.size(); i++) {
        y[i] = data.get(i)[0];
        x[i] = data.get(i)[1];
      }
      return new Dataset(name, x, y, starts, certified, deviation, residualSum);
    }
  }

  /** The NIST models with their analytic gradients (from the model formulas in each file). */
  static WeightedLeastSquares.Model model(Dataset d) {
    return pointModel(d).asModel();
  }

  static WeightedLeastSquares.PointModel pointModel(Dataset d) {
    double[] x = d.x();
    return switch (d.name()) {
      case "Misra1a", "BoxBOD" ->
          (i, b, g) -> {
            double e = Math.exp(-b[1] * x[i]);
            g[0] = 1 - e;
            g[1] = b[0] * x[i] * e;
            return b[0] * (1 - e);
          };
      case "Misra1c" ->
          (i, b, g) -> {
            double base = 1 + 2 * b[1] * x[i];
            double inverseRoot = 1 / Math.sqrt(base);
            g[0] = 1 - inverseRoot;
            g[1] = b[0] * x[i] * inverseRoot / base;
            return b[0] * (1 - inverseRoot);
          };
      case "Chwirut2" ->
          (i, b, g) -> {
            double e = Math.exp(-b[0] * x[i]);
            double den = b[1] + b[2] * x[i];
            g[0] = -x[i] * e / den;
            g[1] = -e / (den * den);
            g[2] = -x[i] * e / (den * den);
            return e / den;
          };
      case "DanWood" ->
          (i, b, g) -> {
            double power = Math.pow(x[i], b[1]);
            g[0] = power;
            g[1] = b[0] * power * Math.log(x[i]);
            return b[0] * power;
          };
      case "Thurber" ->
          (i, b, g) -> {
            double t = x[i];
            double num = b[0] + b[1] * t + b[2] * t * t + b[3] * t * t * t;
            double den = 1 + b[4] * t + b[5] * t * t + b[6] * t * t * t;
            g[0] = 1 / den;
            g[1] = t / den;
            g[2] = t * t / den;
            g[3] = t * t * t / den;
            double q = num / (den * den);
            g[4] = -t * q;
            g[5] = -t * t * q;
            g[6] = -t * t * t * q;
            return num / den;
          };
      case "Rat43" ->
          (i, b, g) -> {
            double e = Math.exp(b[1] - b[2] * x[i]);
            double base = 1 + e;
            double value = b[0] / Math.pow(base, 1 / b[3]);
            g[0] = value / b[0];
            g[1] = -value * e / (b[3] * base);
            g[2] = value * x[i] * e / (b[3] * base);
            g[3] = value * Math.log(base) / (b[3] * b[3]);
            return value;
          };
      case "MGH09" ->
          (i, b, g) -> {
            double t = x[i];
            double num = t * t + t * b[1];
            double den = t * t + t * b[2] + b[3];
            g[0] = num / den;
            g[1] = b[0] * t / den;
            g[2] = -b[0] * num * t / (den * den);
            g[3] = -b[0] * num / (den * den);
            return b[0] * num / den;
          };
      case "Eckerle4" ->
          (i, b, g) -> {
            double z = (x[i] - b[2]) / b[1];
            double e = Math.exp(-0.5 * z * z);
            double value = b[0] / b[1] * e;
            g[0] = e / b[1];
            g[1] = -value / b[1] + value * z * z / b[1];
            g[2] = value * z / b[1];
            return value;
          };
      default -> throw new IllegalArgumentException(d.name());
    };
  }

  private static void assertSignificant(double actual, double certified, int digits, String what) {
    assertThat(actual)
        .as("%s: %s against certified %s", what, actual, certified)
        .isCloseTo(certified, within(Math.abs(certified) * 0.5 * Math.pow(10, 1 - digits)));
  }

  /** The NIST datasets with both certified starts (BoxBOD start 1: see boxBodFromFirstStart). */
  static Stream<Arguments> nistCases() {
    Stream.Builder<Arguments> cases = Stream.builder();
    for (String name :
        List.of(
            "Misra1a",
            "Chwirut2",
            "DanWood",
            "BoxBOD",
            "Thurber",
            "Rat43",
            "Misra1c",
            "Eckerle4",
            "MGH09")) {
      for (int start = 1; start <= 2; start++) {
        if (!(name.equals("BoxBOD") && start == 1)) {
          cases.add(Arguments.of(name, start));
        }
      }
    }
    return cases.build();
  }

  @ParameterizedTest(name = "{0}, start {1}")
  @DisplayName(
      "Streamed (normal-equation) solver: NIST StRD certified parameters (6 digits), standard"
          + " deviations (4 digits) and residual sum of squares (6 digits) [NIST StRD]")
  @MethodSource("nistCases")
  void streamedReproducesCertifiedResults(String name, int start) throws IOException {
    Dataset d = Dataset.load(name);
    WeightedLeastSquares.Solution s =
        WeightedLeastSquares.withDefaults()
            .solveStreamed(pointModel(d), d.y(), unitWeights(d), d.starts()[start - 1], null);
    assertCertified(d, s);
  }

  @ParameterizedTest(name = "{0}, start {1}")
  @DisplayName(
      "NIST StRD certified parameters (6 digits), standard deviations (4 digits) and"
          + " residual sum of squares (6 digits) [NIST StRD]")
  @MethodSource("nistCases")
  void reproducesCertifiedResults(String name, int start) throws IOException {
    Dataset d = Dataset.load(name);
    WeightedLeastSquares.Solution s =
        WeightedLeastSquares.withDefaults()
            .solve(model(d), d.y(), unitWeights(d), d.starts()[start - 1], null);
    assertCertified(d, s);
  }

  @Test
  @DisplayName(
      "BoxBOD from NIST start 1 (b1 = 1, b2 = 1): the first step sends b2 to about"
          + " -845 and the model overflows; a clear FitException, not a wrong answer [NIST StRD]."
          + " With b2 kept positive by a parameter validator it reaches the certified values")
  void boxBodFromFirstStart() throws IOException {
    Dataset d = Dataset.load("BoxBOD");
    WeightedLeastSquares solver = WeightedLeastSquares.withDefaults();
    assertThatThrownBy(() -> solver.solve(model(d), d.y(), unitWeights(d), d.starts()[0], null))
        .isInstanceOf(FitException.class)
        .hasMessageStartingWith("the model gave a non-finite value (-Infinity) at observation 0");
  }

  private static double[] unitWeights(Dataset d) {
    double[] weights = new double[d.y().length];
    java.util.Arrays.fill(weights, 1.0);
    return weights;
  }

  private static void assertCertified(Dataset d, WeightedLeastSquares.Solution s) {
    String name = d.name();
    for (int j = 0; j < d.certified().length; j++) {
      assertSignificant(s.parameters()[j], d.certified()[j], 6, name + " b" + (j + 1));
      assertSignificant(
          s.standardErrors()[j], d.certifiedDeviation()[j], 4, name + " sd(b" + (j + 1) + ")");
    }
    assertSignificant(
        s.weightedResidualSumOfSquares(), d.certifiedResidualSumOfSquares(), 6, name + " RSS");
    double sum = 0;
    for (double r : s.residuals()) {
      sum += r * r;
    }
    assertThat(sum).isCloseTo(s.weightedResidualSumOfSquares(), within(1e-9 * sum));
  }

  @Test
  void rejectsBadInput() {
    WeightedLeastSquares solver = WeightedLeastSquares.withDefaults();
    WeightedLeastSquares.Model line =
        ((WeightedLeastSquares.PointModel)
                (i, b, g) -> {
                  g[0] = 1;
                  g[1] = i;
                  return b[0] + b[1] * i;
                })
            .asModel();
    double[] start = {0, 0};
    assertThatThrownBy(
            () -> solver.solve(line, new double[] {1, 2}, new double[] {1, 1}, start, null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "2 observations are too few for 2 parameters (need more observations than parameters)");
    assertThatThrownBy(
            () -> solver.solve(line, new double[] {1, 2, 3}, new double[] {1, 1}, start, null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("weights (2 values) and observations (3 values) must have the same length");
    assertThatThrownBy(
            () ->
                solver.solve(
                    line, new double[] {1, Double.NaN, 3}, new double[] {1, 1, 1}, start, null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("observation at index 1 (NaN) must be finite");
    assertThatThrownBy(
            () -> solver.solve(line, new double[] {1, 2, 3}, new double[] {1, 0, 1}, start, null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("weight at index 1 (0.0) must be finite and > 0");
    assertThatThrownBy(() -> solver.withTolerance(Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("relative tolerance (NaN) must be in [1e-15, 1e-3]");
    assertThatThrownBy(() -> solver.withMaxIterations(0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("maximum iterations (0) must be >= 1");
  }

  @Test
  @DisplayName(
      "Weights: a straight line with weights 1 and 4 gives the weighted normal-equation"
          + " solution [closed form, any statistics text]")
  void weightedLineMatchesClosedForm() {
    double[] x = {0, 1, 2, 3, 4};
    double[] y = {1.0, 2.9, 5.2, 6.8, 9.1};
    double[] w = {1, 4, 1, 4, 1};
    WeightedLeastSquares.Solution s =
        WeightedLeastSquares.withDefaults()
            .solve(
                ((WeightedLeastSquares.PointModel)
                        (i, b, g) -> {
                          g[0] = 1;
                          g[1] = x[i];
                          return b[0] + b[1] * x[i];
                        })
                    .asModel(),
                y,
                w,
                new double[] {0, 0},
                null);
    double sw = 0, swx = 0, swy = 0, swxx = 0, swxy = 0;
    for (int i = 0; i < x.length; i++) {
      sw += w[i];
      swx += w[i] * x[i];
      swy += w[i] * y[i];
      swxx += w[i] * x[i] * x[i];
      swxy += w[i] * x[i] * y[i];
    }
    double det = sw * swxx - swx * swx;
    double slope = (sw * swxy - swx * swy) / det;
    double intercept = (swxx * swy - swx * swxy) / det;
    assertThat(s.parameters()[1]).isCloseTo(slope, within(1e-12));
    assertThat(s.parameters()[0]).isCloseTo(intercept, within(1e-12));
    double chi = 0;
    for (int i = 0; i < x.length; i++) {
      double r = y[i] - intercept - slope * x[i];
      chi += w[i] * r * r;
    }
    // Standard error of the slope: sqrt(s^2 sw / det), s^2 = chi / (n - 2).
    assertThat(s.standardErrors()[1]).isCloseTo(Math.sqrt(chi / 3 * sw / det), within(1e-12));
  }

  @Test
  @DisplayName(
      "Equal-noise (sandwich) covariance of a weighted straight line: A^-1 B A^-1 times the"
          + " unweighted residual variance, computed here with Commons Math matrices; equal to the"
          + " plain covariance for unit weights [sandwich estimator, any regression text, from"
          + " memory]")
  void equalNoiseCovarianceOfWeightedLine() {
    double[] x = {0, 1, 2, 3, 4, 5};
    double[] y = {1.0, 2.9, 5.2, 6.8, 9.1, 11.2};
    double[] w = {1, 4, 1, 4, 1, 2};
    WeightedLeastSquares.PointModel line =
        (i, b, g) -> {
          g[0] = 1;
          g[1] = x[i];
          return b[0] + b[1] * x[i];
        };
    WeightedLeastSquares solver = WeightedLeastSquares.withDefaults();
    for (WeightedLeastSquares.Solution s :
        List.of(
            solver.solve(line.asModel(), y, w, new double[] {0, 0}, null),
            solver.solveStreamed(line, y, w, new double[] {0, 0}, null))) {
      double[][] design = new double[x.length][];
      double[] weightedSquares = new double[x.length];
      double sumSquares = 0;
      for (int i = 0; i < x.length; i++) {
        design[i] = new double[] {1, x[i]};
        double r = y[i] - s.parameters()[0] - s.parameters()[1] * x[i];
        sumSquares += r * r;
        weightedSquares[i] = w[i] * w[i];
      }
      RealMatrix j = MatrixUtils.createRealMatrix(design);
      RealMatrix a = j.transpose().multiply(MatrixUtils.createRealDiagonalMatrix(w)).multiply(j);
      RealMatrix b =
          j.transpose().multiply(MatrixUtils.createRealDiagonalMatrix(weightedSquares)).multiply(j);
      RealMatrix inverse = MatrixUtils.inverse(a);
      RealMatrix expected =
          inverse.multiply(b).multiply(inverse).scalarMultiply(sumSquares / (x.length - 2));
      for (int r = 0; r < 2; r++) {
        for (int c = 0; c < 2; c++) {
          assertThat(s.equalNoiseCovariance()[r][c])
              .isCloseTo(
                  expected.getEntry(r, c), within(1e-12 * Math.abs(expected.getEntry(r, c))));
        }
      }
    }
    double[] unit = new double[x.length];
    java.util.Arrays.fill(unit, 1.0);
    WeightedLeastSquares.Solution plain =
        solver.solveStreamed(line, y, unit, new double[] {0, 0}, null);
    for (int r = 0; r < 2; r++) {
      for (int c = 0; c < 2; c++) {
        assertThat(plain.equalNoiseCovariance()[r][c])
            .isCloseTo(
                plain.covariance()[r][c], within(1e-12 * Math.abs(plain.covariance()[r][c])));
      }
    }
  }

  @Test
  @DisplayName(
      "Streamed solver: the same optimum as the plain solver on a weighted 8,000-point exponential"
          + " decay to 1e-9 relative [the plain Commons Math Levenberg-Marquardt as reference]")
  void streamedMatchesPlainOnManyPoints() {
    int n = 8000;
    double[] x = new double[n];
    double[] y = new double[n];
    double[] w = new double[n];
    java.util.SplittableRandom random = new java.util.SplittableRandom(7);
    for (int i = 0; i < n; i++) {
      x[i] = 0.01 * i;
      y[i] = 3.0 * Math.exp(-0.7 * x[i]) + 0.5 + 0.01 * random.nextGaussian();
      w[i] = 1.0 + (i % 5);
    }
    WeightedLeastSquares.PointModel decay =
        (i, b, g) -> {
          double e = Math.exp(-b[1] * x[i]);
          g[0] = e;
          g[1] = -b[0] * x[i] * e;
          g[2] = 1;
          return b[0] * e + b[2];
        };
    double[] start = {1, 0.2, 0};
    WeightedLeastSquares solver = WeightedLeastSquares.withDefaults();
    WeightedLeastSquares.Solution plain = solver.solve(decay.asModel(), y, w, start, null);
    WeightedLeastSquares.Solution streamed = solver.solveStreamed(decay, y, w, start, null);
    for (int j = 0; j < 3; j++) {
      assertThat(streamed.parameters()[j])
          .isCloseTo(plain.parameters()[j], within(1e-9 * Math.abs(plain.parameters()[j])));
      assertThat(streamed.standardErrors()[j])
          .isCloseTo(plain.standardErrors()[j], within(1e-6 * plain.standardErrors()[j]));
    }
    assertThat(streamed.weightedResidualSumOfSquares())
        .isCloseTo(
            plain.weightedResidualSumOfSquares(),
            within(1e-12 * plain.weightedResidualSumOfSquares()));
    assertThat(streamed.residuals()).hasSize(n);
  }

  @Test
  @DisplayName("Streamed solver: unidentifiable parameters give a FitException, not NaN")
  void streamedSingular() {
    double[] y = {1, 2, 3, 4, 5};
    double[] w = {1, 1, 1, 1, 1};
    WeightedLeastSquares.PointModel twice =
        (i, b, g) -> {
          g[0] = 1;
          g[1] = 1;
          return b[0] + b[1];
        };
    assertThatThrownBy(
            () ->
                WeightedLeastSquares.withDefaults()
                    .solveStreamed(twice, y, w, new double[] {0, 0}, null))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("cannot all be determined");
  }

  /** The weighted exponential decay of {@link #streamedMatchesPlainOnManyPoints}, with noise. */
  private static double[][] decayData(int n, long seed) {
    double[] x = new double[n];
    double[] y = new double[n];
    double[] w = new double[n];
    java.util.SplittableRandom random = new java.util.SplittableRandom(seed);
    for (int i = 0; i < n; i++) {
      x[i] = 0.01 * i;
      y[i] = 3.0 * Math.exp(-0.7 * x[i]) + 0.5 + 0.01 * random.nextGaussian();
      w[i] = 1.0 + (i % 5);
    }
    return new double[][] {x, y, w};
  }

  private static WeightedLeastSquares.PointModel decayModel(double[] x) {
    return (i, b, g) -> {
      double e = Math.exp(-b[1] * x[i]);
      g[0] = e;
      g[1] = -b[0] * x[i] * e;
      g[2] = 1;
      return b[0] * e + b[2];
    };
  }

  @Test
  @DisplayName(
      "Refinement: from one standard error away it ends within 0.01 standard errors of the"
          + " Levenberg-Marquardt optimum; at the optimum it accepts the start after one pass"
          + " [the plain Commons Math Levenberg-Marquardt as reference]")
  void refinementReachesTheOptimum() {
    double[][] data = decayData(5000, 11);
    WeightedLeastSquares.PointModel decay = decayModel(data[0]);
    WeightedLeastSquares solver = WeightedLeastSquares.withDefaults();
    WeightedLeastSquares.Solution plain =
        solver.solve(decay.asModel(), data[1], data[2], new double[] {1, 0.2, 0}, null);
    double[] errors = plain.standardErrors();
    double[] start = plain.parameters();
    for (int j = 0; j < 3; j++) {
      start[j] += (j == 1 ? -1 : 1) * errors[j];
    }
    WeightedLeastSquares.Solution refined =
        solver.refineStreamed(decay, data[1], data[2], start, null, 0.01);
    for (int j = 0; j < 3; j++) {
      assertThat(Math.abs(refined.parameters()[j] - plain.parameters()[j]))
          .as("parameter %d, in standard errors", j)
          .isLessThanOrEqualTo(0.01 * errors[j]);
    }
    assertThat(refined.evaluations()).isBetween(2, 1 + WeightedLeastSquares.MAX_NEWTON_STEPS);
    WeightedLeastSquares.Solution accepted =
        solver.refineStreamed(decay, data[1], data[2], plain.parameters(), null, 0.01);
    assertThat(accepted.evaluations()).isEqualTo(1);
    assertThat(accepted.iterations()).isZero();
    assertThat(accepted.parameters()).containsExactly(plain.parameters());
    assertThat(accepted.standardErrors()[1]).isCloseTo(errors[1], within(1e-6 * errors[1]));
  }

  @Test
  @DisplayName(
      "Refinement: a start far away or a step the validator changes hands over to"
          + " Levenberg-Marquardt, which reaches the same optimum [plain Commons Math"
          + " Levenberg-Marquardt as reference]")
  void refinementHandsOver() {
    double[][] data = decayData(3000, 12);
    WeightedLeastSquares.PointModel decay = decayModel(data[0]);
    WeightedLeastSquares solver = WeightedLeastSquares.withDefaults();
    WeightedLeastSquares.Solution plain =
        solver.solve(decay.asModel(), data[1], data[2], new double[] {1, 0.2, 0}, null);
    WeightedLeastSquares.Solution far =
        solver.refineStreamed(decay, data[1], data[2], new double[] {1, 0.2, 0}, null, 0.01);
    WeightedLeastSquares.Solution bounded =
        solver.refineStreamed(
            decay,
            data[1],
            data[2],
            new double[] {1, 0.2, 0},
            point -> {
              point.setEntry(1, Math.max(0.05, point.getEntry(1)));
              return point;
            },
            0.01);
    for (WeightedLeastSquares.Solution s : List.of(far, bounded)) {
      for (int j = 0; j < 3; j++) {
        assertThat(s.parameters()[j])
            .isCloseTo(plain.parameters()[j], within(0.01 * plain.standardErrors()[j]));
      }
    }
    assertThatThrownBy(
            () -> solver.refineStreamed(decay, data[1], data[2], new double[] {1, 1, 0}, null, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("standard error fraction (0.0) must be in (0, 1]");
  }

  @Test
  @DisplayName(
      "Regression: y = a (1 - exp(-b x)) on x = 1..6 with y near 1e155 (0.1 % noise) overflows"
          + " the Levenberg-Marquardt step to NaN parameters; a model that rejects them with its"
          + " own IllegalArgumentException (as CurveParameters does) no longer leaks it from inside"
          + " Commons Math: FitException, plain and streamed")
  void nonFiniteTrialParametersNeverReachTheModel() {
    double[] x = {1, 2, 3, 4, 5, 6};
    double[] y = new double[x.length];
    double[] weights = new double[x.length];
    for (int i = 0; i < x.length; i++) {
      y[i] = 1e155 * (1 - Math.exp(-x[i]) + (i % 2 == 0 ? 1e-3 : -1e-3));
      weights[i] = 1;
    }
    WeightedLeastSquares.PointModel model =
        (i, p, gradient) -> {
          if (!Double.isFinite(p[0]) || !Double.isFinite(p[1])) {
            throw new IllegalArgumentException("parameters must be finite");
          }
          double e = Math.exp(-p[1] * x[i]);
          gradient[0] = 1 - e;
          gradient[1] = p[0] * x[i] * e;
          return p[0] * (1 - e);
        };
    double[] start = {0.5e155, 2};
    WeightedLeastSquares solver = WeightedLeastSquares.withDefaults();
    assertThatThrownBy(() -> solver.solve(model.asModel(), y, weights, start, null))
        .isInstanceOf(FitException.class)
        .hasMessageStartingWith("the least-squares step overflowed");
    assertThatThrownBy(() -> solver.solveStreamed(model, y, weights, start, null))
        .isInstanceOf(FitException.class)
        .hasMessageStartingWith("the least-squares step overflowed");
  }
}
