package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The phase relations checked against each other: initial and final degree of saturation and the
 * two initial void ratios. Every expected value is computed here a second way, through the volumes
 * and masses of water, solids and voids (the definitions: S = V<sub>w</sub> / V<sub>v</sub>, w =
 * M<sub>w</sub> / M<sub>s</sub>, &rho; = M / V; any soil mechanics text, from memory), not through
 * the void ratio the library uses (S e = w G<sub>s</sub>, FACTS.md "Saturated: e = w G_s").
 *
 * <p>Specimen and settlements: the invented example of {@link OedometerTestTest} (20 mm high, 75 mm
 * across, G<sub>s</sub> 2.70, 120 g dry, final height 18.7 mm).
 */
class PhaseChecksTest {

  private static final double AREA = Math.PI * 0.075 * 0.075 / 4;
  private static final double DRY_MASS = 0.120;
  private static final double GS = 2.70;
  private static final double SOLIDS_VOLUME = DRY_MASS / (GS * 1000);

  /** Water content that fills a fraction s of the voids of a specimen of height h (by volumes). */
  private static double waterContentFor(double s, double height) {
    double voids = AREA * height - SOLIDS_VOLUME;
    return s * voids * 1000 / DRY_MASS;
  }

  private static Specimen.Builder base() {
    return Specimen.builder().initialHeight(0.020).diameter(0.075).specificGravity(GS);
  }

  private static OedometerTest test(Specimen specimen) {
    return OedometerTest.of(specimen, OedometerTestTest.increments());
  }

  private static List<DataWarning.Kind> kinds(OedometerTest t) {
    return t.warnings().stream().map(DataWarning::kind).toList();
  }

  @Test
  @DisplayName("S0 equals V_w / V_v from the volumes; warned above 1.05 only")
  void initialSaturation() {
    for (double target : new double[] {0.60, 0.98, 1.04, 1.06, 1.30}) {
      OedometerTest t =
          test(
              base().dryMass(DRY_MASS).initialWaterContent(waterContentFor(target, 0.020)).build());
      assertThat(t.initialDegreeOfSaturation().getAsDouble()).isCloseTo(target, within(1e-12));
      assertThat(kinds(t).contains(DataWarning.Kind.SATURATION_ABOVE_ONE))
          .as("S0 = %s", target)
          .isEqualTo(target > OedometerTest.SATURATION_WARNING_ABOVE);
    }
  }

  @Test
  @DisplayName("dry mass and final water content together: Sf from the final volumes, warned")
  void finalSaturation() {
    double finalHeight = test(base().dryMass(DRY_MASS).build()).finalHeightMetres();
    for (double target : new double[] {0.80, 0.96, 1.00, 1.04, 1.10}) {
      Specimen s =
          base().dryMass(DRY_MASS).finalWaterContent(waterContentFor(target, finalHeight)).build();
      assertThat(s.solidsBasis()).isEqualTo(Specimen.SolidsBasis.DRY_MASS);
      OedometerTest t = test(s);
      assertThat(t.finalDegreeOfSaturation().getAsDouble()).isCloseTo(target, within(1e-12));
      List<DataWarning.Kind> kinds = kinds(t);
      assertThat(kinds.contains(DataWarning.Kind.SATURATION_ABOVE_ONE))
          .as("Sf = %s", target)
          .isEqualTo(target > OedometerTest.SATURATION_WARNING_ABOVE);
      assertThat(kinds.contains(DataWarning.Kind.FINAL_SATURATION_BELOW_ONE))
          .as("Sf = %s", target)
          .isEqualTo(target < OedometerTest.FINAL_SATURATION_WARNING_BELOW);
      // The dry mass defines the solids whatever the final water content says.
      assertThat(t.heightOfSolidsMetres())
          .isEqualTo(test(base().dryMass(DRY_MASS).build()).heightOfSolidsMetres());
    }
  }

  @Test
  @DisplayName("Sf is absent when the final water content defines the solids (S_f = 1 assumed)")
  void finalSaturationNeedsDryMass() {
    OedometerTest byWater = test(base().finalWaterContent(0.40).build());
    assertThat(byWater.finalDegreeOfSaturation()).isEmpty();
    assertThat(test(base().dryMass(DRY_MASS).build()).finalDegreeOfSaturation()).isEmpty();
    assertThat(byWater.warnings()).isEmpty();
  }

