package org.oedometry.core;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import org.oedometry.core.internal.Checks;

/**
 * The specimen of an oedometer test: its initial height, its cross-section and the amount of its
 * solids.
 *
 * <p>The solids are given in one of two ways ({@link SolidsBasis}):
 *
 * <ul>
 *   <li>by dry mass M<sub>s</sub> and specific gravity G<sub>s</sub>: height of solids
 *       H<sub>s</sub> = M<sub>s</sub> / (G<sub>s</sub> &rho;<sub>w</sub> A), known before the test;
 *   <li>by final water content w<sub>f</sub> and G<sub>s</sub>, for a specimen saturated at the end
 *       of the test: e<sub>f</sub> = w<sub>f</sub> G<sub>s</sub>, and H<sub>s</sub> = H<sub>f</sub>
 *       / (1 + e<sub>f</sub>) once the final height H<sub>f</sub> is known (see {@link
 *       OedometerTest#heightOfSolidsMetres()}).
 * </ul>
 *
 * <p>A lab usually measures both (the final water content from the final wet mass and the oven-dry
 * mass). Both may be given: the dry mass is then the basis, and the final water content is kept as
 * a check, the final degree of saturation S<sub>f</sub> = w<sub>f</sub> G<sub>s</sub> /
 * e<sub>f</sub> ({@link OedometerTest#finalDegreeOfSaturation()}).
 *
 * <p>Void ratio at any height H: e = H / H<sub>s</sub> - 1. Water density &rho;<sub>w</sub> =
 * {@value #WATER_DENSITY} kg/m<sup>3</sup> (common practice; pure water is 999.97 kg/m<sup>3</sup>
 * at 4 &deg;C and 998.2 at 20 &deg;C, a difference below 0.2 %).
 *
 * <p>Specific gravity: values outside 1.0 &lt; G<sub>s</sub> &le; 6.0 are rejected (solids no
 * denser than water cannot settle; no soil mineral is denser than about 5.3, from memory); values
 * outside 2.0 to 3.2 are accepted with a {@link DataWarning.Kind#UNUSUAL_SPECIFIC_GRAVITY} warning,
 * since organic soils and peat lie below that range.
 *
 * <p>Initial water content w<sub>0</sub> and bulk density &rho; are optional: with w<sub>0</sub>
 * the test reports the initial degree of saturation S<sub>0</sub> = w<sub>0</sub> G<sub>s</sub> /
 * e<sub>0</sub>; with both, {@link #initialVoidRatioFromDensity()} gives an independent
 * e<sub>0</sub> = G<sub>s</sub> &rho;<sub>w</sub> (1 + w<sub>0</sub>) / &rho; - 1 to compare.
 *
 * <p>Immutable and thread-safe. Build with {@link #builder()}.
 */
public final class Specimen {

  /** Density of water used in phase relations, kg/m<sup>3</sup>. */
  public static final double WATER_DENSITY = 1000.0;

  /**
   * Largest water content accepted, as a ratio: 100 (10 000 %), far above any soil (peats reach
   * about 10 to 20, from memory); a guard against absurd input, not a plausibility check.
   */
  public static final double MAX_WATER_CONTENT = 100.0;

  /** How the amount of solids is given. */
  public enum SolidsBasis {
    /** Dry mass of the specimen and specific gravity of the solids. */
    DRY_MASS,
    /** Final water content of the saturated specimen and specific gravity of the solids. */
    FINAL_WATER_CONTENT
  }

  private final double initialHeight;
  private final double area;
  private final OptionalDouble diameter;
  private final double specificGravity;
  private final SolidsBasis solidsBasis;
  private final OptionalDouble dryMass;
  private final OptionalDouble finalWaterContent;
  private final OptionalDouble initialWaterContent;
  private final OptionalDouble bulkDensity;

