package org.oedometry.fitting.internal;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.special.Beta;
import org.apache.commons.math3.special.Gamma;

/**
 * Student's t distribution with an integer number &nu; &ge; 1 of degrees of freedom: the two halves
 * of its distribution function, F(t) - 1/2 and the upper tail Q(t) = 1 - F(t), each accurate
 * relative to itself (so that a tail of 10<sup>-14</sup> keeps its digits: within 5 x
 * 10<sup>-14</sup> up to {@value #CLOSED_FORM_LIMIT} degrees of freedom, 10<sup>-12</sup> up to
 * 1000, 5 x 10<sup>-11</sup> up to 100 000, the last two Commons Math's), and the quantile
 * t<sub>&nu;</sub>(P).
 *
 * <p><b>Closed forms</b> (&nu; &le; {@value #CLOSED_FORM_LIMIT}; Abramowitz &amp; Stegun 1964,
 * 26.7.3 and 26.7.4, from memory). With &theta; = atan(t/&radic;&nu;), c = cos<sup>2</sup>&theta; =
 * &nu;/(&nu; + t<sup>2</sup>) and A = F(t) - F(-t) = 2 F(t) - 1:
 *
 * <ul>
 *   <li>&nu; even: A = sin &theta; &Sigma;<sub>k=0</sub><sup>&nu;/2-1</sup> a<sub>k</sub>
 *       c<sup>k</sup>, a<sub>0</sub> = 1, a<sub>k</sub> = a<sub>k-1</sub> (2k - 1)/(2k);
 *   <li>&nu; odd: A = (2/&pi;) (&theta; + sin &theta; &Sigma;<sub>k=0</sub><sup>(&nu;-3)/2</sup>
 *       b<sub>k</sub> cos<sup>2k+1</sup>&theta;), b<sub>0</sub> = 1, b<sub>k</sub> =
 *       b<sub>k-1</sub> 2k/(2k + 1).
 * </ul>
 *
 * The infinite sums of the same terms are 1/sin &theta; (the binomial series of (1 -
 * c)<sup>-1/2</sup>) and (&pi;/2 - &theta;)/sin &theta; (the series of arcsin x / &radic;(1 -
 * x<sup>2</sup>) at x = cos &theta;), so 1 - A is the sum of the remaining terms times sin &theta;
 * (times 2/&pi; for odd &nu;): positive terms, no cancellation, each c (or about c) times the one
 * before. The upper tail is taken from that remainder where c &le; 1/2 or where 1 - A &lt; {@value
 * #REMAINDER_BELOW}, and as (1 - A)/2 otherwise; F - 1/2 = A/2 from the finite sum (a sum of
 * positive terms). The density is &radic;&nu; a<sub>&nu;/2</sub> c<sup>(&nu;+1)/2</sup>/2 (even) or
 * &radic;&nu; b<sub>(&nu;-1)/2</sub> c<sup>(&nu;+1)/2</sup>/&pi; (odd): the first term of the
 * remainder, rescaled.
 *
 * <p><b>Beyond</b> (&nu; &gt; {@value #CLOSED_FORM_LIMIT}), through the regularized incomplete beta
 * function of Commons Math: F - 1/2 = I<sub>y</sub>(1/2, &nu;/2)/2 with y = t<sup>2</sup>/(&nu; +
 * t<sup>2</sup>), and Q = I<sub>x</sub>(&nu;/2, 1/2)/2 with x = 1 - y (A&amp;S 26.7.1 with 26.5.2,
 * from memory), each in the form whose small values keep their relative accuracy.
 *
 * <p><b>Quantile.</b> From &nu; = {@value #EXPANSION_FREEDOM_PER_Z_SQUARED} max(z<sup>2</sup>, 5)
 * on, the Cornish-Fisher expansion of t about the normal quantile z in powers of 1/&nu; (A&amp;S
 * 26.7.5, four terms). Below, Newton's method on ln t from that expansion, on ln(F - 1/2) for P
 * &lt; 3/4 and on ln Q beyond (nearly straight lines in ln t in the centre and in the tails), until
 * a step is below 10<sup>-15</sup>. Tested against a 25-digit mpmath table (&nu; = 1 to 100 000, P
 * from 1/2 + 10<sup>-7</sup> to 1 - 10<sup>-14</sup>), within 10<sup>-13</sup> relative; the closed
 * forms of &nu; = 1 and 2.
 *
 * <p>Stateless and thread-safe.
 */
public final class StudentT {

  /** Up to this many degrees of freedom, the closed forms: {@value}. */
  public static final int CLOSED_FORM_LIMIT = 100;

  /**
   * The quantile is the Cornish-Fisher expansion from &nu; &ge; {@value} max(z<sup>2</sup>, 5) on
   * (z the normal quantile), so never below 1000 degrees of freedom: the error of its four terms,
   * about 10<sup>-4</sup> z<sup>10</sup>/&nu;<sup>5</sup> relative (measured against the mpmath
   * table at 1000 degrees of freedom, where it reaches 6 x 10<sup>-11</sup> at P = 1 -
   * 10<sup>-14</sup>), is below 10<sup>-15</sup> there.
   */
  public static final int EXPANSION_FREEDOM_PER_Z_SQUARED = 200;

