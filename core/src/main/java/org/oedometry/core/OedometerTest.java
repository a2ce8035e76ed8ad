package org.oedometry.core;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import org.oedometry.core.internal.Checks;
import org.oedometry.theory.Drainage;

/**
 * A whole one-dimensional consolidation (oedometer) test as an immutable value: the specimen, its
 * drainage, the ordered load increments with their readings, free-text identifiers, and the rule
 * for each increment's drainage path.
 *
 * <p><b>Heights.</b> Each increment's settlement curve is measured from the specimen height at the
 * start of that increment, with t = 0 at load application. The height at the start of increment i
 * is the initial height minus the final settlements of the increments before it, summed in order:
 * H<sub>start,0</sub> = H<sub>0</sub>, H<sub>start,i+1</sub> = H<sub>start,i</sub> -
 * s<sub>final,i</sub>. The final settlement of an increment is its last reading.
 *
 * <p><b>Checks.</b> At least one increment; the stress before each increment equals the stress
 * after the previous one (to a relative 1e-9); the specimen height stays above the height of solids
 * at the start and at every reading (void ratio &gt; 0), and every height and void ratio is a
 * finite double, so that the heights and void ratios this class gives are finite.
 *
 * <p><b>Defaults.</b> Double drainage ({@link Drainage#DOUBLE}), drainage path from the height at
 * 50 % consolidation ({@link DrainagePathRule#HEIGHT_AT_HALF_CONSOLIDATION}), empty identifiers.
 *
 * <p>Results derived from a test feed engineering decisions: they must be reviewed by a qualified
 * engineer, and local codes and standards govern.
 *
 * <p>Immutable and thread-safe. {@link #equals(Object)} is exact equality of every value.
 */
public final class OedometerTest {

  private static final double STRESS_MATCH_TOLERANCE = 1e-9;

  /**
   * Degree of saturation above which {@link #warnings()} reports {@link
   * DataWarning.Kind#SATURATION_ABOVE_ONE}: 1.05. Our choice, stated so that it can be reviewed: a
   * computed S a few percent above 1 is common from the scatter of water content, specific gravity,
   * height and dry mass (common practice), while 5 % above points at a wrong value.
   */
  public static final double SATURATION_WARNING_ABOVE = 1.05;

  /**
   * Final degree of saturation below which {@link #warnings()} reports {@link
   * DataWarning.Kind#FINAL_SATURATION_BELOW_ONE}: 0.95 (our choice, the mirror of {@link
   * #SATURATION_WARNING_ABOVE}). A specimen kept under water through the test should end saturated.
   */
  public static final double FINAL_SATURATION_WARNING_BELOW = 0.95;

  /**
   * Largest relative difference of 1 + e<sub>0</sub> between the initial void ratio from the
   * heights and the one from bulk density before {@link #warnings()} reports {@link
   * DataWarning.Kind#VOID_RATIO_DISAGREEMENT}: 0.02. 1 + e = G<sub>s</sub> &rho;<sub>w</sub> /
   * &rho;<sub>d</sub>, so this is a 2 % difference between two dry densities of the same specimen
   * (our choice, stated so that it can be reviewed).
   */
  public static final double VOID_RATIO_AGREEMENT = 0.02;

  private final Specimen specimen;
  private final Drainage drainage;
  private final DrainagePathRule drainagePathRule;
  private final TestIdentifiers identifiers;
  private final List<LoadIncrement> increments;
  private final double[] startHeights;
  private final double heightOfSolids;

