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
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
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
 * <p>Two covariances are given. {@link Solution#covariance()} treats the weights as inverse
 * relative variances: s<sup>2</sup> (J<sup>T</sup>WJ)<sup>-1</sup>. {@link
 * Solution#equalNoiseCovariance()} treats them as design weights on observations of equal noise
 * variance &sigma;<sup>2</sup>, estimated by &Sigma; r<sup>2</sup> / (n - p) from the unweighted
 * residuals: &sigma;<sup>2</sup> A<sup>-1</sup>BA<sup>-1</sup> with A = J<sup>T</sup>WJ and B =
 * J<sup>T</sup>W<sup>2</sup>J (the sandwich form; the two agree for unit weights).
 *
 * <p>For many observations and few parameters, {@link #solveStreamed} passes each evaluation to the
 * optimiser compressed to p + 1 rows (see there), so that nothing of size n &times; p is built or
 * decomposed.
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
   * @param equalNoiseCovariance covariance for design weights on observations of equal noise:
   *     &sigma;<sup>2</sup> A<sup>-1</sup>BA<sup>-1</sup> (see the class description)
   * @param weightedResidualSumOfSquares &Sigma; w r<sup>2</sup> at the optimum
   * @param residuals y<sub>i</sub> - f<sub>i</sub>(p), unweighted
   * @param iterations Levenberg-Marquardt iterations
   * @param evaluations model evaluations
   */
  public record Solution(
      double[] parameters,
      double[] standardErrors,
      double[][] covariance,
      double[][] equalNoiseCovariance,
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
     * @param equalNoiseCovariance covariance for design weights on observations of equal noise
     * @param weightedResidualSumOfSquares weighted residual sum of squares
     * @param residuals unweighted residuals
     * @param iterations iterations
     * @param evaluations evaluations
     */
    public Solution {
      parameters = parameters.clone();
      standardErrors = standardErrors.clone();
      covariance = deepCopy(covariance);
      equalNoiseCovariance = deepCopy(equalNoiseCovariance);
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
     * Covariance for design weights on observations of equal noise.
     *
     * @return a copy
     */
    @Override
    public double[][] equalNoiseCovariance() {
      return deepCopy(equalNoiseCovariance);
    }

    /**
     * Unweighted residuals at the optimum.
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

  /** Gauss-Newton steps of {@link #refineStreamed} before it hands over to Levenberg-Marquardt. */
  public static final int MAX_NEWTON_STEPS = 4;

  /** Eigenvalues of the scaled normal matrix below this fraction of the largest count as 0. */
  private static final double NEGLIGIBLE_EIGENVALUE = 1e-15;

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
   * @throws FitException if the optimiser does not converge, the model returns a non-finite value
   *     or a step gives a non-finite parameter (never passed to the model), or the parameters are
   *     not identifiable (singular normal matrix)
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
          requireFiniteTrial(parameters);
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
    LeastSquaresBuilder builder = builder(function, target, start);
    if (validator != null) {
      builder.parameterValidator(validator);
    }
    final Optimum optimum = optimize(builder);
    final RealMatrix unscaled;
    try {
      unscaled = optimum.getCovariances(SINGULARITY_THRESHOLD);
    } catch (SingularMatrixException e) {
      throw new FitException(
          "the parameters cannot all be determined from these readings (singular normal matrix)",
          e);
    }
    double[] parameters = optimum.getPoint().toArray();
    requireFinite(parameters);
    // Residuals and Jacobian rows of the optimiser are scaled by sqrt(w).
    double[] residuals = optimum.getResiduals().toArray();
    double[][] weightedJacobian = optimum.getJacobian().getData();
    double chiSquare = 0;
    double[][] b = new double[p][p];
    for (int i = 0; i < n; i++) {
      chiSquare += residuals[i] * residuals[i];
      residuals[i] /= rootWeights[i];
      for (int j = 0; j < p; j++) {
        for (int k = 0; k < p; k++) {
          b[j][k] += weights[i] * weightedJacobian[i][j] * weightedJacobian[i][k];
        }
      }
    }
    return solution(
        parameters,
        residuals,
        chiSquare,
        unscaled.getData(),
        b,
        optimum.getIterations(),
        optimum.getEvaluations());
  }

  /**
   * Fits the model as {@link #solve} does, for many observations and few parameters: each
   * evaluation is one pass over the observations that sums A = J<sup>T</sup>WJ, g = J<sup>T
   * </sup>Wr and c = r<sup>T</sup>Wr, and is handed to Levenberg-Marquardt as p + 1 rows with the
   * same normal matrix, gradient and cost: with A = V&Lambda;V<sup>T</sup>, the rows
   * &Lambda;<sup>1/2</sup>V<sup>T</sup> and the residuals z = &Lambda;<sup>-1/2</sup>V<sup>T</sup>g
   * followed by &radic;(c - |z|<sup>2</sup>). The Levenberg-Marquardt step, its trust region and
   * its convergence tests use only these three quantities, so the iterates are those of {@link
   * #solve} up to rounding; memory and time per evaluation are O(n p<sup>2</sup>) with nothing of
   * size n &times; p kept. The price is forming the normal matrix, which squares its condition
   * number: use it where the parameters are well determined (the columns are scaled to unit
   * diagonal before the eigen-decomposition, Commons Math {@code EigenDecomposition}). Directions
   * whose eigenvalue is below 10<sup>-15</sup> of the largest are not moved.
   *
   * @param model the model, called for each observation
   * @param observed observations y<sub>i</sub>, finite; n &gt; p
   * @param weights weights w<sub>i</sub> &gt; 0 and finite, same length as the observations
   * @param start starting parameters, finite
   * @param validator maps a trial parameter vector to an admissible one (for bounds), or null
   * @return the solution, with the same statistics as {@link #solve}
   * @throws IllegalArgumentException if lengths disagree, a value is not finite, a weight is not
   *     positive, or there are not more observations than parameters
   * @throws FitException if the optimiser does not converge, the model returns a non-finite value
   *     or a step gives a non-finite parameter (never passed to the model), or the parameters are
   *     not identifiable (singular normal matrix)
   */
  public Solution solveStreamed(
      PointModel model,
      double[] observed,
      double[] weights,
      double[] start,
      ParameterValidator validator) {
    Objects.requireNonNull(model, "model");
    validate(observed, weights, start);
    final int p = start.length;
    // The last evaluations, so that the optimum's pass is not repeated.
    final Pass[] recent = new Pass[2];
    MultivariateJacobianFunction function =
        point -> {
          double[] parameters = point.toArray();
          Pass pass = Pass.over(model, observed, weights, parameters);
          recent[1] = recent[0];
          recent[0] = pass;
          return pass.compressed();
        };
    LeastSquaresBuilder builder = builder(function, new double[p + 1], start);
    if (validator != null) {
      builder.parameterValidator(validator);
    }
    final Optimum optimum = optimize(builder);
    double[] parameters = optimum.getPoint().toArray();
    requireFinite(parameters);
    Pass atOptimum = null;
    for (Pass pass : recent) {
      if (pass != null && Arrays.equals(pass.parameters, parameters)) {
        atOptimum = pass;
        break;
      }
    }
    if (atOptimum == null) {
      atOptimum = Pass.over(model, observed, weights, parameters);
    }
    return solution(
        parameters,
        atOptimum.residuals,
        atOptimum.weightedSquares,
        atOptimum.inverseNormalMatrix(),
        atOptimum.squaredWeightMatrix,
        optimum.getIterations(),
        optimum.getEvaluations());
  }

  /**
   * Finishes a fit that starts close to the optimum with as few passes over the observations as
   * possible: Gauss-Newton steps &delta; = A<sup>-1</sup>g (A = J<sup>T</sup>WJ, g =
   * J<sup>T</sup>Wr, one pass each), stopping as soon as the step still to be taken is below {@code
   * standardErrorFraction} of a standard error in the metric of the covariance, that is g<sup>T
   * </sup>A<sup>-1</sup>g &le; f<sup>2</sup> s<sup>2</sup> with s<sup>2</sup> = &Sigma; w r<sup>2
   * </sup>/(n - p) (or below the solver's relative tolerance of the cost, for exact data). The
   * start itself is accepted when it already meets this, which costs one pass. A step that raises
   * the cost or that the validator changes, or more than {@value #MAX_NEWTON_STEPS} steps, hands
   * over to {@link #solveStreamed} from the best point so far: the result is then the
   * Levenberg-Marquardt optimum.
   *
   * @param model the model, called for each observation
   * @param observed observations y<sub>i</sub>, finite; n &gt; p
   * @param weights weights w<sub>i</sub> &gt; 0 and finite, same length as the observations
   * @param start starting parameters, finite; close to the optimum
   * @param validator maps a trial parameter vector to an admissible one (for bounds), or null
   * @param standardErrorFraction f, the largest distance to the optimum accepted, in standard
   *     errors; in (0, 1]
   * @return the solution, with the same statistics as {@link #solve}; iterations count the steps
   *     and evaluations the passes
   * @throws IllegalArgumentException as {@link #solve}, or if the fraction is out of range
   * @throws FitException as {@link #solve}
   */
  public Solution refineStreamed(
      PointModel model,
      double[] observed,
      double[] weights,
      double[] start,
      ParameterValidator validator,
      double standardErrorFraction) {
    Objects.requireNonNull(model, "model");
    validate(observed, weights, start);
    if (!(standardErrorFraction > 0 && standardErrorFraction <= 1)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "standard error fraction (%s) must be in (0, 1]",
              standardErrorFraction));
    }
    final int n = observed.length;
    final int p = start.length;
    Pass pass;
    try {
      pass = Pass.over(model, observed, weights, start.clone());
    } catch (NonFiniteModelException e) {
      throw new FitException(e.getMessage(), e);
    }
    int passes = 1;
    for (int step = 0; step <= MAX_NEWTON_STEPS; step++) {
      double[] delta = pass.newtonStep();
      double decrement = 0;
      for (int j = 0; j < p; j++) {
        decrement += delta[j] * pass.gradient[j];
      }
      double variance = pass.weightedSquares / (n - p);
      if (decrement <= standardErrorFraction * standardErrorFraction * variance
          || decrement <= tolerance * pass.weightedSquares) {
        return solution(
            pass.parameters,
            pass.residuals,
            pass.weightedSquares,
            pass.inverseNormalMatrix(),
            pass.squaredWeightMatrix,
            step,
            passes);
      }
      if (step == MAX_NEWTON_STEPS) {
        break;
      }
      double[] trial = pass.parameters.clone();
      for (int j = 0; j < p; j++) {
        trial[j] += delta[j];
      }
      if (validator != null) {
        double[] admitted = validator.validate(new ArrayRealVector(trial)).toArray();
        if (!Arrays.equals(admitted, trial)) {
          break;
        }
      }
      Pass next;
      try {
        next = Pass.over(model, observed, weights, trial);
      } catch (NonFiniteModelException e) {
        break;
      }
      passes++;
      if (!(next.weightedSquares <= pass.weightedSquares)) {
        break;
      }
      pass = next;
    }
    return solveStreamed(model, observed, weights, pass.parameters, validator);
  }

  private LeastSquaresBuilder builder(
      MultivariateJacobianFunction function, double[] target, double[] start) {
    return new LeastSquaresBuilder()
        .model(function)
        .target(target)
        .start(start)
        .maxIterations(maxIterations)
        .maxEvaluations(10 * maxIterations)
        .lazyEvaluation(false);
  }

  private Optimum optimize(LeastSquaresBuilder builder) {
    LevenbergMarquardtOptimizer optimizer =
        new LevenbergMarquardtOptimizer()
            .withCostRelativeTolerance(tolerance)
            .withParameterRelativeTolerance(tolerance)
            .withOrthoTolerance(tolerance);
    try {
      return optimizer.optimize(builder.build());
    } catch (NonFiniteModelException e) {
      throw new FitException(e.getMessage(), e);
    } catch (TooManyEvaluationsException | TooManyIterationsException e) {
      throw new FitException(
          "the least-squares fit did not converge within " + maxIterations + " iterations", e);
    } catch (MathIllegalStateException | MathIllegalArgumentException | MathArithmeticException e) {
      throw new FitException("the least-squares fit failed: " + e.getMessage(), e);
    }
  }

  /**
   * Stops a trial point with a NaN or infinite parameter (a step of the optimiser that overflowed)
   * before the model sees it: a model may reject such parameters with its own exception, which
   * would otherwise escape from inside Commons Math untranslated.
   */
  private static void requireFiniteTrial(double[] parameters) {
    for (double value : parameters) {
      if (!Double.isFinite(value)) {
        throw new NonFiniteModelException();
      }
    }
  }

  private static void requireFinite(double[] parameters) {
    for (double value : parameters) {
      if (!Double.isFinite(value)) {
        throw new FitException("the least-squares fit diverged to a non-finite parameter");
      }
    }
  }

  /**
   * The solution from the residuals, &Sigma; w r<sup>2</sup>, A<sup>-1</sup> and B at the optimum.
   */
  private static Solution solution(
      double[] parameters,
      double[] residuals,
      double chiSquare,
      double[][] inverse,
      double[][] b,
      int iterations,
      int evaluations) {
    int n = residuals.length;
    int p = parameters.length;
    double variance = chiSquare / (n - p);
    double sumSquares = 0;
    for (double r : residuals) {
      sumSquares += r * r;
    }
    double noiseVariance = sumSquares / (n - p);
    double[][] covariance = new double[p][p];
    double[][] sandwich = new double[p][p];
    double[] errors = new double[p];
    for (int j = 0; j < p; j++) {
      for (int k = 0; k < p; k++) {
        covariance[j][k] = inverse[j][k] * variance;
        double sum = 0;
        for (int l = 0; l < p; l++) {
          for (int m = 0; m < p; m++) {
            sum += inverse[j][l] * b[l][m] * inverse[m][k];
          }
        }
        sandwich[j][k] = sum * noiseVariance;
      }
      errors[j] = Math.sqrt(Math.max(0.0, covariance[j][j]));
    }
    for (double[] row : sandwich) {
      for (double value : row) {
        if (!Double.isFinite(value)) {
          throw new FitException(
              "the parameters cannot all be determined from these readings (their covariance is"
                  + " not finite)");
        }
      }
    }
    return new Solution(
        parameters, errors, covariance, sandwich, chiSquare, residuals, iterations, evaluations);
  }

  /**
   * One pass over the observations at one parameter vector: unweighted residuals, the sums A =
   * J<sup>T</sup>WJ, B = J<sup>T</sup>W<sup>2</sup>J, g = J<sup>T</sup>Wr and c = r<sup>T</sup>Wr.
   */
  private static final class Pass {
    final double[] parameters;
    final double[] residuals;
    final double[][] normalMatrix;
    final double[][] squaredWeightMatrix;
    final double[] gradient;
    final double weightedSquares;
    private Scaled decomposed;

    private Pass(
        double[] parameters,
        double[] residuals,
        double[][] normalMatrix,
        double[][] squaredWeightMatrix,
        double[] gradient,
        double weightedSquares) {
      this.parameters = parameters;
      this.residuals = residuals;
      this.normalMatrix = normalMatrix;
      this.squaredWeightMatrix = squaredWeightMatrix;
      this.gradient = gradient;
      this.weightedSquares = weightedSquares;
    }

    static Pass over(PointModel model, double[] observed, double[] weights, double[] parameters) {
      requireFiniteTrial(parameters);
      int n = observed.length;
      int p = parameters.length;
      if (p <= 4) {
        return overAtMostFour(model, observed, weights, parameters);
      }
      double[] residuals = new double[n];
      double[][] a = new double[p][p];
      double[][] b = new double[p][p];
      double[] g = new double[p];
      double c = 0;
      double[] row = new double[p];
      for (int i = 0; i < n; i++) {
        double value = model.valueAndGradient(i, parameters, row);
        if (!Double.isFinite(value)) {
          throw new NonFiniteModelException(i, value, parameters);
        }
        double r = observed[i] - value;
        residuals[i] = r;
        double w = weights[i];
        c += w * r * r;
        for (int j = 0; j < p; j++) {
          double wj = w * row[j];
          if (!Double.isFinite(row[j])) {
            throw new NonFiniteModelException(i, row[j], parameters);
          }
          g[j] += wj * r;
          for (int k = 0; k <= j; k++) {
            a[j][k] += wj * row[k];
            b[j][k] += w * wj * row[k];
          }
        }
      }
      for (int j = 0; j < p; j++) {
        for (int k = 0; k < j; k++) {
          a[k][j] = a[j][k];
          b[k][j] = b[j][k];
        }
      }
      return new Pass(parameters, residuals, a, b, g, c);
    }

    /** Readings evaluated before their sums are taken (the columns of a block stay in cache). */
    private static final int BLOCK = 128;

    /**
     * {@link #over} for up to four parameters, by blocks of {@value #BLOCK} observations: the model
     * fills the block's columns, then three short loops take the sums (g and c; A; B) with at most
     * ten accumulators each, few enough for the processor's registers (one loop with all 25 sums
     * has more than there are registers). Each block's sums are added to the totals in block order:
     * deterministic, and the same for every run.
     */
    private static Pass overAtMostFour(
        PointModel model, double[] observed, double[] weights, double[] parameters) {
      int n = observed.length;
      int p = parameters.length;
      double[] residuals = new double[n];
      double[] row = new double[4];
      double[] c0 = new double[BLOCK];
      double[] c1 = new double[BLOCK];
      double[] c2 = new double[BLOCK];
      double[] c3 = new double[BLOCK];
      double[] weight = new double[BLOCK];
      double[] squaredWeight = new double[BLOCK];
      // The ten distinct products of A and of B, in the order 00, 10, 11, 20, 21, 22, 30, 31, 32,
      // 33.
      double[] a = new double[10];
      double[] b = new double[10];
      double g0 = 0, g1 = 0, g2 = 0, g3 = 0;
      double c = 0;
      for (int start = 0; start < n; start += BLOCK) {
        final int size = Math.min(BLOCK, n - start);
        for (int k = 0; k < size; k++) {
          int i = start + k;
          double value = model.valueAndGradient(i, parameters, row);
          if (!Double.isFinite(value)) {
            throw new NonFiniteModelException(i, value, parameters);
          }
          double x0 = row[0];
          double x1 = row[1];
          double x2 = row[2];
          double x3 = row[3];
          if (!Double.isFinite(x0 + x1 + x2 + x3)) {
            for (int j = 0; j < p; j++) {
              if (!Double.isFinite(row[j])) {
                throw new NonFiniteModelException(i, row[j], parameters);
              }
            }
            // Finite entries whose sum overflows: no error (the sums below will show it).
          }
          residuals[i] = observed[i] - value;
          c0[k] = x0;
          c1[k] = x1;
          c2[k] = x2;
          c3[k] = x3;
          double w = weights[i];
          weight[k] = w;
          squaredWeight[k] = w * w;
        }
        double sc = 0, sg0 = 0, sg1 = 0, sg2 = 0, sg3 = 0;
        for (int k = 0; k < size; k++) {
          double r = residuals[start + k];
          double wr = weight[k] * r;
          sc += wr * r;
          sg0 += wr * c0[k];
          sg1 += wr * c1[k];
          sg2 += wr * c2[k];
          sg3 += wr * c3[k];
        }
        c += sc;
        g0 += sg0;
        g1 += sg1;
        g2 += sg2;
        g3 += sg3;
        addProducts(weight, c0, c1, c2, c3, size, a);
        addProducts(squaredWeight, c0, c1, c2, c3, size, b);
      }
      double[][] fullA = {
        {a[0], a[1], a[3], a[6]},
        {a[1], a[2], a[4], a[7]},
        {a[3], a[4], a[5], a[8]},
        {a[6], a[7], a[8], a[9]}
      };
      double[][] fullB = {
        {b[0], b[1], b[3], b[6]},
        {b[1], b[2], b[4], b[7]},
        {b[3], b[4], b[5], b[8]},
        {b[6], b[7], b[8], b[9]}
      };
      double[] fullG = {g0, g1, g2, g3};
      double[][] normal = new double[p][];
      double[][] squared = new double[p][];
      for (int j = 0; j < p; j++) {
        normal[j] = Arrays.copyOf(fullA[j], p);
        squared[j] = Arrays.copyOf(fullB[j], p);
      }
      return new Pass(parameters, residuals, normal, squared, Arrays.copyOf(fullG, p), c);
    }

    /**
     * Adds the block's sums of f<sub>k</sub> x<sub>j</sub> x<sub>l</sub> (ten accumulators in
     * registers) to the totals, in the order 00, 10, 11, 20, 21, 22, 30, 31, 32, 33.
     */
    private static void addProducts(
        double[] factor,
        double[] c0,
        double[] c1,
        double[] c2,
        double[] c3,
        int size,
        double[] totals) {
      double s00 = 0, s10 = 0, s11 = 0, s20 = 0, s21 = 0, s22 = 0, s30 = 0, s31 = 0, s32 = 0;
      double s33 = 0;
      for (int k = 0; k < size; k++) {
        double f = factor[k];
        double x0 = c0[k];
        double x1 = c1[k];
        double x2 = c2[k];
        double x3 = c3[k];
        double f0 = f * x0;
        double f1 = f * x1;
        double f2 = f * x2;
        double f3 = f * x3;
        s00 += f0 * x0;
        s10 += f1 * x0;
        s11 += f1 * x1;
        s20 += f2 * x0;
        s21 += f2 * x1;
        s22 += f2 * x2;
        s30 += f3 * x0;
        s31 += f3 * x1;
        s32 += f3 * x2;
        s33 += f3 * x3;
      }
      totals[0] += s00;
      totals[1] += s10;
      totals[2] += s11;
      totals[3] += s20;
      totals[4] += s21;
      totals[5] += s22;
      totals[6] += s30;
      totals[7] += s31;
      totals[8] += s32;
      totals[9] += s33;
    }

    /**
     * Eigen-decomposition of the normal matrix scaled to unit diagonal, computed once per pass (a
     * pass is confined to the thread of one fit).
     */
    private Scaled decomposition() {
      if (decomposed == null) {
        decomposed = decompose();
      }
      return decomposed;
    }

    private Scaled decompose() {
      int p = parameters.length;
      double[] scale = new double[p];
      double[][] scaled = new double[p][p];
      for (int j = 0; j < p; j++) {
        scale[j] = normalMatrix[j][j] > 0 ? Math.sqrt(normalMatrix[j][j]) : 1.0;
      }
      for (int j = 0; j < p; j++) {
        for (int k = 0; k < p; k++) {
          scaled[j][k] = normalMatrix[j][k] / (scale[j] * scale[k]);
        }
      }
      EigenDecomposition eigen = new EigenDecomposition(new Array2DRowRealMatrix(scaled, false));
      double[] values = eigen.getRealEigenvalues();
      double largest = 0;
      for (double value : values) {
        largest = Math.max(largest, value);
      }
      for (int k = 0; k < p; k++) {
        if (!(values[k] > NEGLIGIBLE_EIGENVALUE * largest)) {
          values[k] = 0.0;
        }
      }
      return new Scaled(scale, values, eigen.getV().getData());
    }

    /** The p + 1 compressed rows (negated residuals as values, target 0) for the optimiser. */
    Pair<RealVector, RealMatrix> compressed() {
      int p = parameters.length;
      Scaled parts = decomposition();
      double[] scale = parts.scale();
      double[] values = parts.values();
      double[][] v = parts.vectors();
      double[][] rows = new double[p + 1][p];
      double[] negated = new double[p + 1];
      double explained = 0;
      for (int k = 0; k < p; k++) {
        double root = Math.sqrt(values[k]);
        double projection = 0;
        for (int j = 0; j < p; j++) {
          rows[k][j] = root * v[j][k] * scale[j];
          projection += v[j][k] * gradient[j] / scale[j];
        }
        double z = values[k] > 0 ? projection / root : 0.0;
        negated[k] = -z;
        explained += z * z;
      }
      negated[p] = -Math.sqrt(Math.max(0.0, weightedSquares - explained));
      return new Pair<>(new ArrayRealVector(negated, false), new Array2DRowRealMatrix(rows, false));
    }

    /** The Gauss-Newton step A<sup>+</sup>g (directions of negligible eigenvalue not moved). */
    double[] newtonStep() {
      int p = parameters.length;
      Scaled parts = decomposition();
      double[] scale = parts.scale();
      double[] values = parts.values();
      double[][] v = parts.vectors();
      double[] step = new double[p];
      for (int k = 0; k < p; k++) {
        if (values[k] == 0.0) {
          continue;
        }
        double projection = 0;
        for (int j = 0; j < p; j++) {
          projection += v[j][k] * gradient[j] / scale[j];
        }
        double coefficient = projection / values[k];
        for (int j = 0; j < p; j++) {
          step[j] += v[j][k] * coefficient / scale[j];
        }
      }
      return step;
    }

    /** A<sup>-1</sup> from the scaled eigen-decomposition; FitException if singular. */
    double[][] inverseNormalMatrix() {
      int p = parameters.length;
      Scaled parts = decomposition();
      double[] scale = parts.scale();
      double[] values = parts.values();
      double[][] v = parts.vectors();
      double[][] inverse = new double[p][p];
      for (int k = 0; k < p; k++) {
        if (values[k] == 0.0) {
          throw new FitException(
              "the parameters cannot all be determined from these readings (singular normal"
                  + " matrix)");
        }
      }
      for (int j = 0; j < p; j++) {
        for (int l = 0; l < p; l++) {
          double sum = 0;
          for (int k = 0; k < p; k++) {
            sum += v[j][k] * v[l][k] / values[k];
          }
          inverse[j][l] = sum / (scale[j] * scale[l]);
        }
      }
      return inverse;
    }
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

  /**
   * A normal matrix A = D A' D with D = diag(scale) and A' = V diag(values) V<sup>T</sup>,
   * eigenvalues below the negligible fraction set to 0.
   */
  private record Scaled(double[] scale, double[] values, double[][] vectors) {}

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

    NonFiniteModelException() {
      super("the least-squares step overflowed: no finite parameters to try next");
    }
  }
}
