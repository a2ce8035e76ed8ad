package org.oedometry.fitting.reduction;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Function;
import java.util.stream.IntStream;
import org.oedometry.core.DrainagePathRule;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.compressibility.BilinearVolumeMethod;
import org.oedometry.core.compressibility.CasagrandeMethod;
import org.oedometry.core.compressibility.Compressibility;
import org.oedometry.core.compressibility.CompressionCurve;
import org.oedometry.core.compressibility.CompressionIndex;
import org.oedometry.core.compressibility.DeformationBasis;
import org.oedometry.core.compressibility.Derived;
import org.oedometry.core.compressibility.IncrementClass;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.core.compressibility.IncrementDeformation;
import org.oedometry.core.compressibility.IncrementPermeability;
import org.oedometry.core.compressibility.IndexBranch;
import org.oedometry.core.compressibility.IndexFit;
import org.oedometry.core.compressibility.PachecoSilvaMethod;
import org.oedometry.core.compressibility.Permeability;
import org.oedometry.core.compressibility.PermeabilityChangeFit;
import org.oedometry.core.compressibility.PermeabilityChangeIndex;
import org.oedometry.core.compressibility.PreconsolidationEstimate;
import org.oedometry.core.compressibility.SecondaryCompression;
import org.oedometry.core.compressibility.SecondaryCompressionResult;
import org.oedometry.core.compressibility.SpecimenPhases;
import org.oedometry.core.compressibility.WorkMethod;
import org.oedometry.fitting.AsaokaMethod;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.EarlySlopeMethod;
import org.oedometry.fitting.FitException;
import org.oedometry.fitting.FitWarning;
import org.oedometry.fitting.FullCurveMethod;
import org.oedometry.fitting.InflectionPointMethod;
import org.oedometry.fitting.LogTimeMethod;
import org.oedometry.fitting.LogTimeResult;
import org.oedometry.fitting.RectangularHyperbolaMethod;
import org.oedometry.fitting.RootTimeMethod;
import org.oedometry.theory.Drainage;

