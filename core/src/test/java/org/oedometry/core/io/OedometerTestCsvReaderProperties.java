package org.oedometry.core.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;
import static org.quicktheories.generators.SourceDSL.strings;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.OedometerTest;

/** Parsing never throws anything but the documented {@link TestDataException}. */
class OedometerTestCsvReaderProperties {

  private static final CsvTables VALID =
      new CsvTables(
          OedometerTestCsvReaderTest.PROPERTIES,
          OedometerTestCsvReaderTest.INCREMENTS,
          OedometerTestCsvReaderTest.READINGS);

  private static void parseOrTestDataException(CsvTables tables) {
    try {
      OedometerTest t = OedometerTestCsvReader.parse(tables);
      assertThat(t.increments()).isNotEmpty();
    } catch (TestDataException expected) {
      assertThat(expected.getMessage()).isNotBlank();
    } catch (RuntimeException | Error other) {
      fail("undocumented exception for " + tables, other);
    }
  }

  private static CsvTables replace(CsvTables tables, int which, String text) {
    List<String> list = RandomOedometerTests.asList(tables);
    list.set(which, text);
    return new CsvTables(list.get(0), list.get(1), list.get(2));
  }

  @Test
  @DisplayName("random text in any of the three files: a test or a TestDataException")
  void randomText() {
    qt().forAll(integers().between(0, 2), strings().ascii().ofLengthBetween(0, 200))
        .checkAssert((which, text) -> parseOrTestDataException(replace(VALID, which, text)));
  }

  @Test
  @DisplayName("random edits of valid files: a test or a TestDataException")
  void randomEdits() {
    qt().withExamples(2000)
        .forAll(integers().between(0, 2), longs().all())
        .checkAssert(
            (which, seed) -> {
              Random rnd = new Random(seed);
              String edited =
                  RandomOedometerTests.mutate(RandomOedometerTests.asList(VALID).get(which), rnd);
              parseOrTestDataException(replace(VALID, which, edited));
            });
  }

  @Test
  @DisplayName("random edits of written random tests: a test or a TestDataException")
  void randomEditsOfWrittenTests() {
    qt().withExamples(500)
        .forAll(integers().between(0, 2), longs().all())
        .checkAssert(
            (which, seed) -> {
              CsvTables written =
                  OedometerTestCsvWriter.format(RandomOedometerTests.generate(seed));
              Random rnd = new Random(~seed);
              String edited =
                  RandomOedometerTests.mutate(RandomOedometerTests.asList(written).get(which), rnd);
              parseOrTestDataException(replace(written, which, edited));
            });
  }
}