  private Specimen(Builder b) {
    initialHeight = Checks.positive(b.initialHeight, "initial height", "m");
    if (b.diameter.isPresent() == b.area.isPresent()) {
      throw new IllegalArgumentException(
          b.diameter.isPresent()
              ? "give either the diameter or the area of the specimen, not both"
              : "the specimen needs a diameter or an area");
    }
    if (b.diameter.isPresent()) {
      double d = Checks.positive(b.diameter.getAsDouble(), "diameter", "m");
      diameter = OptionalDouble.of(d);
      area = Math.PI * d * d / 4;
      if (!(area > 0) || area == Double.POSITIVE_INFINITY) {
        throw new IllegalArgumentException(
            Checks.format(
                "diameter (%s m) gives an area pi D^2 / 4 outside the range of a positive double",
                Checks.number(d)));
      }
    } else {
      diameter = OptionalDouble.empty();
      area = Checks.positive(b.area.getAsDouble(), "area", "m^2");
    }
    specificGravity = Checks.specificGravity(b.specificGravity);
    if (b.dryMass.isEmpty() && b.finalWaterContent.isEmpty()) {
      throw new IllegalArgumentException(
          "the specimen needs its dry mass or its final water content (or both)");
    }
    finalWaterContent =
        b.finalWaterContent.isPresent()
            ? OptionalDouble.of(
                waterContent(b.finalWaterContent.getAsDouble(), "final water content", false))
            : OptionalDouble.empty();
    if (b.dryMass.isPresent()) {
      solidsBasis = SolidsBasis.DRY_MASS;
      double solidsValue = Checks.positive(b.dryMass.getAsDouble(), "dry mass", "kg");
      dryMass = OptionalDouble.of(solidsValue);
      double hs = solidsValue / (specificGravity * WATER_DENSITY * area);
      if (hs == Double.POSITIVE_INFINITY) {
        throw new IllegalArgumentException(
            Checks.format(
                "dry mass (%s kg) over G_s rho_w A (%s kg/m) gives a height of solids beyond the"
                    + " range of a double",
                Checks.number(solidsValue), Checks.number(specificGravity * WATER_DENSITY * area)));
      }
      if (!(hs > 0) || !Double.isFinite(initialHeight / hs)) {
        throw new IllegalArgumentException(
            Checks.format(
                "height of solids (%s m) from the dry mass (%s kg) is too small to compute a"
                    + " void ratio",
                Checks.number(hs), Checks.number(solidsValue)));
      }
      if (!(hs < initialHeight)) {
        throw new IllegalArgumentException(
            Checks.format(
                "height of solids (%s m) from the dry mass (%s kg) is not less than the initial"
                    + " height (%s m): check the dry mass, specific gravity and size",
                Checks.number(hs), Checks.number(solidsValue), Checks.number(initialHeight)));
      }
    } else {
      solidsBasis = SolidsBasis.FINAL_WATER_CONTENT;
      dryMass = OptionalDouble.empty();
    }
    initialWaterContent =
        b.initialWaterContent.isPresent()
            ? OptionalDouble.of(
                waterContent(b.initialWaterContent.getAsDouble(), "initial water content", true))
            : OptionalDouble.empty();
    bulkDensity =
        b.bulkDensity.isPresent()
            ? OptionalDouble.of(
                Checks.positive(b.bulkDensity.getAsDouble(), "bulk density", "kg/m^3"))
            : OptionalDouble.empty();
    if (initialWaterContent.isPresent() && bulkDensity.isPresent()) {
      double e0 = initialVoidRatioFromDensity().getAsDouble();
      if (!(e0 > 0) || e0 == Double.POSITIVE_INFINITY) {
        throw new IllegalArgumentException(
            Checks.format(
                "bulk density (%s kg/m^3) with initial water content %s and specific gravity"
                    + " %s gives a void ratio %s, not finite and > 0",
                Checks.number(bulkDensity.getAsDouble()),
                Checks.number(initialWaterContent.getAsDouble()),
                Checks.number(specificGravity),
                Double.isFinite(e0) ? "of " + Checks.number(e0) : "beyond the range of a double"));
      }
    }
  }

