package org.oedometry.core.compressibility;

/**
 * A smooth fit of e against x = log<sub>10</sub>&sigma;' by a hyperbola with two straight
 * asymptotes, used to place the point of maximum curvature objectively.
 *
 * <p>Model: e(x) = a + b u + c &radic;(u<sup>2</sup> + r<sup>2</sup>), u = x &minus; x<sub>0</sub>,
 * with c &lt; 0 (the slope falls from b &minus; c before the break to b + c after it) and r &gt; 0
 * the width of the transition in log cycles. For fixed (x<sub>0</sub>, r) the model is linear in
 * (a, b, c) and is solved by least squares with a modified Gram-Schmidt QR factorisation (variable
 * projection); (x<sub>0</sub>, r) are found by a grid over x<sub>0</sub> in the data range and log
 * r in [10<sup>&minus;3</sup>, 1] &times; data span, followed by a compass (pattern) search that
 * halves its steps down to 10<sup>&minus;9</sup> of the span. Deterministic; no random start.
 */
final class SmoothCompressionFit {

  private static final int X0_STEPS = 80;
  private static final int R_STEPS = 30;
  private static final double R_MIN_FRACTION = 1e-3;

  final double x0;
  final double r;
  final double a;
  final double b;
  final double c;
  final double rss;
  final boolean atBound;

  private SmoothCompressionFit(double x0, double r, double[] abc, double rss, boolean atBound) {
    this.x0 = x0;
    this.r = r;
    this.a = abc[0];
    this.b = abc[1];
    this.c = abc[2];
    this.rss = rss;
    this.atBound = atBound;
  }

  double value(double x) {
    double u = x - x0;
    return a + b * u + c * Math.hypot(u, r);
  }

  double slope(double x) {
    double u = x - x0;
    return b + c * u / Math.hypot(u, r);
  }

  double secondDerivative(double x) {
    double u = x - x0;
    double s = Math.hypot(u, r);
    return c * r * r / (s * s * s);
  }

  /** Curvature |e''| / (1 + e'^2)^(3/2) with x in log10 cycles and e unscaled. */
  double curvature(double x) {
    double p = slope(x);
    return Math.abs(secondDerivative(x)) / Math.pow(1.0 + p * p, 1.5);
  }

  /**
   * Fits the model; returns null when no (x0, r) gives a downward break (c &lt; 0) with a full-rank
   * linear problem.
   */
  static SmoothCompressionFit of(double[] x, double[] y) {
    int n = x.length;
    double lo = x[0];
    double hi = x[n - 1];
    double span = hi - lo;
    double logRMin = Math.log(R_MIN_FRACTION * span);
    double logRMax = Math.log(span);
    double bestX0 = Double.NaN;
    double bestLogR = Double.NaN;
    double bestRss = Double.POSITIVE_INFINITY;
    double[] abc = new double[3];
    for (int i = 0; i <= X0_STEPS; i++) {
      double x0 = lo + span * i / X0_STEPS;
      for (int j = 0; j <= R_STEPS; j++) {
        double logR = logRMin + (logRMax - logRMin) * j / R_STEPS;
        double rss = solve(x, y, x0, Math.exp(logR), abc);
        if (rss < bestRss) {
          bestRss = rss;
          bestX0 = x0;
          bestLogR = logR;
        }
      }
    }
    if (bestRss == Double.POSITIVE_INFINITY) {
      return null;
    }
    double stepX = span / X0_STEPS;
    double stepR = (logRMax - logRMin) / R_STEPS;
    double minStep = 1e-9 * span;
    int guard = 0;
    while (stepX > minStep && guard++ < 2000) {
      boolean moved = false;
      double[][] trials = {
        {bestX0 + stepX, bestLogR},
        {bestX0 - stepX, bestLogR},
        {bestX0, bestLogR + stepR},
        {bestX0, bestLogR - stepR}
      };
      for (double[] t : trials) {
        double tx = Math.min(hi, Math.max(lo, t[0]));
        double tr = Math.min(logRMax, Math.max(logRMin, t[1]));
        double rss = solve(x, y, tx, Math.exp(tr), abc);
        if (rss < bestRss) {
          bestRss = rss;
          bestX0 = tx;
          bestLogR = tr;
          moved = true;
        }
      }
      if (!moved) {
        stepX /= 2;
        stepR /= 2;
      }
    }
    double rss = solve(x, y, bestX0, Math.exp(bestLogR), abc);
    double edge = 1e-6;
    boolean atBound =
        bestLogR - logRMin < edge
            || logRMax - bestLogR < edge
            || bestX0 - lo < edge * span
            || hi - bestX0 < edge * span;
    return new SmoothCompressionFit(bestX0, Math.exp(bestLogR), abc.clone(), rss, atBound);
  }

  /**
   * Least squares for (a, b, c) at fixed (x0, r), into abc. Returns the residual sum of squares, or
   * +infinity when the columns are (nearly) dependent or c is not negative.
   */
  static double solve(double[] x, double[] y, double x0, double r, double[] abc) {
    int n = x.length;
    double[][] q = new double[3][n];
    for (int i = 0; i < n; i++) {
      double u = x[i] - x0;
      q[0][i] = 1.0;
      q[1][i] = u;
      q[2][i] = Math.hypot(u, r);
    }
    double[][] rr = new double[3][3];
    for (int k = 0; k < 3; k++) {
      double norm0 = norm(q[k]);
      for (int j = 0; j < k; j++) {
        double d = dot(q[j], q[k]);
        rr[j][k] = d;
        for (int i = 0; i < n; i++) {
          q[k][i] -= d * q[j][i];
        }
      }
      double norm = norm(q[k]);
      if (!(norm > 1e-10 * norm0)) {
        return Double.POSITIVE_INFINITY;
      }
      rr[k][k] = norm;
      for (int i = 0; i < n; i++) {
        q[k][i] /= norm;
      }
    }
    double[] qty = new double[3];
    for (int k = 0; k < 3; k++) {
      qty[k] = dot(q[k], y);
    }
    for (int k = 2; k >= 0; k--) {
      double s = qty[k];
      for (int j = k + 1; j < 3; j++) {
        s -= rr[k][j] * abc[j];
      }
      abc[k] = s / rr[k][k];
    }
    if (!(abc[2] < 0)) {
      return Double.POSITIVE_INFINITY;
    }
    double rss = 0;
    for (int i = 0; i < n; i++) {
      double u = x[i] - x0;
      double res = y[i] - (abc[0] + abc[1] * u + abc[2] * Math.hypot(u, r));
      rss += res * res;
    }
    return Double.isFinite(rss) ? rss : Double.POSITIVE_INFINITY;
  }

  private static double dot(double[] p, double[] q) {
    double s = 0;
    for (int i = 0; i < p.length; i++) {
      s += p[i] * q[i];
    }
    return s;
  }

  private static double norm(double[] p) {
    return Math.sqrt(dot(p, p));
  }
}
