package org.oedometry.examples.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.oedometry.core.OedometerTest;
import org.oedometry.examples.demo.DemoTestGenerator;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.reduction.ReductionOptions;
import org.oedometry.fitting.reduction.TestReduction;
import org.oedometry.fitting.reduction.TestReport;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Whole-test reduction of the invented demo test (12 increments, one of 8,640 logger readings),
 * scores in tests per second: {@link TestReduction#reduceAll} on a batch of {@value #BATCH} copies
 * on all cores, beside its baseline in the same run, the same batch reduced one test after another
 * on one thread with {@link TestReduction#reduce}. The ratio of the two is the parallel speed-up on
 * the machine at hand. Methods: all seven (the default) or the three standard ones (log-time,
 * root-time, full-curve).
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 2, time = 10)
@Measurement(iterations = 3, time = 10)
@Fork(1)
@State(Scope.Benchmark)
public class ReductionBenchmark {

  /** Tests per batch. */
  static final int BATCH = 8;

  /** Which methods run: "all" (the default options) or "standard" (log, root, full-curve). */
  @Param({"all", "standard"})
  public String methods;

  private List<OedometerTest> batch;
  private ReductionOptions options;

  /** Generates the demo test and the options. */
  @Setup
  public void setUp() {
    OedometerTest demo = DemoTestGenerator.generate();
    batch = new ArrayList<>();
    for (int i = 0; i < BATCH; i++) {
      batch.add(demo);
    }
    options =
        methods.equals("all")
            ? ReductionOptions.defaults()
            : ReductionOptions.builder()
                .methods(List.of(CvMethod.LOG_TIME, CvMethod.ROOT_TIME, CvMethod.FULL_CURVE))
                .build();
  }

  /**
   * The batch on all cores.
   *
   * @return the reports
   */
  @Benchmark
  @OperationsPerInvocation(BATCH)
  public List<TestReport> allCores() {
    return TestReduction.reduceAll(batch, options);
  }

  /**
   * Baseline: the batch on one thread, one test after another.
   *
   * @return the reports
   */
  @Benchmark
  @OperationsPerInvocation(BATCH)
  public List<TestReport> singleThread() {
    List<TestReport> out = new ArrayList<>(BATCH);
    for (OedometerTest t : batch) {
      out.add(TestReduction.reduce(t, options));
    }
    return out;
  }
}
