package org.oedometry.examples.demo;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.Specimen;
import org.oedometry.core.TestIdentifiers;
import org.oedometry.core.Units;
import org.oedometry.core.io.CsvTables;
import org.oedometry.core.io.OedometerTestCsvWriter;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;
import org.oedometry.theory.Drainage;

/**
 * Generates the demo oedometer test: <b>invented, for demonstration</b>. A soft silty clay from a
 * made-up site ("Demo riverside warehouse (invented)", borehole BH-D1, sample U4, 6.2 m); no real
 * site, laboratory or test lies behind it.
 *
 * <p>Regenerate the committed files (from the project root): {@code mvn -B -q -pl examples -am
 * compile exec:java -Ddemo.mainClass=org.oedometry.examples.demo.DemoTestGenerator
 * -Dexec.args=examples/src/main/resources/org/oedometry/examples/demo}; {@code
 * DemoTestGeneratorTest} fails whenever the committed files and this generator disagree.
 *
 * <p><b>Specimen.</b> 20 mm high, 75 mm in diameter, G<sub>s</sub> = 2.68, dry mass 115.51 g
 * (e<sub>0</sub> = 1.0500 under the seating stress of 5 kPa), initial water content 39.0 %, bulk
 * density 1.82 Mg/m<sup>3</sup>; drained top and bottom.
 *
 * <p><b>Loading.</b> Seating 5 kPa, then 12.5, 25, 50, 100, 200, 400, 800 kPa, unloading to 200 and
 * 50 kPa, reloading to 200 and 800 kPa, and a last load of 1600 kPa: twelve increments of 24 h
 * each. Readings at 0, 0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30 min, 1, 2, 4, 8 and 24 h, except the 200
 * &rarr; 400 kPa increment, read by a data logger every 10 s for 24 h (8,640 readings after the
 * zero reading).
 *
 * <p><b>The soil.</b> The end-of-primary void ratio follows one e &ndash; log<sub>10</sub>&sigma;'
 * curve on first loading: recompression index C<sub>r</sub> = {@value #RECOMPRESSION_INDEX} below,
 * compression index C<sub>c</sub> = {@value #COMPRESSION_INDEX} above a break at
 * &sigma;'<sub>p</sub> = 80 kPa, joined by a softplus transition {@value #TRANSITION_WIDTH}
 * log<sub>10</sub> cycle wide:
 *
 * <pre>
 *   e(x) = e0 - Cr (x - x0) - (Cc - Cr) w [F((x - xp) / w) - F((x0 - xp) / w)],
 *   F(z) = ln(1 + exp z),   x = log10 sigma',  x0 = log10 5 kPa,  xp = log10 80 kPa,  w = 0.05
 * </pre>
 *
 * (Mesri's hypothesis that the end-of-primary curve does not depend on the duration of the
 * increments before, from memory: the secondary compression of one increment shortens the primary
 * consolidation of the next). Unloading follows a swelling line of slope C<sub>r</sub> from the
 * state at the start of unloading, reloading a line of slope C<sub>r</sub> from the state at the
 * start of reloading, so that the loop closes near 800 kPa. c<sub>v</sub> (m<sup>2</sup>/yr, Julian
 * year) per increment: 8, 8, 7 overconsolidated, 3 across &sigma;'<sub>p</sub>, 1.2, 1.4, 1.6
 * normally consolidated, 10 and 9 on unloading, 8 and 5 on reloading, 1.8 at 1600 kPa; each belongs
 * to the drainage path of half the specimen height at 50 % primary consolidation, the test's rule.
 *
 * <p><b>Each increment</b> is the forward model of {@link ConsolidationCurveModel}, d(t) =
 * d<sub>i</sub> + d<sub>p</sub> U(T) + s log<sub>10</sub>(1 + T), with d<sub>i</sub> +
 * d<sub>p</sub> the settlement from the increment's start height (the previous increment's last
 * reading) to the end-of-primary height H<sub>s</sub> (1 + e), so that the void ratios stay
 * consistent; the instantaneous (false) deformation d<sub>i</sub> is 5 % of that (10 % on the first
 * increment, bedding in); the secondary slope s is C<sub>&alpha;</sub> H<sub>s</sub> per
 * log<sub>10</sub> cycle with C<sub>&alpha;</sub> = {@value #SECONDARY_RATIO} times the increment's
 * own slope of the end-of-primary curve (Mesri's C<sub>&alpha;</sub>/C<sub>c</sub> of inorganic
 * clays, from memory; negative on unloading, where swelling continues). The zero reading at t = 0
 * is 0 (the increment's start). Noise: Gaussian with a standard deviation of 1 &mu;m (dial gauge)
 * or 0.5 &mu;m (logger), from {@link SplittableRandom} with seed {@value #SEED} through the
 * Box&ndash;Muller transform in {@link StrictMath}, so the noise is the same on every platform;
 * readings then rounded to 1 &mu;m (0.1 &mu;m for the logger), which also hides any last-bit
 * difference of the model between platforms.
 *
 * <p><b>What to expect from it.</b> The 24 h (end-of-increment) curve lies below the end-of-primary
 * curve by about 0.005 in e where overconsolidated and 0.022 where normally consolidated (24 h of
 * secondary compression), so its break lies near 70 kPa rather than 80 kPa; C<sub>c</sub> from it
 * is within a few per cent of 0.35. Each increment's true parameters are in {@link #truth()}.
 *
 * <p>Results derived from this test illustrate the library only: any results used for design must
 * be reviewed by a qualified engineer, and local codes and standards govern.
 */
