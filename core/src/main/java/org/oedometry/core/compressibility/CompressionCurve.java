package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;

/**
 * The compression curve of one oedometer test: the initial state and one point (effective stress,
 * void ratio) per load increment, in the order the loads were applied, including any unloading and
 * reloading.
 *
 * <p>The initial state is the void ratio e<sub>0</sub> at the start of the test under the seating
 * stress &sigma;'<sub>0</sub> (which may be 0). Increment j runs from the state before it (the
 * initial state for j = 0, otherwise point j &minus; 1) to point j. Consecutive stresses must
 * differ, and the first point's stress must exceed the seating stress. The axial strain of point j
 * is &epsilon;<sub>j</sub> = (e<sub>0</sub> &minus; e<sub>j</sub>) / (1 + e<sub>0</sub>).
 *
 * <p>This type holds plain numbers so that any source can feed it: a whole-test reduction, a
 * spreadsheet, {@link #fromDeformations} with a specimen's phase relations, or {@link #fromTest}
 * with a whole {@link OedometerTest}. Immutable and thread-safe. Results feed engineering
 * decisions: they must be reviewed by a qualified engineer, and local codes and standards govern.
 */
public final class CompressionCurve {

  private final double initialVoidRatio;
  private final double seatingStress;
  private final List<CompressionPoint> points;