/**
 * Reduces a whole oedometer test in one call: every c<sub>v</sub> method on every increment with
 * the drainage path of the test's rule, then the derivation of {@code core} (void ratios,
 * a<sub>v</sub>, m<sub>v</sub>, &sigma;'<sub>p</sub> by each construction, C<sub>c</sub>,
 * C<sub>r</sub>, k per increment and method, C<sub>k</sub>, C<sub>&alpha;</sub>) into one {@link
 * TestReport}.
 *
 * <h2>Steps, per increment</h2>
 *
 * <ol>
 *   <li><b>Drainage path.</b> By the rule in force ({@link ReductionOptions#drainagePathRule()},
 *       else the test's): {@link DrainagePathRule#START_HEIGHT} and {@link
 *       DrainagePathRule#MEAN_HEIGHT} from the heights of the readings. {@link
 *       DrainagePathRule#HEIGHT_AT_HALF_CONSOLIDATION} needs d<sub>50</sub> = (d<sub>0</sub> +
 *       d<sub>100</sub>)/2 of a fit, so it takes one fixed-point step: the first preferred method
 *       that gives d<sub>0</sub> and d<sub>100</sub> (one whose own curve fits the readings first,
 *       as for the preferred value below) is fitted with the drainage path of the start height, the
 *       height at d<sub>50</sub> of that fit gives H<sub>dr</sub>, and every method is then fitted
 *       with that H<sub>dr</sub>. One step suffices for the constructions we run: their
 *       d<sub>0</sub> and d<sub>100</sub> do not depend on H<sub>dr</sub>, which only scales
 *       c<sub>v</sub>. If no preferred method gives them, the mean height is used with a {@link
 *       FitWarning.Kind#DRAINAGE_PATH_FALLBACK} warning.
 *   <li><b>Methods.</b> Each selected method with its default options (the full-curve fit with
 *       {@link ReductionOptions#fullCurveOptions()}). A method that throws {@link FitException} (no
 *       honest value) or {@link IllegalArgumentException} (the readings do not suit it, e.g. too
 *       few) gives an absent value with the reason in the row and a {@link
 *       FitWarning.Kind#METHOD_GAVE_NO_VALUE} warning; the report goes on.
 *   <li><b>Warnings.</b> The methods' own warnings, except two that every method repeats and that
 *       stay in each method's own result: the reading at t = 0 left out (all methods do so by
 *       design) and the swelling warning (given once per unloading increment by the reduction);
 *       log-time and root-time c<sub>v</sub> differing by more than {@link
 *       ReductionOptions#disagreementFactor()}, a log-time primary ratio outside the usual range.
 *   <li><b>Preferred value.</b> The c<sub>v</sub> (with its d<sub>0</sub>, d<sub>100</sub>) that
 *       feeds the derived quantities: the first method of {@link
 *       ReductionOptions#preferredMethods()} that gave a value whose own Terzaghi curve fits the
 *       readings, that is without {@link FitWarning.Kind#IMPLIED_CURVE_MISSES_READINGS}; a value
 *       passed over for that reason is named in a {@link
 *       FitWarning.Kind#PREFERRED_METHOD_PASSED_OVER} warning. If every value given carries that
 *       warning, the first value given is taken (its own warning stays in the row).
 * </ol>
 *
 * <h2>Then the whole test</h2>
 *
 * <ol>
 *   <li>The compression curve ({@link CompressionCurve#fromDeformations}) with the heights of
 *       solids of the test; each point at the end of primary (the preferred method's
 *       d<sub>100</sub>, with a {@link FitWarning.Kind#END_OF_PRIMARY_NOT_KNOWN} warning and the
 *       last reading where there is none) or at the last reading, as {@link
 *       ReductionOptions#deformationBasis()} says.
 *   <li>&sigma;'<sub>p</sub> by Casagrande, Pacheco Silva, Butterfield, Onitsuka and Becker's work
 *       method; the first present, in that order, classes the increments (OC/NC) and selects the
 *       virgin line for C<sub>c</sub> and the branches for C<sub>r</sub>.
 *   <li>a<sub>v</sub>, m<sub>v</sub> per increment; k = c<sub>v</sub> m<sub>v</sub>
 *       &gamma;<sub>w</sub> for every method's c<sub>v</sub>; C<sub>k</sub> over the normally
 *       consolidated increments with the k of the preferred c<sub>v</sub>.
 *   <li>C<sub>&alpha;e</sub> and C<sub>&alpha;&epsilon;</sub> from the secondary slope of the first
 *       preferred method that gives one (log-time or full-curve), with e<sub>p</sub> at that
 *       method's d<sub>100</sub>; C<sub>&alpha;</sub>/C<sub>c</sub> for normally consolidated
 *       increments with the fitted C<sub>c</sub>.
 * </ol>
 *
 * <p>Caveat: k back-calculated from c<sub>v</sub> is known to underestimate the true k of
 * structured clays (Tavenas et al. 1983, Canadian Geotechnical Journal 20(4)).
 *
 * <p>Results feed engineering decisions: they must be reviewed by a qualified engineer, and local
 * codes and standards govern. Stateless, deterministic (the same test gives the same bits) and
 * thread-safe.
 */
public final class TestReduction {

  private TestReduction() {}

  /**
   * Reduces a test with {@link ReductionOptions#defaults()}.
   *
   * @param test the test; not null
   * @return the report
   * @throws NullPointerException if the test is null
   */
  public static TestReport reduce(OedometerTest test) {
    return reduce(test, ReductionOptions.defaults());
  }

  /**
   * Reduces a test.
   *
   * @param test the test; not null
   * @param options the options; not null
   * @return the report; an increment that a method cannot reduce carries the reason in its row
   * @throws NullPointerException if an argument is null
   */
  public static TestReport reduce(OedometerTest test, ReductionOptions options) {
    Objects.requireNonNull(test, "test");
    Objects.requireNonNull(options, "options");
    DrainagePathRule rule = options.drainagePathRule().orElse(test.drainagePathRule());
    int n = test.increments().size();
    List<Fitted> fitted = new ArrayList<>(n);
    for (int j = 0; j < n; j++) {
      fitted.add(fitIncrement(test, j, rule, options));
    }
    return derive(test, rule, options, fitted);
  }