public final class DemoTestGenerator {

  /** Where the three CSV files lie on the class path (package of this class). */
  public static final String RESOURCE_DIRECTORY = "org/oedometry/examples/demo";

  /** The directory written by {@link #main(String[])} when no argument is given. */
  public static final String DEFAULT_OUTPUT_DIRECTORY =
      "examples/src/main/resources/" + RESOURCE_DIRECTORY;

  /** Initial void ratio chosen, under the seating stress; the dry mass is rounded from it. */
  public static final double INITIAL_VOID_RATIO = 1.05;

  /** Specific gravity of the solids. */
  public static final double SPECIFIC_GRAVITY = 2.68;

  /** Initial height, m. */
  public static final double INITIAL_HEIGHT = 0.020;

  /** Diameter, m. */
  public static final double DIAMETER = 0.075;

  /**
   * Dry mass, kg: H<sub>0</sub> / (1 + e<sub>0</sub>) G<sub>s</sub> &rho;<sub>w</sub> A, to 0.01 g.
   */
  public static final double DRY_MASS = 0.11551;

  /** Seating stress, Pa. */
  public static final double SEATING_STRESS = 5e3;

  /** Stress at the end of each increment, Pa, in the order applied. */
  private static final double[] STRESSES_KPA = {
    12.5, 25, 50, 100, 200, 400, 800, 200, 50, 200, 800, 1600
  };

  /** c<sub>v</sub> of each increment, m<sup>2</sup>/yr (Julian year). */
  private static final double[] CV_PER_YEAR = {8, 8, 7, 3, 1.2, 1.4, 1.6, 10, 9, 8, 5, 1.8};

  /** Index of the increment read by the data logger (200 to 400 kPa). */
  public static final int LOGGER_INCREMENT = 5;

  /** Preconsolidation pressure chosen (the break of the two asymptotes), Pa. */
  public static final double PRECONSOLIDATION_PRESSURE = 80e3;

  /** Compression index chosen. */
  public static final double COMPRESSION_INDEX = 0.35;

  /** Recompression and swelling index chosen. */
  public static final double RECOMPRESSION_INDEX = 0.05;

  /** Width of the transition between the two lines, log<sub>10</sub> cycles of stress. */
  public static final double TRANSITION_WIDTH = 0.05;

  /** C<sub>&alpha;</sub> / C<sub>c</sub> chosen (Mesri's ratio). */
  public static final double SECONDARY_RATIO = 0.04;

  /** Onset time factor T_s of the secondary term the demo was generated with. */
  public static final double SECONDARY_ONSET = 1.0;

  /** Instantaneous deformation as a fraction of each increment's d<sub>i</sub> + d<sub>p</sub>. */
  static final double INSTANTANEOUS_FRACTION = 0.05;

  /** Instantaneous deformation fraction of the first increment (bedding in). */
  static final double FIRST_INSTANTANEOUS_FRACTION = 0.10;

  /** Standard deviation of the dial gauge noise, m. */
  static final double DIAL_NOISE = 1e-6;

  /** Standard deviation of the logger noise, m. */
  static final double LOGGER_NOISE = 0.5e-6;

  /** Seed of the noise. */
  public static final long SEED = 20_261_201L;

  /** Usual lab reading times after the zero reading, minutes. */
  private static final double[] SCHEDULE_MINUTES = {
    0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440
  };

  /** Logger interval, s. */
  public static final double LOGGER_INTERVAL = 10.0;

  /** Duration of every increment, s (24 h). */
  public static final double INCREMENT_DURATION = 86_400.0;

  private static final String[] HEADER = {
    "INVENTED, FOR DEMONSTRATION: not a real test, site or laboratory.",
    "Soft silty clay, 'Demo riverside warehouse (invented)', BH-D1, U4, 6.2 m.",
    "Generated by org.oedometry.examples.demo.DemoTestGenerator (the library's forward model plus"
        + " seeded noise); regenerate, do not edit."
  };

  private DemoTestGenerator() {}