  private OedometerTest(Builder b) {
    specimen = b.specimen;
    drainage = Objects.requireNonNull(b.drainage, "drainage must not be null");
    drainagePathRule =
        Objects.requireNonNull(b.drainagePathRule, "drainagePathRule must not be null");
    identifiers = Objects.requireNonNull(b.identifiers, "identifiers must not be null");
    for (int i = 0; i < b.increments.size(); i++) {
      Objects.requireNonNull(b.increments.get(i), "increment at index " + i + " is null");
    }
    increments = List.copyOf(b.increments);
    if (increments.isEmpty()) {
      throw new IllegalArgumentException("an oedometer test needs at least one load increment");
    }
    for (int i = 1; i < increments.size(); i++) {
      double before = increments.get(i).stressBeforePascals();
      double previousAfter = increments.get(i - 1).stressAfterPascals();
      if (!(Math.abs(before - previousAfter)
          <= STRESS_MATCH_TOLERANCE * Math.max(Math.abs(before), Math.abs(previousAfter)))) {
        throw new IllegalArgumentException(
            Checks.format(
                "stress before the increment at index %d (%s Pa) is not the stress after index"
                    + " %d (%s Pa): increments out of order or missing",
                i, Checks.number(before), i - 1, Checks.number(previousAfter)));
      }
    }
    startHeights = new double[increments.size() + 1];
    startHeights[0] = specimen.initialHeightMetres();
    for (int i = 0; i < increments.size(); i++) {
      SettlementCurve c = increments.get(i).curve();
      for (int j = 0; j < c.size(); j++) {
        if (!Double.isFinite(startHeights[i] - c.settlementMetres(j))) {
          throw new InvalidReadingException(
              Checks.format(
                  "settlement at reading %d of the increment at index %d (%s m) takes the"
                      + " specimen height (%s m at the start of the increment) beyond the range"
                      + " of a double",
                  j, i, Checks.number(c.settlementMetres(j)), Checks.number(startHeights[i])),
              i,
              j);
        }
      }
      startHeights[i + 1] = startHeights[i] - c.finalSettlementMetres();
    }
    double finalHeight = startHeights[increments.size()];
    if (!(finalHeight > 0)) {
      throw new IllegalArgumentException(
          Checks.format(
              "final specimen height (%s m) must be > 0: the settlements add up to more than the"
                  + " initial height (%s m)",
              Checks.number(finalHeight), Checks.number(startHeights[0])));
    }
    heightOfSolids =
        specimen.solidsBasis() == Specimen.SolidsBasis.DRY_MASS
            ? specimen.heightOfSolidsFromDryMass().getAsDouble()
            : finalHeight / (1 + specimen.finalVoidRatioFromWaterContent().getAsDouble());
    if (!(startHeights[0] > heightOfSolids)) {
      throw new IllegalArgumentException(
          Checks.format(
              "initial specimen height (%s m) is not above the height of solids (%s m) from the"
                  + " final water content: initial void ratio would be <= 0",
              Checks.number(startHeights[0]), Checks.number(heightOfSolids)));
    }
    checkVoidRatioFinite(startHeights[0], "initial specimen height");
    for (int i = 0; i < increments.size(); i++) {
      SettlementCurve c = increments.get(i).curve();
      for (int j = 0; j < c.size(); j++) {
        double h = startHeights[i] - c.settlementMetres(j);
        if (!(h > heightOfSolids)) {
          throw new InvalidReadingException(
              Checks.format(
                  "specimen height at reading %d of the increment at index %d (%s m) is not"
                      + " above the height of solids (%s m): void ratio would be <= 0",
                  j, i, Checks.number(h), Checks.number(heightOfSolids)),
              i,
              j);
        }
        if (!Double.isFinite(h / heightOfSolids)) {
          throw new InvalidReadingException(
              voidRatioBeyondRange(
                  Checks.format("specimen height at reading %d of the increment at index %d", j, i),
                  h),
              i,
              j);
        }
      }
    }
  }

  private void checkVoidRatioFinite(double height, String what) {
    if (!Double.isFinite(height / heightOfSolids)) {
      throw new IllegalArgumentException(voidRatioBeyondRange(what, height));
    }
  }

  private String voidRatioBeyondRange(String what, double height) {
    return Checks.format(
        "%s (%s m) is too large for a void ratio: more than the largest double times the height of"
            + " solids (%s m)",
        what, Checks.number(height), Checks.number(heightOfSolids));
  }

