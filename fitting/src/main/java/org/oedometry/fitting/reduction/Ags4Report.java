package org.oedometry.fitting.reduction;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.oedometry.core.compressibility.IncrementClass;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.core.compressibility.IndexBranch;
import org.oedometry.core.compressibility.IndexFit;
import org.oedometry.core.compressibility.PreconsolidationMethod;
import org.oedometry.fitting.CvMethod;

/**
 * The AGS4 rendering of a {@link TestReport}: the CONG (consolidation test, general) and CONS (per
 * increment) groups, with the groups an AGS4 file needs around them.
 *
 * <p>File rules followed (AGS4, from memory; check against the published standard before relying on
 * a file for a submission): every field in double quotes, separated by commas, a quote inside a
 * field doubled; each group starts with a GROUP row, then HEADING, UNIT and TYPE rows and the DATA
 * rows; groups separated by one blank line; lines end in CR LF; key headings first in each group;
 * every heading not in the standard dictionary declared in the DICT group; every unit and data type
 * used listed in the UNIT and TYPE groups; every abbreviation in a PA field listed in ABBR; the
 * PROJ and TRAN groups present.
 *
 * <p>Standard headings written (confirmed in FACTS.md): CONG_HIGT and CONG_SDIA (mm), CONG_MCI and
 * CONG_MCF (%), CONG_IVR, CONG_PDEN (Mg/m3); CONS_INCN, CONS_IVR, CONS_INCF (kPa), CONS_INCE,
 * CONS_INMV (m2/MN), CONS_INSC (written as C<sub>&alpha;e</sub>; whether the standard means
 * C<sub>&alpha;e</sub> or C<sub>&alpha;&epsilon;</sub> we are not sure), CONS_CVRT and CONS_CVLG
 * (m2/yr). CONG_CORR is not written (the test does not say whether the readings were corrected for
 * apparatus deformation). User-defined headings (declared in DICT): C<sub>c</sub>, C<sub>r</sub> of
 * the first recompression, unloading and reloading branch, &sigma;'<sub>p</sub> by each
 * construction (kPa), C<sub>k</sub>; per increment the c<sub>v</sub> of the further methods, the
 * drainage path (mm) and its rule, k (m/s) and the method whose c<sub>v</sub> gave it.
 *
 * <p>Unsure (from memory): the key headings of the laboratory groups (we write LOCA_ID, SAMP_TOP,
 * SAMP_REF, SAMP_TYPE, SAMP_ID, SPEC_REF, SPEC_DPTH, with SPEC_REF "1" and SPEC_DPTH equal to
 * SAMP_TOP), the TRAN_AGS value ("4.1"), whether TRAN_DATE may be empty (we leave it empty so that
 * the same report gives the same file), the exact spelling of the data types (nDP, nSF, nSCI) and
 * whether DICT_TYPE and DICT_STAT values need ABBR rows (we write them). SAMP_TOP is the leading
 * number of the identifiers' depth text, rounded half-up to 2 decimal places as written, or empty
 * when it has none.
 */
final class Ags4Report {

  static final String LINE_END = "\r\n";

  private static final String[] KEYS = {
    "LOCA_ID", "SAMP_TOP", "SAMP_REF", "SAMP_TYPE", "SAMP_ID", "SPEC_REF", "SPEC_DPTH"
  };
  private static final String[] KEY_UNITS = {"", "m", "", "", "", "", "m"};
  private static final String[] KEY_TYPES = {"ID", "2DP", "X", "PA", "ID", "X", "2DP"};

  /** The user-defined headings: name, group, type, unit, description. */
  private record Heading(String name, String unit, String type, String description) {}

  private Ags4Report() {}

