package org.oedometry.examples;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.examples.demo.DemoTestGenerator;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.reduction.TestReduction;
import org.oedometry.fitting.reduction.TestReport;

class DemoTest {

  private static String output() {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    Demo.print(new PrintStream(bytes, true, StandardCharsets.UTF_8));
    return bytes.toString(StandardCharsets.UTF_8);
  }

  @Test
  @DisplayName("The U-T table prints the exact time factors [exact: FACTS.md table]")
  void printsTheTable() {
    assertThat(output())
        .contains("   50.0   0.1967307    0.197")
        .contains("   90.0   0.8480854    0.848")
        .contains("   10.0   0.0078540")
        .contains("   99.0   1.7812880");
  }

  @Test
  @DisplayName("The forecast times follow t = T H_dr^2 / c_v with the FACTS.md constants")
  void printsTheForecast() {
    // Independent arithmetic: H_dr = 3 m, c_v = 1.5 m^2/yr, T50 = 0.1967307, T90 = 0.848085.
    double t50 = 0.1967307 * 9 / 1.5;
    double t90 = 0.848085 * 9 / 1.5;
    String text = output();
    assertThat(text)
        .contains(String.format(java.util.Locale.ROOT, "time to 50 %%: %.2f years", t50))
        .contains(String.format(java.util.Locale.ROOT, "to 90 %%: %.2f years", t90))
        .contains("INVENTED layer");
    // After 20 years T = 1.5 * 20 / 9 = 3.33: U = 1 - (8/pi^2) exp(-pi^2 T / 4) to 1e-9.
    double degree = 1 - 8 / (Math.PI * Math.PI) * Math.exp(-Math.PI * Math.PI * (30.0 / 9) / 4);
    assertThat(text)
        .contains(String.format(java.util.Locale.ROOT, "%6.1f", 180 * degree))
        .contains("20.00   3.3333");
  }

  @Test
  @DisplayName(
      "The demo reduces the invented test and writes the report (CSV with a row per increment,"
          + " JSON, AGS4) and the charts; the full-curve c_v of the data-logger increment is within"
          + " 10 % of the 1.4 m^2/yr it was made with (the generator's truth)")
  void reducesTheDemoTestAndWritesItsFiles(@TempDir Path folder) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int code =
        Demo.run(
            new String[] {folder.toString()},
            new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
    assertThat(code).as(err.toString(StandardCharsets.UTF_8)).isZero();
    int increments = DemoTestGenerator.generate().increments().size();
    for (String file : new String[] {"report.csv", "report.json", "report.ags"}) {
      assertThat(Files.size(folder.resolve(file))).as(file).isPositive();
    }
    List<String> csv =
        Files.readAllLines(folder.resolve("report.csv"), StandardCharsets.UTF_8).stream()
            .filter(line -> !line.isBlank() && !line.startsWith("#"))
            .toList();
    assertThat(csv).hasSize(increments + 1);
    try (var pngs = Files.list(folder)) {
      assertThat(pngs.filter(p -> p.toString().endsWith(".png")).count())
          .isEqualTo(3L * increments + 4);
    }
    TestReport report = TestReduction.reduce(DemoTestGenerator.generate());
    double cv =
        report
            .increments()
            .get(DemoTestGenerator.LOGGER_INCREMENT)
            .cv(CvMethod.FULL_CURVE)
            .getAsDouble();
    assertThat(cv * 365.25 * 86_400).isCloseTo(1.4, within(0.14));
    assertThat(out.toString(StandardCharsets.UTF_8)).contains("Wrote report.csv");
  }

  @Test
  @DisplayName("A user's test folder with a bad file: a clear message naming it, exit code 2")
  void badUserFileGivesAClearMessage(@TempDir Path folder) throws IOException {
    Path input = Files.createDirectories(folder.resolve("mine"));
    Files.writeString(input.resolve("properties.csv"), "property,value\nheight_mm,abc\n");
    Files.writeString(input.resolve("increments.csv"), "increment\n");
    Files.writeString(input.resolve("readings.csv"), "increment\n");
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int code =
        Demo.run(
            new String[] {folder.resolve("out").toString(), input.toString()},
            new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
    assertThat(code).isEqualTo(2);
    assertThat(err.toString(StandardCharsets.UTF_8))
        .startsWith("The test in " + input + " cannot be read: ");
  }

  @Test
  @DisplayName(
      "A user's test folder whose properties.csv is a folder: exit code 2 and a message naming"
          + " that file (Demo.run documents both)")
  void inputFileThatIsAFolder(@TempDir Path folder) throws IOException {
    Path input = Files.createDirectories(folder.resolve("mine"));
    Files.createDirectories(input.resolve("properties.csv"));
    Files.writeString(input.resolve("increments.csv"), "increment\n");
    Files.writeString(input.resolve("readings.csv"), "increment\n");
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int code =
        Demo.run(
            new String[] {folder.resolve("out").toString(), input.toString()},
            new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
    assertThat(code).isEqualTo(2);
    assertThat(err.toString(StandardCharsets.UTF_8))
        .contains(input.resolve("properties.csv").toString());
  }

  @Test
  @DisplayName(
      "A user's test folder that does not exist, or a file given instead of the folder: exit"
          + " code 2, the missing file named")
  void missingInput(@TempDir Path folder) throws IOException {
    Path plainFile = Files.writeString(folder.resolve("a-file.csv"), "property,value\n");
    for (Path input : new Path[] {folder.resolve("no-such-folder"), plainFile}) {
      ByteArrayOutputStream err = new ByteArrayOutputStream();
      int code =
          Demo.run(
              new String[] {folder.resolve("out").toString(), input.toString()},
              new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8),
              new PrintStream(err, true, StandardCharsets.UTF_8));
      assertThat(code).isEqualTo(2);
      assertThat(err.toString(StandardCharsets.UTF_8))
          .startsWith("The test in " + input + " cannot be read: ")
          .contains(input.resolve("properties.csv").toString());
    }
  }

  @Test
  @DisplayName("An output folder that cannot be created (a file is in the way): exit code 3")
  void outputNotWritable(@TempDir Path folder) throws IOException {
    Path blocker = Files.writeString(folder.resolve("blocker"), "x");
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int code =
        Demo.run(
            new String[] {blocker.resolve("out").toString()},
            new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
    assertThat(code).isEqualTo(3);
    assertThat(err.toString(StandardCharsets.UTF_8)).startsWith("Cannot write the results to ");
  }
}
