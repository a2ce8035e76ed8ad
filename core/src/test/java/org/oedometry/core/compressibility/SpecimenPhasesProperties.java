package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class SpecimenPhasesProperties {

  @Test
  @DisplayName("Derived e decreases when settlement increases (e = H/H_s - 1, FACTS)")
  void voidRatioFallsWithSettlement() {
    qt().forAll(
            doubles().between(0.3, 3.0), doubles().between(0.0, 0.2), doubles().between(1e-6, 0.1))
        .checkAssert(
            (e0, strain, extra) -> {
              SpecimenPhases p = SpecimenPhases.fromInitialVoidRatio(0.019, e0);
              double s1 = strain * 0.019;
              double s2 = s1 + extra * 0.019 * 0.1;
              assertThat(p.voidRatio(s2)).isLessThan(p.voidRatio(s1));
            });
  }

  @Test
  @DisplayName("e0 - e = (1 + e0) * axial strain for any settlement (FACTS, phase relations)")
  void strainAndVoidRatioConsistent() {
    qt().forAll(doubles().between(0.3, 3.0), doubles().between(-0.01, 0.2))
        .checkAssert(
            (e0, strain) -> {
              SpecimenPhases p = SpecimenPhases.fromInitialVoidRatio(0.025, e0);
              double s = strain * 0.025;
              double lhs = p.initialVoidRatio() - p.voidRatio(s);
              double rhs = (1 + p.initialVoidRatio()) * p.axialStrain(s);
              assertThat(lhs).isCloseTo(rhs, org.assertj.core.api.Assertions.within(1e-12));
            });
  }
}
