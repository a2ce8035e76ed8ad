package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.Checks;

/**
 * Every per-increment c<sub>v</sub> method of this package on one curve, in one immutable table:
 * for researchers who compare methods (a readable {@link #toString()} for JShell) and for reports.
 *
 * <p>Each method runs with its defaults on the same readings and drainage path. A method that finds
 * no honest value leaves its row without c<sub>v</sub> and with the reason; the others are
 * unaffected. The key time of a row is the time the method itself reads off the curve: t50
 * (log-time, early slope, Asaoka, full curve: T<sub>50</sub> H<sub>dr</sub><sup>2</sup> / c<sub>v
 * </sub>), t90 (root-time, rectangular hyperbola) or the inflection time t<sub>I</sub>.
 *
 * <p>Results feed engineering decisions and must be reviewed by a qualified engineer; local codes
 * and standards govern.
 *
 * @param drainagePath the drainage path all methods used, m
 * @param rows one row per method, in the order of {@link CvMethod}
 */
public record MethodComparison(double drainagePath, List<Row> rows) {

  /**
   * One method's answer.
   *
   * @param method the method
   * @param estimate its result, or empty where it found no honest value
   * @param keyTimeName "t50", "t90" or "tI"; empty without an estimate
   * @param keyTime the key time, s; 0 without an estimate
   * @param failure why there is no estimate; empty when there is one
   */
  public record Row(
      CvMethod method,
      Optional<CvEstimate> estimate,
      String keyTimeName,
      double keyTime,
      Optional<String> failure) {

    /**
     * Validates the row: an estimate or a failure, not both.
     *
     * @param method the method
     * @param estimate the estimate or empty
     * @param keyTimeName name of the key time
     * @param keyTime the key time, s
     * @param failure the reason or empty
     * @throws IllegalArgumentException if both or neither of estimate and failure are given
     */
    public Row {
      Objects.requireNonNull(method, "method");
      Objects.requireNonNull(keyTimeName, "keyTimeName");
      if (estimate.isPresent() == failure.isPresent()) {
        throw new IllegalArgumentException(
            "a comparison row holds either an estimate or a failure, not both or neither");
      }
      Checks.requireFinite("key time", keyTime, "s");
    }
  }

  /**
   * Validates the table and copies the rows.
   *
   * @param drainagePath the drainage path, m
   * @param rows the rows
   * @throws IllegalArgumentException if the drainage path is not finite and positive
   */
  public MethodComparison {
    Checks.requireDrainagePath(drainagePath);
    rows = List.copyOf(rows);
  }

  /**
   * Runs every method on one curve.
   *
   * @param curve one increment's readings
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @return the table
   * @throws IllegalArgumentException if the drainage path is not finite and positive
   */
  public static MethodComparison of(SettlementCurve curve, double drainagePathMetres) {
    Checks.requireDrainagePath(drainagePathMetres);
    Objects.requireNonNull(curve, "curve");
    double h = drainagePathMetres;
    List<Row> rows = new ArrayList<>();
    for (CvMethod method : CvMethod.values()) {
      try {
        rows.add(
            switch (method) {
              case LOG_TIME -> row(method, LogTimeMethod.fit(curve, h), "t50", -1);
              case ROOT_TIME -> {
                RootTimeResult r = RootTimeMethod.fit(curve, h);
                yield row(method, r, "t90", r.t90());
              }
              case FULL_CURVE -> row(method, FullCurveMethod.fit(curve, h), "t50", -1);
              case INFLECTION_POINT -> {
                InflectionPointResult r = InflectionPointMethod.fit(curve, h);
                yield row(method, r, "tI", r.inflectionTime());
              }
              case RECTANGULAR_HYPERBOLA -> {
                RectangularHyperbolaResult r = RectangularHyperbolaMethod.fit(curve, h);
                yield row(method, r, "t90", r.t90());
              }
              case EARLY_SLOPE -> {
                EarlySlopeResult r = EarlySlopeMethod.fit(curve, h);
                yield row(method, r, "t50", r.t50());
              }
              case ASAOKA -> {
                AsaokaResult r = AsaokaMethod.fit(curve, h);
                yield row(method, r, "t50", r.t50());
              }
            });
      } catch (FitException | IllegalArgumentException e) {
        rows.add(new Row(method, Optional.empty(), "", 0.0, Optional.of(e.getMessage())));
      }
    }
    return new MethodComparison(h, rows);
  }

  /** A row; a negative key time means t50 = T50 H^2 / c_v. */
  private static Row row(CvMethod method, CvEstimate estimate, String name, double keyTime) {
    double time =
        keyTime >= 0
            ? keyTime
            : (method == CvMethod.LOG_TIME
                ? ((LogTimeResult) estimate).t50()
                : org.oedometry.theory.Terzaghi.TIME_FACTOR_50
                    * estimate.drainagePath()
                    * estimate.drainagePath()
                    / estimate.cv());
    return new Row(method, Optional.of(estimate), name, time, Optional.empty());
  }

  /**
   * The row of a method.
   *
   * @param method a method
   * @return its row
   */
  public Row row(CvMethod method) {
    return rows.stream().filter(r -> r.method() == method).findFirst().orElseThrow();
  }

  /**
   * The table for JShell: method, c<sub>v</sub> in m<sup>2</sup>/yr (Julian year), key time in
   * minutes, and the warnings' kinds or the reason there is no value.
   *
   * @return the table
   */
  @Override
  public String toString() {
    StringBuilder text =
        new StringBuilder(
            String.format(
                Locale.ROOT,
                "c_v by method (H_dr = %.4g mm)%n  %-28s %12s %14s  %s%n",
                drainagePath * 1e3,
                "method",
                "c_v (m^2/yr)",
                "key time (min)",
                "warnings / reason"));
    for (Row row : rows) {
      if (row.estimate().isPresent()) {
        CvEstimate e = row.estimate().get();
        text.append(
            String.format(
                Locale.ROOT,
                "  %-28s %12.4g %5s %8.4g  %s%n",
                row.method().label(),
                e.cv() * Results.JULIAN_YEAR_SECONDS,
                row.keyTimeName(),
                row.keyTime() / 60,
                e.warnings().stream().map(FitWarning::kind).toList()));
      } else {
        text.append(
            String.format(
                Locale.ROOT,
                "  %-28s %12s %14s  %s%n",
                row.method().label(),
                "-",
                "-",
                row.failure().orElse("")));
      }
    }
    return text.toString();
  }
}
