package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class FrozenDoublesTest {

  @Test
  @DisplayName(
      "Behaves as an unmodifiable list equal to List.of of the same values [java.util.List"
          + " contract]")
  void isAnUnmodifiableList() {
    List<Double> list = FrozenDoubles.owning(new double[] {1.5, -2.0, 0.0});
    assertThat(list).isEqualTo(List.of(1.5, -2.0, 0.0));
    assertThat(list.hashCode()).isEqualTo(List.of(1.5, -2.0, 0.0).hashCode());
    assertThatThrownBy(() -> list.set(0, 1.0)).isInstanceOf(UnsupportedOperationException.class);
    assertThatThrownBy(() -> list.add(1.0)).isInstanceOf(UnsupportedOperationException.class);
    assertThatThrownBy(() -> list.get(3)).isInstanceOf(IndexOutOfBoundsException.class);
  }

  @Test
  @DisplayName("copyOf keeps a frozen list and copies any other into an unmodifiable one")
  void copyOf() {
    List<Double> frozen = FrozenDoubles.owning(new double[] {1, 2});
    assertThat(FrozenDoubles.copyOf(frozen)).isSameAs(frozen);
    List<Double> mutable = new ArrayList<>(List.of(3.0, 4.0));
    List<Double> copy = FrozenDoubles.copyOf(mutable);
    mutable.set(0, 0.0);
    assertThat(copy).containsExactly(3.0, 4.0);
    assertThatThrownBy(() -> copy.add(1.0)).isInstanceOf(UnsupportedOperationException.class);
  }
}