  static String render(TestReport r) {
    StringBuilder s = new StringBuilder();
    Set<String> units = new LinkedHashSet<>();
    Set<String> types = new LinkedHashSet<>();
    List<Heading> userDefined = new ArrayList<>();
    String top = sampleTop(r.identifiers().depth());
    String loca = r.identifiers().borehole();
    String samp = r.identifiers().sample();
    String[] keyValues = {loca, top, samp, "U", samp, "1", top};

    group(
        s,
        "PROJ",
        List.of("PROJ_ID", "PROJ_NAME", "PROJ_MEMO"),
        List.of("", "", ""),
        List.of("ID", "X", "X"),
        List.of(
            List.of(
                r.identifiers().project(),
                r.identifiers().project(),
                "Results must be reviewed by a qualified engineer; local codes and standards"
                    + " govern.")),
        units,
        types);
    group(
        s,
        "TRAN",
        List.of(
            "TRAN_ISNO",
            "TRAN_DATE",
            "TRAN_PROD",
            "TRAN_STAT",
            "TRAN_DESC",
            "TRAN_AGS",
            "TRAN_RECV",
            "TRAN_DLIM",
            "TRAN_RCON"),
        List.of("", "yyyy-mm-dd", "", "", "", "", "", "", ""),
        List.of("X", "DT", "X", "X", "X", "X", "X", "X", "X"),
        List.of(
            List.of(
                "1", "", "oedometry", "DRAFT", "Oedometer test reduction", "4.1", "", "|", "+")),
        units,
        types);
    group(
        s,
        "LOCA",
        List.of("LOCA_ID"),
        List.of(""),
        List.of("ID"),
        List.of(List.of(loca)),
        units,
        types);
    group(
        s,
        "SAMP",
        List.of("LOCA_ID", "SAMP_TOP", "SAMP_REF", "SAMP_TYPE", "SAMP_ID"),
        List.of("", "m", "", "", ""),
        List.of("ID", "2DP", "X", "PA", "ID"),
        List.of(List.of(loca, top, samp, "U", samp)),
        units,
        types);

    // CONG
    List<String> h = new ArrayList<>(List.of(KEYS));
    List<String> u = new ArrayList<>(List.of(KEY_UNITS));
    List<String> t = new ArrayList<>(List.of(KEY_TYPES));
    List<String> d = new ArrayList<>(List.of(keyValues));
    add(h, u, t, d, "CONG_SDIA", "mm", "1DP", fixed(mm(r.specimen().diameterMetres()), 1));
    add(
        h,
        u,
        t,
        d,
        "CONG_HIGT",
        "mm",
        "2DP",
        fixed(OptionalDouble.of(r.specimen().initialHeightMetres() * 1000), 2));
    add(h, u, t, d, "CONG_MCI", "%", "1DP", fixed(percent(r.specimen().initialWaterContent()), 1));
    add(h, u, t, d, "CONG_MCF", "%", "1DP", fixed(percent(r.specimen().finalWaterContent()), 1));
    add(h, u, t, d, "CONG_IVR", "", "3DP", fixed(OptionalDouble.of(r.initialVoidRatio()), 3));
    add(
        h,
        u,
        t,
        d,
        "CONG_PDEN",
        "Mg/m3",
        "2DP",
        fixed(OptionalDouble.of(r.specimen().specificGravity()), 2));
    userDefined.add(
        new Heading(
            "CONG_XCC", "", "3SF", "Compression index C_c (virgin line, e - log10 stress)"));
    add(
        h,
        u,
        t,
        d,
        "CONG_XCC",
        "",
        "3SF",
        sig(r.compressionIndex().value().map(IndexFit::index), 3));
    String[][] branches = {
      {"CONG_XCRR", "RECOMPRESSION", "Recompression index C_r of the first recompression branch"},
      {"CONG_XCRU", "UNLOADING", "Swelling index C_r of the first unloading branch"},
      {"CONG_XCRL", "RELOADING", "Recompression index C_r of the first reloading branch"}
    };
    for (String[] b : branches) {
      userDefined.add(new Heading(b[0], "", "3SF", b[2]));
      add(h, u, t, d, b[0], "", "3SF", sig(branchIndex(r, IncrementClass.valueOf(b[1])), 3));
    }
    for (PreconsolidationMethod m : PreconsolidationMethod.values()) {
      String name = preconsolidationHeading(m);
      userDefined.add(
          new Heading(name, "kPa", "1DP", "Preconsolidation pressure by " + m.reference()));
      add(
          h,
          u,
          t,
          d,
          name,
          "kPa",
          "1DP",
          fixed(ReportUnits.map(r.preconsolidationPressure(m), ReportUnits::kilopascals), 1));
    }
    userDefined.add(
        new Heading(
            "CONG_XCK",
            "",
            "3SF",
            "Permeability change index C_k = de/dlog10 k over the normally consolidated"
                + " increments"));
    add(
        h,
        u,
        t,
        d,
        "CONG_XCK",
        "",
        "3SF",
        sig(r.permeabilityChange().value().map(f -> f.permeabilityChangeIndex()), 3));
    group(s, "CONG", h, u, t, List.of(d), units, types);

    // CONS
    h = new ArrayList<>(List.of(KEYS));
    u = new ArrayList<>(List.of(KEY_UNITS));
    t = new ArrayList<>(List.of(KEY_TYPES));
    h.addAll(List.of("CONS_INCN", "CONS_IVR", "CONS_INCF", "CONS_INCE", "CONS_INMV", "CONS_INSC"));
    u.addAll(List.of("", "", "kPa", "", "m2/MN", ""));
    t.addAll(List.of("0DP", "3DP", "1DP", "3DP", "3SF", "3SF"));
    h.addAll(List.of("CONS_CVRT", "CONS_CVLG"));
    u.addAll(List.of("m2/yr", "m2/yr"));
    t.addAll(List.of("3SF", "3SF"));
    List<CvMethod> further = new ArrayList<>();
    for (CvMethod m : CvMethod.values()) {
      if (m != CvMethod.LOG_TIME && m != CvMethod.ROOT_TIME) {
        further.add(m);
        String name = cvHeading(m);
        h.add(name);
        u.add("m2/yr");
        t.add("3SF");
        userDefined.add(
            new Heading(name, "m2/yr", "3SF", "Coefficient of consolidation c_v by " + m.label()));
      }
    }
    h.addAll(List.of("CONS_XHDR", "CONS_XRUL", "CONS_XK", "CONS_XKMT"));
    u.addAll(List.of("mm", "", "m/s", ""));
    t.addAll(List.of("3DP", "X", "2SCI", "X"));
    userDefined.add(
        new Heading(
            "CONS_XHDR", "mm", "3DP", "Drainage path H_dr that every c_v of the increment used"));
    userDefined.add(new Heading("CONS_XRUL", "", "X", "Rule that chose the drainage path"));
    userDefined.add(
        new Heading(
            "CONS_XK", "m/s", "2SCI", "Permeability k = c_v m_v gamma_w from the preferred c_v"));
    userDefined.add(new Heading("CONS_XKMT", "", "X", "Method whose c_v gave CONS_XK"));
    List<List<String>> rows = new ArrayList<>();
    for (IncrementReport inc : r.increments()) {
      List<String> row = new ArrayList<>(List.of(keyValues));
      IncrementCompressibility c = inc.compressibility().value().orElse(null);
      row.add(Integer.toString(inc.index() + 1));
      row.add(c == null ? "" : fixed(OptionalDouble.of(c.startVoidRatio()), 3));
      row.add(fixed(OptionalDouble.of(ReportUnits.kilopascals(inc.stressAfterPascals())), 1));
      row.add(c == null ? "" : fixed(OptionalDouble.of(c.endVoidRatio()), 3));
      row.add(
          c == null
              ? ""
              : sig(
                  boxed(
                      ReportUnits.map(
                          OptionalDouble.of(c.mv()), ReportUnits::squareMetresPerMeganewton)),
                  3));
      row.add(sig(inc.secondaryCompression().value().map(x -> x.secondaryCompressionIndex()), 3));
      row.add(
          sig(
              boxed(ReportUnits.map(inc.cv(CvMethod.ROOT_TIME), ReportUnits::squareMetresPerYear)),
              3));
      row.add(
          sig(
              boxed(ReportUnits.map(inc.cv(CvMethod.LOG_TIME), ReportUnits::squareMetresPerYear)),
              3));
      for (CvMethod m : further) {
        row.add(sig(boxed(ReportUnits.map(inc.cv(m), ReportUnits::squareMetresPerYear)), 3));
      }
      row.add(
          fixed(
              OptionalDouble.of(ReportUnits.millimetres(inc.drainagePath().drainagePathMetres())),
              3));
      row.add(inc.drainagePath().rule().name());
      row.add(scientific(inc.permeability(), 2));
      row.add(inc.permeability().isPresent() ? inc.preferredMethod().orElseThrow().name() : "");
      rows.add(row);
    }
    group(s, "CONS", h, u, t, rows, units, types);

    List<List<String>> dict = new ArrayList<>();
    for (Heading hd : userDefined) {
      dict.add(
          List.of(
              "HEADING",
              hd.name().substring(0, 4),
              hd.name(),
              "OTHER",
              hd.type(),
              hd.description(),
              hd.unit(),
              "",
              "",
              "user-defined by oedometry",
              ""));
    }
    group(
        s,
        "DICT",
        List.of(
            "DICT_TYPE",
            "DICT_GRP",
            "DICT_HDNG",
            "DICT_STAT",
            "DICT_DTYP",
            "DICT_DESC",
            "DICT_UNIT",
            "DICT_EXMP",
            "DICT_PGRP",
            "DICT_REM",
            "FILE_FSET"),
        List.of("", "", "", "", "", "", "", "", "", "", ""),
        List.of("PA", "X", "X", "PA", "X", "X", "PU", "X", "X", "X", "X"),
        dict,
        units,
        types);
    group(
        s,
        "ABBR",
        List.of("ABBR_HDNG", "ABBR_CODE", "ABBR_DESC", "ABBR_LIST", "ABBR_REM", "FILE_FSET"),
        List.of("", "", "", "", "", ""),
        List.of("X", "X", "X", "X", "X", "X"),
        List.of(
            List.of("SAMP_TYPE", "U", "Undisturbed sample", "", "", ""),
            List.of("DICT_TYPE", "HEADING", "Heading definition", "", "", ""),
            List.of("DICT_STAT", "OTHER", "Neither a key nor a required heading", "", "", "")),
        units,
        types);
    // UNIT and TYPE list what the groups above used (they add no new units or types of their own
    // beyond "X").
    List<List<String>> unitRows = new ArrayList<>();
    for (String unit : units) {
      unitRows.add(List.of(unit, unitDescription(unit), ""));
    }
    types.add("X");
    List<List<String>> typeRows = new ArrayList<>();
    for (String type : types) {
      typeRows.add(List.of(type, typeDescription(type), ""));
    }
    group(
        s,
        "UNIT",
        List.of("UNIT_UNIT", "UNIT_DESC", "FILE_FSET"),
        List.of("", "", ""),
        List.of("X", "X", "X"),
        unitRows,
        new LinkedHashSet<>(),
        new LinkedHashSet<>());
    group(
        s,
        "TYPE",
        List.of("TYPE_TYPE", "TYPE_DESC", "FILE_FSET"),
        List.of("", "", ""),
        List.of("X", "X", "X"),
        typeRows,
        new LinkedHashSet<>(),
        new LinkedHashSet<>());
    return s.toString();
  }

