package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.oedometry.core.FiniteResults.notFinite;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.function.Supplier;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.compressibility.BilinearVolumeMethod;
import org.oedometry.core.compressibility.CasagrandeMethod;
import org.oedometry.core.compressibility.Compressibility;
import org.oedometry.core.compressibility.CompressionCurve;
import org.oedometry.core.compressibility.CompressionIndex;
import org.oedometry.core.compressibility.DeformationBasis;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.core.compressibility.IncrementDeformation;
import org.oedometry.core.compressibility.IncrementPermeability;
import org.oedometry.core.compressibility.PachecoSilvaMethod;
import org.oedometry.core.compressibility.Permeability;
import org.oedometry.core.compressibility.PermeabilityChangeIndex;
import org.oedometry.core.compressibility.PreconsolidationOptions;
import org.oedometry.core.compressibility.SecondaryCompression;
import org.oedometry.core.compressibility.SpecimenPhases;
import org.oedometry.core.compressibility.WorkMethod;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;
import org.quicktheories.api.Pair;
import org.quicktheories.core.Gen;
import org.quicktheories.generators.Generate;

/**
 * The rule "no NaN or infinity ever leaves the library; bad input gets an IllegalArgumentException
 * naming the field, the index and the value", checked on {@link SettlementCurve}, on {@link
 * OedometerTest} with {@link DrainagePathRule}, and on the entry points of the compressibility
 * package with valid but extreme per-increment values.
 *
 * <p>Settlement curves: exact Terzaghi curves from {@link ConsolidationCurveModel} of the theory
 * module (its accuracy is proven against mpmath there), used as an independent generator, with time
 * scaled by 10<sup>-200</sup> to 10<sup>200</sup> and settlement by 10<sup>-200</sup> to
 * 10<sup>200</sup> of either sign, offsets, repeated settlements, 2 to 2000 readings. Compression
 * curves: stresses and void ratios at scales 10<sup>-200</sup> to 10<sup>200</sup> and at the edges
 * of the double range (10<sup>-308</sup>, 10<sup>308</sup>), loading, unloading, consecutive
 * stresses one ulp apart, repeated void ratios, c<sub>v</sub> from 10<sup>-200</sup> to
 * 10<sup>200</sup> m<sup>2</sup>/s.
 *
 * <p>For each call: a result whose every number, walked through all its public accessors (nested
 * records, lists, optionals), is finite, or an IllegalArgumentException with a message that does
 * not quote NaN or infinity (every input is finite, so such a value was made inside the library).
 * Calls whose Javadoc allows no exception on valid input (the preconsolidation constructions, the
 * virgin line and the branches, which say why a value is absent instead) must return a finite
 * result.
 */
class ExtremeInputsProperties {

  /** Exponents from -200 to 200, the two ends and 0 drawn often. */
  private static Gen<Double> exponents() {
    return doubles()
        .between(-200, 200)
        .mix(Generate.pick(List.of(-200.0, 200.0, 0.0, -100.0, 100.0)), 30);
  }

  /**
   * For stresses and heights: exponents from -200 to 200, and the edges of the double range
   * (10<sup>-308</sup>, below the smallest normal double, to 10<sup>308</sup>) drawn often.
   */
  private static Gen<Double> wideExponents() {
    return doubles()
        .between(-200, 200)
        .mix(Generate.pick(List.of(-308.0, -307.0, 307.0, 308.0, 0.0)), 30);
  }

  /**
   * For void ratios: exponents from -200 to 200, and 10<sup>-308</sup>, 10<sup>-307</sup> and
   * 10<sup>308</sup> drawn often.
   */
  private static Gen<Double> voidRatioExponents() {
    return doubles().between(-200, 200).mix(Generate.pick(List.of(-308.0, -307.0, 308.0, 0.0)), 30);
  }

  /** 2 to 2000 readings, mostly few. */
  private static Gen<Integer> readingCounts() {
    return Generate.frequency(
        Pair.of(4, integers().between(2, 40)),
        Pair.of(4, integers().between(41, 200)),
        Pair.of(1, integers().between(201, 2000)));
  }