  /**
   * Writes the three CSV files of the demo test.
   *
   * @param args optional output directory (created if missing); default {@value
   *     #DEFAULT_OUTPUT_DIRECTORY}, relative to the working directory
   * @throws IOException if a file cannot be written
   */
  public static void main(String[] args) throws IOException {
    Path directory = Path.of(args.length > 0 ? args[0] : DEFAULT_OUTPUT_DIRECTORY);
    write(directory);
    System.out.println("wrote the invented demo test to " + directory.toAbsolutePath());
  }

  /**
   * Writes the three CSV files, with comment lines marking the data invented.
   *
   * @param directory output directory, created if missing
   * @throws IOException if a file cannot be written
   */
  public static void write(Path directory) throws IOException {
    Files.createDirectories(directory);
    CsvTables tables = tables();
    Files.writeString(
        directory.resolve(CsvTables.PROPERTIES_FILE), tables.properties(), StandardCharsets.UTF_8);
    Files.writeString(
        directory.resolve(CsvTables.INCREMENTS_FILE), tables.increments(), StandardCharsets.UTF_8);
    Files.writeString(
        directory.resolve(CsvTables.READINGS_FILE), tables.readings(), StandardCharsets.UTF_8);
  }

  /**
   * The texts of the three files: the library's CSV writer's output after comment lines that mark
   * the data invented.
   *
   * @return the texts
   */
  public static CsvTables tables() {
    CsvTables plain = OedometerTestCsvWriter.format(generate());
    return new CsvTables(
        header() + plain.properties(), header() + plain.increments(), header() + plain.readings());
  }

  private static String header() {
    StringBuilder text = new StringBuilder();
    for (String line : HEADER) {
      text.append("# ").append(line).append('\n');
    }
    return text.toString();
  }

  /**
   * The invented demo test, generated afresh (the same bits on every call).
   *
   * @return the test
   */
  public static OedometerTest generate() {
    return run(new ArrayList<>());
  }

  /**
   * What each increment was generated from: the forward model's drainage path and parameters, in
   * the order applied. d<sub>i</sub> + d<sub>p</sub> ({@link
   * CurveParameters#endOfPrimarySettlement()}) is the true end-of-primary settlement from the
   * increment's start, which a d<sub>100</sub> construction estimates.
   *
   * @return one value per increment, unmodifiable
   */
  public static List<IncrementTruth> truth() {
    List<IncrementTruth> truth = new ArrayList<>();
    run(truth);
    return List.copyOf(truth);
  }

  /**
   * The model behind one generated increment.
   *
   * @param drainagePathMetres H<sub>dr</sub>, m: half the height at 50 % primary consolidation
   * @param parameters d<sub>i</sub> (m), d<sub>p</sub> (m), c<sub>v</sub> (m<sup>2</sup>/s) and the
   *     secondary slope (m per log<sub>10</sub> cycle of time)
   */
  public record IncrementTruth(double drainagePathMetres, CurveParameters parameters) {}

