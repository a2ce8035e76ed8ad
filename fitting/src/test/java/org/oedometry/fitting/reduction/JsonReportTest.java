package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.oedometry.core.compressibility.Derived;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.core.compressibility.IndexBranch;
import org.oedometry.core.compressibility.PreconsolidationEstimate;

class JsonReportTest {

  private static final TestReport REPORT = ReductionFixtures.mixedReport();

  @SuppressWarnings("unchecked")
  private static Map<String, Object> map(Object o) {
    return (Map<String, Object>) o;
  }

  @SuppressWarnings("unchecked")
  private static List<Object> list(Object o) {
    return (List<Object>) o;
  }

  /** A JSON number read back equals the report's double exactly; absent is null. */
  private static void same(Object json, OptionalDouble value) {
    if (value.isEmpty()) {
      assertThat(json).isNull();
    } else {
      assertThat(json).isEqualTo(value.getAsDouble());
    }
  }

  private static void same(Object json, double value) {
    assertThat(json).isEqualTo(value);
  }

  private static void reason(Map<String, Object> o, String key, Derived<?> d) {
    assertThat(o.get(key)).isEqualTo(d.isPresent() ? null : d.absenceReason());
  }

  @Test
  @DisplayName(
      "Parsed back by an independent strict parser, every value equals the report's (numbers"
          + " exactly: Double.toString round-trips), absent values are null with their reasons")
  void everyValueReadsBack() {
    readsBack(REPORT);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("org.oedometry.fitting.reduction.ReductionFixtures#unusualReports")
  @DisplayName(
      "Hostile identifiers (quotes, backslash, non-ASCII, joiners, 20 000 characters) and unusual"
          + " tests give valid JSON (RFC 8259, strict parser) that reads back to the report's"
          + " values and labels (U+2028 escaping: JsonWriterTest)")
  void unusualReportsReadBack(String name, TestReport report) {
    String text = report.toJson();
    Map<String, Object> ids = map(map(MiniJson.parse(text)).get("identifiers"));
    assertThat(ids.get("project")).isEqualTo(report.identifiers().project());
    assertThat(ids.get("borehole")).isEqualTo(report.identifiers().borehole());
    assertThat(ids.get("sample")).isEqualTo(report.identifiers().sample());
    assertThat(ids.get("depth")).isEqualTo(report.identifiers().depth());
    readsBack(report);
  }

  private static void readsBack(TestReport report) {
    Map<String, Object> root = map(MiniJson.parse(report.toJson()));
    assertThat(root.keySet())
        .containsExactly(
            "report",
            "review_note",
            "identifiers",
            "specimen",
            "data_warnings",
            "drainage",
            "drainage_path_rule",
            "options",
            "increments",
            "summary");
    assertThat(map(root.get("identifiers")).get("project"))
        .isEqualTo(report.identifiers().project());
    Map<String, Object> specimen = map(root.get("specimen"));
    same(specimen.get("initial_height_m"), report.specimen().initialHeightMetres());
    same(specimen.get("diameter_m"), report.specimen().diameterMetres());
    same(specimen.get("height_of_solids_m"), report.heightOfSolidsMetres());
    same(specimen.get("initial_void_ratio"), report.initialVoidRatio());
    same(specimen.get("dry_mass_kg"), report.specimen().dryMassKilograms());
    same(
        specimen.get("initial_dry_density_kg_per_m3"),
        report.initialDryDensityKilogramsPerCubicMetre());
    same(specimen.get("initial_water_content"), report.specimen().initialWaterContent());
    same(specimen.get("final_water_content"), report.specimen().finalWaterContent());
    same(
        specimen.get("bulk_density_kg_per_m3"),
        report.specimen().bulkDensityKilogramsPerCubicMetre());
    same(
        specimen.get("initial_void_ratio_from_density"),
        report.specimen().initialVoidRatioFromDensity());
    same(specimen.get("initial_degree_of_saturation"), report.initialDegreeOfSaturation());
    same(specimen.get("final_degree_of_saturation"), report.finalDegreeOfSaturation());
    List<Object> dataWarnings = list(root.get("data_warnings"));
    assertThat(dataWarnings).hasSize(report.dataWarnings().size());
    for (int i = 0; i < dataWarnings.size(); i++) {
      Map<String, Object> o = map(dataWarnings.get(i));
      assertThat(o.get("kind")).isEqualTo(report.dataWarnings().get(i).kind().name());
      assertThat(o.get("message")).isEqualTo(report.dataWarnings().get(i).message());
    }
    assertThat(root.get("drainage_path_rule")).isEqualTo(report.drainagePathRule().name());

    List<Object> increments = list(root.get("increments"));
    assertThat(increments).hasSize(report.increments().size());
    for (int j = 0; j < increments.size(); j++) {
      Map<String, Object> o = map(increments.get(j));
      IncrementReport inc = report.increments().get(j);
      assertThat(o.get("number")).isEqualTo((double) (j + 1));
      same(o.get("stress_before_pa"), inc.stressBeforePascals());
      same(o.get("stress_after_pa"), inc.stressAfterPascals());
      Map<String, Object> path = map(o.get("drainage_path"));
      same(path.get("drainage_path_m"), inc.drainagePath().drainagePathMetres());
      assertThat(path.get("rule")).isEqualTo(inc.drainagePath().rule().name());
      assertThat(path.get("explanation")).isEqualTo(inc.drainagePath().explanation());
      List<Object> methods = list(o.get("methods"));
      assertThat(methods).hasSize(inc.methods().size());
      for (int m = 0; m < methods.size(); m++) {
        Map<String, Object> mo = map(methods.get(m));
        MethodOutcome outcome = inc.methods().get(m);
        assertThat(mo.get("method")).isEqualTo(outcome.method().name());
        same(mo.get("cv_m2_per_s"), outcome.cv());
        assertThat(mo.get("failure_reason"))
            .isEqualTo(outcome.failureReason().isEmpty() ? null : outcome.failureReason());
        if (outcome.estimate().isPresent()) {
          same(mo.get("drainage_path_m"), outcome.estimate().get().drainagePath());
        }
        Double k = outcome.permeability().value().orElse(null);
        assertThat(mo.get("permeability_m_per_s")).isEqualTo(k);
        reason(mo, "permeability_reason", outcome.permeability());
      }
      same(o.get("t50_s"), inc.t50());
      same(o.get("t90_s"), inc.t90());
      same(o.get("d0_m"), inc.d0());
      same(o.get("d100_m"), inc.d100());
      same(o.get("primary_ratio"), inc.primaryRatio());
      IncrementCompressibility c = inc.compressibility().value().orElse(null);
      if (c == null) {
        assertThat(o.get("mv_per_pa")).isNull();
        reason(o, "compressibility_reason", inc.compressibility());
      } else {
        same(o.get("void_ratio_at_start"), c.startVoidRatio());
        same(o.get("void_ratio_at_end"), c.endVoidRatio());
        same(o.get("mv_per_pa"), c.mv());
        same(o.get("av_per_pa"), c.coefficientOfCompressibility());
      }
      reason(o, "secondary_compression_reason", inc.secondaryCompression());
      List<Object> warnings = list(o.get("warnings"));
      assertThat(warnings).hasSize(inc.warnings().size());
      for (int w = 0; w < warnings.size(); w++) {
        assertThat(map(warnings.get(w)).get("kind")).isEqualTo(inc.warnings().get(w).kind().name());
        assertThat(map(warnings.get(w)).get("message"))
            .isEqualTo(inc.warnings().get(w).warning().message());
      }
    }

    Map<String, Object> summary = map(root.get("summary"));
    List<Object> pre = list(summary.get("preconsolidation"));
    assertThat(pre).hasSize(report.preconsolidation().size());
    for (int i = 0; i < pre.size(); i++) {
      PreconsolidationEstimate e = report.preconsolidation().get(i);
      same(map(pre.get(i)).get("pressure_pa"), e.preconsolidationPressure());
    }
    same(
        summary.get("compression_index"),
        report.compressionIndex().value().isPresent()
            ? OptionalDouble.of(report.compressionIndex().value().get().index())
            : OptionalDouble.empty());
    reason(summary, "compression_index_reason", report.compressionIndex());
    List<Object> branches = list(summary.get("recompression_branches"));
    assertThat(branches).hasSize(report.recompressionBranches().size());
    for (int i = 0; i < branches.size(); i++) {
      IndexBranch b = report.recompressionBranches().get(i);
      assertThat(map(branches.get(i)).get("kind")).isEqualTo(b.kind().name());
    }
    same(
        summary.get("permeability_change_index"),
        report.permeabilityChange().value().isPresent()
            ? OptionalDouble.of(report.permeabilityChange().value().get().permeabilityChangeIndex())
            : OptionalDouble.empty());
    reason(summary, "permeability_change_index_reason", report.permeabilityChange());
  }

  @Test
  @DisplayName("The same report gives the same JSON text (stable key order, no hash order)")
  void isStable() {
    assertThat(REPORT.toJson()).isEqualTo(REPORT.toJson());
    assertThat(REPORT.toJson()).doesNotContain("NaN").doesNotContain("Infinity");
  }
}
