package org.oedometry.fitting.reduction;

import static org.oedometry.fitting.reduction.ReportUnits.format;
import static org.oedometry.fitting.reduction.ReportUnits.map;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.oedometry.core.DataWarning;
import org.oedometry.core.Specimen;
import org.oedometry.core.compressibility.IndexBranch;
import org.oedometry.core.compressibility.IndexFit;
import org.oedometry.core.compressibility.PermeabilityChangeFit;
import org.oedometry.core.compressibility.PreconsolidationEstimate;
import org.oedometry.core.compressibility.SecondaryCompressionResult;
import org.oedometry.fitting.CvMethod;

/** The plain-text rendering of a {@link TestReport}. */
final class TextReport {

  private static final String ABSENT = "-";

  private TextReport() {}

  /**
   * The specimen's initial dry density, water contents, degrees of saturation and the initial void
   * ratio from bulk density, those that were given or follow from what was given; percentages for
   * water content and saturation.
   */
  private static String phases(TestReport r) {
    List<String> parts = new ArrayList<>();
    parts.add(
        String.format(
            Locale.ROOT,
            "dry density %.4g Mg/m3",
            r.initialDryDensityKilogramsPerCubicMetre() / 1000));
    r.specimen()
        .dryMassKilograms()
        .ifPresent(m -> parts.add(String.format(Locale.ROOT, "dry mass %.4g g", m * 1000)));
    r.specimen()
        .initialWaterContent()
        .ifPresent(w -> parts.add(String.format(Locale.ROOT, "w0 %.1f %%", w * 100)));
    r.initialDegreeOfSaturation()
        .ifPresent(x -> parts.add(String.format(Locale.ROOT, "S0 %.4g %%", x * 100)));
    r.specimen()
        .finalWaterContent()
        .ifPresent(
            w ->
                parts.add(
                    String.format(
                        Locale.ROOT,
                        r.specimen().solidsBasis() == Specimen.SolidsBasis.FINAL_WATER_CONTENT
                            ? "wf %.1f %% (saturated at the end, assumed)"
                            : "wf %.1f %%",
                        w * 100)));
    r.finalDegreeOfSaturation()
        .ifPresent(x -> parts.add(String.format(Locale.ROOT, "Sf %.4g %%", x * 100)));
    r.specimen()
        .bulkDensityKilogramsPerCubicMetre()
        .ifPresent(
            rho -> parts.add(String.format(Locale.ROOT, "bulk density %.4g Mg/m3", rho / 1000)));
    r.specimen()
        .initialVoidRatioFromDensity()
        .ifPresent(e -> parts.add(String.format(Locale.ROOT, "e0 from bulk density %.4f", e)));
    return String.join(", ", parts);
  }

