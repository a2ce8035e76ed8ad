package org.oedometry.examples.bench;

import java.util.Arrays;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.FullCurveMethod;
import org.oedometry.fitting.FullCurveResult;
import org.oedometry.fitting.internal.WeightedLeastSquares;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * {@link FullCurveMethod} on a 14-reading lab increment and an 8,640-reading data-logger increment
 * (one reading per 10 s for 24 h), 1 micrometre of seeded noise; beside it, in the same run, the
 * Levenberg-Marquardt refinement alone from one fixed start with (a) the analytic Jacobian and the
 * fast U(T) of the library and (b) the baseline: central finite differences and the plain 100-term
 * series ({@link PlainSeries}). Scores are microseconds per fit.
 *
 * <p>Warm-up is 10 iterations of 2 s: a fit calls several methods once each with a loop over every
 * reading, and on a 2-core machine the optimising compiler reaches some of them only after 10 s or
 * more; with 3 warm-up iterations we measured up to twice the steady-state time.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 10, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(2)
@State(Scope.Benchmark)
public class FullCurveBenchmark {

  private static final double YEAR = 365.25 * 86_400;
  private static final double DRAINAGE_PATH = BenchmarkIncrement.DRAINAGE_PATH;

  /** Readings per increment: 14 (lab schedule) or 8640 (data logger). */
  @Param({"14", "8640"})
  public int readings;

  private SettlementCurve curve;
  private double[] times;
  private double[] settlements;
  private double[] weights;
  private double[] start;

  /** Makes the increment ({@link BenchmarkIncrement}) and the common start of the refinements. */
  @Setup(Level.Trial)
  public void setUp() {
    times = BenchmarkIncrement.times(readings);
    settlements = BenchmarkIncrement.settlements(times);
    curve = SettlementCurve.of(times, settlements);
    weights = new double[readings];
    Arrays.fill(weights, 1.0);
    start = new double[] {0.0, 0.4e-3, Math.log(1.0 / YEAR), 0.01e-3};
  }

  /**
   * The whole method: profile, multi-start, interval, warnings.
   *
   * @return the fit
   */
  @Benchmark
  public FullCurveResult fullCurveFit() {
    return FullCurveMethod.fit(curve, DRAINAGE_PATH);
  }

  /**
   * Refinement from a fixed start, analytic Jacobian and fast U(T).
   *
   * @return the solution
   */
  @Benchmark
  public WeightedLeastSquares.Solution refineAnalytic() {
    ConsolidationCurveModel model = ConsolidationCurveModel.of(DRAINAGE_PATH);
    return WeightedLeastSquares.withDefaults()
        .solve(
            (p, values, jacobian) -> {
              CurveParameters parameters = CurveParameters.of(p[0], p[1], Math.exp(p[2]), p[3]);
              for (int i = 0; i < values.length; i++) {
                values[i] = model.settlementAndGradient(times[i], parameters, jacobian[i]);
              }
            },
            settlements,
            weights,
            start,
            null);
  }

  /**
   * Refinement from the same start, analytic Jacobian and fast U(T), each evaluation one streamed
   * pass handed to Levenberg-Marquardt as p + 1 compressed rows ({@link
   * WeightedLeastSquares#solveStreamed}).
   *
   * @return the solution
   */
  @Benchmark
  public WeightedLeastSquares.Solution refineStreamed() {
    ConsolidationCurveModel model = ConsolidationCurveModel.of(DRAINAGE_PATH);
    // The curve's parameters are built once per pass (the solver passes one array per pass).
    double[][] builtFor = new double[1][];
    CurveParameters[] built = new CurveParameters[1];
    return WeightedLeastSquares.withDefaults()
        .solveStreamed(
            (i, p, gradient) -> {
              if (p != builtFor[0]) {
                builtFor[0] = p;
                built[0] = CurveParameters.of(p[0], p[1], Math.exp(p[2]), p[3]);
              }
              return model.settlementAndGradient(times[i], built[0], gradient);
            },
            settlements,
            weights,
            start,
            null);
  }

  /** Prints the iterations and evaluations of one run of each benchmark (JMH shows it). */
  @TearDown(Level.Trial)
  public void printCounts() {
    FullCurveResult whole = fullCurveFit();
    WeightedLeastSquares.Solution analytic = refineAnalytic();
    WeightedLeastSquares.Solution streamed = refineStreamed();
    WeightedLeastSquares.Solution baseline = refineBaseline();
    System.out.printf(
        Locale.ROOT,
        "%n%d readings: whole method %d iterations / %d evaluations (%d starts); refinement"
            + " analytic %d / %d, streamed %d / %d, baseline %d / %d%n",
        readings,
        whole.iterations(),
        whole.evaluations(),
        whole.starts(),
        analytic.iterations(),
        analytic.evaluations(),
        streamed.iterations(),
        streamed.evaluations(),
        baseline.iterations(),
        baseline.evaluations());
  }

  /**
   * Baseline refinement: central finite differences on the plain 100-term series.
   *
   * @return the solution
   */
  @Benchmark
  public WeightedLeastSquares.Solution refineBaseline() {
    return WeightedLeastSquares.withDefaults()
        .solve(
            (p, values, jacobian) -> {
              for (int i = 0; i < values.length; i++) {
                values[i] = plainModel(times[i], p);
                for (int j = 0; j < 4; j++) {
                  double step = 1e-6 * Math.max(Math.abs(p[j]), 1e-9);
                  double[] up = p.clone();
                  double[] down = p.clone();
                  up[j] += step;
                  down[j] -= step;
                  jacobian[i][j] =
                      (plainModel(times[i], up) - plainModel(times[i], down)) / (2 * step);
                }
              }
            },
            settlements,
            weights,
            start,
            null);
  }

  private static double plainModel(double seconds, double[] p) {
    double timeFactor = Math.exp(p[2]) * seconds / (DRAINAGE_PATH * DRAINAGE_PATH);
    return p[0]
        + p[1] * PlainSeries.averageDegree(timeFactor)
        + p[3] * Math.log10(1 + timeFactor / ConsolidationCurveModel.DEFAULT_SECONDARY_ONSET);
  }
}