  /**
   * A test with the default drainage (double), drainage path rule (height at 50 % consolidation)
   * and empty identifiers.
   *
   * @param specimen the specimen; not null
   * @param increments the load increments in the order applied; at least one
   * @return the test
   * @throws IllegalArgumentException as {@link Builder#build()}
   * @throws NullPointerException if an argument or increment is null
   */
  public static OedometerTest of(Specimen specimen, List<LoadIncrement> increments) {
    return builder(specimen).increments(increments).build();
  }

  /**
   * A builder for a test of this specimen, with the defaults set.
   *
   * @param specimen the specimen; not null
   * @return the builder
   * @throws NullPointerException if the specimen is null
   */
  public static Builder builder(Specimen specimen) {
    return new Builder(specimen);
  }

  /**
   * A builder holding this test's values, to change some of them.
   *
   * @return a new builder
   */
  public Builder toBuilder() {
    return builder(specimen)
        .drainage(drainage)
        .drainagePathRule(drainagePathRule)
        .identifiers(identifiers)
        .increments(increments);
  }

  /**
   * The specimen.
   *
   * @return the specimen
   */
  public Specimen specimen() {
    return specimen;
  }

  /**
   * Drainage of the specimen (both faces by default).
   *
   * @return the drainage
   */
  public Drainage drainage() {
    return drainage;
  }

  /**
   * The rule for each increment's drainage path.
   *
   * @return the rule
   */
  public DrainagePathRule drainagePathRule() {
    return drainagePathRule;
  }

  /**
   * Free-text identifiers.
   *
   * @return the identifiers
   */
  public TestIdentifiers identifiers() {
    return identifiers;
  }

  /**
   * The load increments in the order applied.
   *
   * @return an unmodifiable list, at least one element
   */
  public List<LoadIncrement> increments() {
    return increments;
  }

  /**
   * Specimen height at the start of an increment.
   *
   * @param index increment index, 0-based
   * @return m
   * @throws IllegalArgumentException if the index is out of range
   */
  public double heightAtStartMetres(int index) {
    return startHeights[checkIndex(index)];
  }

  /**
   * Specimen height at the end (last reading) of an increment.
   *
   * @param index increment index, 0-based
   * @return m
   * @throws IllegalArgumentException if the index is out of range
   */
  public double heightAtEndMetres(int index) {
    return startHeights[checkIndex(index) + 1];
  }

  /**
   * Specimen height at the end of the last increment.
   *
   * @return m, &gt; 0
   */
  public double finalHeightMetres() {
    return startHeights[increments.size()];
  }

  /**
   * Height of solids H<sub>s</sub>: from the dry mass, or H<sub>f</sub> / (1 + w<sub>f</sub>
   * G<sub>s</sub>) from the final water content (see {@link Specimen}).
   *
   * @return m, &gt; 0 and below every height of the specimen during the test
   */
  public double heightOfSolidsMetres() {
    return heightOfSolids;
  }

  /**
   * Void ratio at a specimen height, e = H / H<sub>s</sub> - 1.
   *
   * @param heightMetres specimen height, m; finite, &gt; 0
   * @return dimensionless; may be &le; 0 for a height at or below the height of solids
   * @throws IllegalArgumentException if the height is not finite and positive, or so large that the
   *     void ratio overflows
   */
  public double voidRatioAtHeight(double heightMetres) {
    Checks.positive(heightMetres, "height", "m");
    double e = heightMetres / heightOfSolids - 1;
    if (!Double.isFinite(e)) {
      throw new IllegalArgumentException(
          Checks.format(
              "height (%s m) is too large for a void ratio", Checks.number(heightMetres)));
    }
    return e;
  }

  /**
   * Initial void ratio e<sub>0</sub> = H<sub>0</sub> / H<sub>s</sub> - 1.
   *
   * @return dimensionless, &gt; 0
   */
  public double initialVoidRatio() {
    return voidRatioAtHeight(startHeights[0]);
  }

