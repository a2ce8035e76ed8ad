package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.oedometry.core.FiniteResults.notFinite;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The walk of {@link FiniteResults} on stand-in results whose faults are known. */
class FiniteResultsTest {

  /** A stand-in result for the walk's own check. */
  record Probe(double value, List<Optional<Probe>> nested, OptionalDouble extra) {

    /** A derived value, not a component, that the walk must also reach. */
    public double twice() {
      return value * 2;
    }
  }

  @Test
  @DisplayName(
      "The walk finds a NaN or an infinity at any depth (record, derived accessor, list,"
          + " optional, OptionalDouble) and passes a finite result: the ExtremeInputsProperties can fail")
  void walkFindsWhatItLooksFor() {
    Probe leaf = new Probe(1, List.of(), OptionalDouble.of(3));
    assertThat(notFinite(new Probe(2, List.of(Optional.of(leaf)), OptionalDouble.empty())))
        .isEmpty();
    Probe bad = new Probe(1, List.of(), OptionalDouble.of(Double.NaN));
    assertThat(notFinite(new Probe(2, List.of(Optional.of(bad)), OptionalDouble.empty())))
        .containsExactly("result.nested()[0].get.extra().get = NaN");
    assertThat(notFinite(new Probe(Double.MAX_VALUE, List.of(), OptionalDouble.empty())))
        .containsExactly("result.twice() = Infinity");
  }

  /** A stand-in result whose derived accessor throws. */
  record BrokenProbe(double value) {

    /** Always throws, as a record constructor that refuses a value does. */
    public double checked() {
      throw new IllegalArgumentException("value (" + value + ") refused");
    }
  }

  @Test
  @DisplayName("An accessor that throws is reported with its exception, not passed over")
  void accessorThatThrows() {
    assertThat(notFinite(new BrokenProbe(1)))
        .singleElement()
        .asString()
        .startsWith("result.checked() threw java.lang.IllegalArgumentException");
  }
}
