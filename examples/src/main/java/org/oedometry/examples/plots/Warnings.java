package org.oedometry.examples.plots;

import java.util.List;
import java.util.stream.Collectors;
import org.oedometry.fitting.FitWarning;

/** Warnings in a subtitle: their kinds in lower case, comma separated. */
final class Warnings {

  private Warnings() {}

  static String kinds(List<FitWarning> warnings) {
    return warnings.stream()
        .map(w -> w.kind().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '))
        .collect(Collectors.joining(", "));
  }
}