  /**
   * Void ratio at the end (last reading) of an increment.
   *
   * @param index increment index, 0-based
   * @return dimensionless, &gt; 0
   * @throws IllegalArgumentException if the index is out of range
   */
  public double voidRatioAtEnd(int index) {
    return voidRatioAtHeight(heightAtEndMetres(index));
  }

  /**
   * Initial degree of saturation S<sub>0</sub> = w<sub>0</sub> G<sub>s</sub> / e<sub>0</sub> (the
   * phase relation S e = w G<sub>s</sub>). Values a little above 1 are common from measurement
   * error; much above 1 points at a wrong input ({@link #warnings()}).
   *
   * @return a ratio (1 for saturated; finite, since w &le; 100, G<sub>s</sub> &le; 6 and e = H /
   *     H<sub>s</sub> - 1 &ge; 2<sup>-52</sup>), or empty when no initial water content was given
   */
  public OptionalDouble initialDegreeOfSaturation() {
    OptionalDouble w0 = specimen.initialWaterContent();
    return w0.isPresent()
        ? saturation(w0.getAsDouble(), initialVoidRatio())
        : OptionalDouble.empty();
  }

  /**
   * Final degree of saturation S<sub>f</sub> = w<sub>f</sub> G<sub>s</sub> / e<sub>f</sub>, with
   * e<sub>f</sub> the void ratio at the last reading of the last increment from the heights and the
   * dry mass. Present only when the specimen has both a dry mass and a final water content: without
   * a dry mass the final water content defines the solids by assuming S<sub>f</sub> = 1, so there
   * is nothing to check. A specimen kept under water should end near 1 ({@link #warnings()}).
   *
   * @return a ratio (1 for saturated; finite, as for {@link #initialDegreeOfSaturation()}), or
   *     empty (see above)
   */
  public OptionalDouble finalDegreeOfSaturation() {
    OptionalDouble wf = specimen.finalWaterContent();
    return wf.isPresent() && specimen.solidsBasis() == Specimen.SolidsBasis.DRY_MASS
        ? saturation(wf.getAsDouble(), voidRatioAtEnd(increments.size() - 1))
        : OptionalDouble.empty();
  }

  private OptionalDouble saturation(double waterContent, double voidRatio) {
    return OptionalDouble.of(waterContent * specimen.specificGravity() / voidRatio);
  }