  private static double waterContent(double w, String name, boolean zeroAllowed) {
    if (!(zeroAllowed ? w >= 0 : w > 0) || !(w <= MAX_WATER_CONTENT)) {
      throw new IllegalArgumentException(
          Checks.format(
              "%s (%s) must be %s and <= %s (a ratio: 0.35 for 35 %%)",
              name,
              Checks.number(w),
              zeroAllowed ? ">= 0" : "> 0",
              Checks.number(MAX_WATER_CONTENT)));
    }
    return w + 0.0;
  }

  /**
   * A new builder; every quantity in SI units.
   *
   * @return an empty builder
   */
  public static Builder builder() {
    return new Builder();
  }

  /**
   * Initial height H<sub>0</sub>.
   *
   * @return m, &gt; 0
   */
  public double initialHeightMetres() {
    return initialHeight;
  }

  /**
   * Cross-sectional area A (from the diameter when the diameter was given).
   *
   * @return m<sup>2</sup>, &gt; 0
   */
  public double areaSquareMetres() {
    return area;
  }

  /**
   * Diameter, when it was given (rather than the area).
   *
   * @return m, or empty
   */
  public OptionalDouble diameterMetres() {
    return diameter;
  }

  /**
   * Specific gravity of the solids G<sub>s</sub>.
   *
   * @return dimensionless, in (1.0, 6.0]
   */
  public double specificGravity() {
    return specificGravity;
  }

  /**
   * How the solids were given.
   *
   * @return the basis
   */
  public SolidsBasis solidsBasis() {
    return solidsBasis;
  }

  /**
   * Dry mass M<sub>s</sub>, when it was given (it is then the {@link SolidsBasis#DRY_MASS basis}).
   *
   * @return kg, or empty
   */
  public OptionalDouble dryMassKilograms() {
    return dryMass;
  }

  /**
   * Final water content w<sub>f</sub> (a ratio, 0.35 for 35 %), when it was given: the basis of the
   * solids when no dry mass was given, otherwise a check on the final state.
   *
   * @return ratio, or empty
   */
  public OptionalDouble finalWaterContent() {
    return finalWaterContent;
  }

  /**
   * Initial water content w<sub>0</sub>, a ratio (0.35 for 35 %).
   *
   * @return ratio, or empty if not given
   */
  public OptionalDouble initialWaterContent() {
    return initialWaterContent;
  }

  /**
   * Initial bulk density &rho;.
   *
   * @return kg/m<sup>3</sup>, or empty if not given
   */
  public OptionalDouble bulkDensityKilogramsPerCubicMetre() {
    return bulkDensity;
  }

  /**
   * Height of solids from the dry mass, H<sub>s</sub> = M<sub>s</sub> / (G<sub>s</sub>
   * &rho;<sub>w</sub> A). With the final-water-content basis it needs the final height: see {@link
   * OedometerTest#heightOfSolidsMetres()}.
   *
   * @return m, or empty for the final-water-content basis
   */
  public OptionalDouble heightOfSolidsFromDryMass() {
    return solidsBasis == SolidsBasis.DRY_MASS
        ? OptionalDouble.of(dryMass.getAsDouble() / (specificGravity * WATER_DENSITY * area))
        : OptionalDouble.empty();
  }

  /**
   * Final void ratio of a specimen saturated at the end of the test, e<sub>f</sub> = w<sub>f</sub>
   * G<sub>s</sub>, when it is the basis of the solids (no dry mass given).
   *
   * @return dimensionless, or empty for the dry-mass basis (the final void ratio then comes from
   *     the heights, {@link OedometerTest#voidRatioAtEnd(int)}, and w<sub>f</sub> checks it)
   */
  public OptionalDouble finalVoidRatioFromWaterContent() {
    return solidsBasis == SolidsBasis.FINAL_WATER_CONTENT
        ? OptionalDouble.of(finalWaterContent.getAsDouble() * specificGravity)
        : OptionalDouble.empty();
  }

