package org.oedometry.examples.bench;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.FullCurveMethod;
import org.oedometry.fitting.FullCurveResult;
import org.oedometry.fitting.LogTimeMethod;
import org.oedometry.fitting.LogTimeResult;
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
import org.openjdk.jmh.annotations.Warmup;

/**
 * How the cost of {@link FullCurveMethod} grows with the number of readings: one invented 24-hour
 * increment (as in {@link FullCurveBenchmark}) read by a data logger every 86.4 s, 8.64 s or 0.864
 * s (1,000, 10,000 or 100,000 readings), beside the log-time construction on the same readings as
 * the baseline of the same run. Scores are microseconds per fit.
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
public class FullCurveScalingBenchmark {

  private static final double YEAR = 365.25 * 86_400;
  private static final double DRAINAGE_PATH = 0.0095;

  /** Readings in 24 hours. */
  @Param({"1000", "10000", "100000"})
  public int readings;

  private SettlementCurve curve;

  /** Makes the increment. */
  @Setup(Level.Trial)
  public void setUp() {
    double[] times = new double[readings];
    double[] settlements = new double[readings];
    CurveParameters truth = CurveParameters.of(0.015e-3, 0.5e-3, 1.5 / YEAR, 0.02e-3);
    ConsolidationCurveModel model = ConsolidationCurveModel.of(DRAINAGE_PATH);
    SplittableRandom random = new SplittableRandom(42);
    for (int i = 0; i < readings; i++) {
      times[i] = 86_400.0 * (i + 1) / readings;
      settlements[i] = model.settlement(times[i], truth) + 1e-6 * random.nextGaussian();
    }
    curve = SettlementCurve.of(times, settlements);
  }

  /**
   * The whole full-curve method.
   *
   * @return the fit
   */
  @Benchmark
  public FullCurveResult fullCurveFit() {
    return FullCurveMethod.fit(curve, DRAINAGE_PATH);
  }

  /**
   * Baseline: the log-time construction on the same readings.
   *
   * @return the construction
   */
  @Benchmark
  public LogTimeResult logTimeConstruction() {
    return LogTimeMethod.fit(curve, DRAINAGE_PATH);
  }
}