  /**
   * Remarks on valid but unusual input: those of the specimen ({@link
   * DataWarning.Kind#UNUSUAL_SPECIFIC_GRAVITY}), and the phase relations checked against each other
   * where the inputs allow:
   *
   * <ul>
   *   <li>{@link DataWarning.Kind#SATURATION_ABOVE_ONE}: S<sub>0</sub> or S<sub>f</sub> above
   *       {@value #SATURATION_WARNING_ABOVE};
   *   <li>{@link DataWarning.Kind#FINAL_SATURATION_BELOW_ONE}: S<sub>f</sub> below {@value
   *       #FINAL_SATURATION_WARNING_BELOW};
   *   <li>{@link DataWarning.Kind#VOID_RATIO_DISAGREEMENT}: 1 + e<sub>0</sub> from the heights and
   *       from the bulk density ({@link Specimen#initialVoidRatioFromDensity()}) more than {@value
   *       #VOID_RATIO_AGREEMENT} apart, relative.
   * </ul>
   *
   * <p>A warning never stops the reduction; each message names the values compared so that the
   * technician can find the wrong one.
   *
   * @return an unmodifiable list in the order above, empty when there is nothing to say
   */
  public List<DataWarning> warnings() {
    List<DataWarning> out = new ArrayList<>(specimen.warnings());
    OptionalDouble s0 = initialDegreeOfSaturation();
    if (s0.isPresent()) {
      saturationAbove(
          out,
          "initial",
          "S0",
          s0.getAsDouble(),
          "w0",
          specimen.initialWaterContent().getAsDouble(),
          "e0",
          initialVoidRatio());
    }
    OptionalDouble finalSaturation = finalDegreeOfSaturation();
    if (finalSaturation.isPresent()) {
      OptionalDouble wf = specimen.finalWaterContent();
      double ef = voidRatioAtEnd(increments.size() - 1);
      double sf = finalSaturation.getAsDouble();
      saturationAbove(out, "final", "Sf", sf, "wf", wf.getAsDouble(), "ef", ef);
      if (sf < FINAL_SATURATION_WARNING_BELOW) {
        out.add(
            new DataWarning(
                DataWarning.Kind.FINAL_SATURATION_BELOW_ONE,
                Checks.format(
                    "final degree of saturation Sf = wf Gs / ef = %s (wf %s, Gs %s, ef %s at the"
                        + " last reading) is below %s: a specimen kept under water should end"
                        + " saturated; check the final water content (water lost before"
                        + " weighing?), the dry mass and the final height",
                    Checks.brief(sf),
                    Checks.brief(wf.getAsDouble()),
                    Checks.brief(specimen.specificGravity()),
                    Checks.brief(ef),
                    Checks.brief(FINAL_SATURATION_WARNING_BELOW))));
      }
    }
    OptionalDouble fromDensity = specimen.initialVoidRatioFromDensity();
    if (fromDensity.isPresent()) {
      double w0 = specimen.initialWaterContent().getAsDouble(); // present with the density e0
      double e0 = initialVoidRatio();
      double other = fromDensity.getAsDouble();
      // Both void ratios are finite and > 0, so neither the difference nor 1 + e0 overflows.
      double difference = Math.abs(e0 - other) / (1 + e0);
      if (!(difference <= VOID_RATIO_AGREEMENT)) {
        out.add(
            new DataWarning(
                DataWarning.Kind.VOID_RATIO_DISAGREEMENT,
                Checks.format(
                    "initial void ratio from the heights (%s, %s) and from the bulk density (%s,"
                        + " with w0 %s and Gs %s) differ by more than %s of 1 + e0: check the"
                        + " bulk density, the initial water content, the specimen's size and %s",
                    Checks.brief(e0),
                    "with the " + solidsInput(),
                    Checks.brief(other),
                    Checks.brief(w0),
                    Checks.brief(specimen.specificGravity()),
                    Checks.brief(VOID_RATIO_AGREEMENT),
                    "the " + solidsInput())));
      }
    }
    return List.copyOf(out);
  }

  /** What defines the solids, as the messages name it. */
  private String solidsInput() {
    return specimen.solidsBasis() == Specimen.SolidsBasis.DRY_MASS
        ? "dry mass"
        : "final water content";
  }

  private void saturationAbove(
      List<DataWarning> out,
      String which,
      String symbol,
      double s,
      String waterSymbol,
      double waterContent,
      String voidSymbol,
      double voidRatio) {
    if (s > SATURATION_WARNING_ABOVE) {
      out.add(
          new DataWarning(
              DataWarning.Kind.SATURATION_ABOVE_ONE,
              Checks.format(
                  "%s degree of saturation %s = %s Gs / %s = %s (%s %s, Gs %s, %s %s) is above %s:"
                      + " more water than the voids can hold; check the water content, the"
                      + " specific gravity, the specimen's height and its %s",
                  which,
                  symbol,
                  waterSymbol,
                  voidSymbol,
                  Checks.brief(s),
                  waterSymbol,
                  Checks.brief(waterContent),
                  Checks.brief(specimen.specificGravity()),
                  voidSymbol,
                  Checks.brief(voidRatio),
                  Checks.brief(SATURATION_WARNING_ABOVE),
                  solidsInput())));
    }
  }

  private int checkIndex(int index) {
    if (index < 0 || index >= increments.size()) {
      throw new IllegalArgumentException(
          Checks.format("increment index %d is outside 0..%d", index, increments.size() - 1));
    }
    return index;
  }

