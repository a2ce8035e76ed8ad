package org.oedometry.examples;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import jdk.jshell.JShell;
import jdk.jshell.Snippet;
import jdk.jshell.SnippetEvent;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Runs README's JShell lines through the JShell API, as a reader would type them, and checks the
 * value after each {@code // ~} to the digits written there.
 */
class ReadmeSnippetsTest {

  private static final String MARK = "// ~";

  private static List<String> jshellLines() throws IOException {
    List<String> lines = Files.readAllLines(Path.of("..", "README.md"), StandardCharsets.UTF_8);
    List<String> code = new ArrayList<>();
    boolean inside = false;
    for (String line : lines) {
      if (line.startsWith("```")) {
        inside = line.equals("```jshell");
        continue;
      }
      if (inside && !line.isBlank()) {
        code.add(line);
      }
    }
    return code;
  }

  @Test
  @DisplayName("README's JShell lines run and print the values they promise")
  void readmeSnippetsRun() throws IOException {
    List<String> lines = jshellLines();
    assertThat(lines).as("README has a jshell block").hasSizeGreaterThanOrEqualTo(3);
    int checked = 0;
    try (JShell shell = JShell.builder().executionEngine("local").build()) {
      String classPath =
          System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
      for (String entry : classPath.split(File.pathSeparator)) {
        shell.addToClasspath(entry);
      }
      for (String line : lines) {
        int mark = line.indexOf(MARK);
        String code = mark < 0 ? line : line.substring(0, mark).strip();
        // As the jshell tool does: complete the line (a missing semicolon) before evaluating.
        String source = shell.sourceCodeAnalysis().analyzeCompletion(code).source();
        List<SnippetEvent> events = shell.eval(source);
        assertThat(events).as("events of %s", code).isNotEmpty();
        SnippetEvent event = events.get(0);
        assertThat(event.status())
            .as(
                "status of %s: %s (class path %s)",
                code,
                shell.diagnostics(event.snippet()).map(d -> d.getMessage(null)).toList(),
                classPath)
            .isEqualTo(Snippet.Status.VALID);
        assertThat(event.exception()).as("exception of %s", code).isNull();
        if (mark >= 0) {
          BigDecimal expected =
              new BigDecimal(line.substring(mark + MARK.length()).strip().split("\\s+")[0]);
          double halfUnit = 0.5 * expected.ulp().doubleValue();
          double value = Double.parseDouble(event.value());
          assertThat(Math.abs(value - expected.doubleValue()))
              .as("value of %s (%s) against README's %s", code, value, expected)
              .isLessThanOrEqualTo(halfUnit);
          checked++;
        }
      }
    }
    assertThat(checked).as("values checked").isGreaterThanOrEqualTo(2);
  }
}
