package org.oedometry.fitting.internal;

import java.util.Arrays;
import java.util.Locale;
import java.util.Objects;
import org.apache.commons.math3.exception.MathArithmeticException;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer.Optimum;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.fitting.leastsquares.ParameterValidator;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.apache.commons.math3.util.Pair;
import org.oedometry.fitting.FitException;

/**
 * Weighted nonlinear least squares by Levenberg-Marquardt (Commons Math 3.6.1) with an analytic
 * Jacobian, standard errors scaled by the residual variance, and every Commons Math failure
 * translated into a {@link FitException}.
 *
 * <p>Minimises &Sigma; w<sub>i</sub> (y<sub>i</sub> - f<sub>i</sub>(p))<sup>2</sup>. The weights
 * are applied by scaling residuals and Jacobian rows by &radic;w<sub>i</sub> here, so that the cost
 * stays O(n p<sup>2</sup>) for thousands of readings (a weight matrix passed to Commons Math is n x
 * n and multiplies the Jacobian as a dense matrix).
 *
 * <p>Standard errors: SE<sub>j</sub> = &radic;(C<sub>jj</sub> s<sup>2</sup>), with C = (J<sup>T
 * </sup>WJ)<sup>-1</sup> at the optimum and s<sup>2</sup> = &Sigma; w r<sup>2</sup> / (n - p) the
 * residual variance. Commons Math's {@code Optimum.getSigma} is &radic;C<sub>jj</sub> only: it is
 * not the standard error for unit weights. Checked against the certified values of the NIST StRD
 * nonlinear regression datasets (see the tests).
 *
 * <p>Stateless: one instance may be shared between threads.
 */
public final class WeightedLeastSquares {

  /** The model: its values at every observation and its Jacobian, for one parameter vector. */
  @FunctionalInterface
  public interface Model {
    /**
     * Model values f<sub>i</sub>(p) and Jacobian &part;f<sub>i</sub>/&part;p<sub>j</sub> for all
     * observations at once (so that work shared by all observations is done once a pass).
     *
     * @param parameters current parameters (do not modify)
     * @param values receives f<sub>i</sub>(p), length n
     * @param jacobian receives row i = gradient of f<sub>i</sub>, n x p
     */
    void evaluate(double[] parameters, double[] values, double[][] jacobian);
  }

  /**
   * A model given one observation at a time, for models with nothing to share between observations.
   */
  @FunctionalInterface
  public interface PointModel {
    /**
     * Model value f<sub>i</sub>(p) and its gradient &part;f<sub>i</sub>/&part;p.
     *
     * @param index observation index, 0 &le; i &lt; n
     * @param parameters current parameters (do not modify)
     * @param gradient receives the p partial derivatives
     * @return f<sub>i</sub>(p)
     */
    double valueAndGradient(int index, double[] parameters, double[] gradient);

    /**
     * This model as a {@link Model}.
     *
     * @return a model that calls this one for each observation
     */
    default Model asModel() {
      return (parameters, values, jacobian) -> {
        for (int i = 0; i < values.length; i++) {
          values[i] = valueAndGradient(i, parameters, jacobian[i]);
        }
      };
    }
  }

  /**
   * Result of a fit.
   *
   * @param parameters the parameters at the optimum
   * @param standardErrors standard errors of the parameters, scaled by the residual variance
   * @param covariance scaled covariance s<sup>2</sup> (J<sup>T</sup>WJ)<sup>-1</sup> of the
   *     parameters
   * @param weightedResidualSumOfSquares &Sigma; w r<sup>2</sup> at the optimum
   * @param residuals y<sub>i</sub> - f<sub>i</sub>(p), unweighted
   * @param iterations Levenberg-Marquardt iterations
   * @param evaluations model evaluations
   */
  public record Solution(
      double[] parameters,
      double[] standardErrors,
      double[][] covariance,
      double weightedResidualSumOfSquares,
      double[] residuals,
      int iterations,
      int evaluations) {

    /**
     * Copies the arrays in.
     *
     * @param parameters the parameters at the optimum
     * @param standardErrors standard errors
     * @param covariance scaled covariance
     * @param weightedResidualSumOfSquares weighted residual sum of squares
     * @param residuals unweighted residuals
     * @param iterations iterations
     * @param evaluations evaluations
     */
    public Solution {
      parameters = parameters.clone();
      standardErrors = standardErrors.clone();
      covariance = deepCopy(covariance);
      residuals = residuals.clone();
    }

    /**
     * Parameters at the optimum.
     *
     * @return a copy
     */
    @Override
    public double[] parameters() {
      return parameters.clone();
    }

    /**
     * Standard errors.
     *
     * @return a copy
     */
    @Override
    public double[] standardErrors() {
      return standardErrors.clone();
    }

    /**
     * Scaled covariance matrix.
     *
     * @return a copy
     */
    @Override
    public double[][] covariance() {
      return deepCopy(covariance);
    }

    /**
     * Unweighted residuals.
     *
     * @return a copy
     */
    @Override
    public double[] residuals() {
      return residuals.clone();
    }

    /**
     * Summary with the parameters and their standard errors.
     *
     * @return the summary
     */
    @Override
    public String toString() {
      return String.format(
          Locale.ROOT,
          "Solution[parameters %s, standard errors %s, weighted RSS %s, iterations %d,"
              + " evaluations %d]",
          Arrays.toString(parameters),
          Arrays.toString(standardErrors),
          weightedResidualSumOfSquares,
          iterations,
          evaluations);
    }

    private static double[][] deepCopy(double[][] matrix) {
      double[][] copy = new double[matrix.length][];
      for (int i = 0; i < matrix.length; i++) {
        copy[i] = matrix[i].clone();
      }
      return copy;
    }
  }