  // ---------------------------------------------------------------------------------------------
  // SettlementCurve

  /** One generated settlement curve, rebuilt from these numbers. */
  record Readings(int count, double log10TimeScale, double log10SettlementScale, long seed) {

    double[] times() {
      SplittableRandom random = new SplittableRandom(seed);
      double scale = Math.pow(10, log10TimeScale);
      double[] t = new double[count];
      boolean zero = random.nextBoolean();
      double unit = zero ? 0 : Math.pow(10, -4 + 3 * random.nextDouble());
      for (int i = 0; i < count; i++) {
        t[i] = scale * unit;
        unit += Math.pow(10, -4 + 4 * random.nextDouble()); // irregular steps
      }
      for (int i = 1; i < count; i++) {
        if (!(t[i] > t[i - 1])) {
          t[i] = Math.nextUp(t[i - 1]);
        }
      }
      return t;
    }

    double[] settlements(double[] t) {
      SplittableRandom random = new SplittableRandom(~seed);
      double movement = (random.nextBoolean() ? 1 : -1) * Math.pow(10, log10SettlementScale);
      double offset =
          random.nextBoolean()
              ? 0
              : (random.nextBoolean() ? 1 : -1)
                  * Math.pow(10, Math.min(300, log10SettlementScale + 200 * random.nextDouble()));
      double timeScale = t[count - 1] > 0 ? t[count - 1] : 1;
      ConsolidationCurveModel.Curve curve =
          ConsolidationCurveModel.of(1)
              .curve(
                  CurveParameters.of(
                      movement * 0.1 * random.nextDouble(),
                      movement,
                      (0.3 + 30 * random.nextDouble()) / timeScale,
                      movement * 0.05 * random.nextDouble()));
      double step = movement * Math.pow(10, -3 + 2 * random.nextDouble());
      boolean rounded = random.nextInt(3) == 0;
      double[] d = new double[count];
      for (int i = 0; i < count; i++) {
        d[i] = curve.settlement(t[i]);
        if (rounded) {
          d[i] = step * Math.rint(d[i] / step); // repeated settlements
        }
        d[i] += offset;
      }
      return d;
    }

    @Override
    public String toString() {
      return String.format(
          Locale.ROOT,
          "Readings[%d, time x 1e%.3f, settlement x 1e%.3f, seed %d]",
          count,
          log10TimeScale,
          log10SettlementScale,
          seed);
    }
  }

  private static Gen<Readings> readings() {
    return readingCounts().zip(exponents(), exponents(), longs().all(), Readings::new);
  }

  @Test
  @DisplayName(
      "SettlementCurve.of on extreme exact Terzaghi curves (ConsolidationCurveModel as independent"
          + " generator): accepted, every accessor gives back the readings bit for bit, all finite")
  void settlementCurveKeepsExtremeReadings() {
    qt().withFixedSeed(20261221L)
        .withExamples(400)
        .forAll(readings())
        .checkAssert(
            r -> {
              double[] t = r.times();
              double[] d = r.settlements(t);
              SettlementCurve curve = SettlementCurve.of(t, d);
              assertThat(curve.elapsedSeconds()).as("%s", r).containsExactly(t);
              assertThat(curve.settlementMetres()).as("%s", r).containsExactly(d);
              for (int i = 0; i < t.length; i++) {
                assertThat(curve.elapsedSeconds(i)).isEqualTo(t[i]);
                assertThat(curve.settlementMetres(i)).isEqualTo(d[i]);
              }
              assertThat(curve.durationSeconds()).isEqualTo(t[t.length - 1]);
              assertThat(curve.finalSettlementMetres()).isEqualTo(d[d.length - 1]);
              assertThat(curve.maximumSettlementMetres())
                  .isEqualTo(Arrays.stream(d).max().orElseThrow());
              assertThat(curve).isEqualTo(SettlementCurve.of(t.clone(), d.clone()));
              assertThat(notFinite(curve)).as("%s", r).isEmpty();
            });
  }

