package org.oedometry.examples.bench;

import java.util.concurrent.TimeUnit;
import org.apache.commons.math3.distribution.TDistribution;
import org.oedometry.fitting.internal.StudentT;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The Student t quantiles a fit asks for ({@code StudentT.quantile}, internal to {@code fitting})
 * against Commons Math's {@link TDistribution#inverseCumulativeProbability} in the same run: the
 * full-curve interval's P = 0.975 and the outlier bound's P = 1 - 0.01/(2n), at the degrees of
 * freedom of a 14-reading fit (10), of a 104-reading one (100, the last of the closed forms) and of
 * a 504-reading one (500, Commons Math's incomplete beta function inside). Scores are ns per
 * quantile.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 10, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
@State(Scope.Benchmark)
public class StudentQuantileBenchmark {

  /** Degrees of freedom. */
  @Param({"10", "100", "500"})
  public int freedom;

  /** The probability: the interval's 0.975, or the outlier bound's 1 - 0.01/(2 (freedom + 4)). */
  @Param({"interval", "outlier"})
  public String use;

  private double probability;
  private TDistribution commons;

  /** Makes the probability and the Commons Math distribution (made once, as a caller would). */
  @Setup
  public void setUp() {
    probability = use.equals("interval") ? 0.975 : 1 - 0.01 / (2.0 * (freedom + 4));
    commons = new TDistribution(null, freedom);
  }

  /**
   * The library's quantile.
   *
   * @return t
   */
  @Benchmark
  public double library() {
    return StudentT.quantile(probability, freedom);
  }

  /**
   * Baseline: Commons Math's inverse (bracketing search on its distribution function).
   *
   * @return t
   */
  @Benchmark
  public double commonsMath() {
    return commons.inverseCumulativeProbability(probability);
  }
}
