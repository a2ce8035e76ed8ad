package org.oedometry.fitting.reduction;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.OptionalDouble;

/**
 * A small streaming JSON writer (RFC 8259), written here rather than adding a JSON library to the
 * library's dependencies: the report needs only objects, arrays, strings, numbers, booleans and
 * null, in a fixed order, and every extra runtime dependency is one more thing an embedding program
 * must reconcile with its own. The writer
 *
 * <ul>
 *   <li>escapes '"', '\\' and every control character below U+0020 (as {@code \n}, {@code \t} etc.
 *       or <code>&#92;u00XX</code>), and U+2028, U+2029 and lone surrogates as <code>&#92;uXXXX
 *       </code>, so the text is valid JSON and valid JavaScript;
 *   <li>writes a non-finite double (which the report never holds) and an empty optional as {@code
 *       null}, never {@code NaN} or {@code Infinity};
 *   <li>writes numbers with {@link Double#toString(double)}, the shortest decimal that reads back
 *       to the same double (e.g. {@code 1.0E-9}, which JSON's number grammar allows);
 *   <li>keeps the keys in the order written (stable output) and checks the nesting, throwing {@link
 *       IllegalStateException} on a value without a key inside an object, a key outside one, or an
 *       unbalanced end.
 * </ul>
 *
 * Output is indented by two spaces. Not thread-safe (one writer per document).
 */
final class JsonWriter {

  private enum Context {
    OBJECT_EXPECTING_NAME,
    OBJECT_EXPECTING_VALUE,
    ARRAY,
    TOP
  }

  private final StringBuilder out = new StringBuilder();
  private final Deque<Context> stack = new ArrayDeque<>();
  private final Deque<Boolean> empty = new ArrayDeque<>();
  private boolean done;

  JsonWriter() {
    stack.push(Context.TOP);
    empty.push(Boolean.TRUE);
  }

  JsonWriter beginObject() {
    beforeValue();
    out.append('{');
    stack.push(Context.OBJECT_EXPECTING_NAME);
    empty.push(Boolean.TRUE);
    return this;
  }

  JsonWriter endObject() {
    if (stack.peek() != Context.OBJECT_EXPECTING_NAME) {
      throw new IllegalStateException("endObject without an open object awaiting a key");
    }
    end('}');
    return this;
  }

  JsonWriter beginArray() {
    beforeValue();
    out.append('[');
    stack.push(Context.ARRAY);
    empty.push(Boolean.TRUE);
    return this;
  }

  JsonWriter endArray() {
    if (stack.peek() != Context.ARRAY) {
      throw new IllegalStateException("endArray without an open array");
    }
    end(']');
    return this;
  }

  JsonWriter name(String name) {
    if (stack.peek() != Context.OBJECT_EXPECTING_NAME) {
      throw new IllegalStateException("key '" + name + "' outside an object or after a key");
    }
    separator();
    string(name);
    out.append(": ");
    stack.pop();
    stack.push(Context.OBJECT_EXPECTING_VALUE);
    return this;
  }

  JsonWriter value(String value) {
    beforeValue();
    if (value == null) {
      out.append("null");
    } else {
      string(value);
    }
    return this;
  }

  JsonWriter value(double value) {
    beforeValue();
    out.append(Double.isFinite(value) ? Double.toString(value) : "null");
    return this;
  }

  JsonWriter value(OptionalDouble value) {
    return value.isPresent() ? value(value.getAsDouble()) : nullValue();
  }

  JsonWriter value(long value) {
    beforeValue();
    out.append(value);
    return this;
  }

  JsonWriter value(boolean value) {
    beforeValue();
    out.append(value);
    return this;
  }

  JsonWriter nullValue() {
    beforeValue();
    out.append("null");
    return this;
  }

  /** The document; the top-level value must be complete. */
  String text() {
    if (stack.peek() != Context.TOP || !done) {
      throw new IllegalStateException("JSON document is incomplete");
    }
    return out.toString() + "\n";
  }

  private void beforeValue() {
    Context c = stack.peek();
    if (c == Context.OBJECT_EXPECTING_NAME) {
      throw new IllegalStateException("a value inside an object needs a key first");
    }
    if (c == Context.TOP) {
      if (done) {
        throw new IllegalStateException("a JSON document holds one top-level value");
      }
      done = true;
    } else if (c == Context.OBJECT_EXPECTING_VALUE) {
      stack.pop();
      stack.push(Context.OBJECT_EXPECTING_NAME);
    } else {
      separator();
    }
  }

  private void separator() {
    if (!empty.peek()) {
      out.append(',');
    }
    empty.pop();
    empty.push(Boolean.FALSE);
    newline(stack.size() - 1);
  }

  private void end(char bracket) {
    stack.pop();
    boolean wasEmpty = empty.pop();
    if (!wasEmpty) {
      newline(stack.size() - 1);
    }
    out.append(bracket);
  }

  private void newline(int depth) {
    out.append('\n');
    for (int i = 0; i < depth; i++) {
      out.append("  ");
    }
  }

  private void string(String s) {
    out.append('"');
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      switch (c) {
        case '"' -> out.append("\\\"");
        case '\\' -> out.append("\\\\");
        case '\n' -> out.append("\\n");
        case '\r' -> out.append("\\r");
        case '\t' -> out.append("\\t");
        case '\b' -> out.append("\\b");
        case '\f' -> out.append("\\f");
        default -> {
          boolean loneSurrogate =
              Character.isHighSurrogate(c)
                  ? !(i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1)))
                  : Character.isLowSurrogate(c)
                      && !(i > 0 && Character.isHighSurrogate(s.charAt(i - 1)));
          if (c < 0x20 || c == '\u2028' || c == '\u2029' || loneSurrogate) {
            out.append(String.format(java.util.Locale.ROOT, "\\u%04x", (int) c));
          } else {
            out.append(c);
          }
        }
      }
    }
    out.append('"');
  }
}
