package org.oedometry.fitting.reduction;

import java.util.OptionalDouble;
import org.oedometry.fitting.AsaokaResult;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.EarlySlopeResult;
import org.oedometry.fitting.FullCurveResult;
import org.oedometry.fitting.InflectionPointResult;
import org.oedometry.fitting.LogTimeResult;
import org.oedometry.fitting.RectangularHyperbolaResult;
import org.oedometry.fitting.RootTimeResult;

/** The quantities beside c_v that some results carry, read uniformly. */
final class Estimates {

  private Estimates() {}

  /** Corrected zero d0, m from the increment's start; empty for methods without one. */
  static OptionalDouble d0(CvEstimate e) {
    if (e instanceof LogTimeResult r) {
      return OptionalDouble.of(r.d0());
    } else if (e instanceof RootTimeResult r) {
      return OptionalDouble.of(r.d0());
    } else if (e instanceof FullCurveResult r) {
      return OptionalDouble.of(r.d0());
    } else if (e instanceof InflectionPointResult r) {
      return OptionalDouble.of(r.d0());
    } else if (e instanceof EarlySlopeResult r) {
      return OptionalDouble.of(r.d0());
    }
    return OptionalDouble.empty();
  }

  /** End of primary d100 (Asaoka: its final settlement), m from the increment's start. */
  static OptionalDouble d100(CvEstimate e) {
    if (e instanceof LogTimeResult r) {
      return OptionalDouble.of(r.d100());
    } else if (e instanceof RootTimeResult r) {
      return OptionalDouble.of(r.d100());
    } else if (e instanceof FullCurveResult r) {
      return OptionalDouble.of(r.d100());
    } else if (e instanceof InflectionPointResult r) {
      return OptionalDouble.of(r.d100());
    } else if (e instanceof RectangularHyperbolaResult r) {
      return OptionalDouble.of(r.d100());
    } else if (e instanceof EarlySlopeResult r) {
      return OptionalDouble.of(r.d100());
    } else if (e instanceof AsaokaResult r) {
      return OptionalDouble.of(r.finalSettlement());
    }
    return OptionalDouble.empty();
  }

  /** Secondary slope, m per log10 cycle of time; only log-time and full-curve give one. */
  static OptionalDouble secondarySlope(CvEstimate e) {
    if (e instanceof LogTimeResult r) {
      return OptionalDouble.of(r.secondarySlope());
    } else if (e instanceof FullCurveResult r) {
      return OptionalDouble.of(r.secondarySlope());
    }
    return OptionalDouble.empty();
  }
}
