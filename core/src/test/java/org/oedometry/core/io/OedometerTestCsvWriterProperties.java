package org.oedometry.core.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.OedometerTest;

class OedometerTestCsvWriterProperties {

  @Test
  @DisplayName("write -> read returns an equal test for random valid tests (invented data)")
  void roundTrip() {
    qt().withExamples(500)
        .forAll(longs().all())
        .checkAssert(
            seed -> {
              OedometerTest t = RandomOedometerTests.generate(seed);
              OedometerTest back = OedometerTestCsvReader.parse(OedometerTestCsvWriter.format(t));
              assertThat(back).isEqualTo(t);
              assertThat(back.hashCode()).isEqualTo(t.hashCode());
            });
  }
}
