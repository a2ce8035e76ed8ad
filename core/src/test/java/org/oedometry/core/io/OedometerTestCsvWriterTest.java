package org.oedometry.core.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.TestIdentifiers;

class OedometerTestCsvWriterTest {

  private static OedometerTest example() {
    return OedometerTestCsvReader.parse(
        new CsvTables(
            OedometerTestCsvReaderTest.PROPERTIES,
            OedometerTestCsvReaderTest.INCREMENTS,
            OedometerTestCsvReaderTest.READINGS));
  }

  @Test
  @DisplayName("writes the documented layout in SI units")
  void layout() {
    CsvTables t = OedometerTestCsvWriter.format(example());
    assertThat(t.properties())
        .contains("property,value\n")
        .contains("initial_height_m,0.02\n")
        .contains("diameter_m,0.075\n")
        .contains("dry_mass_kg,0.12\n")
        .contains("initial_water_content_ratio,0.36\n")
        .contains("drainage,double\n")
        .contains("drainage_path_rule,mean_height\n")
        .startsWith("# ");
    assertThat(t.increments())
        .contains(
            "increment,stress_before_Pa,stress_after_Pa\n1,0.0,50000.0\n2,50000.0,100000.0\n");
    assertThat(t.readings()).contains("increment,elapsed_s,settlement_m\n1,0.0,0.0\n1,60.0,");
  }

  @Test
  @DisplayName("round trip through files: the written test reads back equal")
  void roundTripThroughFiles(@TempDir Path dir) throws IOException {
    OedometerTest t =
        example().toBuilder()
            .identifiers(TestIdentifiers.of("Demo, \"quoted\"", "#7", "  ", "é 4.5 m"))
            .build();
    OedometerTestCsvWriter.write(t, dir);
    assertThat(OedometerTestCsvReader.read(dir)).isEqualTo(t);
  }

  @Test
  @DisplayName("dry mass and final water content together are written and read back")
  void bothSolidsInputsRoundTrip() {
    OedometerTest t =
        OedometerTest.builder(example().specimen().toBuilder().finalWaterContent(0.405).build())
            .increments(example().increments())
            .drainagePathRule(example().drainagePathRule())
            .identifiers(example().identifiers())
            .build();
    CsvTables written = OedometerTestCsvWriter.format(t);
    assertThat(written.properties())
        .contains("dry_mass_kg,0.12\n")
        .contains("final_water_content_ratio,0.405\n");
    OedometerTest back = OedometerTestCsvReader.parse(written);
    assertThat(back).isEqualTo(t);
    assertThat(back.finalDegreeOfSaturation()).isEqualTo(t.finalDegreeOfSaturation()).isPresent();
  }
}