  /** 1 - A below which the upper tail is summed as the remainder of the series: {@value}. */
  static final double REMAINDER_BELOW = 0.02;

  /** Most terms of a remainder; never reached for &nu; &le; 100 (under 1000 there). */
  private static final int MAXIMUM_TERMS = 100_000;

  private StudentT() {}

  /**
   * The upper tail Q(t) = P(T &gt; t).
   *
   * @param t a value &ge; 0
   * @param degreesOfFreedom &nu; &ge; 1
   * @return Q in [0, 1/2]: 1/2 at t = 0, 0 at infinity (and where it is below the smallest double)
   * @throws IllegalArgumentException if t is negative or NaN, or &nu; &lt; 1
   */
  public static double upperTail(double t, int degreesOfFreedom) {
    check(t, degreesOfFreedom);
    return halves(t, degreesOfFreedom, true);
  }

  /**
   * F(t) - 1/2 = P(0 &lt; T &le; t).
   *
   * @param t a value &ge; 0
   * @param degreesOfFreedom &nu; &ge; 1
   * @return F(t) - 1/2 in [0, 1/2]
   * @throws IllegalArgumentException if t is negative or NaN, or &nu; &lt; 1
   */
  public static double centralHalf(double t, int degreesOfFreedom) {
    check(t, degreesOfFreedom);
    return halves(t, degreesOfFreedom, false);
  }

  /**
   * The quantile t<sub>&nu;</sub>(P) of the upper half: F(t) = P.
   *
   * @param probability P in (1/2, 1)
   * @param degreesOfFreedom &nu; &ge; 1
   * @return t &gt; 0
   * @throws IllegalArgumentException if P is not in (1/2, 1), or &nu; &lt; 1
   */
  public static double quantile(double probability, int degreesOfFreedom) {
    if (!(probability > 0.5 && probability < 1)) {
      throw new IllegalArgumentException(
          "probability must lie in (0.5, 1) for the upper half, got " + probability);
    }
    if (degreesOfFreedom < 1) {
      throw new IllegalArgumentException(
          "degrees of freedom must be at least 1, got " + degreesOfFreedom);
    }
    double nu = degreesOfFreedom;
    double z = new NormalDistribution(null, 0, 1).inverseCumulativeProbability(probability);
    double z2 = z * z;
    double g1 = z * (z2 + 1) / 4;
    double g2 = z * ((5 * z2 + 16) * z2 + 3) / 96;
    double g3 = z * (((3 * z2 + 19) * z2 + 17) * z2 - 15) / 384;
    double g4 = z * ((((79 * z2 + 776) * z2 + 1482) * z2 - 1920) * z2 - 945) / 92_160;
    double t = z + (g1 + (g2 + (g3 + g4 / nu) / nu) / nu) / nu;
    if (nu >= EXPANSION_FREEDOM_PER_Z_SQUARED * Math.max(z2, 5)) {
      return t;
    }
    if (!(t > 0) || !Double.isFinite(t)) {
      t = z;
    }
    // Both are exact for P in [1/2, 1] (Sterbenz's lemma).
    boolean centre = probability < 0.75;
    double target = centre ? probability - 0.5 : 1 - probability;
    double logDensityFactor = degreesOfFreedom > CLOSED_FORM_LIMIT ? logDensityFactor(nu) : 0;
    double previousStep = Double.POSITIVE_INFINITY;
    for (int step = 0; step < 60; step++) {
      double value;
      double density;
      if (degreesOfFreedom > CLOSED_FORM_LIMIT) {
        value = halves(t, degreesOfFreedom, !centre);
        density = Math.exp(logDensityFactor - 0.5 * (nu + 1) * Math.log1p(t / nu * t));
      } else {
        Evaluation at = closedForm(t, degreesOfFreedom, !centre);
        value = at.half();
        density = at.density();
      }
      // d ln(F - 1/2)/d ln t = t f/(F - 1/2); d ln Q/d ln t = -t f/Q.
      double logStep = Math.log(value / target) * value / (t * density);
      double next = t * Math.exp(centre ? -logStep : logStep);
      if (!(next > 0) || !Double.isFinite(next)) {
        break;
      }
      t = next;
      double size = Math.abs(logStep);
      // Converged, or (beyond the closed forms) at the noise of the incomplete beta function's
      // continued fraction, where the steps stop shrinking: the iterate is then as good as the
      // distribution function allows.
      if (size <= 1e-15 || (size < 1e-10 && size > 0.5 * previousStep)) {
        break;
      }
      previousStep = size;
    }
    return t;
  }

  private static void check(double t, int degreesOfFreedom) {
    if (!(t >= 0)) {
      throw new IllegalArgumentException("t must be >= 0 and not NaN, got " + t);
    }
    if (degreesOfFreedom < 1) {
      throw new IllegalArgumentException(
          "degrees of freedom must be at least 1, got " + degreesOfFreedom);
    }
  }

