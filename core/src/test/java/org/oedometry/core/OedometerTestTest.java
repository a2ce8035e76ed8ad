package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.theory.Drainage;

/**
 * Uses the invented worked example of {@link SpecimenTest} (H_s = 10.0602 mm, e0 = 0.98804) with
 * three increments settling 0.5 mm, 1.0 mm and -0.2 mm (swelling on unloading).
 */
class OedometerTestTest {

  static SettlementCurve curve(double finalMetres) {
    return SettlementCurve.of(
        new double[] {0, 60, 600, 86_400},
        new double[] {0, 0.4 * finalMetres, 0.8 * finalMetres, finalMetres});
  }

  static List<LoadIncrement> increments() {
    return List.of(
        LoadIncrement.of(0, 50e3, curve(0.0005)),
        LoadIncrement.of(50e3, 100e3, curve(0.0010)),
        LoadIncrement.of(100e3, 25e3, curve(-0.0002)));
  }

  static OedometerTest example() {
    return OedometerTest.of(SpecimenTest.example(), increments());
  }

  @Test
  @DisplayName("heights: initial height minus the final settlements of earlier increments")
  void heights() {
    OedometerTest t = example();
    assertThat(t.heightAtStartMetres(0)).isEqualTo(0.020);
    assertThat(t.heightAtStartMetres(1)).isCloseTo(0.0195, within(1e-15));
    assertThat(t.heightAtEndMetres(1)).isCloseTo(0.0185, within(1e-15));
    assertThat(t.heightAtStartMetres(2)).isEqualTo(t.heightAtEndMetres(1));
    assertThat(t.finalHeightMetres()).isCloseTo(0.0187, within(1e-15));
  }

  @Test
  @DisplayName("void ratios: e = H / H_s - 1 against the hand-worked example (invented numbers)")
  void voidRatios() {
    OedometerTest t = example();
    assertThat(t.heightOfSolidsMetres()).isCloseTo(0.0100602, within(1e-7));
    assertThat(t.initialVoidRatio()).isCloseTo(0.98804, within(1e-5));
    // Second, independent form (FACTS.md): e = e0 - (1 + e0) dH / H0.
    double e0 = t.initialVoidRatio();
    assertThat(t.voidRatioAtEnd(1)).isCloseTo(e0 - (1 + e0) * 0.0015 / 0.020, within(1e-12));
    assertThat(t.voidRatioAtEnd(2)).isCloseTo(e0 - (1 + e0) * 0.0013 / 0.020, within(1e-12));
  }

  @Test
  @DisplayName("saturated final state: e_f = w_f G_s, with w_f from the water mass by hand")
  void finalWaterContentBasisAgrees() {
    OedometerTest byDryMass = example();
    // Saturated at the end: water volume = void volume = (H_f - H_s) A; w = M_w / M_s.
    double area = byDryMass.specimen().areaSquareMetres();
    double waterMass =
        1000 * (byDryMass.finalHeightMetres() - byDryMass.heightOfSolidsMetres()) * area;
    double wf = waterMass / 0.120;
    assertThat(byDryMass.voidRatioAtEnd(2)).isCloseTo(wf * 2.70, within(1e-12));
    Specimen byWaterContent =
        Specimen.builder()
            .initialHeight(0.020)
            .diameter(0.075)
            .specificGravity(2.70)
            .finalWaterContent(wf)
            .build();
    OedometerTest t = OedometerTest.of(byWaterContent, increments());
    assertThat(t.heightOfSolidsMetres()).isCloseTo(byDryMass.heightOfSolidsMetres(), within(1e-15));
    assertThat(t.initialVoidRatio()).isCloseTo(byDryMass.initialVoidRatio(), within(1e-12));
  }

  @Test
  @DisplayName("initial degree of saturation S0 = w0 G_s / e0 (0.36 x 2.70 / 0.98804 by hand)")
  void degreeOfSaturation() {
    assertThat(example().initialDegreeOfSaturation().getAsDouble())
        .isCloseTo(0.98377, within(1e-5));
    Specimen noWater =
        Specimen.builder()
            .initialHeight(0.020)
            .diameter(0.075)
            .specificGravity(2.70)
            .dryMass(0.120)
            .build();
    assertThat(OedometerTest.of(noWater, increments()).initialDegreeOfSaturation()).isEmpty();
  }