  /**
   * Reduces many tests with the default options, in parallel on all cores.
   *
   * @param tests the tests; no null element
   * @return one report per test, in the order of the input; the same as reducing each in turn
   * @throws NullPointerException if the list or an element is null
   */
  public static List<TestReport> reduceAll(List<OedometerTest> tests) {
    return reduceAll(tests, ReductionOptions.defaults());
  }

  /**
   * Reduces many tests in parallel on all cores (the common fork-join pool). Each test is reduced
   * on its own, so the results are deterministic and in input order.
   *
   * @param tests the tests; no null element
   * @param options the options for every test; not null
   * @return one report per test, in the order of the input
   * @throws NullPointerException if an argument or element is null
   */
  public static List<TestReport> reduceAll(List<OedometerTest> tests, ReductionOptions options) {
    List<OedometerTest> copy = List.copyOf(tests);
    Objects.requireNonNull(options, "options");
    return IntStream.range(0, copy.size())
        .parallel()
        .mapToObj(i -> reduce(copy.get(i), options))
        .toList();
  }

  /** What the methods gave for one increment, before the whole-test derivation. */
  private record Fitted(
      DrainagePathChoice path,
      List<Attempt> attempts,
      Optional<CvEstimate> preferred,
      List<ReductionWarning> warnings) {}

  /** One method's estimate or its failure reason. */
  private record Attempt(CvMethod method, Optional<CvEstimate> estimate, String reason) {}

