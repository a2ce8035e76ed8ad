package org.oedometry.fitting.synthetic;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FitWarning;
import org.oedometry.fitting.MethodComparison;

/**
 * The further c<sub>v</sub> methods (inflection point, rectangular hyperbola, early slope, Asaoka)
 * on the varied synthetic study of the constructions ({@link SyntheticStudy}: families, schedules,
 * noise and rounding; seed {@value #SEED}), beside log-time, root-time and the full curve on the
 * same cases. The issue asks for their tolerance on exact curves only (tested in each method's
 * test); this study states what they give on noisy, rounded readings. The bounds asserted are the
 * measured values rounded up (a regression guard, not a published target). Writes the table to
 * target/further-methods-study.md.
 */
class FurtherMethodsStudyTest {

  private static final long SEED = 20261201L;
  private static final int PER_CELL = 60;

  /** Median, 90th percentile (nearest rank) and refusals of one method on one set of cases. */
  private record Cell(double median, double p90, int refusals, int count) {
    static Cell of(List<Double> errors, int refusals) {
      List<Double> sorted = new ArrayList<>(errors);
      Collections.sort(sorted);
      int n = sorted.size();
      return n == 0
          ? new Cell(Double.NaN, Double.NaN, refusals, refusals)
          : new Cell(
              sorted.get((n - 1) / 2),
              sorted.get((int) Math.ceil(0.9 * n) - 1),
              refusals,
              n + refusals);
    }

    String row(String method, String schedule) {
      boolean none = Double.isNaN(median);
      return String.format(
          Locale.ROOT,
          "| %s | %s | %d | %s | %s | %d (%.1f %%) |",
          method,
          schedule,
          count,
          none ? "-" : String.format(Locale.ROOT, "%.2f %%", 100 * median),
          none ? "-" : String.format(Locale.ROOT, "%.2f %%", 100 * p90),
          refusals,
          100.0 * refusals / count);
    }
  }

  private static boolean warned(CvEstimate estimate) {
    return estimate.warnings().stream()
        .anyMatch(
            w ->
                !w.is(FitWarning.Kind.ZERO_READING_IGNORED)
                    && !w.is(FitWarning.Kind.SWELLING_INCREMENT));
  }

  @Test
  @DisplayName(
      "Further methods on the varied synthetic study: no incomplete curve given a silent c_v;"
          + " on complete curves median / 90th percentile of |c_v error| and refusals within the"
          + " measured values rounded up (full curve 1 % / 4.5 %, inflection 1.5 % / 5 %, hyperbola"
          + " 2.5 % / 14 %, early slope 2.5 % / 11 %, Asaoka on logger readings 2.5 % / 12 %)")
  void study() throws IOException {
    List<SyntheticStudy.Case> cases = SyntheticStudy.cases(PER_CELL, SEED);
    Map<CvMethod, Map<SyntheticStudy.Schedule, List<Double>>> errors =
        new EnumMap<>(CvMethod.class);
    Map<CvMethod, Map<SyntheticStudy.Schedule, Integer>> refusals = new EnumMap<>(CvMethod.class);
    Map<CvMethod, Integer> silentIncomplete = new EnumMap<>(CvMethod.class);
    for (CvMethod method : CvMethod.values()) {
      errors.put(method, new EnumMap<>(SyntheticStudy.Schedule.class));
      refusals.put(method, new EnumMap<>(SyntheticStudy.Schedule.class));
      silentIncomplete.put(method, 0);
    }
    for (SyntheticStudy.Case c : cases) {
      MethodComparison comparison =
          MethodComparison.of(c.readings().toCurve(), c.increment().drainagePath());
      for (MethodComparison.Row row : comparison.rows()) {
        CvMethod method = row.method();
        if (!c.family().complete()) {
          if (row.estimate().isPresent() && !warned(row.estimate().get())) {
            silentIncomplete.merge(method, 1, Integer::sum);
          }
          continue;
        }
        if (row.estimate().isEmpty()) {
          refusals.get(method).merge(c.schedule(), 1, Integer::sum);
        } else {
          double error = Math.abs(row.estimate().get().cv() / c.increment().cv() - 1);
          errors.get(method).computeIfAbsent(c.schedule(), k -> new ArrayList<>()).add(error);
        }
      }
    }
    StringBuilder table = new StringBuilder();
    table
        .append("Further methods on the synthetic study (seed ")
        .append(SEED)
        .append(", ")
        .append(PER_CELL)
        .append(" cases per family and schedule; complete families only; the incomplete family")
        .append(" counts c_v given without a warning)\n\n")
        .append("| method | schedule | complete curves | median abs c_v error |")
        .append(" 90th percentile | refusals |\n|---|---|---|---|---|---|\n");
    Map<CvMethod, Cell> pooled = new EnumMap<>(CvMethod.class);
    for (CvMethod method : CvMethod.values()) {
      List<Double> all = new ArrayList<>();
      int allRefusals = 0;
      for (SyntheticStudy.Schedule s : SyntheticStudy.Schedule.values()) {
        List<Double> e = errors.get(method).getOrDefault(s, List.of());
        int r = refusals.get(method).getOrDefault(s, 0);
        table
            .append(
                Cell.of(e, r)
                    .row(method.label(), s.name().toLowerCase(Locale.ROOT).replace('_', ' ')))
            .append('\n');
        all.addAll(e);
        allRefusals += r;
      }
      Cell cell = Cell.of(all, allRefusals);
      pooled.put(method, cell);
      table.append(cell.row(method.label(), "all")).append('\n');
    }
    table.append("\nIncomplete curves given a c_v without a warning: ");
    for (CvMethod method : CvMethod.values()) {
      table.append(method.label()).append(' ').append(silentIncomplete.get(method)).append("; ");
    }
    table.append('\n');
    Path out = Path.of("target", "further-methods-study.md");
    Files.createDirectories(out.getParent());
    Files.writeString(out, table.toString(), StandardCharsets.UTF_8);
    for (CvMethod method : CvMethod.values()) {
      assertThat(silentIncomplete.get(method))
          .as("%s: incomplete curves given a c_v without a warning", method.label())
          .isZero();
    }
    // Measured with this seed (README table), rounded up: median, 90th percentile, refusals.
    guard(pooled.get(CvMethod.FULL_CURVE), 0.01, 0.045, 0.01);
    guard(pooled.get(CvMethod.INFLECTION_POINT), 0.015, 0.05, 0.01);
    guard(pooled.get(CvMethod.RECTANGULAR_HYPERBOLA), 0.025, 0.14, 0.08);
    guard(pooled.get(CvMethod.EARLY_SLOPE), 0.025, 0.11, 0.08);
    // Asaoka is for equally spaced (logger) readings: it refuses the lab schedules.
    Cell asaoka =
        Cell.of(
            errors.get(CvMethod.ASAOKA).get(SyntheticStudy.Schedule.DATA_LOGGER),
            refusals.get(CvMethod.ASAOKA).getOrDefault(SyntheticStudy.Schedule.DATA_LOGGER, 0));
    guard(asaoka, 0.025, 0.12, 0.05);
  }

  private static void guard(Cell cell, double median, double p90, double refusals) {
    assertThat(cell.median()).as("median").isLessThanOrEqualTo(median);
    assertThat(cell.p90()).as("90th percentile").isLessThanOrEqualTo(p90);
    assertThat((double) cell.refusals() / cell.count())
        .as("refusals")
        .isLessThanOrEqualTo(refusals);
  }
}