  static String preconsolidationHeading(PreconsolidationMethod m) {
    return switch (m) {
      case CASAGRANDE -> "CONG_XPCA";
      case PACHECO_SILVA -> "CONG_XPPS";
      case BUTTERFIELD -> "CONG_XPBU";
      case ONITSUKA -> "CONG_XPON";
      case BECKER_WORK -> "CONG_XPBW";
    };
  }

  static String cvHeading(CvMethod m) {
    return switch (m) {
      case LOG_TIME -> "CONS_CVLG";
      case ROOT_TIME -> "CONS_CVRT";
      case FULL_CURVE -> "CONS_XCVF";
      case INFLECTION_POINT -> "CONS_XCVI";
      case RECTANGULAR_HYPERBOLA -> "CONS_XCVH";
      case EARLY_SLOPE -> "CONS_XCVE";
      case ASAOKA -> "CONS_XCVA";
    };
  }

  private static java.util.Optional<Double> branchIndex(TestReport r, IncrementClass kind) {
    for (IndexBranch b : r.recompressionBranches()) {
      if (b.kind() == kind && b.fit().isPresent()) {
        return java.util.Optional.of(b.fit().value().get().index());
      }
    }
    return java.util.Optional.empty();
  }

  private static void add(
      List<String> h,
      List<String> u,
      List<String> t,
      List<String> d,
      String heading,
      String unit,
      String type,
      String value) {
    h.add(heading);
    u.add(unit);
    t.add(type);
    d.add(value);
  }