  private static Fitted fitIncrement(
      OedometerTest test, int j, DrainagePathRule rule, ReductionOptions options) {
    LoadIncrement increment = test.increments().get(j);
    SettlementCurve curve = increment.curve();
    Drainage drainage = test.drainage();
    double hStart = test.heightAtStartMetres(j);
    double hEnd = test.heightAtEndMetres(j);
    List<ReductionWarning> warnings = new ArrayList<>();

    DrainagePathChoice path;
    if (rule.needsFittedCurve()) {
      path = null;
      double startPath = drainage.drainagePath(hStart);
      Optional<CvEstimate> first =
          firstTrusted(
              preferredSelected(options),
              m ->
                  attempt(m, curve, startPath, options)
                      .estimate()
                      .filter(e -> halfConsolidationSettlement(e).orElse(hStart) < hStart),
              new ArrayList<>());
      if (first.isPresent()) {
        CvMethod m = first.get().method();
        double d50 = halfConsolidationSettlement(first.get()).orElseThrow();
        double hHalf = hStart - d50;
        path =
            new DrainagePathChoice(
                rule,
                rule.drainagePath(drainage, hStart, hHalf, hEnd),
                hHalf,
                false,
                format(
                    "%s of the height at 50 %% consolidation, %.4f mm = start height %.4f mm -"
                        + " d50 %.4f mm of a first %s fit with the start height (one fixed-point"
                        + " step)",
                    drainage == Drainage.DOUBLE ? "half" : "all",
                    mm(hHalf),
                    mm(hStart),
                    mm(d50),
                    m.label()));
      } else {
        double mean = 0.5 * (hStart + hEnd);
        path =
            new DrainagePathChoice(
                DrainagePathRule.MEAN_HEIGHT,
                DrainagePathRule.MEAN_HEIGHT.drainagePath(drainage, hStart, mean, hEnd),
                mean,
                true,
                format(
                    "%s of the mean height %.4f mm: no preferred method gave d0 and d100 for the"
                        + " height at 50 %% consolidation",
                    drainage == Drainage.DOUBLE ? "half" : "all", mm(mean)));
        warnings.add(
            reductionWarning(
                FitWarning.Kind.DRAINAGE_PATH_FALLBACK,
                "no preferred method gave d0 and d100, so the drainage path is taken from the"
                    + " mean height instead of the height at 50 % consolidation"));
      }
    } else {
      double height = rule == DrainagePathRule.START_HEIGHT ? hStart : 0.5 * (hStart + hEnd);
      path =
          new DrainagePathChoice(
              rule,
              rule.drainagePath(drainage, hStart, hStart, hEnd),
              height,
              false,
              format(
                  "%s of the %s, %.4f mm",
                  drainage == Drainage.DOUBLE ? "half" : "all",
                  rule == DrainagePathRule.START_HEIGHT
                      ? "height at the start of the increment"
                      : "mean of the heights at the start and end of the increment",
                  mm(height)));
    }

    List<Attempt> attempts = new ArrayList<>();
    for (CvMethod m : options.methods()) {
      Attempt a = attempt(m, curve, path.drainagePathMetres(), options);
      attempts.add(a);
      if (a.estimate().isPresent()) {
        for (FitWarning w : a.estimate().get().warnings()) {
          if (w.kind() != FitWarning.Kind.SWELLING_INCREMENT
              && w.kind() != FitWarning.Kind.ZERO_READING_IGNORED) {
            warnings.add(new ReductionWarning(Optional.of(m), w));
          }
        }
      } else {
        warnings.add(
            new ReductionWarning(
                Optional.of(m),
                new FitWarning(FitWarning.Kind.METHOD_GAVE_NO_VALUE, "no value: " + a.reason())));
      }
    }
    if (curve.finalSettlementMetres() < 0
        || increment.stressAfterPascals() < increment.stressBeforePascals()) {
      warnings.add(
          0,
          reductionWarning(
              FitWarning.Kind.SWELLING_INCREMENT,
              format(
                  "unloading increment (%.4g to %.4g kPa), the specimen swells: c_v from swelling"
                      + " is usually reported for information only",
                  increment.stressBeforePascals() / 1000, increment.stressAfterPascals() / 1000)));
    }
    Optional<CvEstimate> log = find(attempts, CvMethod.LOG_TIME);
    Optional<CvEstimate> root = find(attempts, CvMethod.ROOT_TIME);
    if (log.isPresent() && root.isPresent()) {
      double ratio = root.get().cv() / log.get().cv();
      if (ratio > options.disagreementFactor() || 1 / ratio > options.disagreementFactor()) {
        warnings.add(
            reductionWarning(
                FitWarning.Kind.METHODS_DISAGREE,
                format(
                    "root-time c_v (%.3g m2/yr) and log-time c_v (%.3g m2/yr) differ by a factor"
                        + " %.2f, more than %.2f: review both constructions",
                    perYear(root.get().cv()),
                    perYear(log.get().cv()),
                    Math.max(ratio, 1 / ratio),
                    options.disagreementFactor())));
      }
    }
    if (log.isPresent()) {
      OptionalDouble rp = ((LogTimeResult) log.get()).primaryRatio();
      if (rp.isPresent()
          && (rp.getAsDouble() < options.primaryRatioLow()
              || rp.getAsDouble() > options.primaryRatioHigh())) {
        warnings.add(
            reductionWarning(
                FitWarning.Kind.PRIMARY_RATIO_UNUSUAL,
                format(
                    "log-time primary compression ratio %.3f lies outside the usual %.2f to %.2f:"
                        + " check the zero reading, d0 and d100",
                    rp.getAsDouble(), options.primaryRatioLow(), options.primaryRatioHigh())));
      }
    }
    List<CvMethod> passedOver = new ArrayList<>();
    Optional<CvEstimate> preferred =
        firstTrusted(options.preferredMethods(), m -> find(attempts, m), passedOver);
    if (!passedOver.isEmpty()) {
      StringBuilder names = new StringBuilder();
      for (CvMethod m : passedOver) {
        names
            .append(names.length() == 0 ? "" : ", ")
            .append(
                format("%s c_v (%.3g m2/yr)", m.label(), perYear(find(attempts, m).get().cv())));
      }
      warnings.add(
          reductionWarning(
              FitWarning.Kind.PREFERRED_METHOD_PASSED_OVER,
              format(
                  "%s not taken for the derived values: its own Terzaghi curve misses the"
                      + " readings (%s); %s is taken instead, the next preferred method whose"
                      + " curve fits them",
                  names,
                  FitWarning.Kind.IMPLIED_CURVE_MISSES_READINGS,
                  preferred.get().method().label())));
    }
    return new Fitted(path, attempts, preferred, warnings);
  }