  @Test
  @DisplayName(
      "SettlementCurve.of with one bad value (NaN, an infinity, a negative time, a time not after"
          + " the one before) at any index of an extreme curve: IllegalArgumentException naming"
          + " the index and the value")
  void settlementCurveNamesTheBadReading() {
    qt().withFixedSeed(20261222L)
        .withExamples(400)
        .forAll(readings(), integers().between(0, 6), integers().between(0, 1999))
        .checkAssert(
            (r, kind, where) -> {
              double[] t = r.times();
              double[] d = r.settlements(t);
              int i = where % t.length;
              double bad;
              switch (kind) {
                case 0 -> bad = t[i] = Double.NaN;
                case 1 -> bad = t[i] = Double.POSITIVE_INFINITY;
                case 2 -> bad = t[i] = -Math.max(Double.MIN_VALUE, t[i]);
                case 3 -> bad = d[i] = Double.NaN;
                case 4 -> bad = d[i] = Double.NEGATIVE_INFINITY;
                case 5 -> {
                  i = Math.max(1, i);
                  bad = t[i] = t[i - 1];
                }
                default -> {
                  i = Math.max(1, i);
                  bad = t[i] = Math.nextDown(t[i - 1]);
                  if (bad < 0) {
                    bad = t[i] = t[i - 1];
                  }
                }
              }
              int index = i;
              double value = bad;
              assertThatThrownBy(() -> SettlementCurve.of(t, d))
                  .as("%s, kind %d at %d", r, kind, index)
                  .isInstanceOf(IllegalArgumentException.class)
                  .hasMessageContaining("index " + index + " (" + value);
            });
  }

  // ---------------------------------------------------------------------------------------------
  // OedometerTest and DrainagePathRule

  /**
   * One generated test: the initial height 10<sup>log10Height</sup> m, the height of solids
   * 10<sup>-log10HeightOverSolids</sup> times it, and per increment an extreme Terzaghi curve whose
   * settlement is scaled to the specimen height (swelling to a few times the height included).
   */
  record WholeTest(int count, double log10Height, double log10HeightOverSolids, long seed) {

    OedometerTest build() {
      SplittableRandom random = new SplittableRandom(seed);
      double height = Math.pow(10, log10Height);
      double solids = height * Math.pow(10, -Math.max(1e-12, log10HeightOverSolids));
      double area = solids > 1 ? 1e-6 : 1.0;
      Specimen.Builder specimen = Specimen.builder().initialHeight(height).specificGravity(2.5);
      specimen.area(area);
      int solidsInput = random.nextInt(3);
      if (solidsInput != 1) {
        specimen.dryMass(solids * area * 2.5 * Specimen.WATER_DENSITY);
      }
      if (solidsInput != 0) {
        // Alone: e_f = 1, H_s is half the final height; with the dry mass: a check of S_f.
        specimen.finalWaterContent(0.4);
      }
      // Phase inputs from their whole accepted range, so that the phase checks see extremes too.
      if (random.nextBoolean()) {
        specimen.initialWaterContent(
            random.nextBoolean() ? 0 : Math.pow(10, -300 + 302 * random.nextDouble()));
      }
      if (random.nextBoolean()) {
        specimen.bulkDensity(Math.pow(10, -300 + 608 * random.nextDouble()));
      }
      List<LoadIncrement> increments = new ArrayList<>();
      double stress = 0;
      for (int i = 0; i < count; i++) {
        Readings r =
            new Readings(
                2 + random.nextInt(30),
                -200 + 400 * random.nextDouble(),
                Math.min(307, log10Height - 4 + 4.6 * random.nextDouble()),
                random.nextLong());
        double[] t = r.times();
        double next = stress == 0 || random.nextBoolean() ? stress * 2 + 1e3 : stress / 2;
        increments.add(LoadIncrement.of(stress, next, SettlementCurve.of(t, r.settlements(t))));
        stress = next;
      }
      return OedometerTest.of(specimen.build(), increments);
    }

    @Override
    public String toString() {
      return String.format(
          Locale.ROOT,
          "WholeTest[%d, height 1e%.3f m, height over solids 1e%.3f, seed %d]",
          count,
          log10Height,
          log10HeightOverSolids,
          seed);
    }
  }