  private static void group(
      StringBuilder s,
      String name,
      List<String> headings,
      List<String> units,
      List<String> types,
      List<List<String>> data,
      Set<String> unitsUsed,
      Set<String> typesUsed) {
    if (s.length() > 0) {
      s.append(LINE_END);
    }
    row(s, "GROUP", List.of(name));
    row(s, "HEADING", headings);
    row(s, "UNIT", units);
    row(s, "TYPE", types);
    for (List<String> d : data) {
      row(s, "DATA", d);
    }
    for (String unit : units) {
      if (!unit.isEmpty()) {
        unitsUsed.add(unit);
      }
    }
    typesUsed.addAll(types);
  }

  private static void row(StringBuilder s, String descriptor, List<String> fields) {
    s.append(quote(descriptor));
    for (String f : fields) {
      s.append(',').append(quote(f));
    }
    s.append(LINE_END);
  }

  static String quote(String field) {
    return '"' + field.replace("\"", "\"\"") + '"';
  }

  /**
   * The leading number of a depth text such as "6.2 m", rounded half-up to 2 decimal places from
   * the decimal digits as written (not through a double, which would turn "2.675" into 2.67 and a
   * number beyond the double range into infinity), or empty.
   */
  static String sampleTop(String depth) {
    Matcher m = Pattern.compile("^\\s*([0-9]+(?:\\.[0-9]+)?)").matcher(depth);
    return m.find()
        ? new BigDecimal(m.group(1)).setScale(2, RoundingMode.HALF_UP).toPlainString()
        : "";
  }