  /**
   * The preferred value: in the order given, the first method that gives a usable value whose own
   * Terzaghi curve fits the readings (no {@link FitWarning.Kind#IMPLIED_CURVE_MISSES_READINGS}),
   * else the first that gives a usable value at all. Methods are tried lazily, in order, and no
   * further than needed.
   *
   * @param order the preferred methods, in order
   * @param usable a method's usable value, or empty
   * @param passedOver receives the methods whose usable values were passed over for a later one
   *     (left empty when none was, or when every usable value misses its readings)
   * @return the preferred value, or empty if no method gives a usable one
   */
  private static Optional<CvEstimate> firstTrusted(
      List<CvMethod> order,
      Function<CvMethod, Optional<CvEstimate>> usable,
      List<CvMethod> passedOver) {
    Optional<CvEstimate> firstUsable = Optional.empty();
    List<CvMethod> missing = new ArrayList<>();
    for (CvMethod m : order) {
      Optional<CvEstimate> e = usable.apply(m);
      if (e.isEmpty()) {
        continue;
      }
      if (!e.get().hasWarning(FitWarning.Kind.IMPLIED_CURVE_MISSES_READINGS)) {
        passedOver.addAll(missing);
        return e;
      }
      missing.add(m);
      if (firstUsable.isEmpty()) {
        firstUsable = e;
      }
    }
    return firstUsable;
  }

  /** d<sub>50</sub> = (d<sub>0</sub> + d<sub>100</sub>)/2 of an estimate, m, where it has both. */
  private static OptionalDouble halfConsolidationSettlement(CvEstimate e) {
    OptionalDouble d0 = Estimates.d0(e);
    OptionalDouble d100 = Estimates.d100(e);
    return d0.isPresent() && d100.isPresent()
        ? OptionalDouble.of(0.5 * (d0.getAsDouble() + d100.getAsDouble()))
        : OptionalDouble.empty();
  }

  private static List<CvMethod> preferredSelected(ReductionOptions options) {
    List<CvMethod> out = new ArrayList<>();
    for (CvMethod m : options.preferredMethods()) {
      if (options.methods().contains(m)) {
        out.add(m);
      }
    }
    return out;
  }

  private static Optional<CvEstimate> find(List<Attempt> attempts, CvMethod method) {
    for (Attempt a : attempts) {
      if (a.method() == method) {
        return a.estimate();
      }
    }
    return Optional.empty();
  }

  private static Attempt attempt(
      CvMethod method, SettlementCurve curve, double drainagePath, ReductionOptions options) {
    try {
      return new Attempt(method, Optional.of(fit(method, curve, drainagePath, options)), "");
    } catch (FitException | IllegalArgumentException e) {
      String reason =
          e.getMessage() == null || e.getMessage().isBlank() ? e.toString() : e.getMessage();
      return new Attempt(method, Optional.empty(), reason);
    }
  }

  private static CvEstimate fit(
      CvMethod method, SettlementCurve curve, double drainagePath, ReductionOptions options) {
    return switch (method) {
      case LOG_TIME -> LogTimeMethod.fit(curve, drainagePath);
      case ROOT_TIME -> RootTimeMethod.fit(curve, drainagePath);
      case FULL_CURVE -> FullCurveMethod.fit(curve, drainagePath, options.fullCurveOptions());
      case INFLECTION_POINT -> InflectionPointMethod.fit(curve, drainagePath);
      case RECTANGULAR_HYPERBOLA -> RectangularHyperbolaMethod.fit(curve, drainagePath);
      case EARLY_SLOPE -> EarlySlopeMethod.fit(curve, drainagePath);
      case ASAOKA -> AsaokaMethod.fit(curve, drainagePath);
    };
  }

