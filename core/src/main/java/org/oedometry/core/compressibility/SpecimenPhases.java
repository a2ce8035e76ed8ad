package org.oedometry.core.compressibility;

import java.util.Locale;

/**
 * Phase relations of an oedometer specimen: its initial height and the height of its solids, from
 * which the void ratio at any settlement follows.
 *
 * <p>The height of solids H<sub>s</sub> is the height the solid particles would occupy with no
 * voids. With H the current specimen height, the void ratio is e = H / H<sub>s</sub> &minus; 1.
 * Written against the initial state (height H<sub>0</sub>, void ratio e<sub>0</sub>) the same
 * relation reads e = e<sub>0</sub> &minus; (1 + e<sub>0</sub>) &Delta;H / H<sub>0</sub>, and the
 * axial strain is &epsilon; = &Delta;H / H<sub>0</sub>. H<sub>s</sub> can come from three sources,
 * each a factory:
 *
 * <ul>
 *   <li>{@link #fromDryMass}: H<sub>s</sub> = M<sub>s</sub> / (G<sub>s</sub> &rho;<sub>w</sub> A)
 *       (ASTM D2435, ISO 17892-5);
 *   <li>{@link #fromFinalWaterContent}: back-calculated from the final water content of a saturated
 *       specimen, e<sub>f</sub> = w<sub>f</sub> G<sub>s</sub> and H<sub>s</sub> = H<sub>f</sub> /
 *       (1 + e<sub>f</sub>);
 *   <li>{@link #fromInitialVoidRatio}: H<sub>s</sub> = H<sub>0</sub> / (1 + e<sub>0</sub>).
 * </ul>
 *
 * <p>Settlement is positive for compression and measured from the start of the test. Immutable and
 * thread-safe. Results feed engineering decisions: they must be reviewed by a qualified engineer,
 * and local codes and standards govern.
 *
 * @param initialHeight specimen height H<sub>0</sub> at the start of the test, m; finite, &gt; 0
 * @param solidsHeight height of solids H<sub>s</sub>, m; finite, &gt; 0 and &lt; H<sub>0</sub>
 */
public record SpecimenPhases(double initialHeight, double solidsHeight) {

  /** Density of water used by {@link #fromDryMass(double, double, double, double)}: 1000 kg/m^3. */
  public static final double WATER_DENSITY = 1000.0;