  /** ln of the density's factor, ln(&Gamma;((&nu;+1)/2)/(&radic;(&nu;&pi;) &Gamma;(&nu;/2))). */
  private static double logDensityFactor(double nu) {
    return Gamma.logGamma(0.5 * (nu + 1)) - Gamma.logGamma(0.5 * nu) - 0.5 * Math.log(nu * Math.PI);
  }

  /** Q(t) if {@code upper}, else F(t) - 1/2; t &ge; 0. */
  private static double halves(double t, int degreesOfFreedom, boolean upper) {
    if (t == 0) {
      return upper ? 0.5 : 0.0;
    }
    if (Double.isInfinite(t)) {
      return upper ? 0.0 : 0.5;
    }
    double nu = degreesOfFreedom;
    if (degreesOfFreedom > CLOSED_FORM_LIMIT) {
      double ratio = nu / t / t;
      // x = nu/(nu + t^2) and y = 1 - x = t^2/(nu + t^2), each without a subtraction. Commons
      // Math sums the continued fraction of I_x(a, b) directly for x <= (a + 1)/(a + b + 2) and
      // takes 1 - I_(1-x)(b, a) beyond, which would lose the digits of a 1 - x near 0: each side
      // is therefore asked only where it sums directly, and the other half is 1/2 minus it (at
      // least 0.04 there, so nothing cancels).
      double a = 0.5 * nu;
      double x = ratio / (1 + ratio);
      if (x <= (a + 1) / (a + 2.5)) {
        double tail = 0.5 * Beta.regularizedBeta(x, a, 0.5);
        return upper ? tail : 0.5 - tail;
      }
      double central = 0.5 * Beta.regularizedBeta(1 / (1 + ratio), 0.5, a);
      return upper ? 0.5 - central : central;
    }
    return closedForm(t, degreesOfFreedom, upper).half();
  }

  /** One half of the distribution function and the density at the same t. */
  private record Evaluation(double half, double density) {}

  /** cos<sup>2</sup>&theta; = &nu;/(&nu; + t<sup>2</sup>), t &gt; 0, without overflow. */
  private static double cosineSquared(double t, double nu) {
    if (t <= 1) {
      return nu / (nu + t * t);
    }
    double ratio = nu / t / t;
    return ratio / (1 + ratio);
  }

  /** sin &theta; = t/&radic;(&nu; + t<sup>2</sup>), t &gt; 0, without overflow. */
  private static double sine(double t, double nu) {
    return t <= 1 ? t / Math.sqrt(nu + t * t) : 1 / Math.sqrt(1 + nu / t / t);
  }

  /** Q(t) if {@code upper}, else F(t) - 1/2, and the density; 0 &lt; t &lt; infinity. */
  private static Evaluation closedForm(double t, int degreesOfFreedom, boolean upper) {
    double nu = degreesOfFreedom;
    double c = cosineSquared(t, nu);
    double sin = sine(t, nu);
    double cos = Math.sqrt(c);
    boolean even = degreesOfFreedom % 2 == 0;
    // Terms a_k c^k (even) or b_k cos^(2k+1) (odd), k = 0 .. m - 1, then the remainder from m.
    int m = even ? degreesOfFreedom / 2 : (degreesOfFreedom - 1) / 2;
    double term = even ? 1.0 : cos;
    double finite = 0;
    for (int k = 0; k < m; k++) {
      finite += term;
      term *= even ? c * (2 * k + 1) / (2 * k + 2) : c * (2 * k + 2) / (2 * k + 3);
    }
    // The density: a_m c^m (even) or b_m cos^nu (odd), the first term of the remainder, rescaled.
    double density = even ? 0.5 * Math.sqrt(nu) * term * cos : Math.sqrt(nu) * term * cos / Math.PI;
    double theta = even ? 0 : Math.atan2(t, Math.sqrt(nu));
    // A/2 = F - 1/2, a sum of positive terms.
    double centralHalf = even ? 0.5 * sin * finite : (theta + sin * finite) / Math.PI;
    double half;
    if (!upper) {
      half = c > 0.5 ? centralHalf : 0.5 - remainderHalf(term, c, m, even, sin);
    } else {
      double upperHalf = 0.5 - centralHalf;
      half =
          c > 0.5 && upperHalf >= 0.5 * REMAINDER_BELOW
              ? upperHalf
              : remainderHalf(term, c, m, even, sin);
    }
    return new Evaluation(half, density);
  }

  /** (1 - A)/2 as the remainder of the series from its term m (first term given). */
  private static double remainderHalf(double first, double c, int m, boolean even, double sin) {
    double sum = 0;
    double term = first;
    // The terms fall at least by c each; what follows a term is below term c/(1 - c).
    double stop = 1e-17 * (1 - c);
    for (int k = m; k < m + MAXIMUM_TERMS; k++) {
      sum += term;
      if (term <= stop * sum) {
        break;
      }
      term *= even ? c * (2 * k + 1) / (2 * k + 2) : c * (2 * k + 2) / (2 * k + 3);
    }
    return even ? 0.5 * sin * sum : sin * sum / Math.PI;
  }
}