  private static TestReport derive(
      OedometerTest test, DrainagePathRule rule, ReductionOptions options, List<Fitted> fitted) {
    int n = fitted.size();
    double h0 = test.specimen().initialHeightMetres();
    double hs = test.heightOfSolidsMetres();
    double seating = test.increments().get(0).stressBeforePascals();
    List<List<ReductionWarning>> warnings = new ArrayList<>();
    DeformationBasis[] basis = new DeformationBasis[n];
    List<IncrementDeformation> deformations = new ArrayList<>(n);
    for (int j = 0; j < n; j++) {
      Fitted f = fitted.get(j);
      List<ReductionWarning> w = new ArrayList<>(f.warnings());
      warnings.add(w);
      double endOfIncrement = h0 - test.heightAtEndMetres(j);
      double stress = test.increments().get(j).stressAfterPascals();
      basis[j] = DeformationBasis.END_OF_INCREMENT;
      double point = endOfIncrement;
      if (options.deformationBasis() == DeformationBasis.END_OF_PRIMARY) {
        OptionalDouble d100 =
            f.preferred().isPresent()
                ? Estimates.d100(f.preferred().get())
                : OptionalDouble.empty();
        if (d100.isPresent()) {
          basis[j] = DeformationBasis.END_OF_PRIMARY;
          point = h0 - test.heightAtStartMetres(j) + d100.getAsDouble();
        } else {
          w.add(
              reductionWarning(
                  FitWarning.Kind.END_OF_PRIMARY_NOT_KNOWN,
                  "no preferred method gave d100: the e - log sigma' point of this increment is"
                      + " taken at its last reading"));
        }
      }
      deformations.add(IncrementDeformation.of(stress, endOfIncrement, point));
    }

    Derived<CompressionCurve> curve;
    try {
      curve =
          Derived.of(
              CompressionCurve.fromDeformations(
                  SpecimenPhases.of(h0, hs),
                  seating,
                  deformations,
                  DeformationBasis.END_OF_PRIMARY));
    } catch (IllegalArgumentException e) {
      curve = Derived.absent("no compression curve: " + e.getMessage());
    }

    List<PreconsolidationEstimate> estimates = new ArrayList<>();
    Derived<PreconsolidationEstimate> classing =
        Derived.absent(
            curve.isPresent() ? "no construction found sigma'_p" : curve.absenceReason());
    List<IncrementCompressibility> compressibility = List.of();
    Derived<IndexFit> cc =
        Derived.absent(
            curve.isPresent()
                ? "no construction found sigma'_p, so the virgin line is not known"
                : curve.absenceReason());
    List<IndexBranch> branches = List.of();
    if (curve.isPresent()) {
      CompressionCurve c = curve.value().get();
      estimates.add(CasagrandeMethod.estimate(c));
      estimates.add(PachecoSilvaMethod.estimate(c));
      estimates.add(BilinearVolumeMethod.butterfield(c));
      estimates.add(BilinearVolumeMethod.onitsuka(c));
      estimates.add(WorkMethod.estimate(c));
      for (PreconsolidationEstimate e : estimates) {
        if (e.preconsolidationPressure().isPresent()) {
          classing = Derived.of(e);
          break;
        }
      }
      double largest = 0;
      for (int j = 0; j < c.size(); j++) {
        largest = Math.max(largest, c.stress(j));
      }
      double sigmaP =
          classing.isPresent()
              ? classing.value().get().preconsolidationPressure().getAsDouble()
              : largest;
      compressibility = Compressibility.increments(c, sigmaP);
      if (classing.isPresent()) {
        cc = CompressionIndex.virginLine(c, sigmaP);
        branches = CompressionIndex.branches(c, sigmaP);
      }
    }

    List<IncrementReport> rows = new ArrayList<>(n);
    List<IncrementPermeability> forCk = new ArrayList<>();
    for (int j = 0; j < n; j++) {
      Fitted f = fitted.get(j);
      Derived<IncrementCompressibility> comp =
          compressibility.isEmpty()
              ? Derived.absent(curve.isPresent() ? "no compressibility" : curve.absenceReason())
              : Derived.of(compressibility.get(j));
      Derived<IncrementClass> history =
          comp.isPresent() && classing.isPresent()
              ? Derived.of(comp.value().get().stressHistory())
              : Derived.absent(
                  curve.isPresent()
                      ? "no preconsolidation pressure found, so the increment cannot be classed"
                      : curve.absenceReason());
      List<MethodOutcome> outcomes = new ArrayList<>();
      for (Attempt a : f.attempts()) {
        Derived<Double> k;
        if (a.estimate().isEmpty()) {
          k = Derived.absent("no c_v from this method");
        } else if (!comp.isPresent()) {
          k = Derived.absent("no m_v: " + comp.absenceReason());
        } else {
          k = permeability(a.estimate().get().cv(), comp.value().get().mv(), options);
        }
        outcomes.add(new MethodOutcome(a.method(), a.estimate(), a.reason(), k));
      }
      Optional<CvMethod> preferredMethod = f.preferred().map(CvEstimate::method);
      if (preferredMethod.isPresent()
          && history.isPresent()
          && history.value().get() == IncrementClass.NORMALLY_CONSOLIDATED) {
        MethodOutcome o =
            outcomes.stream().filter(x -> x.method() == preferredMethod.get()).findFirst().get();
        if (o.permeability().isPresent()) {
          IncrementCompressibility ic = comp.value().get();
          forCk.add(
              new IncrementPermeability(
                  j,
                  ic.meanVoidRatio(),
                  o.cv().getAsDouble(),
                  ic.mv(),
                  o.permeability().value().get()));
        }
      }
      rows.add(
          new IncrementReport(
              j,
              test.increments().get(j).stressBeforePascals(),
              test.increments().get(j).stressAfterPascals(),
              test.heightAtStartMetres(j),
              test.heightAtEndMetres(j),
              f.path(),
              outcomes,
              preferredMethod,
              basis[j],
              comp,
              history,
              secondary(test, j, f, options, cc, history),
              warnings.get(j)));
    }
    Derived<PermeabilityChangeFit> ck =
        classing.isPresent()
            ? PermeabilityChangeIndex.fit(forCk)
            : Derived.absent(
                curve.isPresent()
                    ? "no preconsolidation pressure, so no normally consolidated increments"
                    : curve.absenceReason());
    return new TestReport(
        test.identifiers(),
        test.specimen(),
        test.drainage(),
        rule,
        options,
        hs,
        test.initialVoidRatio(),
        seating,
        test.initialDegreeOfSaturation(),
        test.finalDegreeOfSaturation(),
        test.warnings(),
        rows,
        curve,
        estimates,
        classing,
        cc,
        branches,
        ck);
  }