  static String render(TestReport r) {
    StringBuilder s = new StringBuilder();
    line(s, "Oedometer test reduction");
    line(
        s,
        "Project: %s   Borehole: %s   Sample: %s   Depth: %s",
        r.identifiers().project(),
        r.identifiers().borehole(),
        r.identifiers().sample(),
        r.identifiers().depth());
    line(
        s,
        "Specimen: H0 %.3f mm, G_s %.3f, H_s %.4f mm, e0 %.4f; %s drainage; drainage path rule %s",
        ReportUnits.millimetres(r.specimen().initialHeightMetres()),
        r.specimen().specificGravity(),
        ReportUnits.millimetres(r.heightOfSolidsMetres()),
        r.initialVoidRatio(),
        r.drainage().name().toLowerCase(Locale.ROOT),
        r.drainagePathRule());
    line(s, "Phases: %s", phases(r));
    line(s, "Results must be reviewed by a qualified engineer; local codes and standards govern.");
    line(s, "");

    List<CvMethod> methods = r.options().methods();
    StringBuilder head1 = new StringBuilder();
    StringBuilder head2 = new StringBuilder();
    head1.append(String.format(Locale.ROOT, "%-4s %-17s %8s %8s", "Inc", "Stress", "t50", "t90"));
    head2.append(String.format(Locale.ROOT, "%-4s %-17s %8s %8s", "", "(kPa)", "(min)", "(min)"));
    for (CvMethod m : methods) {
      head1.append(String.format(Locale.ROOT, " %11s", "c_v " + ReportUnits.shortName(m)));
      head2.append(String.format(Locale.ROOT, " %11s", "(m2/yr)"));
    }
    head1.append(
        String.format(
            Locale.ROOT,
            " %8s %8s %7s %8s %9s %9s %-6s",
            "d0",
            "d100",
            "primary",
            "C_ae",
            "m_v",
            "k",
            "OC/NC"));
    head2.append(
        String.format(
            Locale.ROOT,
            " %8s %8s %7s %8s %9s %9s %-6s",
            "(mm)",
            "(mm)",
            "ratio",
            "",
            "(m2/MN)",
            "(m/s)",
            ""));
    line(s, head1.toString().stripTrailing());
    line(s, head2.toString().stripTrailing());
    for (IncrementReport inc : r.increments()) {
      StringBuilder row = new StringBuilder();
      row.append(
          String.format(
              Locale.ROOT,
              "%-4d %-17s %8s %8s",
              inc.index() + 1,
              String.format(
                  Locale.ROOT,
                  "%.4g -> %.4g",
                  ReportUnits.kilopascals(inc.stressBeforePascals()),
                  ReportUnits.kilopascals(inc.stressAfterPascals())),
              format("%.3g", map(inc.t50(), ReportUnits::minutes), ABSENT),
              format("%.3g", map(inc.t90(), ReportUnits::minutes), ABSENT)));
      for (CvMethod m : methods) {
        row.append(
            String.format(
                Locale.ROOT,
                " %11s",
                format("%.3g", map(inc.cv(m), ReportUnits::squareMetresPerYear), ABSENT)));
      }
      OptionalDouble cae =
          inc.secondaryCompression().value().isPresent()
              ? OptionalDouble.of(
                  inc.secondaryCompression().value().get().secondaryCompressionIndex())
              : OptionalDouble.empty();
      row.append(
          String.format(
              Locale.ROOT,
              " %8s %8s %7s %8s %9s %9s %-6s",
              format("%.4f", map(inc.d0(), ReportUnits::millimetres), ABSENT),
              format("%.4f", map(inc.d100(), ReportUnits::millimetres), ABSENT),
              format("%.3f", inc.primaryRatio(), ABSENT),
              format("%.5f", cae, ABSENT),
              format("%.4f", map(inc.mv(), ReportUnits::squareMetresPerMeganewton), ABSENT),
              format("%.2e", inc.permeability(), ABSENT),
              inc.stressHistory().value().map(ReportUnits::shortClass).orElse(ABSENT)));
      line(s, row.toString().stripTrailing());
    }
    line(s, "");
    line(
        s,
        "d0, d100 and k from the preferred c_v (first of %s that gave a value); t50 log-time,"
            + " t90 root-time;",
        names(r.options().preferredMethods()));
    line(
        s,
        "k = c_v m_v gamma_w with gamma_w %.4g kN/m3; C_ae = -de/dlog10 t after primary."
            + " OC recompression, OC rel reloading, OC unl unloading,",
        r.options().waterUnitWeight() / 1000);
    line(
        s,
        "OC>NC crosses sigma'_p, NC normally consolidated; '-' no value (reasons below). m2/yr"
            + " in Julian years.");
    line(
        s,
        "k back-calculated from c_v may underestimate the true k of structured clays (Tavenas et"
            + " al. 1983).");
    line(s, "");

    line(s, "Drainage path of each increment (rule in force: %s)", r.drainagePathRule());
    for (IncrementReport inc : r.increments()) {
      DrainagePathChoice p = inc.drainagePath();
      line(
          s,
          "  %d: H_dr %.4f mm by %s%s: %s",
          inc.index() + 1,
          ReportUnits.millimetres(p.drainagePathMetres()),
          p.rule(),
          p.fellBack() ? " (fallback)" : "",
          p.explanation());
    }
    line(s, "");
    line(s, "c_v methods (each c_v belongs to the increment's H_dr above)");
    for (CvMethod m : methods) {
      line(s, "  %-12s %s; %s", ReportUnits.shortName(m), m.label(), m.reference());
    }
    line(s, "");

    line(s, "Warnings and missing values");
    boolean any = false;
    for (DataWarning w : r.dataWarnings()) {
      line(s, "  test: [%s] %s", w.kind(), w.message());
      any = true;
    }
    for (IncrementReport inc : r.increments()) {
      for (ReductionWarning w : inc.warnings()) {
        line(s, "  %d: [%s] %s", inc.index() + 1, w.kind(), w.message());
        any = true;
      }
      if (inc.compressibility().value().isEmpty()) {
        line(s, "  %d: no m_v: %s", inc.index() + 1, inc.compressibility().absenceReason());
        any = true;
      }
      if (inc.secondaryCompression().value().isEmpty()) {
        line(s, "  %d: no C_ae: %s", inc.index() + 1, inc.secondaryCompression().absenceReason());
        any = true;
      }
    }
    if (!any) {
      line(s, "  none");
    }
    line(s, "");

    line(s, "Summary");
    line(s, "  Initial void ratio e0: %.4f", r.initialVoidRatio());
    line(
        s,
        "  e - log sigma' points at: %s",
        r.options().deformationBasis()
                == org.oedometry.core.compressibility.DeformationBasis.END_OF_PRIMARY
            ? "end of primary (d100 of the preferred c_v), else the last reading"
            : "the last reading of each increment");
    if (r.compressionCurve().value().isEmpty()) {
      line(s, "  No compression curve: %s", r.compressionCurve().absenceReason());
    }
    line(s, "  Preconsolidation pressure sigma'_p:");
    for (PreconsolidationEstimate e : r.preconsolidation()) {
      line(
          s,
          "    %-14s %s",
          e.method(),
          e.preconsolidationPressure().isPresent()
              ? String.format(
                  Locale.ROOT,
                  "%.1f kPa",
                  ReportUnits.kilopascals(e.preconsolidationPressure().getAsDouble()))
              : "none: " + e.absenceReason());
    }
    line(
        s,
        "  Increments classed OC/NC with: %s",
        r.preconsolidationForClasses().value().isPresent()
            ? String.format(
                Locale.ROOT,
                "%s, %.1f kPa",
                r.preconsolidationForClasses().value().get().method(),
                ReportUnits.kilopascals(
                    r.preconsolidationForClasses()
                        .value()
                        .get()
                        .preconsolidationPressure()
                        .getAsDouble()))
            : "none: " + r.preconsolidationForClasses().absenceReason());
    if (r.compressionIndex().value().isPresent()) {
      IndexFit cc = r.compressionIndex().value().get();
      line(
          s,
          "  Compression index C_c: %.4f (C_c/(1+e0) %.4f; R^2 %.4f over increments %s)",
          cc.index(),
          cc.modifiedIndex(),
          cc.line().rSquared(),
          numbers(cc.increments()));
    } else {
      line(s, "  Compression index C_c: none: %s", r.compressionIndex().absenceReason());
    }
    if (r.recompressionBranches().isEmpty()) {
      line(s, "  Recompression / swelling index C_r: no overconsolidated branch");
    }
    for (IndexBranch b : r.recompressionBranches()) {
      line(
          s,
          "  C_r, %s, increments %d-%d: %s",
          b.kind().name().toLowerCase(Locale.ROOT).replace('_', ' '),
          b.firstIncrement() + 1,
          b.lastIncrement() + 1,
          b.fit().value().isPresent()
              ? String.format(Locale.ROOT, "%.4f", b.fit().value().get().index())
              : "none: " + b.fit().absenceReason());
    }
    if (r.permeabilityChange().value().isPresent()) {
      PermeabilityChangeFit ck = r.permeabilityChange().value().get();
      line(
          s,
          "  Permeability change index C_k: %.4f (R^2 %.4f over NC increments %s; C_k/e0 %.2f)",
          ck.permeabilityChangeIndex(),
          ck.rSquared(),
          numbers(ck.increments()),
          ck.permeabilityChangeIndex() / r.initialVoidRatio());
    } else {
      line(s, "  Permeability change index C_k: none: %s", r.permeabilityChange().absenceReason());
    }
    for (IncrementReport inc : r.increments()) {
      if (inc.secondaryCompression().value().isPresent()) {
        SecondaryCompressionResult sc = inc.secondaryCompression().value().get();
        if (sc.mesriRatio().value().isPresent()) {
          line(
              s,
              "  C_alpha/C_c, increment %d: %.3f (C_ae %.5f, C_a_eps %.5f)",
              inc.index() + 1,
              sc.mesriRatio().value().get(),
              sc.secondaryCompressionIndex(),
              sc.modifiedSecondaryCompressionIndex());
        }
      }
    }
    return s.toString();
  }

  private static String names(List<CvMethod> methods) {
    StringBuilder b = new StringBuilder();
    for (CvMethod m : methods) {
      b.append(b.length() == 0 ? "" : ", ").append(ReportUnits.shortName(m));
    }
    return b.length() == 0 ? "(none)" : b.toString();
  }

  private static String numbers(List<Integer> indices) {
    StringBuilder b = new StringBuilder();
    for (int i : indices) {
      b.append(b.length() == 0 ? "" : ", ").append(i + 1);
    }
    return b.toString();
  }

  private static void line(StringBuilder s, String template, Object... values) {
    s.append(values.length == 0 ? template : String.format(Locale.ROOT, template, values))
        .append('\n');
  }
}
