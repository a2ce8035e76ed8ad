package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Worked example (invented numbers): H0 = 20.00 mm, D = 75.0 mm, dry mass 120.0 g, G_s = 2.70. By
 * hand: A = pi 75^2 / 4 = 4417.86 mm^2; V = A H0 = 88 357.3 mm^3; V_s = M_s / (G_s rho_w) = 120 /
 * 2.70 = 44.444 cm^3 = 44 444.4 mm^3; H_s = V_s / A = 10.0602 mm; e0 = (V - V_s) / V_s = 0.98804.
 */
class SpecimenTest {

  static Specimen example() {
    return Specimen.builder()
        .initialHeight(0.020)
        .diameter(0.075)
        .specificGravity(2.70)
        .dryMass(0.120)
        .initialWaterContent(0.36)
        .build();
  }

  @Test
  @DisplayName("H_s = M_s / (G_s rho_w A) against the hand-worked volumes (invented example)")
  void heightOfSolidsWorkedExample() {
    Specimen s = example();
    // Independent calculation through volumes, not through H_s.
    double area = Math.PI * 0.075 * 0.075 / 4;
    double volume = area * 0.020;
    double volumeOfSolids = 0.120 / (2.70 * 1000);
    assertThat(s.areaSquareMetres()).isCloseTo(4417.86e-6, within(0.01e-6));
    assertThat(s.heightOfSolidsFromDryMass().getAsDouble())
        .isCloseTo(volumeOfSolids / area, within(1e-15))
        .isCloseTo(0.0100602, within(1e-7));
    double e0ByVolumes = (volume - volumeOfSolids) / volumeOfSolids;
    assertThat(e0ByVolumes).isCloseTo(0.98804, within(1e-5));
    assertThat(s.finalVoidRatioFromWaterContent()).isEmpty();
    assertThat(s.finalWaterContent()).isEmpty();
    assertThat(s.dryMassKilograms()).hasValue(0.120);
    assertThat(s.solidsBasis()).isEqualTo(Specimen.SolidsBasis.DRY_MASS);
  }

  @Test
  @DisplayName("saturated soil: e = w G_s (standard phase relation)")
  void finalVoidRatioIsWaterContentTimesSpecificGravity() {
    Specimen s =
        Specimen.builder()
            .initialHeight(0.019)
            .area(0.003)
            .specificGravity(2.65)
            .finalWaterContent(0.40)
            .build();
    assertThat(s.finalVoidRatioFromWaterContent().getAsDouble()).isCloseTo(1.06, within(1e-15));
    assertThat(s.heightOfSolidsFromDryMass()).isEmpty();
    assertThat(s.diameterMetres()).isEmpty();
    assertThat(s.areaSquareMetres()).isEqualTo(0.003);
  }

  @Test
  @DisplayName("e0 from bulk density: rho_d = rho / (1 + w0), e0 = G_s rho_w / rho_d - 1")
  void voidRatioFromDensity() {
    // Bulk density chosen by hand from the worked example: rho = M_s (1 + w0) / V
    // = 0.120 * 1.36 / 88 357.3e-9 = 1847.05 kg/m^3, so e0 must come back as 0.98804.
    Specimen s = example().toBuilder().bulkDensity(0.120 * 1.36 / 88_357.29e-9).build();
    assertThat(s.initialVoidRatioFromDensity().getAsDouble()).isCloseTo(0.98804, within(1e-5));
    assertThat(example().initialVoidRatioFromDensity()).isEmpty();
  }

  @Test
  @DisplayName("G_s outside 2.0-3.2 is accepted with a warning; outside (1.0, 6.0] rejected")
  void specificGravityRange() {
    assertThat(example().warnings()).isEmpty();
    Specimen peat = example().toBuilder().specificGravity(1.6).build();
    assertThat(peat.warnings())
        .singleElement()
        .satisfies(
            w -> {
              assertThat(w.kind()).isEqualTo(DataWarning.Kind.UNUSUAL_SPECIFIC_GRAVITY);
              assertThat(w.message()).startsWith("specific gravity of solids 1.6 is outside");
            });
    assertThat(example().toBuilder().specificGravity(3.5).build().warnings()).hasSize(1);
    assertThatThrownBy(() -> example().toBuilder().specificGravity(0.9).build())
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("specific gravity of solids (0.9) must be > 1.0 and <= 6.0");
    assertThatThrownBy(() -> example().toBuilder().specificGravity(Double.NaN).build())
        .hasMessage("specific gravity of solids (NaN) must be > 1.0 and <= 6.0");
  }