  private static OptionalDouble mm(OptionalDouble metres) {
    return ReportUnits.map(metres, ReportUnits::millimetres);
  }

  private static OptionalDouble percent(OptionalDouble ratio) {
    return ReportUnits.map(ratio, x -> 100 * x);
  }

  private static java.util.Optional<Double> boxed(OptionalDouble v) {
    return v.isPresent() ? java.util.Optional.of(v.getAsDouble()) : java.util.Optional.empty();
  }

  /** nDP: a fixed number of decimal places, half-up as BigDecimal rounds. */
  static String fixed(OptionalDouble value, int places) {
    if (value.isEmpty()) {
      return "";
    }
    return new BigDecimal(value.getAsDouble())
        .setScale(places, RoundingMode.HALF_UP)
        .toPlainString();
  }

  /** nSF: n significant figures, plain notation. */
  static String sig(java.util.Optional<Double> value, int figures) {
    if (value.isEmpty()) {
      return "";
    }
    return new BigDecimal(value.get())
        .round(new MathContext(figures, RoundingMode.HALF_UP))
        .toPlainString();
  }

  /** nSCI: scientific notation with n decimal places, e.g. 1.23E-10. */
  static String scientific(OptionalDouble value, int places) {
    if (value.isEmpty()) {
      return "";
    }
    return String.format(Locale.ROOT, "%." + places + "E", value.getAsDouble());
  }

  private static String unitDescription(String unit) {
    return switch (unit) {
      case "m" -> "metre";
      case "mm" -> "millimetre";
      case "%" -> "percentage";
      case "Mg/m3" -> "megagrams per cubic metre";
      case "kPa" -> "kilopascal";
      case "m2/MN" -> "square metres per meganewton";
      case "m2/yr" -> "square metres per year";
      case "m/s" -> "metres per second";
      case "yyyy-mm-dd" -> "year month day";
      default -> unit;
    };
  }

  private static String typeDescription(String type) {
    return switch (type) {
      case "ID" -> "Unique identifier";
      case "X" -> "Text";
      case "PA" -> "Text listed in ABBR group";
      case "PU" -> "Text listed in UNIT group";
      case "DT" -> "Date time in international format";
      case "2SCI" -> "Scientific notation with 2 decimal places";
      default -> {
        if (type.endsWith("DP")) {
          yield "Value; required number of decimal places, " + type.substring(0, type.length() - 2);
        }
        yield "Value; required number of significant figures, "
            + type.substring(0, type.length() - 2);
      }
    };
  }
}
