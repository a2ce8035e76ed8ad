package org.oedometry.fitting.reduction;

import java.util.Optional;
import org.oedometry.core.DataWarning;
import org.oedometry.core.compressibility.Derived;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.core.compressibility.IndexBranch;
import org.oedometry.core.compressibility.IndexFit;
import org.oedometry.core.compressibility.PermeabilityChangeFit;
import org.oedometry.core.compressibility.PreconsolidationEstimate;
import org.oedometry.core.compressibility.SecondaryCompressionResult;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FitWarning;

/**
 * The JSON rendering of a {@link TestReport}: SI values, each key naming its unit, absent values as
 * null with a "..._reason" key beside them (null when the value is present), increments numbered
 * from 1 as in the other renderings. Ratios (water content, degree of saturation) as ratios, 0.35
 * for 35 %.
 */
final class JsonReport {

  private JsonReport() {}

  static String render(TestReport r) {
    JsonWriter w = new JsonWriter();
    w.beginObject();
    w.name("report").value("oedometer test reduction");
    w.name("review_note")
        .value(
            "Results must be reviewed by a qualified engineer; local codes and standards govern.");
    w.name("identifiers").beginObject();
    w.name("project").value(r.identifiers().project());
    w.name("borehole").value(r.identifiers().borehole());
    w.name("sample").value(r.identifiers().sample());
    w.name("depth").value(r.identifiers().depth());
    w.endObject();
    w.name("specimen").beginObject();
    w.name("initial_height_m").value(r.specimen().initialHeightMetres());
    w.name("diameter_m").value(r.specimen().diameterMetres());
    w.name("area_m2").value(r.specimen().areaSquareMetres());
    w.name("specific_gravity").value(r.specimen().specificGravity());
    w.name("height_of_solids_m").value(r.heightOfSolidsMetres());
    w.name("initial_void_ratio").value(r.initialVoidRatio());
    w.name("seating_stress_pa").value(r.seatingStressPascals());
    w.name("initial_dry_density_kg_per_m3").value(r.initialDryDensityKilogramsPerCubicMetre());
    w.name("dry_mass_kg").value(r.specimen().dryMassKilograms());
    w.name("initial_water_content").value(r.specimen().initialWaterContent());
    w.name("final_water_content").value(r.specimen().finalWaterContent());
    w.name("bulk_density_kg_per_m3").value(r.specimen().bulkDensityKilogramsPerCubicMetre());
    w.name("initial_void_ratio_from_density").value(r.specimen().initialVoidRatioFromDensity());
    w.name("initial_degree_of_saturation").value(r.initialDegreeOfSaturation());
    w.name("final_degree_of_saturation").value(r.finalDegreeOfSaturation());
    w.endObject();
    w.name("data_warnings").beginArray();
    for (DataWarning dw : r.dataWarnings()) {
      w.beginObject();
      w.name("kind").value(dw.kind().name());
      w.name("message").value(dw.message());
      w.endObject();
    }
    w.endArray();
    w.name("drainage").value(r.drainage().name());
    w.name("drainage_path_rule").value(r.drainagePathRule().name());
    w.name("options").beginObject();
    w.name("methods").beginArray();
    for (CvMethod m : r.options().methods()) {
      w.value(m.name());
    }
    w.endArray();
    w.name("preferred_methods").beginArray();
    for (CvMethod m : r.options().preferredMethods()) {
      w.value(m.name());
    }
    w.endArray();
    w.name("water_unit_weight_n_per_m3").value(r.options().waterUnitWeight());
    w.name("deformation_basis").value(r.options().deformationBasis().name());
    w.name("disagreement_factor").value(r.options().disagreementFactor());
    w.name("usual_primary_ratio_low").value(r.options().primaryRatioLow());
    w.name("usual_primary_ratio_high").value(r.options().primaryRatioHigh());
    w.endObject();

    w.name("increments").beginArray();
    for (IncrementReport inc : r.increments()) {
      increment(w, inc);
    }
    w.endArray();

    w.name("summary").beginObject();
    w.name("compression_curve_reason").value(reason(r.compressionCurve()));
    w.name("preconsolidation").beginArray();
    for (PreconsolidationEstimate e : r.preconsolidation()) {
      w.beginObject();
      w.name("method").value(e.method().name());
      w.name("pressure_pa").value(e.preconsolidationPressure());
      w.name("reason").value(e.absenceReason().isEmpty() ? null : e.absenceReason());
      w.endObject();
    }
    w.endArray();
    w.name("classed_with")
        .value(r.preconsolidationForClasses().value().map(e -> e.method().name()).orElse(null));
    w.name("classed_with_reason").value(reason(r.preconsolidationForClasses()));
    Optional<IndexFit> cc = r.compressionIndex().value();
    w.name("compression_index").value(cc.map(IndexFit::index).orElse(Double.NaN));
    w.name("compression_index_r_squared")
        .value(cc.map(f -> f.line().rSquared()).orElse(Double.NaN));
    w.name("compression_index_reason").value(reason(r.compressionIndex()));
    w.name("recompression_branches").beginArray();
    for (IndexBranch b : r.recompressionBranches()) {
      w.beginObject();
      w.name("kind").value(b.kind().name());
      w.name("first_increment").value(b.firstIncrement() + 1L);
      w.name("last_increment").value(b.lastIncrement() + 1L);
      w.name("index").value(b.fit().value().map(IndexFit::index).orElse(Double.NaN));
      w.name("reason").value(reason(b.fit()));
      w.endObject();
    }
    w.endArray();
    Optional<PermeabilityChangeFit> ck = r.permeabilityChange().value();
    w.name("permeability_change_index")
        .value(ck.map(PermeabilityChangeFit::permeabilityChangeIndex).orElse(Double.NaN));
    w.name("permeability_change_index_reason").value(reason(r.permeabilityChange()));
    w.endObject();
    w.endObject();
    return w.text();
  }

