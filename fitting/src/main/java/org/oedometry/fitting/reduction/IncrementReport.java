package org.oedometry.fitting.reduction;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.oedometry.core.LoadDirection;
import org.oedometry.core.compressibility.DeformationBasis;
import org.oedometry.core.compressibility.Derived;
import org.oedometry.core.compressibility.IncrementClass;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.core.compressibility.SecondaryCompressionResult;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FitWarning;
import org.oedometry.fitting.LogTimeResult;
import org.oedometry.fitting.RootTimeResult;

/**
 * One row of a {@link TestReport}: what the reduction found for one load increment.
 *
 * <p>Settlements (d<sub>0</sub>, d<sub>100</sub>) are measured from the specimen height at the
 * start of the increment, positive for compression. All values SI. Absent values come with a
 * reason.
 *
 * @param index increment number, from 0, in the order applied
 * @param stressBeforePascals vertical stress before the increment, Pa
 * @param stressAfterPascals vertical stress after the increment, Pa
 * @param heightAtStartMetres specimen height at the start of the increment, m
 * @param heightAtEndMetres specimen height at the last reading of the increment, m
 * @param drainagePath the drainage path every c<sub>v</sub> of this increment belongs to, and how
 *     it was chosen
 * @param methods one outcome per selected method, in the order of {@link
 *     ReductionOptions#methods()}
 * @param preferredMethod the method whose c<sub>v</sub>, d<sub>100</sub> and k feed the derived
 *     quantities (the first of {@link ReductionOptions#preferredMethods()} that gave a value whose
 *     own curve fits the readings, else the first that gave a value; see {@link TestReduction});
 *     empty when none gave a value
 * @param deformationBasis the settlement that placed this increment on the e &ndash; log &sigma;'
 *     curve
 * @param compressibility void ratios, a<sub>v</sub>, m<sub>v</sub> and mid-increment stresses of
 *     the increment, or why they are absent; where no construction found &sigma;'<sub>p</sub>, the
 *     class it carries ({@link IncrementCompressibility#stressHistory()}) is taken against the
 *     largest stress of the test in its place and is not a finding: the increment's class is {@code
 *     stressHistory}
 * @param stressHistory the class of the increment relative to &sigma;'<sub>p</sub> (OC or NC), or
 *     why it is absent (no construction found &sigma;'<sub>p</sub>, as for a single increment)
 * @param secondaryCompression C<sub>&alpha;e</sub>, C<sub>&alpha;&epsilon;</sub> and (for normally
 *     consolidated increments) C<sub>&alpha;</sub>/C<sub>c</sub>, or why they are absent
 * @param warnings typed warnings, empty when there is nothing to say
 */
