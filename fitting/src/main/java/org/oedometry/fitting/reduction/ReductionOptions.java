package org.oedometry.fitting.reduction;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.oedometry.core.DrainagePathRule;
import org.oedometry.core.compressibility.DeformationBasis;
import org.oedometry.core.compressibility.Permeability;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FullCurveOptions;

/**
 * How {@link TestReduction} reduces a test: an immutable value with a builder and documented
 * defaults.
 *
 * <table>
 *   <caption>Options and their defaults</caption>
 *   <tr><th>option</th><th>default</th><th>meaning</th></tr>
 *   <tr><td>{@link #drainagePathRule()}</td><td>empty: the test's own rule</td><td>which height
 *       gives each increment's H<sub>dr</sub></td></tr>
 *   <tr><td>{@link #methods()}</td><td>all seven {@link CvMethod}s</td><td>the c<sub>v</sub>
 *       methods run on every increment</td></tr>
 *   <tr><td>{@link #waterUnitWeight()}</td><td>9810 N/m^3 (9.81 kN/m^3)</td><td>&gamma;<sub>w</sub>
 *       in k = c<sub>v</sub> m<sub>v</sub> &gamma;<sub>w</sub></td></tr>
 *   <tr><td>{@link #preferredMethods()}</td><td>log-time, then root-time, then full-curve</td>
 *       <td>the order in which an increment's c<sub>v</sub> (and the d<sub>0</sub>,
 *       d<sub>100</sub> and secondary slope that go with it) is taken for k, C<sub>k</sub>, the
 *       end-of-primary point, C<sub>&alpha;</sub> and the height at 50 % consolidation: the first
 *       method of the list that gave a value whose own Terzaghi curve fits the readings (no {@link
 *       org.oedometry.fitting.FitWarning.Kind#IMPLIED_CURVE_MISSES_READINGS}), else the first that
 *       gave a value (see {@link TestReduction})</td></tr>
 *   <tr><td>{@link #deformationBasis()}</td><td>{@link DeformationBasis#END_OF_PRIMARY}</td>
 *       <td>which settlement places each increment on the e &ndash; log &sigma;' curve: the end of
 *       primary consolidation (d<sub>100</sub> of the preferred method), or the last reading; an
 *       increment with no d<sub>100</sub> falls back to its last reading, with a warning</td></tr>
 *   <tr><td>{@link #disagreementFactor()}</td><td>1.5</td><td>log-time and root-time
 *       c<sub>v</sub> that differ by more than this factor raise a warning (root-time usually
 *       reads somewhat higher than log-time; 1.5 is a common-practice threshold, from memory, that
 *       flags only larger differences)</td></tr>
 *   <tr><td>{@link #primaryRatioLow()}, {@link #primaryRatioHigh()}</td><td>0.5 and 1.0</td>
 *       <td>a log-time primary compression ratio outside this range raises a warning (our choice:
 *       below 0.5 more than half the settlement is initial or secondary compression; above 1 the
 *       primary compression exceeds the whole settlement, which only a doubtful construction
 *       gives)</td></tr>
 *   <tr><td>{@link #fullCurveOptions()}</td><td>{@link FullCurveOptions#defaults()}</td><td>the
 *       options of the full-curve fit (e.g. its secondary onset); the other methods run with
 *       their defaults</td></tr>
 * </table>
 *
 * <p>Immutable and thread-safe.
 */
public final class ReductionOptions {

  /**
   * Default factor between log-time and root-time c<sub>v</sub> that raises a warning: {@value}.
   */
  public static final double DEFAULT_DISAGREEMENT_FACTOR = 1.5;

  /** Default lower end of the usual primary compression ratio: {@value}. */
  public static final double DEFAULT_PRIMARY_RATIO_LOW = 0.5;

  /** Default upper end of the usual primary compression ratio: {@value}. */
  public static final double DEFAULT_PRIMARY_RATIO_HIGH = 1.0;