  @Test
  @DisplayName(
      "OedometerTest on extreme heights, solids and swelling or settling curves: refused with a"
          + " clean IllegalArgumentException, or every accessor (heights, void ratios per"
          + " increment, every drainage path rule) finite and none throws on a valid index")
  void oedometerTestAccessorsStayFinite() {
    qt().withFixedSeed(20261226L)
        .withExamples(400)
        .forAll(
            integers().between(1, 6),
            wideExponents(),
            doubles().between(-12, 400).mix(Generate.pick(List.of(307.5, 308.0, 308.2, 0.001)), 20),
            longs().all())
        .as(WholeTest::new)
        .checkAssert(
            w -> {
              OedometerTest test;
              try {
                test = w.build();
              } catch (IllegalArgumentException e) {
                assertThat(e.getMessage())
                    .as("%s: %s", w, e)
                    .doesNotContain("NaN")
                    .doesNotContain("Infinity");
                return;
              }
              assertThat(notFinite(test)).as("%s", w).isEmpty();
              assertThat(test.initialDegreeOfSaturation().orElse(0)).as("%s", w).isFinite();
              assertThat(test.finalDegreeOfSaturation().orElse(0)).as("%s", w).isFinite();
              for (DataWarning warning : test.warnings()) {
                assertThat(warning.message())
                    .as("%s", w)
                    .doesNotContain("NaN")
                    .doesNotContain("Infinity");
              }
              for (int i = 0; i < test.increments().size(); i++) {
                double start = test.heightAtStartMetres(i);
                double end = test.heightAtEndMetres(i);
                assertThat(List.of(start, end, test.voidRatioAtEnd(i)))
                    .as("%s, increment %d", w, i)
                    .allMatch(v -> Double.isFinite(v) && v > 0);
                for (DrainagePathRule rule : DrainagePathRule.values()) {
                  for (org.oedometry.theory.Drainage drainage :
                      org.oedometry.theory.Drainage.values()) {
                    double path =
                        rule.drainagePath(drainage, start, Math.min(start, end) + 0.0, end);
                    assertThat(path).as("%s, %s %s, increment %d", w, rule, drainage, i).isFinite();
                  }
                }
              }
            });
  }

  // ---------------------------------------------------------------------------------------------
  // The compressibility package

  /** One generated compression test: per-increment stresses, void ratios, settlements and c_v. */
  record Increments(int count, double log10StressScale, double log10VoidRatioScale, long seed) {

    /** Seating stress, then one stress per increment, Pa. */
    double[] stresses() {
      SplittableRandom random = new SplittableRandom(seed);
      double scale = Math.pow(10, log10StressScale);
      double[] s = new double[count + 1];
      s[0] = random.nextBoolean() ? 0 : scale * 0.5 * random.nextDouble();
      s[1] = Math.min(Double.MAX_VALUE, scale * (1 + random.nextDouble()));
      for (int j = 2; j <= count; j++) {
        double u = random.nextDouble();
        double next;
        if (u < 0.65) {
          next = s[j - 1] * Math.pow(10, 0.05 + 0.55 * random.nextDouble()); // loading
        } else if (u < 0.8) {
          next = s[j - 1] * Math.pow(10, -0.05 - 0.55 * random.nextDouble()); // unloading
        } else if (u < 0.9) {
          next = Math.nextUp(s[j - 1]); // one ulp more
        } else if (u < 0.95) {
          next = Math.nextDown(s[j - 1]); // one ulp less
        } else {
          next = s[j - 1] * Math.pow(10, 1 + 20 * random.nextDouble()); // a large jump
        }
        s[j] = Double.isFinite(next) && next > 0 && next != s[j - 1] ? next : s[j - 1] * 1.5;
        if (!Double.isFinite(s[j])) {
          s[j] = s[j - 1] / 3;
        }
      }
      return s;
    }

