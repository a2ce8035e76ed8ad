package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.core.compressibility.PreconsolidationMethod;
import org.oedometry.fitting.CvMethod;

class Ags4ReportTest {

  private static final double YEAR = 365.25 * 86_400;
  private static final TestReport REPORT = ReductionFixtures.mixedReport();

  /** One parsed group: headings, units, types and data rows as heading -> value maps. */
  private record Group(
      List<String> headings,
      List<String> units,
      List<String> types,
      List<Map<String, String>> data) {

    String unit(String heading) {
      return units.get(headings.indexOf(heading));
    }

    String type(String heading) {
      return types.get(headings.indexOf(heading));
    }
  }

  /** Parses an AGS4 text: each line one quoted CSV record, groups separated by blank lines. */
  private static Map<String, Group> parse(String text) throws IOException {
    Map<String, Group> groups = new LinkedHashMap<>();
    String name = null;
    Group g = null;
    for (String line : text.split("\r\n", -1)) {
      if (line.isEmpty()) {
        continue;
      }
      // AGS4 rule: every field quoted, separated by commas.
      // (Possessive: a 20 000-character field must not exhaust the regex engine's stack.)
      assertThat(line).matches("\"(?:[^\"]++|\"\")*+\"(?:,\"(?:[^\"]++|\"\")*+\")*+");
      CSVRecord r;
      try (CSVParser p = CSVParser.parse(new StringReader(line), CSVFormat.RFC4180)) {
        r = p.getRecords().get(0);
      }
      List<String> f = new ArrayList<>(r.toList());
      String descriptor = f.remove(0);
      switch (descriptor) {
        case "GROUP" -> {
          name = f.get(0);
          g = null;
        }
        case "HEADING" -> {
          g = new Group(f, new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
          groups.put(name, g);
        }
        case "UNIT" -> g.units().addAll(f);
        case "TYPE" -> g.types().addAll(f);
        case "DATA" -> {
          assertThat(f).hasSameSizeAs(g.headings());
          Map<String, String> row = new LinkedHashMap<>();
          for (int i = 0; i < f.size(); i++) {
            row.put(g.headings().get(i), f.get(i));
          }
          g.data().add(row);
        }
        default -> throw new AssertionError("unknown data descriptor " + descriptor);
      }
    }
    return groups;
  }

  /** Checks a value written to the precision its TYPE says (nDP: half a unit in the last place). */
  private static void check(Group g, Map<String, String> row, String heading, OptionalDouble v) {
    String field = row.get(heading);
    if (v.isEmpty()) {
      assertThat(field).as(heading).isEmpty();
      return;
    }
    String type = g.type(heading);
    double x = v.getAsDouble();
    double read = Double.parseDouble(field);
    if (type.endsWith("DP")) {
      int places = Integer.parseInt(type.substring(0, type.length() - 2));
      assertThat(field.contains(".") ? field.length() - field.indexOf('.') - 1 : 0)
          .as(heading)
          .isEqualTo(places);
      assertThat(read).as(heading).isCloseTo(x, within(0.5000001 * Math.pow(10, -places)));
    } else if (type.endsWith("SCI")) {
      assertThat(field).as(heading).matches("-?\\d\\.\\d{2}E[-+]\\d+");
      assertThat(read).as(heading).isCloseTo(x, within(0.005000001 * Math.abs(x)));
    } else {
      assertThat(type).as(heading).isEqualTo("3SF");
      assertThat(read).as(heading).isCloseTo(x, within(0.0050001 * Math.abs(x)));
    }
  }

  private static OptionalDouble of(double x) {
    return OptionalDouble.of(x);
  }

  @Test
  @DisplayName(
      "AGS4 file rules (from memory): quoted fields, CR LF, GROUP/HEADING/UNIT/TYPE/DATA rows, one"
          + " blank line between groups, the groups PROJ, TRAN, UNIT, TYPE, DICT present")
  void followsTheFileRules() throws IOException {
    checkFileRules(REPORT.toAgs4());
  }

  /** Every file rule that {@link #followsTheFileRules()} names. */
  private static Map<String, Group> checkFileRules(String text) throws IOException {
    assertThat(text.replace("\r\n", "")).doesNotContain("\n").doesNotContain("\r");
    assertThat(text).startsWith("\"GROUP\",\"PROJ\"\r\n");
    assertThat(text).contains("\r\n\r\n\"GROUP\",\"CONS\"\r\n");
    Map<String, Group> groups = parse(text);
    assertThat(groups.keySet())
        .contains("PROJ", "TRAN", "LOCA", "SAMP", "CONG", "CONS", "DICT", "ABBR", "UNIT", "TYPE");
    for (Map.Entry<String, Group> e : groups.entrySet()) {
      Group g = e.getValue();
      assertThat(g.units()).as(e.getKey()).hasSameSizeAs(g.headings());
      assertThat(g.types()).as(e.getKey()).hasSameSizeAs(g.headings());
      for (String h : g.headings()) {
        // Heading names: group name, underscore, up to four capitals or digits.
        assertThat(h).matches("[A-Z0-9]{4}_[A-Z0-9]{1,4}");
      }
    }
    // Every unit and type used is listed; every non-standard heading is declared in DICT.
    List<String> units = groups.get("UNIT").data().stream().map(r -> r.get("UNIT_UNIT")).toList();
    List<String> types = groups.get("TYPE").data().stream().map(r -> r.get("TYPE_TYPE")).toList();
    List<String> declared =
        groups.get("DICT").data().stream().map(r -> r.get("DICT_HDNG")).toList();
    List<String> standard =
        List.of(
            "CONG_SDIA",
            "CONG_HIGT",
            "CONG_MCI",
            "CONG_MCF",
            "CONG_IVR",
            "CONG_PDEN",
            "CONS_INCN",
            "CONS_IVR",
            "CONS_INCF",
            "CONS_INCE",
            "CONS_INMV",
            "CONS_INSC",
            "CONS_CVRT",
            "CONS_CVLG");
    for (String group : List.of("CONG", "CONS")) {
      Group g = groups.get(group);
      for (int i = 0; i < g.headings().size(); i++) {
        String h = g.headings().get(i);
        if (!g.units().get(i).isEmpty()) {
          assertThat(units).contains(g.units().get(i));
        }
        assertThat(types).contains(g.types().get(i));
        if (h.startsWith(group) && !standard.contains(h)) {
          assertThat(declared).as(h).contains(h);
        }
      }
    }
    // The units AGS4 fixes for these quantities (FACTS).
    Group cons = groups.get("CONS");
    assertThat(cons.unit("CONS_CVLG")).isEqualTo("m2/yr");
    assertThat(cons.unit("CONS_CVRT")).isEqualTo("m2/yr");
    assertThat(cons.unit("CONS_INMV")).isEqualTo("m2/MN");
    assertThat(cons.unit("CONS_INCF")).isEqualTo("kPa");
    return groups;
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("org.oedometry.fitting.reduction.ReductionFixtures#unusualReports")
  @DisplayName(
      "AGS4 file rules (from memory, as above) hold for hostile identifiers (quotes, commas,"
          + " backslash, non-ASCII, 20 000 characters, a 401-digit depth) and for unusual tests;"
          + " the labels read back unchanged, one CONS row per increment")
  void unusualReportsFollowTheFileRules(String name, TestReport report) throws IOException {
    Map<String, Group> groups = checkFileRules(report.toAgs4());
    assertThat(groups.get("PROJ").data().get(0).get("PROJ_NAME"))
        .isEqualTo(report.identifiers().project());
    Map<String, String> cong = groups.get("CONG").data().get(0);
    assertThat(cong.get("LOCA_ID")).isEqualTo(report.identifiers().borehole());
    assertThat(cong.get("SAMP_ID")).isEqualTo(report.identifiers().sample());
    assertThat(cong.get("SAMP_TOP")).isEqualTo(Ags4Report.sampleTop(report.identifiers().depth()));
    assertThat(groups.get("CONS").data()).hasSize(report.increments().size());
  }

  @Test
  @DisplayName(
      "Read back, every CONG and CONS value equals the report's to the precision of its TYPE"
          + " (kPa = Pa/1000, m2/yr = m2/s * 31557600, m2/MN = 1e6 / Pa, mm = m*1000)")
  void everyValueReadsBack() throws IOException {
    Map<String, Group> groups = parse(REPORT.toAgs4());
    Group cong = groups.get("CONG");
    assertThat(cong.data()).hasSize(1);
    Map<String, String> c = cong.data().get(0);
    assertThat(c.get("LOCA_ID")).isEqualTo(REPORT.identifiers().borehole());
    assertThat(c.get("SAMP_TOP")).isEqualTo("3.50");
    check(cong, c, "CONG_HIGT", of(REPORT.specimen().initialHeightMetres() * 1000));
    check(cong, c, "CONG_SDIA", of(REPORT.specimen().diameterMetres().getAsDouble() * 1000));
    check(cong, c, "CONG_MCI", of(REPORT.specimen().initialWaterContent().getAsDouble() * 100));
    check(cong, c, "CONG_MCF", OptionalDouble.empty());
    check(cong, c, "CONG_IVR", of(REPORT.initialVoidRatio()));
    check(cong, c, "CONG_PDEN", of(REPORT.specimen().specificGravity()));
    check(
        cong,
        c,
        "CONG_XCC",
        REPORT.compressionIndex().value().isPresent()
            ? of(REPORT.compressionIndex().value().get().index())
            : OptionalDouble.empty());
    for (PreconsolidationMethod m : PreconsolidationMethod.values()) {
      OptionalDouble p = REPORT.preconsolidationPressure(m);
      check(
          cong,
          c,
          Ags4Report.preconsolidationHeading(m),
          p.isPresent() ? of(p.getAsDouble() / 1000) : p);
    }
    Group cons = groups.get("CONS");
    assertThat(cons.data()).hasSize(REPORT.increments().size());
    for (int j = 0; j < cons.data().size(); j++) {
      Map<String, String> row = cons.data().get(j);
      IncrementReport inc = REPORT.increments().get(j);
      IncrementCompressibility ic = inc.compressibility().value().orElseThrow();
      assertThat(row.get("CONS_INCN")).isEqualTo(Integer.toString(j + 1));
      check(cons, row, "CONS_IVR", of(ic.startVoidRatio()));
      check(cons, row, "CONS_INCF", of(inc.stressAfterPascals() / 1000));
      check(cons, row, "CONS_INCE", of(ic.endVoidRatio()));
      check(cons, row, "CONS_INMV", of(ic.mv() * 1e6));
      check(
          cons,
          row,
          "CONS_INSC",
          inc.secondaryCompression().value().isPresent()
              ? of(inc.secondaryCompression().value().get().secondaryCompressionIndex())
              : OptionalDouble.empty());
      for (CvMethod m : CvMethod.values()) {
        OptionalDouble cv = inc.cv(m);
        check(
            cons, row, Ags4Report.cvHeading(m), cv.isPresent() ? of(cv.getAsDouble() * YEAR) : cv);
      }
      check(cons, row, "CONS_XHDR", of(inc.drainagePath().drainagePathMetres() * 1000));
      assertThat(row.get("CONS_XRUL")).isEqualTo(inc.drainagePath().rule().name());
      check(cons, row, "CONS_XK", inc.permeability());
      assertThat(row.get("CONS_XKMT"))
          .isEqualTo(
              inc.permeability().isPresent() ? inc.preferredMethod().orElseThrow().name() : "");
    }
  }

  @Test
  @DisplayName("A quote inside a field is doubled (the fixture's project name holds quotes)")
  void doublesQuotes() throws IOException {
    assertThat(Ags4Report.quote("a \"b\"")).isEqualTo("\"a \"\"b\"\"\"");
    Map<String, Group> groups = parse(REPORT.toAgs4());
    assertThat(groups.get("PROJ").data().get(0).get("PROJ_NAME"))
        .isEqualTo(REPORT.identifiers().project());
  }

  @Test
  @DisplayName("SAMP_TOP is the leading number of the depth text, or empty")
  void readsTheSampleDepth() {
    assertThat(Ags4Report.sampleTop("6.2 m")).isEqualTo("6.20");
    assertThat(Ags4Report.sampleTop(" 12 m below ground")).isEqualTo("12.00");
    assertThat(Ags4Report.sampleTop("unknown")).isEmpty();
  }

  @Test
  @DisplayName(
      "SAMP_TOP (TYPE 2DP: two decimal places) rounds the decimal the lab wrote half-up, as the"
          + " class documents: 2.675 -> 2.68 (not 2.67 through the double 2.67499...), and a"
          + " leading number beyond the double range is written exactly instead of failing")
  void sampleDepthIsRoundedAsWritten() {
    assertThat(Ags4Report.sampleTop("2.675 m")).isEqualTo("2.68");
    String huge = "1" + "0".repeat(400);
    assertThat(Ags4Report.sampleTop(huge + ".005 m")).isEqualTo(huge + ".01");
  }
}
