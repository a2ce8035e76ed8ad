package org.oedometry.examples.bench;

import java.util.concurrent.TimeUnit;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.EarlySlopeMethod;
import org.oedometry.fitting.EarlySlopeResult;
import org.oedometry.fitting.InflectionPointMethod;
import org.oedometry.fitting.InflectionPointResult;
import org.oedometry.fitting.LogTimeMethod;
import org.oedometry.fitting.LogTimeResult;
import org.oedometry.fitting.MethodComparison;
import org.oedometry.fitting.RectangularHyperbolaMethod;
import org.oedometry.fitting.RectangularHyperbolaResult;
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
import org.openjdk.jmh.annotations.Warmup;

/**
 * The further c<sub>v</sub> methods (inflection point, rectangular hyperbola, early slope) and the
 * comparison of every method ({@link MethodComparison}, which runs all seven and records the
 * refusals: Asaoka's method refuses the lab schedule) on the increments of {@link
 * FullCurveBenchmark} (invented: 14 lab readings, or a reading every 10 s for 24 h, 1 micrometre of
 * seeded noise), beside the log-time construction on the same readings as the baseline of the same
 * run. Scores are microseconds per call. Warm-up as in {@link FullCurveBenchmark}, one fork.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 10, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
@State(Scope.Benchmark)
public class FurtherMethodsBenchmark {

  private static final double DRAINAGE_PATH = BenchmarkIncrement.DRAINAGE_PATH;

  /** Readings per increment: 14 (lab schedule) or 8640 (data logger). */
  @Param({"14", "8640"})
  public int readings;

  private SettlementCurve curve;

  /** Makes the increment ({@link BenchmarkIncrement}, as in {@link FullCurveBenchmark}). */
  @Setup(Level.Trial)
  public void setUp() {
    curve = BenchmarkIncrement.curve(readings);
  }

  /**
   * Baseline: the log-time construction.
   *
   * @return the construction
   */
  @Benchmark
  public LogTimeResult logTimeConstruction() {
    return LogTimeMethod.fit(curve, DRAINAGE_PATH);
  }

  /**
   * The inflection point method.
   *
   * @return the result
   */
  @Benchmark
  public InflectionPointResult inflectionPoint() {
    return InflectionPointMethod.fit(curve, DRAINAGE_PATH);
  }

  /**
   * The rectangular hyperbola method.
   *
   * @return the result
   */
  @Benchmark
  public RectangularHyperbolaResult rectangularHyperbola() {
    return RectangularHyperbolaMethod.fit(curve, DRAINAGE_PATH);
  }

  /**
   * The early-slope method.
   *
   * @return the result
   */
  @Benchmark
  public EarlySlopeResult earlySlope() {
    return EarlySlopeMethod.fit(curve, DRAINAGE_PATH);
  }

  /**
   * Every c<sub>v</sub> method on the increment, refusals recorded.
   *
   * @return the comparison
   */
  @Benchmark
  public MethodComparison allMethods() {
    return MethodComparison.of(curve, DRAINAGE_PATH);
  }
}
