package org.oedometry.examples.bench;

import java.util.concurrent.TimeUnit;
import org.oedometry.theory.Terzaghi;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * {@link Terzaghi} against the plain 100-term series ({@link PlainSeries}) in the same run, over
 * {@value #POINTS} time factors log-spaced in [10<sup>-6</sup>, 3] (and the U and Z values they map
 * to). Scores are ns per call (each invocation makes {@value #POINTS} calls).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
// Ten warm-up iterations: on 2 shared cores the optimising compiler reaches methods called once
// per increment late (see DEVELOPERS.md, Benchmarks).
@Warmup(iterations = 10, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
@State(Scope.Benchmark)
public class TerzaghiBenchmark {

  /** Points per invocation. */
  static final int POINTS = 256;

  private final double[] timeFactors = new double[POINTS];
  private final double[] degrees = new double[POINTS];
  private final double[] depths = new double[POINTS];

  /** Creates the inputs: T log-spaced over [1e-6, 3], U = U(T), Z spread over [0, 2]. */
  public TerzaghiBenchmark() {
    double low = Math.log10(1e-6);
    double high = Math.log10(3);
    for (int i = 0; i < POINTS; i++) {
      timeFactors[i] = Math.pow(10, low + (high - low) * i / (POINTS - 1));
      degrees[i] = Terzaghi.averageDegree(timeFactors[i]);
      depths[i] = 2.0 * ((i * 37) % POINTS) / POINTS;
    }
  }

  /**
   * Library U(T).
   *
   * @param sink consumes results
   */
  @Benchmark
  @OperationsPerInvocation(POINTS)
  public void averageDegree(Blackhole sink) {
    for (double t : timeFactors) {
      sink.consume(Terzaghi.averageDegree(t));
    }
  }

  /**
   * Baseline U(T), 100-term series.
   *
   * @param sink consumes results
   */
  @Benchmark
  @OperationsPerInvocation(POINTS)
  public void averageDegreeBaseline(Blackhole sink) {
    for (double t : timeFactors) {
      sink.consume(PlainSeries.averageDegree(t));
    }
  }

  /**
   * Library T(U).
   *
   * @param sink consumes results
   */
  @Benchmark
  @OperationsPerInvocation(POINTS)
  public void timeFactor(Blackhole sink) {
    for (double u : degrees) {
      sink.consume(Terzaghi.timeFactor(u));
    }
  }

  /**
   * Baseline T(U), Newton on the 100-term series.
   *
   * @param sink consumes results
   */
  @Benchmark
  @OperationsPerInvocation(POINTS)
  public void timeFactorBaseline(Blackhole sink) {
    for (double u : degrees) {
      sink.consume(PlainSeries.timeFactor(u));
    }
  }

  /**
   * Library u/u0(Z, T).
   *
   * @param sink consumes results
   */
  @Benchmark
  @OperationsPerInvocation(POINTS)
  public void porePressureRatio(Blackhole sink) {
    for (int i = 0; i < POINTS; i++) {
      sink.consume(Terzaghi.porePressureRatio(depths[i], timeFactors[i]));
    }
  }

  /**
   * Baseline u/u0(Z, T), 100-term series.
   *
   * @param sink consumes results
   */
  @Benchmark
  @OperationsPerInvocation(POINTS)
  public void porePressureRatioBaseline(Blackhole sink) {
    for (int i = 0; i < POINTS; i++) {
      sink.consume(PlainSeries.porePressureRatio(depths[i], timeFactors[i]));
    }
  }
}