public record IncrementReport(
    int index,
    double stressBeforePascals,
    double stressAfterPascals,
    double heightAtStartMetres,
    double heightAtEndMetres,
    DrainagePathChoice drainagePath,
    List<MethodOutcome> methods,
    Optional<CvMethod> preferredMethod,
    DeformationBasis deformationBasis,
    Derived<IncrementCompressibility> compressibility,
    Derived<IncrementClass> stressHistory,
    Derived<SecondaryCompressionResult> secondaryCompression,
    List<ReductionWarning> warnings) {

  /**
   * Validates and copies.
   *
   * @param index increment number, &ge; 0
   * @param stressBeforePascals Pa; finite, &ge; 0
   * @param stressAfterPascals Pa; finite, &gt; 0
   * @param heightAtStartMetres m; finite, &gt; 0
   * @param heightAtEndMetres m; finite, &gt; 0
   * @param drainagePath not null
   * @param methods not null, no null element; copied
   * @param preferredMethod not null; when present, a method of {@code methods} with a value
   * @param deformationBasis not null
   * @param compressibility not null
   * @param stressHistory not null
   * @param secondaryCompression not null
   * @param warnings not null, no null element; copied
   * @throws IllegalArgumentException if a number is out of range, or the preferred method is not
   *     one with a value
   * @throws NullPointerException if an argument or element is null
   */
  public IncrementReport {
    if (index < 0) {
      throw new IllegalArgumentException("increment index (" + index + ") must be >= 0");
    }
    if (!(stressBeforePascals >= 0) || Double.isInfinite(stressBeforePascals)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT, "stress before (%s Pa) must be finite and >= 0", stressBeforePascals));
    }
    for (double v : new double[] {stressAfterPascals, heightAtStartMetres, heightAtEndMetres}) {
      if (!(v > 0) || Double.isInfinite(v)) {
        throw new IllegalArgumentException(
            String.format(Locale.ROOT, "stress after and heights (%s) must be finite and > 0", v));
      }
    }
    Objects.requireNonNull(drainagePath, "drainage path");
    methods = List.copyOf(methods);
    Objects.requireNonNull(preferredMethod, "preferred method");
    Objects.requireNonNull(deformationBasis, "deformation basis");
    Objects.requireNonNull(compressibility, "compressibility");
    Objects.requireNonNull(stressHistory, "stress history");
    Objects.requireNonNull(secondaryCompression, "secondary compression");
    warnings = List.copyOf(warnings);
    if (preferredMethod.isPresent()) {
      CvMethod p = preferredMethod.get();
      if (methods.stream().noneMatch(m -> m.method() == p && m.estimate().isPresent())) {
        throw new IllegalArgumentException(
            "preferred method " + p + " is not a method of this increment with a value");
      }
    }
  }

  /**
   * Whether the increment adds or removes load.
   *
   * @return loading or unloading
   */
  public LoadDirection direction() {
    return stressAfterPascals > stressBeforePascals
        ? LoadDirection.LOADING
        : LoadDirection.UNLOADING;
  }

  /**
   * The outcome of one method.
   *
   * @param method a method
   * @return its outcome, or empty when the method was not selected
   */
  public Optional<MethodOutcome> outcome(CvMethod method) {
    return methods.stream().filter(m -> m.method() == method).findFirst();
  }

  /**
   * The estimate of one method.
   *
   * @param method a method
   * @return its result, or empty when it was not selected or gave no value
   */
  public Optional<CvEstimate> estimate(CvMethod method) {
    return outcome(method).flatMap(MethodOutcome::estimate);
  }

  /**
   * c<sub>v</sub> by one method.
   *
   * @param method a method
   * @return m^2/s, or empty when not selected or no value
   */
  public OptionalDouble cv(CvMethod method) {
    Optional<CvEstimate> e = estimate(method);
    return e.isPresent() ? OptionalDouble.of(e.get().cv()) : OptionalDouble.empty();
  }

  /**
   * The log-time construction, when it gave a value.
   *
   * @return the result, or empty
   */
  public Optional<LogTimeResult> logTime() {
    return estimate(CvMethod.LOG_TIME).map(LogTimeResult.class::cast);
  }

  /**
   * The root-time construction, when it gave a value.
   *
   * @return the result, or empty
   */
  public Optional<RootTimeResult> rootTime() {
    return estimate(CvMethod.ROOT_TIME).map(RootTimeResult.class::cast);
  }

  /**
   * t50 of the log-time construction.
   *
   * @return s, or empty
   */
  public OptionalDouble t50() {
    Optional<LogTimeResult> r = logTime();
    return r.isPresent() ? OptionalDouble.of(r.get().t50()) : OptionalDouble.empty();
  }

  /**
   * t90 of the root-time construction.
   *
   * @return s, or empty
   */
  public OptionalDouble t90() {
    Optional<RootTimeResult> r = rootTime();
    return r.isPresent() ? OptionalDouble.of(r.get().t90()) : OptionalDouble.empty();
  }

  /**
   * c<sub>v</sub> of the preferred method.
   *
   * @return m^2/s, or empty
   */
  public OptionalDouble preferredCv() {
    return preferredMethod.isPresent() ? cv(preferredMethod.get()) : OptionalDouble.empty();
  }

  /**
   * d<sub>0</sub> of the preferred method.
   *
   * @return m from the start of the increment, or empty (none preferred, or the method gives no
   *     d<sub>0</sub>)
   */
  public OptionalDouble d0() {
    return preferredMethod.isPresent()
        ? Estimates.d0(estimate(preferredMethod.get()).orElseThrow())
        : OptionalDouble.empty();
  }

  /**
   * d<sub>100</sub> of the preferred method.
   *
   * @return m from the start of the increment, or empty
   */
  public OptionalDouble d100() {
    return preferredMethod.isPresent()
        ? Estimates.d100(estimate(preferredMethod.get()).orElseThrow())
        : OptionalDouble.empty();
  }

  /**
   * Primary compression ratio of the log-time construction, else of the root-time construction.
   *
   * @return dimensionless, or empty (neither gave one; it needs the reading at t = 0)
   */
  public OptionalDouble primaryRatio() {
    Optional<LogTimeResult> l = logTime();
    if (l.isPresent() && l.get().primaryRatio().isPresent()) {
      return l.get().primaryRatio();
    }
    Optional<RootTimeResult> r = rootTime();
    return r.isPresent() ? r.get().primaryRatio() : OptionalDouble.empty();
  }

  /**
   * m<sub>v</sub> of the increment.
   *
   * @return 1/Pa, or empty
   */
  public OptionalDouble mv() {
    return compressibility.value().isPresent()
        ? OptionalDouble.of(compressibility.value().get().mv())
        : OptionalDouble.empty();
  }

  /**
   * k from the preferred c<sub>v</sub>.
   *
   * @return m/s, or empty
   */
  public OptionalDouble permeability() {
    if (preferredMethod.isEmpty()) {
      return OptionalDouble.empty();
    }
    Optional<Double> k = outcome(preferredMethod.get()).orElseThrow().permeability().value();
    return k.isPresent() ? OptionalDouble.of(k.get()) : OptionalDouble.empty();
  }

  /**
   * Whether a warning of this kind is attached.
   *
   * @param kind a kind
   * @return true if any warning has it
   */
  public boolean hasWarning(FitWarning.Kind kind) {
    return warnings.stream().anyMatch(w -> w.kind() == kind);
  }

  /**
   * A one-line summary.
   *
   * @return e.g. {@code IncrementReport[3: 50000.0 -> 100000.0 Pa, H_dr 0.0098 m, preferred
   *     LOG_TIME, 2 warnings]}
   */
  @Override
  public String toString() {
    return String.format(
        Locale.ROOT,
        "IncrementReport[%d: %s -> %s Pa, H_dr %s m, preferred %s, %d warnings]",
        index,
        stressBeforePascals,
        stressAfterPascals,
        drainagePath.drainagePathMetres(),
        preferredMethod.map(Enum::name).orElse("none"),
        warnings.size());
  }
}