  private CompressionCurve(
      double initialVoidRatio, double seatingStress, List<CompressionPoint> points) {
    this.initialVoidRatio = Checks.positive("initial void ratio", initialVoidRatio, "");
    this.seatingStress = Checks.nonNegative("seating stress", seatingStress, " Pa");
    if (points.isEmpty()) {
      throw new IllegalArgumentException("compression curve needs at least one point (0 given)");
    }
    this.points = List.copyOf(points);
    if (!(this.points.get(0).effectiveStress() > seatingStress)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "effective stress at index 0 (%s Pa) must exceed the seating stress (%s Pa)",
              this.points.get(0).effectiveStress(),
              seatingStress));
    }
    for (int i = 1; i < this.points.size(); i++) {
      double previous = this.points.get(i - 1).effectiveStress();
      double current = this.points.get(i).effectiveStress();
      if (current == previous) {
        throw new IllegalArgumentException(
            String.format(
                Locale.ROOT,
                "effective stress at index %d (%s Pa) equals index %d (%s Pa): "
                    + "consecutive increments must change the stress",
                i,
                current,
                i - 1,
                previous));
      }
    }
  }

  /**
   * A curve from zero seating stress.
   *
   * @param initialVoidRatio e<sub>0</sub>, dimensionless; finite, &gt; 0
   * @param effectiveStresses &sigma;' at the end of each increment, Pa; finite, &gt; 0, consecutive
   *     values different; copied
   * @param voidRatios e at the end of each increment, dimensionless; finite, &gt; 0; copied
   * @return the curve
   * @throws IllegalArgumentException if the arrays are empty, of different lengths, or hold a value
   *     out of range (the message names the index)
   */
  public static CompressionCurve of(
      double initialVoidRatio, double[] effectiveStresses, double[] voidRatios) {
    return of(initialVoidRatio, 0.0, effectiveStresses, voidRatios);
  }

  /**
   * A curve from a given seating stress.
   *
   * @param initialVoidRatio e<sub>0</sub>, dimensionless; finite, &gt; 0
   * @param seatingStress &sigma;'<sub>0</sub> under which e<sub>0</sub> was measured, Pa; finite,
   *     &ge; 0 and below the first stress
   * @param effectiveStresses &sigma;' at the end of each increment, Pa; finite, &gt; 0, consecutive
   *     values different; copied
   * @param voidRatios e at the end of each increment, dimensionless; finite, &gt; 0; copied
   * @return the curve
   * @throws IllegalArgumentException if the arrays are empty, of different lengths, or hold a value
   *     out of range (the message names the index)
   */
  public static CompressionCurve of(
      double initialVoidRatio,
      double seatingStress,
      double[] effectiveStresses,
      double[] voidRatios) {
    Checks.notNull("effective stresses", effectiveStresses);
    Checks.notNull("void ratios", voidRatios);
    Checks.sameLength(
        "effective stresses", effectiveStresses.length, "void ratios", voidRatios.length);
    List<CompressionPoint> list = new ArrayList<>(effectiveStresses.length);
    for (int i = 0; i < effectiveStresses.length; i++) {
      Checks.positiveAt("effective stress", i, effectiveStresses[i], " Pa");
      Checks.positiveAt("void ratio", i, voidRatios[i], "");
      list.add(new CompressionPoint(effectiveStresses[i], voidRatios[i]));
    }
    return new CompressionCurve(initialVoidRatio, seatingStress, list);
  }

  /**
   * A curve from a list of points.
   *
   * @param initialVoidRatio e<sub>0</sub>, dimensionless; finite, &gt; 0
   * @param seatingStress &sigma;'<sub>0</sub>, Pa; finite, &ge; 0 and below the first stress
   * @param points one point per increment in loading order; copied; no null element
   * @return the curve
   * @throws IllegalArgumentException if the list is empty, holds null, or the stresses are out of
   *     order as described in the class documentation
   */
  public static CompressionCurve of(
      double initialVoidRatio, double seatingStress, List<CompressionPoint> points) {
    Checks.notNull("points", points);
    for (int i = 0; i < points.size(); i++) {
      if (points.get(i) == null) {
        throw new IllegalArgumentException(
            String.format(Locale.ROOT, "point at index %d must not be null", i));
      }
    }
    return new CompressionCurve(initialVoidRatio, seatingStress, points);
  }

  /**
   * A curve from a specimen's phase relations and each increment's settlement.
   *
   * <p>Point j has the void ratio e<sub>j</sub> = (H<sub>0</sub> &minus; &Delta;H<sub>j</sub>) /
   * H<sub>s</sub> &minus; 1 with &Delta;H<sub>j</sub> the settlement the basis selects, and
   * e<sub>0</sub> = H<sub>0</sub> / H<sub>s</sub> &minus; 1.
   *
   * @param phases initial height and height of solids of the specimen
   * @param seatingStress &sigma;'<sub>0</sub> at the zero of settlement, Pa; finite, &ge; 0
   * @param increments the increments in loading order; no null element
   * @param basis end of increment or end of primary consolidation
   * @return the curve
   * @throws IllegalArgumentException if an argument is null or empty, an end-of-primary settlement
   *     is asked for but not known, a settlement would leave no voids, or the stresses are out of
   *     order (each message names the index)
   */
  public static CompressionCurve fromDeformations(
      SpecimenPhases phases,
      double seatingStress,
      List<IncrementDeformation> increments,
      DeformationBasis basis) {
    Checks.notNull("phases", phases);
    Checks.notNull("increments", increments);
    Checks.notNull("deformation basis", basis);
    List<CompressionPoint> list = new ArrayList<>(increments.size());
    for (int i = 0; i < increments.size(); i++) {
      IncrementDeformation increment = increments.get(i);
      if (increment == null) {
        throw new IllegalArgumentException(
            String.format(Locale.ROOT, "increment at index %d must not be null", i));
      }
      double settlement = increment.settlement(basis, i);
      double voidRatio;
      try {
        voidRatio = phases.voidRatio(settlement);
      } catch (IllegalArgumentException e) {
        throw new IllegalArgumentException(
            String.format(Locale.ROOT, "increment at index %d: %s", i, e.getMessage()), e);
      }
      list.add(new CompressionPoint(increment.effectiveStress(), voidRatio));
    }
    return new CompressionCurve(phases.initialVoidRatio(), seatingStress, list);
  }

  /**
   * The end-of-increment compression curve of a whole test held as values.
   *
   * <p>The seating stress is the stress before the first increment; point j has the stress after
   * increment j and the void ratio at its last reading, e<sub>j</sub> = (H<sub>0</sub> &minus;
   * &Delta;H<sub>j</sub>) / H<sub>s</sub> &minus; 1, where &Delta;H<sub>j</sub> = H<sub>0</sub>
   * &minus; {@link OedometerTest#heightAtEndMetres(int)} is the settlement from the start of the
   * test (the sum of the final readings of increments 0..j) and H<sub>s</sub> = {@link
   * OedometerTest#heightOfSolidsMetres()} comes from the specimen's dry mass or final water
   * content. The initial void ratio is H<sub>0</sub> / H<sub>s</sub> &minus; 1. Each increment's
   * final reading is taken as its end; for end-of-primary points use {@link #fromDeformations} with
   * each increment's d<sub>100</sub>.
   *
   * @param test the test; not null
   * @return the curve, one point per increment in the order applied
   * @throws IllegalArgumentException if the test is null, or its first increment unloads (its
   *     stress after would not exceed the seating stress)
   */
  public static CompressionCurve fromTest(OedometerTest test) {
    Checks.notNull("oedometer test", test);
    double initialHeight = test.specimen().initialHeightMetres();
    SpecimenPhases phases = SpecimenPhases.of(initialHeight, test.heightOfSolidsMetres());
    List<LoadIncrement> increments = test.increments();
    List<IncrementDeformation> deformations = new ArrayList<>(increments.size());
    for (int j = 0; j < increments.size(); j++) {
      deformations.add(
          IncrementDeformation.of(
              increments.get(j).stressAfterPascals(), initialHeight - test.heightAtEndMetres(j)));
    }
    return fromDeformations(
        phases,
        increments.get(0).stressBeforePascals(),
        deformations,
        DeformationBasis.END_OF_INCREMENT);
  }

  /**
   * Initial void ratio e<sub>0</sub>, at the seating stress before the first increment.
   *
   * @return e<sub>0</sub>, dimensionless, &gt; 0
   */
  public double initialVoidRatio() {
    return initialVoidRatio;
  }

  /**
   * Seating stress &sigma;'<sub>0</sub> under which e<sub>0</sub> applies.
   *
   * @return Pa, &ge; 0
   */
  public double seatingStress() {
    return seatingStress;
  }

  /**
   * The points, one per increment, in loading order.
   *
   * @return an unmodifiable list
   */
  public List<CompressionPoint> points() {
    return points;
  }

  /**
   * Number of points (and of increments).
   *
   * @return &ge; 1
   */
  public int size() {
    return points.size();
  }

  /**
   * Effective stress of point j.
   *
   * @param index j, 0 &le; j &lt; {@link #size()}
   * @return &sigma;', Pa
   * @throws IllegalArgumentException if the index is out of range
   */
  public double stress(int index) {
    return point(index).effectiveStress();
  }

  /**
   * Void ratio of point j.
   *
   * @param index j, 0 &le; j &lt; {@link #size()}
   * @return e, dimensionless
   * @throws IllegalArgumentException if the index is out of range
   */
  public double voidRatio(int index) {
    return point(index).voidRatio();
  }

  /**
   * Axial strain of point j: &epsilon; = (e<sub>0</sub> &minus; e<sub>j</sub>) / (1 +
   * e<sub>0</sub>), positive for compression.
   *
   * @param index j, 0 &le; j &lt; {@link #size()}
   * @return &epsilon;, dimensionless
   * @throws IllegalArgumentException if the index is out of range
   */
  public double axialStrain(int index) {
    return (initialVoidRatio - voidRatio(index)) / (1.0 + initialVoidRatio);
  }

  /**
   * Stress at the start of increment j: the seating stress for j = 0, otherwise the stress of point
   * j &minus; 1.
   *
   * @param index j, 0 &le; j &lt; {@link #size()}
   * @return Pa, &ge; 0
   * @throws IllegalArgumentException if the index is out of range
   */
  public double startStress(int index) {
    checkIndex(index);
    return index == 0 ? seatingStress : points.get(index - 1).effectiveStress();
  }

  /**
   * Void ratio at the start of increment j: e<sub>0</sub> for j = 0, otherwise that of point j
   * &minus; 1.
   *
   * @param index j, 0 &le; j &lt; {@link #size()}
   * @return dimensionless, &gt; 0
   * @throws IllegalArgumentException if the index is out of range
   */
  public double startVoidRatio(int index) {
    checkIndex(index);
    return index == 0 ? initialVoidRatio : points.get(index - 1).voidRatio();
  }

  private CompressionPoint point(int index) {
    checkIndex(index);
    return points.get(index);
  }

  private void checkIndex(int index) {
    if (index < 0 || index >= points.size()) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "point index %d is outside 0..%d", index, points.size() - 1));
    }
  }

  @Override
  public boolean equals(Object other) {
    return other instanceof CompressionCurve c
        && Double.compare(c.initialVoidRatio, initialVoidRatio) == 0
        && Double.compare(c.seatingStress, seatingStress) == 0
        && c.points.equals(points);
  }

  @Override
  public int hashCode() {
    return (31 * Double.hashCode(initialVoidRatio) + Double.hashCode(seatingStress)) * 31
        + points.hashCode();
  }

  @Override
  public String toString() {
    StringBuilder s =
        new StringBuilder(
            String.format(
                Locale.ROOT,
                "CompressionCurve[e0=%s, seating=%s Pa, points=",
                initialVoidRatio,
                seatingStress));
    for (int i = 0; i < points.size(); i++) {
      s.append(i == 0 ? "" : ", ")
          .append(
              String.format(
                  Locale.ROOT,
                  "(%s Pa, e=%s)",
                  points.get(i).effectiveStress(),
                  points.get(i).voidRatio()));
    }
    return s.append(']').toString();
  }
}