  @Test
  @DisplayName("e0 from bulk density M / V agrees with e0 from the heights; 2 % of 1 + e0 warned")
  void voidRatioFromDensity() {
    double w0 = waterContentFor(0.95, 0.020);
    double consistentDensity = DRY_MASS * (1 + w0) / (AREA * 0.020); // rho = M / V
    OedometerTest agreeing =
        test(
            base()
                .dryMass(DRY_MASS)
                .initialWaterContent(w0)
                .bulkDensity(consistentDensity)
                .build());
    assertThat(agreeing.specimen().initialVoidRatioFromDensity().getAsDouble())
        .isCloseTo(agreeing.initialVoidRatio(), within(1e-12));
    assertThat(agreeing.warnings()).isEmpty();
    // 1 + e = G_s rho_w (1 + w0) / rho: a density 1 % high moves 1 + e by 1/1.01 - 1, about 1 %.
    for (double factor : new double[] {1.01, 0.99, 1.03, 0.97}) {
      OedometerTest t =
          test(
              base()
                  .dryMass(DRY_MASS)
                  .initialWaterContent(w0)
                  .bulkDensity(consistentDensity * factor)
                  .build());
      double relative = Math.abs(1 / factor - 1);
      assertThat(kinds(t).contains(DataWarning.Kind.VOID_RATIO_DISAGREEMENT))
          .as("density x %s", factor)
          .isEqualTo(relative > OedometerTest.VOID_RATIO_AGREEMENT);
    }
  }

  @Test
  @DisplayName("warnings name the values compared; finite for a void ratio near its least (2^-52)")
  void messages() {
    OedometerTest wet =
        test(base().dryMass(DRY_MASS).initialWaterContent(waterContentFor(1.25, 0.020)).build());
    DataWarning w = wet.warnings().get(0);
    assertThat(w.kind()).isEqualTo(DataWarning.Kind.SATURATION_ABOVE_ONE);
    assertThat(w.message()).contains("initial degree of saturation", "1.25", "Gs 2.7", "dry mass");

    // Dry mass a hair below filling the ring: e0 = H0 / H_s - 1 about 1e-15, S0 about 1e17.
    double nearlyFull = AREA * 0.020 * GS * 1000 * (1 - 1e-15);
    Specimen dense = base().dryMass(nearlyFull).initialWaterContent(50).build();
    OedometerTest t = OedometerTest.of(dense, List.of(LoadIncrement.of(0, 50e3, curveOfZero())));
    assertThat(t.initialDegreeOfSaturation().getAsDouble()).isGreaterThan(1e10);
    assertThat(t.warnings())
        .extracting(DataWarning::kind)
        .containsExactly(DataWarning.Kind.SATURATION_ABOVE_ONE);
    assertThat(t.warnings().get(0).message()).doesNotContain("Infinity", "NaN");
  }

  private static SettlementCurve curveOfZero() {
    return SettlementCurve.of(new double[] {0, 60}, new double[] {0, 0});
  }

  @Test
  @DisplayName("neither dry mass nor final water content: refused, message names both")
  void needsOne() {
    assertThatThrownBy(() -> base().build())
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("dry mass")
        .hasMessageContaining("final water content");
  }

  @Test
  @DisplayName("both solids inputs: equals, hashCode, toString and toBuilder keep both")
  void bothKept() {
    Specimen s = base().dryMass(DRY_MASS).finalWaterContent(0.41).build();
    assertThat(s.dryMassKilograms()).hasValue(DRY_MASS);
    assertThat(s.finalWaterContent()).hasValue(0.41);
    assertThat(s.finalVoidRatioFromWaterContent()).isEmpty();
    assertThat(s.toBuilder().build()).isEqualTo(s).hasSameHashCodeAs(s);
    assertThat(s).isNotEqualTo(base().dryMass(DRY_MASS).build());
    assertThat(s.toString()).contains("dry mass 0.12 kg", "final w 0.41");
  }

  @Test
  @DisplayName("property: consistent inputs (S0 <= 1, rho = M / V, Sf = 1) give no phase warning")
  void consistentInputsGiveNoWarning() {
    qt().forAll(
            doubles().between(0.0, 1.0),
            doubles().between(0.015, 0.040),
            doubles().between(0.0, 0.002))
        .checkAssert(
            (s0, height, settlement) -> {
              double voids = AREA * height - SOLIDS_VOLUME;
              if (!(voids > 0.05 * AREA * height)) {
                return; // only specimens with e0 above about 0.05
              }
              double w0 = s0 * voids * 1000 / DRY_MASS;
              double density = DRY_MASS * (1 + w0) / (AREA * height);
              double finalVoids = AREA * (height - settlement) - SOLIDS_VOLUME;
              double wf = finalVoids * 1000 / DRY_MASS;
              Specimen specimen =
                  Specimen.builder()
                      .initialHeight(height)
                      .diameter(0.075)
                      .specificGravity(GS)
                      .dryMass(DRY_MASS)
                      .initialWaterContent(w0)
                      .bulkDensity(density)
                      .finalWaterContent(wf)
                      .build();
              OedometerTest t =
                  OedometerTest.of(
                      specimen,
                      List.of(
                          LoadIncrement.of(
                              0,
                              100e3,
                              SettlementCurve.of(
                                  new double[] {0, 60, 86_400},
                                  new double[] {0, settlement / 2, settlement}))));
              assertThat(t.warnings()).isEmpty();
              assertThat(t.initialDegreeOfSaturation().getAsDouble()).isCloseTo(s0, within(1e-9));
              assertThat(t.finalDegreeOfSaturation().getAsDouble()).isCloseTo(1.0, within(1e-9));
            });
  }
}