  @Override
  public boolean equals(Object o) {
    if (this == o) {
      return true;
    }
    if (!(o instanceof OedometerTest)) {
      return false;
    }
    OedometerTest t = (OedometerTest) o;
    return specimen.equals(t.specimen)
        && drainage == t.drainage
        && drainagePathRule == t.drainagePathRule
        && identifiers.equals(t.identifiers)
        && increments.equals(t.increments);
  }

  @Override
  public int hashCode() {
    return Objects.hash(specimen, drainage, drainagePathRule, identifiers, increments);
  }

  /**
   * A one-line summary, e.g. {@code OedometerTest[sample 'S1', 5 increments 0.0 -> 400000.0 Pa,
   * DOUBLE drainage, HEIGHT_AT_HALF_CONSOLIDATION, H0 0.02 m -> 0.0183 m]}.
   *
   * @return the summary
   */
  @Override
  public String toString() {
    return Checks.format(
        "OedometerTest[sample '%s', %d increment%s %s -> %s Pa, %s drainage, %s, H0 %s m -> %s"
            + " m]",
        identifiers.sample(),
        increments.size(),
        increments.size() == 1 ? "" : "s",
        Checks.brief(increments.get(0).stressBeforePascals()),
        Checks.brief(increments.get(increments.size() - 1).stressAfterPascals()),
        drainage,
        drainagePathRule,
        Checks.brief(startHeights[0]),
        Checks.brief(finalHeightMetres()));
  }

  /**
   * Collects the parts of an {@link OedometerTest}; {@link #build()} validates them. Not
   * thread-safe; the test it builds is.
   */
  public static final class Builder {
    private final Specimen specimen;
    private Drainage drainage = Drainage.DOUBLE;
    private DrainagePathRule drainagePathRule = DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION;
    private TestIdentifiers identifiers = TestIdentifiers.none();
    private final List<LoadIncrement> increments = new ArrayList<>();

    private Builder(Specimen specimen) {
      this.specimen = Objects.requireNonNull(specimen, "specimen must not be null");
    }

    /**
     * Sets the drainage (default {@link Drainage#DOUBLE}).
     *
     * @param drainage double or single; not null
     * @return this builder
     */
    public Builder drainage(Drainage drainage) {
      this.drainage = drainage;
      return this;
    }

    /**
     * Sets the drainage path rule (default {@link DrainagePathRule#HEIGHT_AT_HALF_CONSOLIDATION}).
     *
     * @param rule the rule; not null
     * @return this builder
     */
    public Builder drainagePathRule(DrainagePathRule rule) {
      this.drainagePathRule = rule;
      return this;
    }

    /**
     * Sets the identifiers (default all empty).
     *
     * @param identifiers the identifiers; not null
     * @return this builder
     */
    public Builder identifiers(TestIdentifiers identifiers) {
      this.identifiers = identifiers;
      return this;
    }

    /**
     * Appends one increment.
     *
     * @param increment the next increment; not null (checked by {@link #build()})
     * @return this builder
     */
    public Builder addIncrement(LoadIncrement increment) {
      this.increments.add(increment);
      return this;
    }

    /**
     * Replaces the increments.
     *
     * @param increments the increments in the order applied; not null
     * @return this builder
     */
    public Builder increments(List<LoadIncrement> increments) {
      this.increments.clear();
      this.increments.addAll(increments);
      return this;
    }

    /**
     * Validates and builds the test.
     *
     * @return the test
     * @throws IllegalArgumentException if there is no increment, a stress before differs from the
     *     stress after the previous increment, the settlements exceed the initial height, a height
     *     reaches the height of solids, or a height or void ratio at a reading would exceed the
     *     range of a double (for a reading: its subclass {@link InvalidReadingException}, which
     *     names the increment and the reading)
     * @throws NullPointerException if the drainage, rule, identifiers or an increment is null
     */
    public OedometerTest build() {
      return new OedometerTest(this);
    }
  }
}