  private static Derived<Double> permeability(double cv, double mv, ReductionOptions options) {
    if (!(mv > 0)) {
      return Derived.absent(
          format(
              "m_v is not positive (%.4g m2/MN): the specimen did not respond in the usual sense",
              mv * 1e6));
    }
    try {
      return Derived.of(Permeability.fromConsolidation(cv, mv, options.waterUnitWeight()));
    } catch (IllegalArgumentException e) {
      return Derived.absent(e.getMessage());
    }
  }

  private static Derived<SecondaryCompressionResult> secondary(
      OedometerTest test,
      int j,
      Fitted f,
      ReductionOptions options,
      Derived<IndexFit> cc,
      Derived<IncrementClass> history) {
    for (CvMethod m : options.preferredMethods()) {
      Optional<CvEstimate> e =
          f.attempts().stream().filter(a -> a.method() == m).findFirst().flatMap(Attempt::estimate);
      if (e.isEmpty()) {
        continue;
      }
      OptionalDouble slope = Estimates.secondarySlope(e.get());
      OptionalDouble d100 = Estimates.d100(e.get());
      if (slope.isEmpty() || d100.isEmpty()) {
        continue;
      }
      try {
        double ep = test.voidRatioAtHeight(test.heightAtStartMetres(j) - d100.getAsDouble());
        boolean nc =
            history.isPresent() && history.value().get() == IncrementClass.NORMALLY_CONSOLIDATED;
        return Derived.of(
            nc && cc.isPresent()
                ? SecondaryCompression.of(
                    slope.getAsDouble(), test.heightOfSolidsMetres(), ep, cc.value().get().index())
                : SecondaryCompression.of(slope.getAsDouble(), test.heightOfSolidsMetres(), ep));
      } catch (IllegalArgumentException ex) {
        return Derived.absent("no secondary compression index: " + ex.getMessage());
      }
    }
    return Derived.absent(
        "no preferred method with a secondary slope (log-time or full-curve) gave a value");
  }

  private static ReductionWarning reductionWarning(FitWarning.Kind kind, String message) {
    return new ReductionWarning(Optional.empty(), new FitWarning(kind, message));
  }

  private static double mm(double metres) {
    return metres * 1000;
  }

  private static double perYear(double squareMetresPerSecond) {
    return squareMetresPerSecond * 365.25 * 86_400;
  }

  private static String format(String template, Object... values) {
    return String.format(Locale.ROOT, template, values);
  }
}
