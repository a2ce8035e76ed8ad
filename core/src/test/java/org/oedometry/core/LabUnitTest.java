package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class LabUnitTest {

  @Test
  @DisplayName("header tokens are unique, ASCII and found again by forHeaderToken")
  void tokensAreUnique() {
    Set<String> tokens = new HashSet<>();
    for (LabUnit unit : LabUnit.values()) {
      assertThat(tokens.add(unit.headerToken())).as(unit.name()).isTrue();
      assertThat(unit.headerToken()).matches("[A-Za-z0-9_]+");
      assertThat(LabUnit.forHeaderToken(unit.headerToken())).contains(unit);
    }
    assertThat(LabUnit.forHeaderToken("furlong")).isEmpty();
    assertThat(LabUnit.forHeaderToken("mpa")).as("tokens are case-sensitive").isEmpty();
  }

  @Test
  @DisplayName("each quantity has exactly one SI unit, the one the API uses")
  void oneSiUnitPerQuantity() {
    for (LabUnit.Quantity q : LabUnit.Quantity.values()) {
      long si = 0;
      for (LabUnit unit : LabUnit.values()) {
        if (unit.quantity() == q && unit.isSi()) {
          si++;
          assertThat(unit.symbol()).isEqualTo(q.siSymbol());
        }
      }
      assertThat(si).as(q.name()).isEqualTo(1);
    }
  }

  @Test
  @DisplayName("siFactor matches toSi(1) (SI definitions of the prefixes)")
  void factors() {
    assertThat(LabUnit.MILLIMETRE.siFactor()).isEqualTo(1e-3);
    assertThat(LabUnit.MEGAGRAM_PER_CUBIC_METRE.siFactor()).isEqualTo(1000);
    for (LabUnit unit : LabUnit.values()) {
      assertThat(unit.toSi(1)).as(unit.name()).isEqualTo(unit.siFactor());
    }
  }

  @Test
  @DisplayName("headerTokens lists the units of one quantity")
  void listsTokens() {
    assertThat(LabUnit.headerTokens(LabUnit.Quantity.STRESS)).isEqualTo("Pa, kPa, MPa");
    assertThat(LabUnit.headerTokens(LabUnit.Quantity.TIME)).isEqualTo("s, min, h, d, yr");
  }
}
