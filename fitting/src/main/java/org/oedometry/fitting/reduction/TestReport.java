package org.oedometry.fitting.reduction;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.oedometry.core.DataWarning;
import org.oedometry.core.DrainagePathRule;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.Specimen;
import org.oedometry.core.TestIdentifiers;
import org.oedometry.core.compressibility.CompressionCurve;
import org.oedometry.core.compressibility.Derived;
import org.oedometry.core.compressibility.IndexBranch;
import org.oedometry.core.compressibility.IndexFit;
import org.oedometry.core.compressibility.PermeabilityChangeFit;
import org.oedometry.core.compressibility.PreconsolidationEstimate;
import org.oedometry.core.compressibility.PreconsolidationMethod;
import org.oedometry.theory.Drainage;

/**
 * The reduced oedometer test: one {@link IncrementReport} per increment and the whole-test
 * quantities (e<sub>0</sub>, the compression curve, &sigma;'<sub>p</sub> by each construction,
 * C<sub>c</sub>, C<sub>r</sub>, C<sub>k</sub>), with the options that produced them. Made by {@link
 * TestReduction}; rendered by {@link #toText()}, {@link #toCsv()}, {@link #toJson()} and {@link
 * #toAgs4()}.
 *
 * <p>Every number is traceable: each c<sub>v</sub> names its method, its drainage path and the rule
 * that chose that path; each derived quantity names the c<sub>v</sub> it came from; absent values
 * carry a reason. All values are SI; the renderings convert to the lab's units (kPa, mm, min,
 * m^2/yr, m^2/MN, m/s) and say so in every heading.
 *
 * <p>Results feed engineering decisions: they must be reviewed by a qualified engineer, and local
 * codes and standards govern. Immutable and thread-safe.
 *
 * @param identifiers the test's identifiers
 * @param specimen the specimen
 * @param drainage double or single drainage
 * @param drainagePathRule the drainage path rule in force (the options' override or the test's own)
 * @param options the options of the reduction
 * @param heightOfSolidsMetres H<sub>s</sub>, m
 * @param initialVoidRatio e<sub>0</sub>, dimensionless
 * @param seatingStressPascals stress before the first increment, Pa
 * @param initialDegreeOfSaturation S<sub>0</sub> = w<sub>0</sub> G<sub>s</sub> / e<sub>0</sub>, or
 *     empty without an initial water content ({@link OedometerTest#initialDegreeOfSaturation()})
 * @param finalDegreeOfSaturation S<sub>f</sub> = w<sub>f</sub> G<sub>s</sub> / e<sub>f</sub>, or
 *     empty unless both the dry mass and the final water content were given ({@link
 *     OedometerTest#finalDegreeOfSaturation()})
 * @param dataWarnings the test's remarks on its input data ({@link OedometerTest#warnings()}:
 *     unusual specific gravity, phase relations that disagree), empty when there is nothing to say
 * @param increments one row per increment, in the order applied
 * @param compressionCurve the e &ndash; log &sigma;' points the derivation used, or why none
 * @param preconsolidation &sigma;'<sub>p</sub> by each construction of {@link
 *     PreconsolidationMethod}, in that order, each present or absent with its reason (empty when
 *     there is no compression curve)
 * @param preconsolidationForClasses the estimate that classed the increments as overconsolidated or
 *     normally consolidated (the first present, in {@link PreconsolidationMethod} order), or why
 *     none
 * @param compressionIndex C<sub>c</sub> over the normally consolidated increments, or why absent
 * @param recompressionBranches the overconsolidated branches with their C<sub>r</sub>
 * @param permeabilityChange C<sub>k</sub> over the normally consolidated increments' k from the
 *     preferred c<sub>v</sub>, or why absent
 */
