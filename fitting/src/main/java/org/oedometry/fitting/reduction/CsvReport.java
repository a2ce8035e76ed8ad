package org.oedometry.fitting.reduction;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.core.compressibility.SecondaryCompressionResult;
import org.oedometry.fitting.CvMethod;

/**
 * The CSV rendering of a {@link TestReport}: one row per increment, RFC 4180 quoting (a field with
 * a comma, quote or line break is quoted, quotes doubled), '\n' line ends, numbers by {@link
 * Double#toString(double)} after unit conversion, absent values as empty fields.
 */
final class CsvReport {

  private CsvReport() {}

  static List<String> headers(List<CvMethod> methods) {
    List<String> h = new ArrayList<>();
    h.add("increment");
    h.add("stress before (kPa)");
    h.add("stress after (kPa)");
    h.add("direction");
    h.add("stress history");
    h.add("drainage path rule");
    h.add("drainage path (mm)");
    h.add("height for drainage path (mm)");
    h.add("t50 log-time (min)");
    h.add("t90 root-time (min)");
    for (CvMethod m : methods) {
      h.add("cv " + ReportUnits.shortName(m) + " (m2/yr)");
    }
    h.add("preferred method");
    h.add("d0 (mm)");
    h.add("d100 (mm)");
    h.add("primary ratio");
    h.add("e - log stress point at");
    h.add("void ratio at start");
    h.add("void ratio at end");
    h.add("av (m2/MN)");
    h.add("mv (m2/MN)");
    for (CvMethod m : methods) {
      h.add("k " + ReportUnits.shortName(m) + " (m/s)");
    }
    h.add("C_alpha_e");
    h.add("C_alpha_eps");
    h.add("warnings");
    return List.copyOf(h);
  }

  static String render(TestReport r) {
    List<CvMethod> methods = r.options().methods();
    StringBuilder s = new StringBuilder();
    row(s, headers(methods));
    for (IncrementReport inc : r.increments()) {
      List<String> f = new ArrayList<>();
      f.add(Integer.toString(inc.index() + 1));
      f.add(number(ReportUnits.kilopascals(inc.stressBeforePascals())));
      f.add(number(ReportUnits.kilopascals(inc.stressAfterPascals())));
      f.add(inc.direction().name());
      f.add(inc.stressHistory().value().map(Enum::name).orElse(""));
      f.add(inc.drainagePath().rule().name());
      f.add(number(ReportUnits.millimetres(inc.drainagePath().drainagePathMetres())));
      f.add(number(ReportUnits.millimetres(inc.drainagePath().heightMetres())));
      f.add(number(ReportUnits.map(inc.t50(), ReportUnits::minutes)));
      f.add(number(ReportUnits.map(inc.t90(), ReportUnits::minutes)));
      for (CvMethod m : methods) {
        f.add(number(ReportUnits.map(inc.cv(m), ReportUnits::squareMetresPerYear)));
      }
      f.add(inc.preferredMethod().map(Enum::name).orElse(""));
      f.add(number(ReportUnits.map(inc.d0(), ReportUnits::millimetres)));
      f.add(number(ReportUnits.map(inc.d100(), ReportUnits::millimetres)));
      f.add(number(inc.primaryRatio()));
      f.add(inc.deformationBasis().name());
      Optional<IncrementCompressibility> c = inc.compressibility().value();
      f.add(c.map(x -> number(x.startVoidRatio())).orElse(""));
      f.add(c.map(x -> number(x.endVoidRatio())).orElse(""));
      f.add(
          c.map(
                  x ->
                      number(
                          ReportUnits.map(
                              OptionalDouble.of(x.coefficientOfCompressibility()),
                              ReportUnits::squareMetresPerMeganewton)))
              .orElse(""));
      f.add(
          c.map(
                  x ->
                      number(
                          ReportUnits.map(
                              OptionalDouble.of(x.mv()), ReportUnits::squareMetresPerMeganewton)))
              .orElse(""));
      for (CvMethod m : methods) {
        f.add(
            inc.outcome(m)
                .flatMap(o -> o.permeability().value())
                .map(CsvReport::number)
                .orElse(""));
      }
      Optional<SecondaryCompressionResult> sc = inc.secondaryCompression().value();
      f.add(sc.map(x -> number(x.secondaryCompressionIndex())).orElse(""));
      f.add(sc.map(x -> number(x.modifiedSecondaryCompressionIndex())).orElse(""));
      StringBuilder w = new StringBuilder();
      for (ReductionWarning warning : inc.warnings()) {
        w.append(w.length() == 0 ? "" : " | ")
            .append(warning.kind())
            .append(": ")
            .append(warning.message());
      }
      f.add(w.toString());
      row(s, f);
    }
    return s.toString();
  }

  static String number(double value) {
    return Double.isFinite(value) ? Double.toString(value) : "";
  }

  static String number(OptionalDouble value) {
    return value.isPresent() ? number(value.getAsDouble()) : "";
  }

  private static void row(StringBuilder s, List<String> fields) {
    for (int i = 0; i < fields.size(); i++) {
      if (i > 0) {
        s.append(',');
      }
      s.append(quote(fields.get(i)));
    }
    s.append('\n');
  }

  /** RFC 4180: quote a field holding a comma, quote, CR or LF; double the quotes inside. */
  static String quote(String field) {
    if (field.indexOf(',') < 0
        && field.indexOf('"') < 0
        && field.indexOf('\n') < 0
        && field.indexOf('\r') < 0) {
      return field;
    }
    return '"' + field.replace("\"", "\"\"") + '"';
  }
}
