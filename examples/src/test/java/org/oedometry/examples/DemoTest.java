package org.oedometry.examples;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

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
      "The methods table has a row per demo increment, and the full-curve c_v of the data-logger"
          + " increment is within 10 % of the 1.4 m^2/yr it was made with (the generator's truth)")
  void printsEveryMethodOnEveryIncrement() {
    String[] lines = output().split("\\R");
    int rows = 0;
    String logger = null;
    for (String line : lines) {
      if (line.matches("\\s+\\d+\\s+\\d+ ->\\s+\\d+\\s+.*")) {
        rows++;
        if (line.trim().startsWith("6 ")) {
          logger = line;
        }
      }
    }
    assertThat(rows)
        .isEqualTo(org.oedometry.examples.demo.DemoTestGenerator.generate().increments().size());
    assertThat(logger).isNotNull();
    String[] cells = logger.trim().split("\\s+");
    // incr, before, ->, after, H_dr, log-time, root-time, full-curve, ...
    double fullCurve = Double.parseDouble(cells[7].replace("*", ""));
    assertThat(fullCurve).isCloseTo(1.4, within(0.14));
  }
}
