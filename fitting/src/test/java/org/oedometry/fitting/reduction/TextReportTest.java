package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.oedometry.fitting.CvMethod;

class TextReportTest {

  private static final double YEAR = 365.25 * 86_400;
  private static final TestReport REPORT = ReductionFixtures.mixedReport();

  @Test
  @DisplayName(
      "Each table row shows the stress range in kPa and each method's c_v in m2/yr to 3 figures"
          + " ('-' when absent), m_v in m2/MN and k in m/s")
  void tableRowsHoldTheReportValues() {
    List<String> lines = REPORT.toText().lines().toList();
    int header = 0;
    while (!lines.get(header).startsWith("Inc ")) {
      header++;
    }
    List<CvMethod> methods = REPORT.options().methods();
    for (int j = 0; j < REPORT.increments().size(); j++) {
      IncrementReport inc = REPORT.increments().get(j);
      String[] cells = lines.get(header + 2 + j).trim().split("\\s+");
      // Cells: number, stress before, "->", stress after, t50, t90, one c_v per method, d0, d100,
      // primary ratio, C_ae, m_v, k, class (which may hold a space).
      assertThat(cells[0]).isEqualTo(Integer.toString(j + 1));
      assertThat(Double.parseDouble(cells[1]))
          .isCloseTo(
              inc.stressBeforePascals() / 1000, within(5e-4 * inc.stressBeforePascals() / 1000));
      assertThat(Double.parseDouble(cells[3]))
          .isCloseTo(
              inc.stressAfterPascals() / 1000, within(5e-4 * inc.stressAfterPascals() / 1000));
      for (int m = 0; m < methods.size(); m++) {
        String cell = cells[6 + m];
        if (inc.cv(methods.get(m)).isEmpty()) {
          assertThat(cell).isEqualTo("-");
        } else {
          double cv = inc.cv(methods.get(m)).getAsDouble() * YEAR;
          assertThat(Double.parseDouble(cell)).isCloseTo(cv, within(5e-3 * cv));
        }
      }
      int after = 6 + methods.size();
      double mv = inc.mv().getAsDouble() * 1e6;
      assertThat(Double.parseDouble(cells[after + 4]))
          .isCloseTo(mv, within(5e-5 + 1e-3 * Math.abs(mv)));
      if (inc.permeability().isPresent()) {
        double k = inc.permeability().getAsDouble();
        assertThat(Double.parseDouble(cells[after + 5])).isCloseTo(k, within(5e-3 * k));
      }
      String history = String.join(" ", Arrays.copyOfRange(cells, after + 6, cells.length));
      assertThat(history)
          .isEqualTo(inc.stressHistory().value().map(ReportUnits::shortClass).orElse("-"));
    }
  }

  @Test
  @DisplayName(
      "The text names each increment's H_dr with its rule, every method with its reference, every"
          + " warning, and the summary quantities")
  void tracesEveryNumber() {
    String text = REPORT.toText();
    for (IncrementReport inc : REPORT.increments()) {
      assertThat(text).contains(inc.drainagePath().explanation());
      for (ReductionWarning w : inc.warnings()) {
        assertThat(text).contains(w.message());
      }
    }
    for (CvMethod m : REPORT.options().methods()) {
      assertThat(text).contains(m.reference());
    }
    assertThat(text)
        .contains(
            "Initial void ratio e0: "
                + String.format(java.util.Locale.ROOT, "%.4f", REPORT.initialVoidRatio()))
        .contains("Compression index C_c")
        .contains("Permeability change index C_k")
        .contains("Preconsolidation pressure sigma'_p")
        .contains("reviewed by a qualified engineer");
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("org.oedometry.fitting.reduction.ReductionFixtures#unusualReports")
  @DisplayName(
      "Hostile identifiers and unusual tests: no control character but the documented '\\n' line"
          + " ends, the labels verbatim on the second line, one table row per increment, every"
          + " warning, drainage path and missing value with its reason")
  void unusualReportsStayReadable(String name, TestReport report) {
    String text = report.toText();
    assertThat(text.chars().filter(c -> c != '\n' && Character.isISOControl(c))).isEmpty();
    List<String> lines = text.lines().toList();
    assertThat(lines.get(1))
        .isEqualTo(
            "Project: "
                + report.identifiers().project()
                + "   Borehole: "
                + report.identifiers().borehole()
                + "   Sample: "
                + report.identifiers().sample()
                + "   Depth: "
                + report.identifiers().depth());
    int header = lines.indexOf(lines.stream().filter(l -> l.startsWith("Inc ")).findFirst().get());
    for (int j = 0; j < report.increments().size(); j++) {
      assertThat(lines.get(header + 2 + j)).startsWith((j + 1) + " ");
    }
    for (IncrementReport inc : report.increments()) {
      assertThat(text).contains(inc.drainagePath().explanation());
      for (ReductionWarning w : inc.warnings()) {
        assertThat(text).contains(w.message());
      }
      if (inc.compressibility().value().isEmpty()) {
        assertThat(text).contains(inc.compressibility().absenceReason());
      }
      if (inc.secondaryCompression().value().isEmpty()) {
        assertThat(text).contains(inc.secondaryCompression().absenceReason());
      }
    }
  }

  @Test
  @DisplayName(
      "Phases line: S0 in % equals V_w / V_v from the volumes; each data warning is listed under"
          + " 'test'")
  void phasesAndDataWarnings() {
    TestReport r =
        ReductionFixtures.unusualReports()
            .filter(a -> a.get()[0].equals("phases disagree"))
            .map(a -> (TestReport) a.get()[1])
            .findFirst()
            .orElseThrow();
    List<String> lines = r.toText().lines().toList();
    String phases = lines.stream().filter(l -> l.startsWith("Phases: ")).findFirst().orElseThrow();
    // Definitions S = V_w / V_v, w = M_w / M_s (any soil mechanics text, from memory), with the
    // fixture's invented inputs: 120 g of solids, G_s 2.70, 20 x 75 mm ring, w0 0.60.
    double volume = Math.PI * 0.075 * 0.075 / 4 * 0.020;
    double voids = volume - 0.120 / 2700;
    double s0 = 0.60 * 0.120 / 1000 / voids;
    String cell = phases.replaceAll(".*S0 ([0-9.]+) %.*", "$1");
    // Printed to 4 significant figures (164.0 %), so within half a unit of the last one.
    assertThat(Double.parseDouble(cell)).isCloseTo(100 * s0, within(0.05));
    assertThat(phases).contains("dry mass 120.0 g", "w0 60.0 %", "wf 25.0 %", "Sf ");
    // Dry density M_s / V (definition): 120 g in 88.36 cm3 = 1.358 Mg/m3.
    String dryDensity = phases.replaceAll(".*dry density ([0-9.]+) Mg/m3.*", "$1");
    assertThat(Double.parseDouble(dryDensity)).isCloseTo(0.120 / volume / 1000, within(5e-4));
    assertThat(r.dataWarnings()).hasSize(3);
    for (org.oedometry.core.DataWarning w : r.dataWarnings()) {
      assertThat(lines).contains("  test: [" + w.kind() + "] " + w.message());
    }
  }
}
