package org.oedometry.examples.bench;

import java.util.concurrent.TimeUnit;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.LogTimeMethod;
import org.oedometry.fitting.RootTimeMethod;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.fitting.synthetic.SyntheticIncrement;
import org.oedometry.fitting.synthetic.SyntheticReadings;
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
 * The log-time and root-time constructions on one invented increment (c<sub>v</sub> with T = 10 at
 * 24 h, H<sub>dr</sub> = 10 mm, primary 0.5 mm, 1 micrometre noise), ns per increment: 14 readings
 * on the usual lab schedule, and 1,000, 8,640 (one per 10 s for 24 h), 10,000 and 100,000 readings
 * equally spaced over 24 h. Baseline in the same run: one least-squares line of settlement against
 * log<sub>10</sub> t over all readings (a single linear pass), so the ratio shows whether the
 * constructions grow linearly with the readings.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
// Ten warm-up iterations: on 2 shared cores the optimising compiler reaches methods called once
// per increment late (see DEVELOPERS.md, Benchmarks).
@Warmup(iterations = 10, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
@State(Scope.Benchmark)
public class ConstructionBenchmark {

  /** Number of readings after t = 0 (14 means the usual lab schedule). */
  @Param({"14", "1000", "8640", "10000", "100000"})
  public int readings;

  private static final double DRAINAGE_PATH = 0.01;

  private SettlementCurve curve;
  private double[] times;
  private double[] settlements;

  /** Creates the benchmark; the curve is made in {@link #setUp()}. */
  public ConstructionBenchmark() {}

  /** Builds the invented curve for the current number of readings. */
  @Setup
  public void setUp() {
    double day = 86400.0;
    SyntheticIncrement model =
        SyntheticIncrement.terzaghi(
            0.5e-3, 10 * DRAINAGE_PATH * DRAINAGE_PATH / day, DRAINAGE_PATH);
    double[] schedule =
        readings == 14
            ? ReadingSchedules.usualLab()
            : ReadingSchedules.uniform(day / readings, day);
    SyntheticReadings r =
        SyntheticReadings.sample(model, ReadingSchedules.withZeroReading(schedule), 1e-6, 0, 7);
    curve = r.toCurve();
    times = r.elapsedSeconds();
    settlements = r.settlementMetres();
  }

  /**
   * Log-time construction.
   *
   * @return c<sub>v</sub>
   */
  @Benchmark
  public double logTime() {
    return LogTimeMethod.fit(curve, DRAINAGE_PATH).cv();
  }

  /**
   * Root-time construction.
   *
   * @return c<sub>v</sub>
   */
  @Benchmark
  public double rootTime() {
    return RootTimeMethod.fit(curve, DRAINAGE_PATH).cv();
  }

  /**
   * Baseline: one least-squares line of settlement against log<sub>10</sub> t over all readings
   * after t = 0.
   *
   * @return the slope
   */
  @Benchmark
  public double baselineLineFit() {
    double sx = 0;
    double sy = 0;
    double sxx = 0;
    double sxy = 0;
    int n = 0;
    for (int i = 0; i < times.length; i++) {
      if (times[i] > 0) {
        double x = Math.log10(times[i]);
        sx += x;
        sy += settlements[i];
        sxx += x * x;
        sxy += x * settlements[i];
        n++;
      }
    }
    return (n * sxy - sx * sy) / (n * sxx - sx * sx);
  }
}