  private static OedometerTest run(List<IncrementTruth> truth) {
    Specimen specimen =
        Specimen.builder()
            .initialHeight(INITIAL_HEIGHT)
            .diameter(DIAMETER)
            .specificGravity(SPECIFIC_GRAVITY)
            .dryMass(DRY_MASS)
            .initialWaterContent(0.390)
            .bulkDensity(1820)
            .build();
    double solidsHeight = specimen.heightOfSolidsFromDryMass().getAsDouble();
    SplittableRandom random = new SplittableRandom(SEED);
    List<LoadIncrement> increments = new ArrayList<>();

    double height = INITIAL_HEIGHT;
    double stressBefore = SEATING_STRESS;
    double largestStress = SEATING_STRESS;
    double branchStress = SEATING_STRESS;
    double branchVoidRatio = Double.NaN;
    boolean unloading = false;
    boolean reloading = false;
    for (int j = 0; j < STRESSES_KPA.length; j++) {
      double stressAfter = Units.kilopascalsToPascals(STRESSES_KPA[j]);
      double voidRatioNow = height / solidsHeight - 1;
      double target;
      double slope; // the increment's own slope of the end-of-primary curve, -de/dlog10 sigma'
      double logChange = Math.log10(stressAfter / stressBefore);
      if (stressAfter < stressBefore) {
        if (!unloading) {
          unloading = true;
          reloading = false;
          branchStress = stressBefore;
          branchVoidRatio = voidRatioNow;
        }
        target = branchVoidRatio - RECOMPRESSION_INDEX * Math.log10(stressAfter / branchStress);
        slope = RECOMPRESSION_INDEX;
      } else if (stressAfter <= largestStress) {
        if (!reloading) {
          reloading = true;
          unloading = false;
          branchStress = stressBefore;
          branchVoidRatio = voidRatioNow;
        }
        target = branchVoidRatio - RECOMPRESSION_INDEX * Math.log10(stressAfter / branchStress);
        slope = RECOMPRESSION_INDEX;
      } else {
        unloading = false;
        reloading = false;
        double from = Math.max(stressBefore, largestStress);
        target = endOfPrimaryVoidRatio(stressAfter);
        slope = -(target - endOfPrimaryVoidRatio(from)) / Math.log10(stressAfter / from);
      }
      largestStress = Math.max(largestStress, stressAfter);

      double total = height - solidsHeight * (1 + target);
      double fraction = j == 0 ? FIRST_INSTANTANEOUS_FRACTION : INSTANTANEOUS_FRACTION;
      double instantaneous = fraction * total;
      double primary = total - instantaneous;
      double secondary = Math.signum(logChange) * SECONDARY_RATIO * slope * solidsHeight;
      double drainagePath = Drainage.DOUBLE.drainagePath(height - instantaneous - 0.5 * primary);
      ConsolidationCurveModel model = new ConsolidationCurveModel(drainagePath, SECONDARY_ONSET);
      CurveParameters parameters =
          CurveParameters.of(
              instantaneous,
              primary,
              Units.squareMetresPerYearToSquareMetresPerSecond(CV_PER_YEAR[j]),
              secondary);

      truth.add(new IncrementTruth(drainagePath, parameters));
      boolean logger = j == LOGGER_INCREMENT;
      double[] times = logger ? loggerTimes() : scheduleTimes();
      double noise = logger ? LOGGER_NOISE : DIAL_NOISE;
      double resolution = logger ? 1e-7 : 1e-6;
      double[] readings = new double[times.length];
      for (int k = 1; k < times.length; k++) {
        double exact = model.settlement(times[k], parameters);
        readings[k] = round(exact + noise * gaussian(random), resolution);
      }
      SettlementCurve curve = SettlementCurve.of(times, readings);
      increments.add(LoadIncrement.of(stressBefore, stressAfter, curve));
      height -= curve.finalSettlementMetres();
      stressBefore = stressAfter;
    }
    // The final water content a lab would weigh: the specimen saturated at the end (S_f = 1, so
    // w_f = e_f / G_s), rounded to 0.1 %; it then checks the final state (Sf close to 1).
    double finalVoidRatio = height / solidsHeight - 1;
    double finalWaterContent = round(finalVoidRatio / SPECIFIC_GRAVITY, 1e-3);
    return OedometerTest.builder(specimen.toBuilder().finalWaterContent(finalWaterContent).build())
        .drainage(Drainage.DOUBLE)
        .identifiers(
            TestIdentifiers.of("Demo riverside warehouse (invented)", "BH-D1", "U4", "6.2 m"))
        .increments(increments)
        .build();
  }

  /**
   * End-of-primary void ratio on first loading at a stress: the curve of the class documentation.
   *
   * @param stress &sigma;', Pa; &ge; the seating stress
   * @return e
   */
  public static double endOfPrimaryVoidRatio(double stress) {
    double x = Math.log10(stress);
    double x0 = Math.log10(SEATING_STRESS);
    double xp = Math.log10(PRECONSOLIDATION_PRESSURE);
    double w = TRANSITION_WIDTH;
    return INITIAL_VOID_RATIO
        - RECOMPRESSION_INDEX * (x - x0)
        - (COMPRESSION_INDEX - RECOMPRESSION_INDEX)
            * w
            * (softplus((x - xp) / w) - softplus((x0 - xp) / w));
  }

  /** ln(1 + e^z) without overflow. */
  private static double softplus(double z) {
    return z > 0 ? z + Math.log1p(Math.exp(-z)) : Math.log1p(Math.exp(z));
  }

  private static double[] scheduleTimes() {
    double[] t = new double[SCHEDULE_MINUTES.length + 1];
    for (int k = 0; k < SCHEDULE_MINUTES.length; k++) {
      t[k + 1] = Units.minutesToSeconds(SCHEDULE_MINUTES[k]);
    }
    return t;
  }

  private static double[] loggerTimes() {
    int n = (int) Math.round(INCREMENT_DURATION / LOGGER_INTERVAL);
    double[] t = new double[n + 1];
    for (int k = 1; k <= n; k++) {
      t[k] = k * LOGGER_INTERVAL;
    }
    return t;
  }

  /** A standard normal deviate by the Box-Muller transform (one of the pair), in StrictMath. */
  private static double gaussian(SplittableRandom random) {
    double u = 1.0 - random.nextDouble(); // in (0, 1]
    double v = random.nextDouble();
    return StrictMath.sqrt(-2.0 * StrictMath.log(u)) * StrictMath.cos(2.0 * StrictMath.PI * v);
  }

  /** Rounds to a multiple of the resolution, as an integer count divided by 1/resolution. */
  private static double round(double value, double resolution) {
    double steps = Math.rint(1.0 / resolution);
    return Math.rint(value * steps) / steps;
  }
}