  private static void increment(JsonWriter w, IncrementReport inc) {
    w.beginObject();
    w.name("number").value(inc.index() + 1L);
    w.name("stress_before_pa").value(inc.stressBeforePascals());
    w.name("stress_after_pa").value(inc.stressAfterPascals());
    w.name("direction").value(inc.direction().name());
    w.name("stress_history").value(inc.stressHistory().value().map(Enum::name).orElse(null));
    w.name("stress_history_reason").value(reason(inc.stressHistory()));
    w.name("height_at_start_m").value(inc.heightAtStartMetres());
    w.name("height_at_end_m").value(inc.heightAtEndMetres());
    w.name("drainage_path").beginObject();
    w.name("rule").value(inc.drainagePath().rule().name());
    w.name("drainage_path_m").value(inc.drainagePath().drainagePathMetres());
    w.name("height_m").value(inc.drainagePath().heightMetres());
    w.name("fell_back").value(inc.drainagePath().fellBack());
    w.name("explanation").value(inc.drainagePath().explanation());
    w.endObject();
    w.name("methods").beginArray();
    for (MethodOutcome o : inc.methods()) {
      w.beginObject();
      w.name("method").value(o.method().name());
      w.name("label").value(o.method().label());
      w.name("reference").value(o.method().reference());
      w.name("cv_m2_per_s").value(o.cv());
      w.name("drainage_path_m")
          .value(o.estimate().map(CvEstimate::drainagePath).orElse(Double.NaN));
      w.name("failure_reason").value(o.failureReason().isEmpty() ? null : o.failureReason());
      w.name("permeability_m_per_s").value(o.permeability().value().orElse(Double.NaN));
      w.name("permeability_reason").value(reason(o.permeability()));
      w.endObject();
    }
    w.endArray();
    w.name("preferred_method").value(inc.preferredMethod().map(Enum::name).orElse(null));
    w.name("t50_s").value(inc.t50());
    w.name("t90_s").value(inc.t90());
    w.name("d0_m").value(inc.d0());
    w.name("d100_m").value(inc.d100());
    w.name("primary_ratio").value(inc.primaryRatio());
    w.name("deformation_basis").value(inc.deformationBasis().name());
    Optional<IncrementCompressibility> c = inc.compressibility().value();
    w.name("void_ratio_at_start")
        .value(c.map(IncrementCompressibility::startVoidRatio).orElse(Double.NaN));
    w.name("void_ratio_at_end")
        .value(c.map(IncrementCompressibility::endVoidRatio).orElse(Double.NaN));
    w.name("av_per_pa")
        .value(c.map(IncrementCompressibility::coefficientOfCompressibility).orElse(Double.NaN));
    w.name("mv_per_pa").value(c.map(IncrementCompressibility::mv).orElse(Double.NaN));
    w.name("compressibility_reason").value(reason(inc.compressibility()));
    Optional<SecondaryCompressionResult> sc = inc.secondaryCompression().value();
    w.name("secondary_compression_index")
        .value(sc.map(SecondaryCompressionResult::secondaryCompressionIndex).orElse(Double.NaN));
    w.name("modified_secondary_compression_index")
        .value(
            sc.map(SecondaryCompressionResult::modifiedSecondaryCompressionIndex)
                .orElse(Double.NaN));
    w.name("secondary_compression_reason").value(reason(inc.secondaryCompression()));
    w.name("warnings").beginArray();
    for (ReductionWarning rw : inc.warnings()) {
      FitWarning fw = rw.warning();
      w.beginObject();
      w.name("kind").value(fw.kind().name());
      w.name("method").value(rw.method().map(Enum::name).orElse(null));
      w.name("message").value(fw.message());
      w.endObject();
    }
    w.endArray();
    w.endObject();
  }

  private static String reason(Derived<?> d) {
    return d.isPresent() ? null : d.absenceReason();
  }
}