  /**
   * Validates the heights.
   *
   * @param initialHeight specimen height H<sub>0</sub> at the start of the test, m; finite, &gt; 0
   * @param solidsHeight height of solids H<sub>s</sub>, m; finite, &gt; 0 and &lt; H<sub>0</sub>
   * @throws IllegalArgumentException if a height is not finite and positive, if the height of
   *     solids is not below the initial height (which would mean e<sub>0</sub> &le; 0), or if
   *     H<sub>0</sub> / H<sub>s</sub> is beyond the double range
   */
  public SpecimenPhases {
    Checks.positive("initial height", initialHeight, " m");
    Checks.positive("height of solids", solidsHeight, " m");
    if (!(solidsHeight < initialHeight)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "height of solids (%s m) must be below the initial height (%s m)",
              solidsHeight,
              initialHeight));
    }
    Checks.representable(
        initialHeight / solidsHeight,
        "initial height (%s m) over height of solids (%s m), the initial void ratio plus 1,",
        initialHeight,
        solidsHeight);
  }

  /**
   * Phases from the initial height and the height of solids.
   *
   * @param initialHeight H<sub>0</sub>, m; finite, &gt; 0
   * @param solidsHeight H<sub>s</sub>, m; finite, 0 &lt; H<sub>s</sub> &lt; H<sub>0</sub>
   * @return the phases
   * @throws IllegalArgumentException as the canonical constructor
   */
  public static SpecimenPhases of(double initialHeight, double solidsHeight) {
    return new SpecimenPhases(initialHeight, solidsHeight);
  }

  /**
   * Phases from the oven-dry mass of the specimen: H<sub>s</sub> = M<sub>s</sub> / (G<sub>s</sub>
   * &rho;<sub>w</sub> A), with &rho;<sub>w</sub> = {@value #WATER_DENSITY} kg/m^3.
   *
   * @param initialHeight H<sub>0</sub>, m; finite, &gt; 0
   * @param dryMass oven-dry mass of solids M<sub>s</sub>, kg; finite, &gt; 0
   * @param specificGravity particle density relative to water G<sub>s</sub>, dimensionless; finite,
   *     &gt; 0
   * @param area specimen cross-section area A, m^2; finite, &gt; 0
   * @return the phases
   * @throws IllegalArgumentException if an argument is not finite and positive, or the resulting
   *     height of solids is not below the initial height
   */
  public static SpecimenPhases fromDryMass(
      double initialHeight, double dryMass, double specificGravity, double area) {
    Checks.positive("initial height", initialHeight, " m");
    Checks.positive("dry mass", dryMass, " kg");
    Checks.positive("specific gravity", specificGravity, "");
    Checks.positive("area", area, " m^2");
    return new SpecimenPhases(initialHeight, dryMass / (specificGravity * WATER_DENSITY * area));
  }

  /**
   * Phases back-calculated from the final water content of a saturated specimen: e<sub>f</sub> =
   * w<sub>f</sub> G<sub>s</sub>, H<sub>s</sub> = H<sub>f</sub> / (1 + e<sub>f</sub>), with
   * H<sub>f</sub> = H<sub>0</sub> &minus; final settlement.
   *
   * @param initialHeight H<sub>0</sub>, m; finite, &gt; 0
   * @param finalSettlement settlement at the end of the test (after any unloading), m; finite, &ge;
   *     0 and &lt; H<sub>0</sub>
   * @param finalWaterContent w<sub>f</sub> as a ratio (0.35 for 35 %); finite, &gt; 0
   * @param specificGravity G<sub>s</sub>, dimensionless; finite, &gt; 0
   * @return the phases
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static SpecimenPhases fromFinalWaterContent(
      double initialHeight,
      double finalSettlement,
      double finalWaterContent,
      double specificGravity) {
    Checks.positive("initial height", initialHeight, " m");
    Checks.nonNegative("final settlement", finalSettlement, " m");
    if (!(finalSettlement < initialHeight)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "final settlement (%s m) must be below the initial height (%s m)",
              finalSettlement,
              initialHeight));
    }
    Checks.positive("final water content", finalWaterContent, "");
    Checks.positive("specific gravity", specificGravity, "");
    double finalVoidRatio = saturatedVoidRatio(finalWaterContent, specificGravity);
    return new SpecimenPhases(
        initialHeight, (initialHeight - finalSettlement) / (1.0 + finalVoidRatio));
  }

  /**
   * Phases from a known initial void ratio: H<sub>s</sub> = H<sub>0</sub> / (1 + e<sub>0</sub>).
   *
   * @param initialHeight H<sub>0</sub>, m; finite, &gt; 0
   * @param initialVoidRatio e<sub>0</sub>, dimensionless; finite, &gt; 0
   * @return the phases
   * @throws IllegalArgumentException if an argument is not finite and positive
   */
  public static SpecimenPhases fromInitialVoidRatio(double initialHeight, double initialVoidRatio) {
    Checks.positive("initial height", initialHeight, " m");
    Checks.positive("initial void ratio", initialVoidRatio, "");
    return new SpecimenPhases(initialHeight, initialHeight / (1.0 + initialVoidRatio));
  }

  /**
   * Void ratio of a saturated soil from its water content: e = w G<sub>s</sub>.
   *
   * @param waterContent w as a ratio (0.35 for 35 %); finite, &gt; 0
   * @param specificGravity G<sub>s</sub>, dimensionless; finite, &gt; 0
   * @return e, dimensionless
   * @throws IllegalArgumentException if an argument is not finite and positive
   */
  public static double saturatedVoidRatio(double waterContent, double specificGravity) {
    Checks.positive("water content", waterContent, "");
    Checks.positive("specific gravity", specificGravity, "");
    return waterContent * specificGravity;
  }

  /**
   * Initial void ratio e<sub>0</sub> = H<sub>0</sub> / H<sub>s</sub> &minus; 1.
   *
   * @return e<sub>0</sub>, dimensionless, &gt; 0
   */
  public double initialVoidRatio() {
    return initialHeight / solidsHeight - 1.0;
  }

  /**
   * Void ratio after a settlement: e = (H<sub>0</sub> &minus; &Delta;H) / H<sub>s</sub> &minus; 1.
   *
   * @param settlement &Delta;H from the start of the test, m, positive for compression; finite and
   *     such that the void ratio stays &gt; 0 (&Delta;H &lt; H<sub>0</sub> &minus; H<sub>s</sub>)
   * @return e, dimensionless, &gt; 0
   * @throws IllegalArgumentException if the settlement is not finite or would leave no voids, or
   *     the void ratio is beyond the double range (a swelling of the order of 10<sup>308</sup> m)
   */
  public double voidRatio(double settlement) {
    Checks.finite("settlement", settlement, " m");
    if (!(settlement < initialHeight - solidsHeight)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "settlement (%s m) must be below initial height minus height of solids (%s m)",
              settlement,
              initialHeight - solidsHeight));
    }
    return Checks.representable(
        (initialHeight - settlement) / solidsHeight - 1.0,
        "void ratio after a settlement of %s m (initial height %s m, height of solids %s m)",
        settlement,
        initialHeight,
        solidsHeight);
  }

  /**
   * Axial strain &epsilon; = &Delta;H / H<sub>0</sub>, positive for compression.
   *
   * @param settlement &Delta;H from the start of the test, m; finite
   * @return &epsilon;, dimensionless
   * @throws IllegalArgumentException if the settlement is not finite, or the strain is beyond the
   *     double range
   */
  public double axialStrain(double settlement) {
    Checks.finite("settlement", settlement, " m");
    return Checks.representable(
        settlement / initialHeight,
        "axial strain of a settlement of %s m over an initial height of %s m",
        settlement,
        initialHeight);
  }
}