    /** e<sub>0</sub>, then one void ratio per increment: falling on loading, repeated at times. */
    double[] voidRatios(double[] s) {
      SplittableRandom random = new SplittableRandom(~seed);
      double[] e = new double[count + 1];
      e[0] =
          Math.min(Double.MAX_VALUE, Math.pow(10, log10VoidRatioScale) * (1 + random.nextDouble()));
      for (int j = 1; j <= count; j++) {
        double u = random.nextDouble();
        if (u < 0.1) {
          e[j] = e[j - 1];
        } else if (s[j] > s[j - 1]) {
          e[j] = e[j - 1] * (1 - 0.3 * random.nextDouble());
        } else {
          e[j] = Math.min(Double.MAX_VALUE, e[j - 1] * (1 + 0.05 * random.nextDouble()));
        }
        if (!(e[j] > 0)) {
          e[j] = e[j - 1];
        }
      }
      return e;
    }

    /** c<sub>v</sub> of each increment, m<sup>2</sup>/s: 10<sup>-200</sup> to 10<sup>200</sup>. */
    double[] cv() {
      SplittableRandom random = new SplittableRandom(seed * 31 + 7);
      double[] cv = new double[count];
      for (int j = 0; j < count; j++) {
        cv[j] = Math.pow(10, -200 + 400 * random.nextDouble());
      }
      return cv;
    }

    @Override
    public String toString() {
      return String.format(
          Locale.ROOT,
          "Increments[%d, stress x 1e%.3f, void ratio x 1e%.3f, seed %d]",
          count,
          log10StressScale,
          log10VoidRatioScale,
          seed);
    }
  }

  private static Gen<Increments> increments() {
    return integers()
        .between(1, 40)
        .zip(wideExponents(), voidRatioExponents(), longs().all(), Increments::new);
  }

  /** A call on valid input: a finite result, or an IllegalArgumentException that is not a leak. */
  private static void finiteOrClean(Object input, String call, Supplier<Object> supplier) {
    Object result;
    try {
      result = supplier.get();
    } catch (IllegalArgumentException e) {
      assertThat(e.getMessage())
          .as("%s on %s: %s", call, input, e)
          .isNotBlank()
          .doesNotContain("NaN")
          .doesNotContain("Infinity");
      return;
    }
    assertThat(notFinite(result)).as("%s on %s", call, input).isEmpty();
  }

  /**
   * A call whose documented contract allows no exception on valid input (the package documentation:
   * "where a quantity cannot be derived from valid input, the result says why instead of
   * throwing"): a finite result.
   */
  private static void finiteNeverThrows(Object input, String call, Supplier<Object> supplier) {
    Object result;
    try {
      result = supplier.get();
    } catch (IllegalArgumentException e) {
      throw new AssertionError(call + " on " + input + " threw on valid input: " + e, e);
    }
    assertThat(notFinite(result)).as("%s on %s", call, input).isEmpty();
  }