  @Test
  @DisplayName("bad input catalogue: each message names the value")
  void badInput() {
    assertThatThrownBy(() -> example().toBuilder().initialHeight(-0.02).build())
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("initial height (-0.02 m) must be finite and > 0");
    assertThatThrownBy(() -> example().toBuilder().area(1e-3).build())
        .hasMessage("give either the diameter or the area of the specimen, not both");
    assertThatThrownBy(() -> Specimen.builder().initialHeight(0.02).specificGravity(2.7).build())
        .hasMessage("the specimen needs a diameter or an area");
    assertThatThrownBy(
            () ->
                Specimen.builder().initialHeight(0.02).diameter(0.075).specificGravity(2.7).build())
        .hasMessage("the specimen needs its dry mass or its final water content (or both)");
    assertThatThrownBy(() -> example().toBuilder().dryMass(0.5).build())
        .hasMessageStartingWith("height of solids (0.04191")
        .hasMessageContaining("is not less than the initial height (0.02 m)");
    assertThatThrownBy(() -> example().toBuilder().diameter(Double.POSITIVE_INFINITY).build())
        .hasMessage("diameter (Infinity m) must be finite and > 0");
    assertThatThrownBy(() -> example().toBuilder().initialWaterContent(-0.1).build())
        .hasMessage(
            "initial water content (-0.1) must be >= 0 and <= 100.0 (a ratio: 0.35 for 35 %)");
    assertThatThrownBy(
            () ->
                Specimen.builder()
                    .initialHeight(0.02)
                    .area(0.003)
                    .specificGravity(2.7)
                    .finalWaterContent(1e308)
                    .build())
        .hasMessage(
            "final water content (1.0E308) must be > 0 and <= 100.0 (a ratio: 0.35 for 35 %)");
    assertThatThrownBy(() -> example().toBuilder().dryMass(1e-320).build())
        .hasMessageContaining("is too small to compute a void ratio");
    assertThatThrownBy(() -> example().toBuilder().bulkDensity(4000).build())
        .hasMessageStartingWith("bulk density (4000.0 kg/m^3) with initial water content 0.36")
        .hasMessageEndingWith("not finite and > 0");
  }

  @Test
  @DisplayName("value semantics, toBuilder and toString")
  void valueSemantics() {
    Specimen a = example();
    assertThat(a).isEqualTo(example()).hasSameHashCodeAs(example());
    assertThat(a.toBuilder().build()).isEqualTo(a);
    assertThat(a).isNotEqualTo(a.toBuilder().initialHeight(0.0201).build());
    assertThat(a.toString())
        .isEqualTo("Specimen[H0 0.02 m, D 0.075 m, Gs 2.7, dry mass 0.12 kg, initial w 0.36]");
  }

  @Test
  @DisplayName(
      "values the library derives beyond the double range (area, H_s, e0 from density) are"
          + " refused naming the input, never quoting Infinity (project rule: no infinity leaves"
          + " the library, messages included)")
  void derivedValuesBeyondTheDoubleRange() {
    // pi (1e200)^2 / 4 overflows; 0.05 kg over 2700 kg/m^3 x 4.9e-324 m^2 overflows;
    // G_s rho_w (1 + w0) / rho with rho = 1e-310 kg/m^3 overflows (IEEE 754 double range).
    assertThatThrownBy(() -> example().toBuilder().diameter(1e200).build())
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "diameter (1.0E200 m) gives an area pi D^2 / 4 outside the range of a positive double");
    assertThatThrownBy(
            () ->
                Specimen.builder()
                    .initialHeight(0.02)
                    .area(Double.MIN_VALUE)
                    .specificGravity(2.7)
                    .dryMass(0.05)
                    .build())
        .hasMessageStartingWith("dry mass (0.05 kg) over G_s rho_w A")
        .hasMessageEndingWith("gives a height of solids beyond the range of a double");
    assertThatThrownBy(() -> example().toBuilder().bulkDensity(1e-310).build())
        .hasMessage(
            "bulk density (1.0E-310 kg/m^3) with initial water content 0.36 and specific gravity"
                + " 2.7 gives a void ratio beyond the range of a double, not finite and > 0");
  }
}