  private static final ReductionOptions DEFAULTS = builder().build();

  private final Optional<DrainagePathRule> drainagePathRule;
  private final List<CvMethod> methods;
  private final double waterUnitWeight;
  private final List<CvMethod> preferredMethods;
  private final DeformationBasis deformationBasis;
  private final double disagreementFactor;
  private final double primaryRatioLow;
  private final double primaryRatioHigh;
  private final FullCurveOptions fullCurveOptions;

  private ReductionOptions(Builder b) {
    drainagePathRule = Optional.ofNullable(b.drainagePathRule);
    methods = checkedMethods(b.methods, "methods", false);
    preferredMethods = checkedMethods(b.preferredMethods, "preferred methods", true);
    if (!(b.waterUnitWeight > 0) || Double.isInfinite(b.waterUnitWeight)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "unit weight of water (%s N/m^3) must be finite and > 0",
              b.waterUnitWeight));
    }
    waterUnitWeight = b.waterUnitWeight;
    deformationBasis = Objects.requireNonNull(b.deformationBasis, "deformation basis");
    if (!(b.disagreementFactor > 1) || Double.isInfinite(b.disagreementFactor)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "disagreement factor (%s) must be finite and > 1",
              b.disagreementFactor));
    }
    disagreementFactor = b.disagreementFactor;
    if (!(b.primaryRatioLow >= 0
        && b.primaryRatioLow < b.primaryRatioHigh
        && Double.isFinite(b.primaryRatioHigh))) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "usual primary ratio range (%s to %s) must satisfy 0 <= low < high, both finite",
              b.primaryRatioLow,
              b.primaryRatioHigh));
    }
    primaryRatioLow = b.primaryRatioLow;
    primaryRatioHigh = b.primaryRatioHigh;
    fullCurveOptions = Objects.requireNonNull(b.fullCurveOptions, "full-curve options");
  }

  private static List<CvMethod> checkedMethods(
      List<CvMethod> given, String name, boolean emptyAllowed) {
    Objects.requireNonNull(given, name);
    EnumSet<CvMethod> seen = EnumSet.noneOf(CvMethod.class);
    for (int i = 0; i < given.size(); i++) {
      CvMethod m = given.get(i);
      if (m == null) {
        throw new IllegalArgumentException(
            String.format(Locale.ROOT, "%s: element at index %d is null", name, i));
      }
      if (!seen.add(m)) {
        throw new IllegalArgumentException(
            String.format(Locale.ROOT, "%s: %s at index %d is repeated", name, m, i));
      }
    }
    if (!emptyAllowed && given.isEmpty()) {
      throw new IllegalArgumentException(name + " must name at least one method (0 given)");
    }
    return List.copyOf(given);
  }

  /**
   * The defaults listed in the class description.
   *
   * @return the default options
   */
  public static ReductionOptions defaults() {
    return DEFAULTS;
  }

  /**
   * A builder holding the defaults.
   *
   * @return a new builder
   */
  public static Builder builder() {
    return new Builder();
  }

  /**
   * A builder holding these options, to change some of them.
   *
   * @return a new builder
   */
  public Builder toBuilder() {
    Builder b = new Builder();
    b.drainagePathRule = drainagePathRule.orElse(null);
    b.methods = new ArrayList<>(methods);
    b.waterUnitWeight = waterUnitWeight;
    b.preferredMethods = new ArrayList<>(preferredMethods);
    b.deformationBasis = deformationBasis;
    b.disagreementFactor = disagreementFactor;
    b.primaryRatioLow = primaryRatioLow;
    b.primaryRatioHigh = primaryRatioHigh;
    b.fullCurveOptions = fullCurveOptions;
    return b;
  }

  /**
   * The drainage path rule that overrides the test's own.
   *
   * @return the rule, or empty to use {@link org.oedometry.core.OedometerTest#drainagePathRule()}
   */
  public Optional<DrainagePathRule> drainagePathRule() {
    return drainagePathRule;
  }

  /**
   * The c<sub>v</sub> methods run on every increment, in report order.
   *
   * @return an unmodifiable list, at least one method, no repeats
   */
  public List<CvMethod> methods() {
    return methods;
  }

  /**
   * Unit weight of water &gamma;<sub>w</sub>.
   *
   * @return N/m^3, finite, &gt; 0
   */
  public double waterUnitWeight() {
    return waterUnitWeight;
  }

  /**
   * The order in which an increment's c<sub>v</sub>, d<sub>100</sub> and secondary slope are taken
   * for the derived quantities (see the class description). Methods not in {@link #methods()} are
   * skipped.
   *
   * @return an unmodifiable list, no repeats; may be empty (then nothing is derived from
   *     c<sub>v</sub>)
   */
  public List<CvMethod> preferredMethods() {
    return preferredMethods;
  }

  /**
   * Which settlement places each increment on the e &ndash; log &sigma;' curve.
   *
   * @return the basis
   */
  public DeformationBasis deformationBasis() {
    return deformationBasis;
  }

  /**
   * Factor between log-time and root-time c<sub>v</sub> above which they are reported as
   * disagreeing.
   *
   * @return a factor, finite, &gt; 1
   */
  public double disagreementFactor() {
    return disagreementFactor;
  }

  /**
   * Lower end of the usual log-time primary compression ratio.
   *
   * @return dimensionless, &ge; 0
   */
  public double primaryRatioLow() {
    return primaryRatioLow;
  }

  /**
   * Upper end of the usual log-time primary compression ratio.
   *
   * @return dimensionless, &gt; {@link #primaryRatioLow()}
   */
  public double primaryRatioHigh() {
    return primaryRatioHigh;
  }

  /**
   * Options of the full-curve fit.
   *
   * @return the options
   */
  public FullCurveOptions fullCurveOptions() {
    return fullCurveOptions;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof ReductionOptions r
        && drainagePathRule.equals(r.drainagePathRule)
        && methods.equals(r.methods)
        && Double.compare(waterUnitWeight, r.waterUnitWeight) == 0
        && preferredMethods.equals(r.preferredMethods)
        && deformationBasis == r.deformationBasis
        && Double.compare(disagreementFactor, r.disagreementFactor) == 0
        && Double.compare(primaryRatioLow, r.primaryRatioLow) == 0
        && Double.compare(primaryRatioHigh, r.primaryRatioHigh) == 0
        && fullCurveOptions.equals(r.fullCurveOptions);
  }

  @Override
  public int hashCode() {
    return Objects.hash(
        drainagePathRule,
        methods,
        waterUnitWeight,
        preferredMethods,
        deformationBasis,
        disagreementFactor,
        primaryRatioLow,
        primaryRatioHigh,
        fullCurveOptions);
  }

  /**
   * All options on one line.
   *
   * @return e.g. {@code ReductionOptions[drainage path rule: the test's own, methods [LOG_TIME,
   *     ...], ...]}
   */
  @Override
  public String toString() {
    return String.format(
        Locale.ROOT,
        "ReductionOptions[drainage path rule: %s, methods %s, gamma_w %s N/m^3, preferred %s,"
            + " basis %s, disagreement factor %s, usual primary ratio %s..%s, full-curve %s]",
        drainagePathRule.map(Enum::name).orElse("the test's own"),
        methods,
        waterUnitWeight,
        preferredMethods,
        deformationBasis,
        disagreementFactor,
        primaryRatioLow,
        primaryRatioHigh,
        fullCurveOptions);
  }

  /** Collects options; {@link #build()} validates them. Not thread-safe; the options are. */
  public static final class Builder {
    private DrainagePathRule drainagePathRule;
    private List<CvMethod> methods = List.of(CvMethod.values());
    private double waterUnitWeight = Permeability.STANDARD_WATER_UNIT_WEIGHT;
    private List<CvMethod> preferredMethods =
        List.of(CvMethod.LOG_TIME, CvMethod.ROOT_TIME, CvMethod.FULL_CURVE);
    private DeformationBasis deformationBasis = DeformationBasis.END_OF_PRIMARY;
    private double disagreementFactor = DEFAULT_DISAGREEMENT_FACTOR;
    private double primaryRatioLow = DEFAULT_PRIMARY_RATIO_LOW;
    private double primaryRatioHigh = DEFAULT_PRIMARY_RATIO_HIGH;
    private FullCurveOptions fullCurveOptions = FullCurveOptions.defaults();

    private Builder() {}

    /**
     * Sets the options of the full-curve fit (default {@link FullCurveOptions#defaults()}).
     *
     * @param options the options; not null
     * @return this builder
     */
    public Builder fullCurveOptions(FullCurveOptions options) {
      this.fullCurveOptions = options;
      return this;
    }

    /**
     * Overrides the test's drainage path rule.
     *
     * @param rule the rule; null to use the test's own (the default)
     * @return this builder
     */
    public Builder drainagePathRule(DrainagePathRule rule) {
      this.drainagePathRule = rule;
      return this;
    }

    /**
     * Sets the c<sub>v</sub> methods to run (default all seven, in {@link CvMethod} order).
     *
     * @param methods at least one, no repeats; copied by {@link #build()}
     * @return this builder
     */
    public Builder methods(List<CvMethod> methods) {
      this.methods = new ArrayList<>(Objects.requireNonNull(methods, "methods"));
      return this;
    }

    /**
     * Sets the unit weight of water (default 9810 N/m^3).
     *
     * @param newtonsPerCubicMetre &gamma;<sub>w</sub>, N/m^3; finite, &gt; 0
     * @return this builder
     */
    public Builder waterUnitWeight(double newtonsPerCubicMetre) {
      this.waterUnitWeight = newtonsPerCubicMetre;
      return this;
    }

    /**
     * Sets the order in which c<sub>v</sub> and its d<sub>100</sub> are taken for the derived
     * quantities (default log-time, root-time, full-curve).
     *
     * @param methods no repeats; may be empty
     * @return this builder
     */
    public Builder preferredMethods(List<CvMethod> methods) {
      this.preferredMethods = new ArrayList<>(Objects.requireNonNull(methods, "methods"));
      return this;
    }

    /**
     * Sets the settlement that places each increment on the e &ndash; log &sigma;' curve (default
     * end of primary).
     *
     * @param basis the basis; not null
     * @return this builder
     */
    public Builder deformationBasis(DeformationBasis basis) {
      this.deformationBasis = basis;
      return this;
    }

    /**
     * Sets the factor between log-time and root-time c<sub>v</sub> above which they disagree
     * (default 1.5).
     *
     * @param factor finite, &gt; 1
     * @return this builder
     */
    public Builder disagreementFactor(double factor) {
      this.disagreementFactor = factor;
      return this;
    }

    /**
     * Sets the usual range of the log-time primary compression ratio (default 0.5 to 1.0).
     *
     * @param low lower end, &ge; 0
     * @param high upper end, finite, &gt; low
     * @return this builder
     */
    public Builder usualPrimaryRatio(double low, double high) {
      this.primaryRatioLow = low;
      this.primaryRatioHigh = high;
      return this;
    }

    /**
     * Validates and builds the options.
     *
     * @return the options
     * @throws IllegalArgumentException if a method list holds null or a repeat, no method is
     *     selected, &gamma;<sub>w</sub> is not finite and positive, the factor is not above 1, or
     *     the primary ratio range is empty or not finite
     * @throws NullPointerException if the deformation basis or the full-curve options are null
     */
    public ReductionOptions build() {
      return new ReductionOptions(this);
    }
  }
}