  /**
   * Initial void ratio from bulk density and initial water content, an independent check on the one
   * from heights: e<sub>0</sub> = G<sub>s</sub> &rho;<sub>w</sub> (1 + w<sub>0</sub>) / &rho; - 1.
   *
   * @return dimensionless, or empty unless both the bulk density and the initial water content were
   *     given
   */
  public OptionalDouble initialVoidRatioFromDensity() {
    if (initialWaterContent.isEmpty() || bulkDensity.isEmpty()) {
      return OptionalDouble.empty();
    }
    return OptionalDouble.of(
        specificGravity
                * WATER_DENSITY
                * (1 + initialWaterContent.getAsDouble())
                / bulkDensity.getAsDouble()
            - 1);
  }

  /**
   * Remarks on valid but unusual values.
   *
   * @return an unmodifiable list, empty when there is nothing to say
   */
  public List<DataWarning> warnings() {
    if (specificGravity < 2.0 || specificGravity > 3.2) {
      return List.of(
          new DataWarning(
              DataWarning.Kind.UNUSUAL_SPECIFIC_GRAVITY,
              Checks.format(
                  "specific gravity of solids %s is outside 2.0 to 3.2, the usual range of"
                      + " mineral soils: check it (organic soils and peat lie lower)",
                  Checks.number(specificGravity))));
    }
    return List.of();
  }

  /**
   * A builder with the same values, to change one of them.
   *
   * @return a new builder
   */
  public Builder toBuilder() {
    Builder b = new Builder().initialHeight(initialHeight).specificGravity(specificGravity);
    if (diameter.isPresent()) {
      b.diameter(diameter.getAsDouble());
    } else {
      b.area(area);
    }
    b.dryMass = dryMass;
    b.finalWaterContent = finalWaterContent;
    b.initialWaterContent = initialWaterContent;
    b.bulkDensity = bulkDensity;
    return b;
  }

  @Override
  public boolean equals(Object o) {
    if (this == o) {
      return true;
    }
    if (!(o instanceof Specimen)) {
      return false;
    }
    Specimen s = (Specimen) o;
    return Double.compare(initialHeight, s.initialHeight) == 0
        && Double.compare(area, s.area) == 0
        && diameter.equals(s.diameter)
        && Double.compare(specificGravity, s.specificGravity) == 0
        && dryMass.equals(s.dryMass)
        && finalWaterContent.equals(s.finalWaterContent)
        && initialWaterContent.equals(s.initialWaterContent)
        && bulkDensity.equals(s.bulkDensity);
  }

  @Override
  public int hashCode() {
    return Objects.hash(
        initialHeight,
        area,
        diameter,
        specificGravity,
        dryMass,
        finalWaterContent,
        initialWaterContent,
        bulkDensity);
  }

  /**
   * A one-line summary in SI units, e.g. {@code Specimen[H0 0.02 m, D 0.075 m, Gs 2.7, dry mass
   * 0.12 kg]}.
   *
   * @return the summary
   */
  @Override
  public String toString() {
    StringBuilder text = new StringBuilder("Specimen[H0 ").append(initialHeight).append(" m, ");
    if (diameter.isPresent()) {
      text.append("D ").append(diameter.getAsDouble()).append(" m");
    } else {
      text.append("A ").append(area).append(" m^2");
    }
    text.append(", Gs ").append(specificGravity);
    dryMass.ifPresent(m -> text.append(", dry mass ").append(m).append(" kg"));
    finalWaterContent.ifPresent(w -> text.append(", final w ").append(w));
    initialWaterContent.ifPresent(w -> text.append(", initial w ").append(w));
    bulkDensity.ifPresent(rho -> text.append(", bulk density ").append(rho).append(" kg/m^3"));
    return text.append(']').toString();
  }

  /**
   * Collects the values of a {@link Specimen}; {@link #build()} validates them. Not thread-safe;
   * the specimen it builds is.
   */
  public static final class Builder {
    private double initialHeight = Double.NaN;
    private OptionalDouble diameter = OptionalDouble.empty();
    private OptionalDouble area = OptionalDouble.empty();
    private double specificGravity = Double.NaN;
    private OptionalDouble dryMass = OptionalDouble.empty();
    private OptionalDouble finalWaterContent = OptionalDouble.empty();
    private OptionalDouble initialWaterContent = OptionalDouble.empty();
    private OptionalDouble bulkDensity = OptionalDouble.empty();