  @Test
  @DisplayName("defaults: double drainage, height at 50 % consolidation, empty identifiers")
  void defaults() {
    OedometerTest t = example();
    assertThat(t.drainage()).isEqualTo(Drainage.DOUBLE);
    assertThat(t.drainagePathRule()).isEqualTo(DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION);
    assertThat(t.identifiers()).isEqualTo(TestIdentifiers.none());
    assertThat(t.increments()).hasSize(3);
    assertThat(t.warnings()).isEmpty();
    assertThat(t.increments().get(2).direction()).isEqualTo(LoadDirection.UNLOADING);
  }

  @Test
  @DisplayName("bad input: order of stresses, too much settlement, empty, index")
  void badInput() {
    List<LoadIncrement> outOfOrder =
        List.of(
            LoadIncrement.of(0, 50e3, curve(0.0005)),
            LoadIncrement.of(100e3, 200e3, curve(0.0005)));
    assertThatThrownBy(() -> OedometerTest.of(SpecimenTest.example(), outOfOrder))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "stress before the increment at index 1 (100000.0 Pa) is not the stress after index"
                + " 0 (50000.0 Pa): increments out of order or missing");
    assertThatThrownBy(() -> OedometerTest.of(SpecimenTest.example(), List.of()))
        .hasMessage("an oedometer test needs at least one load increment");
    assertThatThrownBy(
            () ->
                OedometerTest.of(
                    SpecimenTest.example(), List.of(LoadIncrement.of(0, 50e3, curve(0.025)))))
        .hasMessage(
            "final specimen height (-0.005000000000000001 m) must be > 0: the settlements add up"
                + " to more than the initial height (0.02 m)");
    assertThatThrownBy(
            () ->
                OedometerTest.of(
                    SpecimenTest.example(), List.of(LoadIncrement.of(0, 50e3, curve(0.0105)))))
        .hasMessageStartingWith("specimen height at reading 3 of the increment at index 0")
        .hasMessageEndingWith("void ratio would be <= 0");
    assertThatThrownBy(() -> example().voidRatioAtHeight(1e308))
        .hasMessage("height (1.0E308 m) is too large for a void ratio");
    assertThatThrownBy(() -> example().heightAtStartMetres(3))
        .hasMessage("increment index 3 is outside 0..2");
  }

  @Test
  @DisplayName(
      "final-water-content basis with every reading swelling: H_s above H_0 (e0 < 0) is refused,"
          + " as the class Javadoc promises void ratio > 0 (worked by hand, invented numbers)")
  void initialHeightBelowTheSolids() {
    // By hand (FACTS: e = w G_s saturated, e = H / H_s - 1): w_f = 0.10, G_s = 2.70, e_f = 0.27;
    // readings start after load (t = 60 s) and swell to -6 mm, so H_f = 26 mm and
    // H_s = 26 / 1.27 = 20.472 mm, above H_0 = 20 mm: e0 = 20 / 20.472 - 1 = -0.023 < 0.
    Specimen swelling =
        Specimen.builder()
            .initialHeight(0.020)
            .diameter(0.075)
            .specificGravity(2.70)
            .finalWaterContent(0.10)
            .build();
    List<LoadIncrement> increments =
        List.of(
            LoadIncrement.of(
                0, 10e3, SettlementCurve.of(new double[] {60, 120}, new double[] {-5e-3, -6e-3})));
    assertThatThrownBy(() -> OedometerTest.of(swelling, increments))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageStartingWith(
            "initial specimen height (0.02 m) is not above the height of solids")
        .hasMessageEndingWith("initial void ratio would be <= 0");
  }

  @Test
  @DisplayName("value semantics, toBuilder and a concise toString")
  void valueSemantics() {
    OedometerTest a = example();
    assertThat(a).isEqualTo(example()).hasSameHashCodeAs(example());
    assertThat(a.toBuilder().build()).isEqualTo(a);
    OedometerTest b =
        a.toBuilder()
            .drainage(Drainage.SINGLE)
            .drainagePathRule(DrainagePathRule.MEAN_HEIGHT)
            .identifiers(TestIdentifiers.of("Invented", "BH-A", "S1", "4.5 m"))
            .build();
    assertThat(b).isNotEqualTo(a);
    assertThat(b.toString())
        .isEqualTo(
            "OedometerTest[sample 'S1', 3 increments 0.0 -> 25000.0 Pa, SINGLE drainage,"
                + " MEAN_HEIGHT, H0 0.02 m -> 0.0187 m]");
    OedometerTest c =
        OedometerTest.builder(SpecimenTest.example())
            .addIncrement(LoadIncrement.of(0, 50e3, curve(0.0005)))
            .build();
    assertThat(c.increments()).hasSize(1);
  }

  @Test
  @DisplayName(
      "swelling readings whose heights add up beyond the largest double (about 1.8e308, IEEE 754)"
          + " are refused with the reading named, not kept as an infinite height")
  void heightsBeyondTheDoubleRange() {
    // Each increment swells by 1e308 m: H_1 = 0.02 + 1e308 = 1e308, then 1e308 + 1e308 overflows.
    SettlementCurve swelling =
        SettlementCurve.of(new double[] {60, 120}, new double[] {-1e307, -1e308});
    List<LoadIncrement> increments =
        List.of(
            LoadIncrement.of(0, 50e3, swelling),
            LoadIncrement.of(50e3, 25e3, swelling),
            LoadIncrement.of(25e3, 12.5e3, curve(0.001)));
    assertThatThrownBy(() -> OedometerTest.of(SpecimenTest.example(), increments))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "settlement at reading 1 of the increment at index 1 (-1.0E308 m) takes the specimen"
                + " height (1.0E308 m at the start of the increment) beyond the range of a"
                + " double");
  }

  @Test
  @DisplayName(
      "a height whose void ratio H / H_s - 1 would exceed the largest double is refused when the"
          + " test is built, so voidRatioAtEnd never throws for a valid index; just below, e ="
          + " e0 - (1 + e0) dH / H0 (FACTS.md) agrees")
  void voidRatiosBeyondTheDoubleRange() {
    // H_s = 10.0602 mm (SpecimenTest, by hand): a height of 1e307 m gives e of about 1e309.
    SettlementCurve tooFar = SettlementCurve.of(new double[] {60, 120}, new double[] {0, -1e307});
    assertThatThrownBy(
            () ->
                OedometerTest.of(SpecimenTest.example(), List.of(LoadIncrement.of(0, 5e3, tooFar))))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageStartingWith(
            "specimen height at reading 1 of the increment at index 0 (1.0E307 m) is too large"
                + " for a void ratio");
    SettlementCurve far = SettlementCurve.of(new double[] {60, 120}, new double[] {0, -1e305});
    OedometerTest t =
        OedometerTest.of(SpecimenTest.example(), List.of(LoadIncrement.of(0, 5e3, far)));
    double e0 = t.initialVoidRatio();
    assertThat(t.voidRatioAtEnd(0))
        .isFinite()
        .isCloseTo(e0 - (1 + e0) * -1e305 / 0.020, withinPercentage(1e-10));
    assertThat(FiniteResults.notFinite(t)).isEmpty();
  }

  @Test
  @DisplayName(
      "a reading that takes the height below the solids is an InvalidReadingException pointing at"
          + " it (increment 1, reading 2), an IllegalArgumentException like every invalid input")
  void readingBelowTheSolidsPointsAtIt() {
    // The worked example has H_s = 10.0602 mm; 19.5 mm at the start of increment 1 less 10 mm
    // leaves 9.5 mm, below it (by hand).
    SettlementCurve bad =
        SettlementCurve.of(new double[] {0, 60, 600, 86_400}, new double[] {0, 4e-4, 0.010, 1e-3});
    List<LoadIncrement> increments =
        List.of(
            LoadIncrement.of(0, 50e3, curve(0.0005)),
            LoadIncrement.of(50e3, 100e3, bad),
            LoadIncrement.of(100e3, 25e3, curve(-0.0002)));
    assertThatThrownBy(() -> OedometerTest.of(SpecimenTest.example(), increments))
        .isInstanceOf(IllegalArgumentException.class)
        .isInstanceOfSatisfying(
            InvalidReadingException.class,
            e -> {
              assertThat(e.incrementIndex()).isEqualTo(1);
              assertThat(e.readingIndex()).isEqualTo(2);
            })
        .hasMessageContaining("reading 2 of the increment at index 1");
    assertThatThrownBy(() -> new InvalidReadingException("x", -1, 0))
        .isExactlyInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("(-1)");
  }
}