  /** Default relative tolerance on the cost and on the parameters. */
  public static final double DEFAULT_TOLERANCE = 1e-12;

  /** Default limit on Levenberg-Marquardt iterations. */
  public static final int DEFAULT_MAX_ITERATIONS = 1000;

  private static final double SINGULARITY_THRESHOLD = 1e-14;

  private final int maxIterations;
  private final double tolerance;

  private WeightedLeastSquares(int maxIterations, double tolerance) {
    this.maxIterations = maxIterations;
    this.tolerance = tolerance;
  }

  /**
   * The solver with {@link #DEFAULT_MAX_ITERATIONS} and {@link #DEFAULT_TOLERANCE}.
   *
   * @return the solver
   */
  public static WeightedLeastSquares withDefaults() {
    return new WeightedLeastSquares(DEFAULT_MAX_ITERATIONS, DEFAULT_TOLERANCE);
  }

  /**
   * A copy with another iteration limit (evaluations are limited to 10 times as many).
   *
   * @param iterations at least 1
   * @return the solver
   * @throws IllegalArgumentException if iterations is below 1
   */
  public WeightedLeastSquares withMaxIterations(int iterations) {
    if (iterations < 1) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "maximum iterations (%d) must be >= 1", iterations));
    }
    return new WeightedLeastSquares(iterations, tolerance);
  }

  /**
   * A copy with another relative tolerance on cost and parameters.
   *
   * @param relativeTolerance in [1e-15, 1e-3]
   * @return the solver
   * @throws IllegalArgumentException if the tolerance is out of range or NaN
   */
  public WeightedLeastSquares withTolerance(double relativeTolerance) {
    if (!(relativeTolerance >= 1e-15 && relativeTolerance <= 1e-3)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT, "relative tolerance (%s) must be in [1e-15, 1e-3]", relativeTolerance));
    }
    return new WeightedLeastSquares(maxIterations, relativeTolerance);
  }

  /**
   * Fits the model.
   *
   * @param model the model, called for each observation
   * @param observed observations y<sub>i</sub>, finite; n &gt; p
   * @param weights weights w<sub>i</sub> &gt; 0 and finite, same length as the observations
   * @param start starting parameters, finite
   * @param validator maps a trial parameter vector to an admissible one (for bounds), or null
   * @return the solution
   * @throws IllegalArgumentException if lengths disagree, a value is not finite, a weight is not
   *     positive, or there are not more observations than parameters
   * @throws FitException if the optimiser does not converge, the model returns a non-finite value,
   *     or the parameters are not identifiable (singular normal matrix)
   */
  public Solution solve(
      Model model,
      double[] observed,
      double[] weights,
      double[] start,
      ParameterValidator validator) {
    Objects.requireNonNull(model, "model");
    final int n = observed.length;
    final int p = start.length;
    validate(observed, weights, start);
    final double[] rootWeights = new double[n];
    final double[] target = new double[n];
    for (int i = 0; i < n; i++) {
      rootWeights[i] = Math.sqrt(weights[i]);
      target[i] = rootWeights[i] * observed[i];
    }
    MultivariateJacobianFunction function =
        point -> {
          double[] parameters = point.toArray();
          double[] values = new double[n];
          double[][] jacobian = new double[n][p];
          model.evaluate(parameters, values, jacobian);
          for (int i = 0; i < n; i++) {
            double value = values[i];
            if (!Double.isFinite(value)) {
              throw new NonFiniteModelException(i, value, parameters);
            }
            values[i] = rootWeights[i] * value;
            for (int j = 0; j < p; j++) {
              if (!Double.isFinite(jacobian[i][j])) {
                throw new NonFiniteModelException(i, jacobian[i][j], parameters);
              }
              jacobian[i][j] *= rootWeights[i];
            }
          }
          return new Pair<>(
              new ArrayRealVector(values, false), new Array2DRowRealMatrix(jacobian, false));
        };
    LeastSquaresBuilder builder =
        new LeastSquaresBuilder()
            .model(function)
            .target(target)
            .start(start)
            .maxIterations(maxIterations)
            .maxEvaluations(10 * maxIterations)
            .lazyEvaluation(false);
    if (validator != null) {
      builder.parameterValidator(validator);
    }
    LevenbergMarquardtOptimizer optimizer =
        new LevenbergMarquardtOptimizer()
            .withCostRelativeTolerance(tolerance)
            .withParameterRelativeTolerance(tolerance)
            .withOrthoTolerance(tolerance);
    final Optimum optimum;
    final RealMatrix unscaled;
    try {
      optimum = optimizer.optimize(builder.build());
      unscaled = optimum.getCovariances(SINGULARITY_THRESHOLD);
    } catch (NonFiniteModelException e) {
      throw new FitException(e.getMessage(), e);
    } catch (TooManyEvaluationsException | TooManyIterationsException e) {
      throw new FitException(
          "the least-squares fit did not converge within " + maxIterations + " iterations", e);
    } catch (SingularMatrixException e) {
      throw new FitException(
          "the parameters cannot all be determined from these readings (singular normal matrix)",
          e);
    } catch (MathIllegalStateException | MathIllegalArgumentException | MathArithmeticException e) {
      throw new FitException("the least-squares fit failed: " + e.getMessage(), e);
    }
    double[] parameters = optimum.getPoint().toArray();
    for (double value : parameters) {
      if (!Double.isFinite(value)) {
        throw new FitException("the least-squares fit diverged to a non-finite parameter");
      }
    }
    double[] residuals = new double[n];
    model.evaluate(parameters, residuals, new double[n][p]);
    double chiSquare = 0;
    for (int i = 0; i < n; i++) {
      residuals[i] = observed[i] - residuals[i];
      chiSquare += weights[i] * residuals[i] * residuals[i];
    }
    double variance = chiSquare / (n - p);
    double[][] covariance = new double[p][p];
    double[] errors = new double[p];
    for (int j = 0; j < p; j++) {
      for (int k = 0; k < p; k++) {
        covariance[j][k] = unscaled.getEntry(j, k) * variance;
      }
      errors[j] = Math.sqrt(Math.max(0.0, covariance[j][j]));
    }
    return new Solution(
        parameters,
        errors,
        covariance,
        chiSquare,
        residuals,
        optimum.getIterations(),
        optimum.getEvaluations());
  }

  private static void validate(double[] observed, double[] weights, double[] start) {
    if (weights.length != observed.length) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "weights (%d values) and observations (%d values) must have the same length",
              weights.length,
              observed.length));
    }
    if (observed.length <= start.length) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "%d observations are too few for %d parameters (need more observations than"
                  + " parameters)",
              observed.length,
              start.length));
    }
    for (int i = 0; i < observed.length; i++) {
      if (!Double.isFinite(observed[i])) {
        throw new IllegalArgumentException(
            String.format(
                Locale.ROOT, "observation at index %d (%s) must be finite", i, observed[i]));
      }
      if (!(weights[i] > 0) || weights[i] == Double.POSITIVE_INFINITY) {
        throw new IllegalArgumentException(
            String.format(
                Locale.ROOT, "weight at index %d (%s) must be finite and > 0", i, weights[i]));
      }
    }
    for (int j = 0; j < start.length; j++) {
      if (!Double.isFinite(start[j])) {
        throw new IllegalArgumentException(
            String.format(
                Locale.ROOT, "starting parameter at index %d (%s) must be finite", j, start[j]));
      }
    }
  }

  /** Thrown inside the optimiser when the model leaves the finite numbers. */
  private static final class NonFiniteModelException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    NonFiniteModelException(int index, double value, double[] parameters) {
      super(
          String.format(
              Locale.ROOT,
              "the model gave a non-finite value (%s) at observation %d for parameters %s",
              value,
              index,
              Arrays.toString(parameters)));
    }
  }
}