  @Test
  @DisplayName(
      "Compression curve, per-increment compressibility, C_c / C_r fits and the four"
          + " preconsolidation constructions on extreme stresses and void ratios: finite or a clean"
          + " IllegalArgumentException where documented; virgin line, branches and the"
          + " constructions never throw")
  void compressionCurveEntryPoints() {
    qt().withFixedSeed(20261223L)
        .withExamples(400)
        .forAll(increments())
        .checkAssert(
            c -> {
              double[] s = c.stresses();
              double[] e = c.voidRatios(s);
              double[] stresses = Arrays.copyOfRange(s, 1, s.length);
              double[] voidRatios = Arrays.copyOfRange(e, 1, e.length);
              CompressionCurve curve = CompressionCurve.of(e[0], s[0], stresses, voidRatios);
              assertThat(notFinite(curve)).as("%s", c).isEmpty();
              for (int j = 0; j < curve.size(); j++) {
                assertThat(
                        List.of(
                            curve.stress(j),
                            curve.voidRatio(j),
                            curve.axialStrain(j),
                            curve.startStress(j),
                            curve.startVoidRatio(j)))
                    .as("%s, point %d", c, j)
                    .allMatch(Double::isFinite);
              }
              SplittableRandom random = new SplittableRandom(c.seed() ^ 0xC0FFEEL);
              double pressure =
                  random.nextBoolean()
                      ? stresses[random.nextInt(stresses.length)]
                      : Math.min(
                          Double.MAX_VALUE,
                          stresses[0] * Math.pow(10, -1 + 3 * random.nextDouble()));
              finiteOrClean(c, "increments", () -> Compressibility.increments(curve, pressure));
              finiteNeverThrows(
                  c, "virginLine", () -> CompressionIndex.virginLine(curve, pressure));
              finiteNeverThrows(c, "branches", () -> CompressionIndex.branches(curve, pressure));
              int[] fromStress =
                  java.util.stream.IntStream.range(0, curve.size())
                      .filter(j -> curve.startStress(j) > 0)
                      .toArray();
              if (fromStress.length > 0) {
                finiteOrClean(
                    c, "overIncrements", () -> CompressionIndex.overIncrements(curve, fromStress));
              }
              double[][] rising = risingPoints(stresses, voidRatios);
              if (rising[0].length >= 2) {
                finiteOrClean(
                    c, "ofPoints", () -> CompressionIndex.ofPoints(e[0], rising[0], rising[1]));
              }
              PreconsolidationOptions twoPoints = new PreconsolidationOptions(2);
              finiteNeverThrows(c, "Casagrande", () -> CasagrandeMethod.estimate(curve));
              finiteNeverThrows(
                  c, "Casagrande, 2 points", () -> CasagrandeMethod.estimate(curve, twoPoints));
              finiteNeverThrows(c, "Pacheco Silva", () -> PachecoSilvaMethod.estimate(curve));
              finiteNeverThrows(
                  c,
                  "Pacheco Silva, 2 points",
                  () -> PachecoSilvaMethod.estimate(curve, twoPoints));
              finiteNeverThrows(c, "work", () -> WorkMethod.estimate(curve));
              finiteNeverThrows(c, "Butterfield", () -> BilinearVolumeMethod.butterfield(curve));
              finiteNeverThrows(c, "Onitsuka", () -> BilinearVolumeMethod.onitsuka(curve));
            });
  }

  /** The points of strictly rising stress, in order (for a virgin-line fit through points). */
  private static double[][] risingPoints(double[] stresses, double[] voidRatios) {
    double[] x = new double[stresses.length];
    double[] y = new double[stresses.length];
    int k = 0;
    for (int j = 0; j < stresses.length; j++) {
      if (k == 0 || stresses[j] > x[k - 1]) {
        x[k] = stresses[j];
        y[k] = voidRatios[j];
        k++;
      }
    }
    return new double[][] {Arrays.copyOf(x, k), Arrays.copyOf(y, k)};
  }

  @Test
  @DisplayName(
      "Permeability per increment (k = c_v m_v gamma_w) with c_v from 1e-200 to 1e200 m^2/s and"
          + " the permeability change index on extreme compression curves: finite or a clean"
          + " IllegalArgumentException")
  void permeabilityEntryPoints() {
    qt().withFixedSeed(20261224L)
        .withExamples(400)
        .forAll(increments())
        .checkAssert(
            c -> {
              double[] s = c.stresses();
              double[] e = c.voidRatios(s);
              CompressionCurve curve =
                  CompressionCurve.of(
                      e[0],
                      s[0],
                      Arrays.copyOfRange(s, 1, s.length),
                      Arrays.copyOfRange(e, 1, e.length));
              List<IncrementCompressibility> all;
              try {
                all = Compressibility.increments(curve, curve.stress(0));
              } catch (IllegalArgumentException ex) {
                finiteOrClean(c, "increments", () -> Compressibility.increments(curve, 1));
                return;
              }
              double[] cvAll = c.cv();
              List<IncrementCompressibility> compressing = new ArrayList<>();
              List<Double> cvList = new ArrayList<>();
              for (IncrementCompressibility inc : all) {
                if (inc.mv() > 0) {
                  compressing.add(inc);
                  cvList.add(cvAll[inc.index()]);
                }
              }
              double[] cv = cvList.stream().mapToDouble(Double::doubleValue).toArray();
              for (int j = 0; j < cv.length; j++) {
                double mv = compressing.get(j).mv();
                double cvj = cv[j];
                finiteOrClean(
                    c, "fromConsolidation", () -> Permeability.fromConsolidation(cvj, mv));
              }
              List<IncrementPermeability> permeabilities;
              try {
                permeabilities = Permeability.perIncrement(compressing, cv);
              } catch (IllegalArgumentException ex) {
                finiteOrClean(c, "perIncrement", () -> Permeability.perIncrement(compressing, cv));
                return;
              }
              assertThat(notFinite(permeabilities)).as("%s", c).isEmpty();
              finiteOrClean(c, "C_k fit", () -> PermeabilityChangeIndex.fit(permeabilities));
              double[] voids =
                  permeabilities.stream().mapToDouble(p -> p.meanVoidRatio()).toArray();
              double[] ks = permeabilities.stream().mapToDouble(p -> p.permeability()).toArray();
              finiteOrClean(c, "C_k points", () -> PermeabilityChangeIndex.ofPoints(voids, ks));
            });
  }

