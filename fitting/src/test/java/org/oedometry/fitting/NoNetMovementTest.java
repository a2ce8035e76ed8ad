package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.function.ToDoubleBiFunction;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;

/**
 * Readings that move and come back to where they began carry no consolidation: every method refuses
 * them with a reason (ARCHITECTURE.md, Errors: "a valid curve that does not admit a construction:
 * FitException"; no NaN or infinity in any message). Found by the whole-reduction fuzz: a
 * noise-only increment whose rounded last reading was -0.0 against a first of +0.0 made Asaoka's
 * method quote a final settlement "-Infinity times the movement seen".
 */
class NoNetMovementTest {

  private static final double H = 0.01;

  static Stream<Arguments> methods() {
    return Stream.of(
        Arguments.of("Asaoka", method((c, h) -> AsaokaMethod.fit(c, h).cv())),
        Arguments.of("inflection point", method((c, h) -> InflectionPointMethod.fit(c, h).cv())),
        Arguments.of(
            "rectangular hyperbola", method((c, h) -> RectangularHyperbolaMethod.fit(c, h).cv())),
        Arguments.of("early slope", method((c, h) -> EarlySlopeMethod.fit(c, h).cv())),
        Arguments.of("log-time", method((c, h) -> LogTimeMethod.fit(c, h).cv())),
        Arguments.of("root-time", method((c, h) -> RootTimeMethod.fit(c, h).cv())));
  }

  private static ToDoubleBiFunction<SettlementCurve, Double> method(
      ToDoubleBiFunction<SettlementCurve, Double> f) {
    return f;
  }

  /** A bump: rises to 20 um half-way through the usual lab schedule and returns to the start. */
  private static SettlementCurve bump(double first, double last) {
    double[] t = ReadingSchedules.logSpaced(6, 86_400, 6);
    double[] d = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      d[i] = 20e-6 * Math.sin(Math.PI * i / (t.length - 1));
    }
    d[0] = first;
    d[t.length - 1] = last;
    return SettlementCurve.of(t, d);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("methods")
  void refusesReadingsThatEndWhereTheyBegan(
      String name, ToDoubleBiFunction<SettlementCurve, Double> fit) {
    for (SettlementCurve curve : new SettlementCurve[] {bump(0.0, -0.0), bump(3e-6, 3e-6)}) {
      assertThatThrownBy(() -> fit.applyAsDouble(curve, H))
          .isInstanceOf(FitException.class)
          .message()
          .doesNotContain("NaN")
          .doesNotContain("Infinity");
    }
  }
}
