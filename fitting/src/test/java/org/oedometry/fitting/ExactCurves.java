package org.oedometry.fitting;

import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;

/**
 * Exact synthetic curves for the further methods, made with our forward model {@link
 * ConsolidationCurveModel} (its accuracy is proven against mpmath in the theory module).
 */
final class ExactCurves {

  static final double YEAR = 365.25 * 86_400;
  static final double DRAINAGE_PATH = 0.0095;

  private ExactCurves() {}

  /** Readings log-spaced at {@code perDecade} a decade from T = firstT to T = lastT. */
  static double[] logTimes(double cv, double firstT, double lastT, int perDecade) {
    double h2 = DRAINAGE_PATH * DRAINAGE_PATH;
    int count = (int) Math.round(Math.log10(lastT / firstT) * perDecade) + 1;
    double[] t = new double[count];
    for (int i = 0; i < count; i++) {
      t[i] = firstT * Math.pow(lastT / firstT, i / (double) (count - 1)) * h2 / cv;
    }
    return t;
  }

  /** Readings every {@code step} seconds, {@code count} of them, from t = step. */
  static double[] equalTimes(double step, int count) {
    double[] t = new double[count];
    for (int i = 0; i < count; i++) {
      t[i] = step * (i + 1);
    }
    return t;
  }

  static SettlementCurve curve(double[] times, CurveParameters truth) {
    ConsolidationCurveModel model = ConsolidationCurveModel.of(DRAINAGE_PATH);
    double[] d = new double[times.length];
    for (int i = 0; i < times.length; i++) {
      d[i] = model.settlement(times[i], truth);
    }
    return SettlementCurve.of(times, d);
  }

  /** Dense (80 a decade), exact, no secondary compression, from T = 0.001 to T = 5. */
  static SettlementCurve dense(double cv, double initial) {
    return curve(logTimes(cv, 1e-3, 5, 80), CurveParameters.of(initial, 0.5e-3, cv, 0));
  }

  /** The curve with Gaussian noise of the given standard deviation (seeded Box-Muller). */
  static SettlementCurve noisy(SettlementCurve curve, double sigma, long seed) {
    java.util.SplittableRandom random = new java.util.SplittableRandom(seed);
    double[] d = curve.settlementMetres();
    for (int i = 0; i < d.length; i++) {
      double u = 1 - random.nextDouble();
      double v = random.nextDouble();
      d[i] += sigma * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    }
    return SettlementCurve.of(curve.elapsedSeconds(), d);
  }

  /**
   * Checks the contract on any curve: a result with a finite positive c_v, or a FitException;
   * nothing else escapes.
   */
  static void resultOrFitException(java.util.function.Supplier<CvEstimate> fit) {
    try {
      CvEstimate estimate = fit.get();
      org.assertj.core.api.Assertions.assertThat(estimate.cv()).isPositive().isFinite();
    } catch (FitException expected) {
      org.assertj.core.api.Assertions.assertThat(expected.getMessage()).isNotBlank();
    }
  }

  /**
   * Checks that a method refuses exact curves that end before primary consolidation is far along (T
   * at the last reading 0.05, 0.3 and 0.5, that is U = 25 %, 59 % and 76 %, 80 readings a decade,
   * c_v 2 m^2/yr) with a FitException.
   */
  static void refusesIncompleteCurves(java.util.function.Function<SettlementCurve, ?> fit) {
    double cv = 2 / YEAR;
    for (double lastT : new double[] {0.05, 0.3, 0.5}) {
      SettlementCurve c =
          curve(logTimes(cv, 1e-3, lastT, 80), CurveParameters.of(0, 0.5e-3, cv, 0));
      org.assertj.core.api.Assertions.assertThatThrownBy(() -> fit.apply(c))
          .as("ending at T = %s", lastT)
          .isInstanceOf(FitException.class);
    }
  }

  static SettlementCurve negated(SettlementCurve curve) {
    double[] d = curve.settlementMetres();
    for (int i = 0; i < d.length; i++) {
      d[i] = -d[i];
    }
    return SettlementCurve.of(curve.elapsedSeconds(), d);
  }

  static SettlementCurve scaled(SettlementCurve curve, double timeFactor, double settlementFactor) {
    double[] t = curve.elapsedSeconds();
    double[] d = curve.settlementMetres();
    for (int i = 0; i < t.length; i++) {
      t[i] *= timeFactor;
      d[i] *= settlementFactor;
    }
    return SettlementCurve.of(t, d);
  }
}