  @Test
  @DisplayName(
      "Compression curve from a specimen's heights and each increment's settlement (1e-200 to"
          + " 1e200 m) and the secondary compression indices from extreme slopes: finite or a"
          + " clean IllegalArgumentException")
  void deformationEntryPoints() {
    qt().withFixedSeed(20261225L)
        .withExamples(400)
        .forAll(increments(), wideExponents(), doubles().between(-12, 400))
        .checkAssert(
            (c, log10Height, log10HeightOverSolids) -> {
              double height = Math.pow(10, log10Height);
              double solids = Math.pow(10, log10Height - Math.max(1e-12, log10HeightOverSolids));
              if (!(solids > 0 && solids < height)) {
                solids = height / 2;
              }
              double solidsHeight = solids;
              finiteOrClean(c, "phases", () -> SpecimenPhases.of(height, solidsHeight));
              SpecimenPhases phases;
              try {
                phases = SpecimenPhases.of(height, solidsHeight);
              } catch (IllegalArgumentException ex) {
                return;
              }
              double[] s = c.stresses();
              SplittableRandom random = new SplittableRandom(c.seed() + 99);
              double room = height - solidsHeight;
              List<IncrementDeformation> deformations = new ArrayList<>();
              double settled = 0;
              for (int j = 1; j < s.length; j++) {
                settled += (s[j] > s[j - 1] ? 0.3 : -0.05) * random.nextDouble() * (room - settled);
                double primary = settled * (0.8 + 0.2 * random.nextDouble());
                deformations.add(IncrementDeformation.of(s[j], settled, primary));
              }
              for (DeformationBasis basis : DeformationBasis.values()) {
                finiteOrClean(
                    c,
                    "fromDeformations " + basis,
                    () -> CompressionCurve.fromDeformations(phases, s[0], deformations, basis));
              }
              for (int j = 0; j < deformations.size(); j++) {
                double settlement = deformations.get(j).endOfIncrementSettlement();
                finiteOrClean(c, "voidRatio", () -> phases.voidRatio(settlement));
                finiteOrClean(c, "axialStrain", () -> phases.axialStrain(settlement));
              }
              double swelling = -Math.pow(10, -200 + 508 * random.nextDouble());
              finiteOrClean(c, "voidRatio after swelling", () -> phases.voidRatio(swelling));
              finiteOrClean(c, "axialStrain of swelling", () -> phases.axialStrain(swelling));
              double slope =
                  (random.nextBoolean() ? 1 : -1) * Math.pow(10, -200 + 400 * random.nextDouble());
              double endVoidRatio = Math.pow(10, -200 + 400 * random.nextDouble());
              double index =
                  (random.nextBoolean() ? 1 : -1) * Math.pow(10, -200 + 400 * random.nextDouble());
              finiteOrClean(
                  c,
                  "secondary compression",
                  () -> SecondaryCompression.of(slope, solidsHeight, endVoidRatio));
              finiteOrClean(
                  c,
                  "secondary compression with C_c",
                  () -> SecondaryCompression.of(slope, solidsHeight, endVoidRatio, index));
            });
  }
}