public record TestReport(
    TestIdentifiers identifiers,
    Specimen specimen,
    Drainage drainage,
    DrainagePathRule drainagePathRule,
    ReductionOptions options,
    double heightOfSolidsMetres,
    double initialVoidRatio,
    double seatingStressPascals,
    OptionalDouble initialDegreeOfSaturation,
    OptionalDouble finalDegreeOfSaturation,
    List<DataWarning> dataWarnings,
    List<IncrementReport> increments,
    Derived<CompressionCurve> compressionCurve,
    List<PreconsolidationEstimate> preconsolidation,
    Derived<PreconsolidationEstimate> preconsolidationForClasses,
    Derived<IndexFit> compressionIndex,
    List<IndexBranch> recompressionBranches,
    Derived<PermeabilityChangeFit> permeabilityChange) {

  /**
   * Validates and copies.
   *
   * @param identifiers not null
   * @param specimen not null
   * @param drainage not null
   * @param drainagePathRule not null
   * @param options not null
   * @param heightOfSolidsMetres m; finite, &gt; 0
   * @param initialVoidRatio finite, &gt; 0
   * @param seatingStressPascals Pa; finite, &ge; 0
   * @param initialDegreeOfSaturation not null; finite and &ge; 0 when present
   * @param finalDegreeOfSaturation not null; finite and &ge; 0 when present
   * @param dataWarnings no null element; copied
   * @param increments at least one, no null element; copied
   * @param compressionCurve not null
   * @param preconsolidation no null element; copied
   * @param preconsolidationForClasses not null
   * @param compressionIndex not null
   * @param recompressionBranches no null element; copied
   * @param permeabilityChange not null
   * @throws IllegalArgumentException if a number is out of range or there is no increment
   * @throws NullPointerException if an argument or element is null
   */
  public TestReport {
    Objects.requireNonNull(identifiers, "identifiers");
    Objects.requireNonNull(specimen, "specimen");
    Objects.requireNonNull(drainage, "drainage");
    Objects.requireNonNull(drainagePathRule, "drainage path rule");
    Objects.requireNonNull(options, "options");
    if (!(heightOfSolidsMetres > 0) || Double.isInfinite(heightOfSolidsMetres)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT, "height of solids (%s m) must be finite and > 0", heightOfSolidsMetres));
    }
    if (!(initialVoidRatio > 0) || Double.isInfinite(initialVoidRatio)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT, "initial void ratio (%s) must be finite and > 0", initialVoidRatio));
    }
    if (!(seatingStressPascals >= 0) || Double.isInfinite(seatingStressPascals)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT, "seating stress (%s Pa) must be finite and >= 0", seatingStressPascals));
    }
    saturation(initialDegreeOfSaturation, "initial degree of saturation");
    saturation(finalDegreeOfSaturation, "final degree of saturation");
    dataWarnings = List.copyOf(dataWarnings);
    increments = List.copyOf(increments);
    if (increments.isEmpty()) {
      throw new IllegalArgumentException("a test report needs at least one increment");
    }
    Objects.requireNonNull(compressionCurve, "compression curve");
    preconsolidation = List.copyOf(preconsolidation);
    Objects.requireNonNull(preconsolidationForClasses, "preconsolidation for classes");
    Objects.requireNonNull(compressionIndex, "compression index");
    recompressionBranches = List.copyOf(recompressionBranches);
    Objects.requireNonNull(permeabilityChange, "permeability change");
  }

  private static void saturation(OptionalDouble value, String name) {
    Objects.requireNonNull(value, name);
    if (value.isPresent()
        && (!(value.getAsDouble() >= 0) || Double.isInfinite(value.getAsDouble()))) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "%s (%s) must be finite and >= 0", name, value.getAsDouble()));
    }
  }

  /**
   * Initial dry density &rho;<sub>d0</sub> = G<sub>s</sub> &rho;<sub>w</sub> / (1 + e<sub>0</sub>)
   * (= M<sub>s</sub> / (A H<sub>0</sub>) when the dry mass defines the solids), with
   * &rho;<sub>w</sub> = {@value Specimen#WATER_DENSITY} kg/m<sup>3</sup>.
   *
   * @return kg/m<sup>3</sup>, finite and &gt; 0 (1 + e<sub>0</sub> is finite since e<sub>0</sub>
   *     is)
   */
  public double initialDryDensityKilogramsPerCubicMetre() {
    return specimen.specificGravity() * Specimen.WATER_DENSITY / (1 + initialVoidRatio);
  }

  /**
   * &sigma;'<sub>p</sub> by one construction.
   *
   * @param method the construction
   * @return Pa, or empty when the construction found none (its reason is in {@link
   *     #preconsolidation()}) or there is no compression curve
   */
  public OptionalDouble preconsolidationPressure(PreconsolidationMethod method) {
    return preconsolidation.stream()
        .filter(e -> e.method() == method)
        .findFirst()
        .map(PreconsolidationEstimate::preconsolidationPressure)
        .orElse(OptionalDouble.empty());
  }

  /**
   * The estimate of one construction.
   *
   * @param method the construction
   * @return the estimate, or empty when there is no compression curve
   */
  public Optional<PreconsolidationEstimate> preconsolidationEstimate(
      PreconsolidationMethod method) {
    return preconsolidation.stream().filter(e -> e.method() == method).findFirst();
  }

  /**
   * A plain-text report: a table per increment (stress range in kPa, t50 and t90 in min,
   * c<sub>v</sub> by each method in m^2/yr, d<sub>0</sub> and d<sub>100</sub> in mm, primary ratio,
   * C<sub>&alpha;e</sub>, m<sub>v</sub> in m^2/MN, k in m/s, OC/NC), the drainage path of each
   * increment with its rule, the warnings and missing values with their reasons, and a summary
   * (e<sub>0</sub>, C<sub>c</sub>, C<sub>r</sub>, &sigma;'<sub>p</sub> by each construction in kPa,
   * C<sub>k</sub>).
   *
   * @return the text, lines ending in '\n'
   */
  public String toText() {
    return TextReport.render(this);
  }

  /**
   * One CSV row per increment (RFC 4180 quoting, '\n' line ends) with the units in the headers; see
   * {@link #csvHeaders()}. Absent values are empty fields; numbers are written with {@link
   * Double#toString(double)} after unit conversion (no rounding, so that a program reading the file
   * gets the report's values). A value whose lab unit would leave the double range (m<sub>v</sub>
   * in m^2/MN at stresses near 1e-306 Pa, say) is written as absent here and in {@link #toText()}
   * and {@link #toAgs4()}; {@link #toJson()} keeps SI units and the value.
   *
   * @return the CSV text with a header row
   */
  public String toCsv() {
    return CsvReport.render(this);
  }

  /**
   * The CSV headers of {@link #toCsv()} for this report's methods.
   *
   * @return the column names in order, each with its unit in parentheses where it has one
   */
  public List<String> csvHeaders() {
    return CsvReport.headers(options.methods());
  }

  /**
   * The report as one JSON object (RFC 8259), keys in a fixed order, SI units named in each key
   * (e.g. {@code "cv_m2_per_s"}), absent values as {@code null} with a {@code "..._reason"} key
   * beside them (null when the value is present). Layout: {@code identifiers}, {@code specimen},
   * {@code drainage}, {@code drainage_path_rule}, {@code options}, {@code increments} (numbered
   * from 1, each with its drainage path, one entry per method with c<sub>v</sub>, H<sub>dr</sub>, k
   * or the reasons, and its warnings) and {@code summary} (&sigma;'<sub>p</sub> per construction,
   * C<sub>c</sub>, C<sub>r</sub> branches, C<sub>k</sub>). Written by a small JSON writer of our
   * own (escaping, no NaN, stable key order) rather than a JSON library, to keep the library's
   * runtime dependencies to Commons Math.
   *
   * @return the JSON text
   */
  public String toJson() {
    return JsonReport.render(this);
  }

  /**
   * The report as an AGS4 file with the CONG and CONS groups (and the groups AGS4 requires around
   * them: PROJ, TRAN, LOCA, SAMP, DICT, ABBR, UNIT, TYPE). Standard headings: CONG_SDIA, CONG_HIGT
   * (mm), CONG_MCI, CONG_MCF (%), CONG_IVR, CONG_PDEN (Mg/m3); CONS_INCN, CONS_IVR, CONS_INCF
   * (kPa), CONS_INCE, CONS_INMV (m2/MN), CONS_INSC (C<sub>&alpha;e</sub>), CONS_CVRT, CONS_CVLG
   * (m2/yr). User-defined headings, declared in DICT: CONG_XCC (C<sub>c</sub>), CONG_XCRR,
   * CONG_XCRU, CONG_XCRL (C<sub>r</sub> of the first recompression, unloading and reloading
   * branch), CONG_XPCA, CONG_XPPS, CONG_XPBU, CONG_XPON, CONG_XPBW (&sigma;'<sub>p</sub> in kPa by
   * Casagrande, Pacheco Silva, Butterfield, Onitsuka, Becker), CONG_XCK (C<sub>k</sub>); CONS_XCVF,
   * CONS_XCVI, CONS_XCVH, CONS_XCVE, CONS_XCVA (c<sub>v</sub> in m2/yr by full-curve, inflection
   * point, rectangular hyperbola, early slope, Asaoka), CONS_XHDR (H<sub>dr</sub>, mm), CONS_XRUL
   * (its rule), CONS_XK (k, m/s, from the preferred c<sub>v</sub>) and CONS_XKMT (that method).
   *
   * <p>The AGS4 file rules followed are from memory (quoted comma-separated fields, GROUP, HEADING,
   * UNIT, TYPE and DATA rows, CR LF line ends, a blank line between groups); the key headings of
   * the laboratory groups, the TRAN_AGS version written ("4.1"), an empty TRAN_DATE (so that the
   * same report gives the same file) and the ABBR rows for DICT values are our best understanding,
   * not checked against the published standard: check before using a file for a submission.
   *
   * @return the AGS4 text, lines ending in CR LF
   */
  public String toAgs4() {
    return Ags4Report.render(this);
  }

  /**
   * A one-line summary.
   *
   * @return e.g. {@code TestReport[sample 'U4', 12 increments, e0 1.05, rule
   *     HEIGHT_AT_HALF_CONSOLIDATION]}
   */
  @Override
  public String toString() {
    return String.format(
        Locale.ROOT,
        "TestReport[sample '%s', %d increments, e0 %s, rule %s]",
        identifiers.sample(),
        increments.size(),
        initialVoidRatio,
        drainagePathRule);
  }
}