    private Builder() {}

    /**
     * Sets the initial height H<sub>0</sub>.
     *
     * @param metres m; finite, &gt; 0 (checked by {@link #build()})
     * @return this builder
     */
    public Builder initialHeight(double metres) {
      this.initialHeight = metres;
      return this;
    }

    /**
     * Sets the diameter (give the diameter or the area).
     *
     * @param metres m; finite, &gt; 0 (checked by {@link #build()})
     * @return this builder
     */
    public Builder diameter(double metres) {
      this.diameter = OptionalDouble.of(metres);
      return this;
    }

    /**
     * Sets the cross-sectional area (give the diameter or the area).
     *
     * @param squareMetres m<sup>2</sup>; finite, &gt; 0 (checked by {@link #build()})
     * @return this builder
     */
    public Builder area(double squareMetres) {
      this.area = OptionalDouble.of(squareMetres);
      return this;
    }

    /**
     * Sets the specific gravity of the solids G<sub>s</sub>.
     *
     * @param gs dimensionless; 1.0 &lt; G<sub>s</sub> &le; 6.0 (checked by {@link #build()})
     * @return this builder
     */
    public Builder specificGravity(double gs) {
      this.specificGravity = gs;
      return this;
    }

    /**
     * Sets the oven-dry mass of the specimen M<sub>s</sub> (give the dry mass, the final water
     * content or both; with both, the dry mass is the basis of the solids).
     *
     * @param kilograms kg; finite, &gt; 0 (checked by {@link #build()})
     * @return this builder
     */
    public Builder dryMass(double kilograms) {
      this.dryMass = OptionalDouble.of(kilograms);
      return this;
    }

    /**
     * Sets the final water content w<sub>f</sub> of the specimen at the end of the test (give the
     * dry mass, the final water content or both): without a dry mass the specimen is taken as
     * saturated at the end (e<sub>f</sub> = w<sub>f</sub> G<sub>s</sub>); with one, w<sub>f</sub>
     * checks the final degree of saturation.
     *
     * @param ratio a ratio, 0.35 for 35 %; &gt; 0 and &le; {@value #MAX_WATER_CONTENT} (checked by
     *     {@link #build()})
     * @return this builder
     */
    public Builder finalWaterContent(double ratio) {
      this.finalWaterContent = OptionalDouble.of(ratio);
      return this;
    }

    /**
     * Sets the initial water content w<sub>0</sub> (optional).
     *
     * @param ratio a ratio, 0.35 for 35 %; &ge; 0 and &le; {@value #MAX_WATER_CONTENT} (checked by
     *     {@link #build()})
     * @return this builder
     */
    public Builder initialWaterContent(double ratio) {
      this.initialWaterContent = OptionalDouble.of(ratio);
      return this;
    }

    /**
     * Sets the initial bulk density &rho; (optional).
     *
     * @param kilogramsPerCubicMetre kg/m<sup>3</sup>; finite, &gt; 0 (checked by {@link #build()})
     * @return this builder
     */
    public Builder bulkDensity(double kilogramsPerCubicMetre) {
      this.bulkDensity = OptionalDouble.of(kilogramsPerCubicMetre);
      return this;
    }

    /**
     * Validates the values and builds the specimen.
     *
     * @return the specimen
     * @throws IllegalArgumentException if a value is missing, out of range or not finite, if both
     *     or neither of diameter and area are given, if neither the dry mass nor the final water
     *     content is given, if the dry mass gives a height of solids not less than the initial
     *     height (or so small that the void ratio overflows), or if the bulk density and initial
     *     water content give a void ratio that is not finite and &gt; 0; the message names the
     *     value
     */
    public Specimen build() {
      return new Specimen(this);
    }
  }
}
