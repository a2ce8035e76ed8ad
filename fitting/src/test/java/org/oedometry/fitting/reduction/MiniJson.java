package org.oedometry.fitting.reduction;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A strict recursive-descent JSON parser (RFC 8259) for the tests, written independently of the
 * writer: objects become LinkedHashMap (key order kept; a repeated key fails), arrays List, numbers
 * Double, strings String, true/false Boolean, null null. Anything outside the grammar fails.
 */
final class MiniJson {

  private final String s;
  private int i;

  private MiniJson(String s) {
    this.s = s;
  }

  static Object parse(String text) {
    MiniJson p = new MiniJson(text);
    p.space();
    Object v = p.value();
    p.space();
    if (p.i != text.length()) {
      throw new IllegalArgumentException("trailing text at " + p.i);
    }
    return v;
  }

  private Object value() {
    char c = peek();
    switch (c) {
      case '{':
        return object();
      case '[':
        return array();
      case '"':
        return string();
      case 't':
        return literal("true", Boolean.TRUE);
      case 'f':
        return literal("false", Boolean.FALSE);
      case 'n':
        return literal("null", null);
      default:
        return number();
    }
  }

  private Map<String, Object> object() {
    expect('{');
    Map<String, Object> m = new LinkedHashMap<>();
    space();
    if (peek() == '}') {
      i++;
      return m;
    }
    while (true) {
      space();
      String k = string();
      space();
      expect(':');
      space();
      if (m.containsKey(k)) {
        throw new IllegalArgumentException("repeated key " + k);
      }
      m.put(k, value());
      space();
      if (peek() == ',') {
        i++;
        continue;
      }
      expect('}');
      return m;
    }
  }

  private List<Object> array() {
    expect('[');
    List<Object> l = new ArrayList<>();
    space();
    if (peek() == ']') {
      i++;
      return l;
    }
    while (true) {
      space();
      l.add(value());
      space();
      if (peek() == ',') {
        i++;
        continue;
      }
      expect(']');
      return l;
    }
  }

  private String string() {
    expect('"');
    StringBuilder b = new StringBuilder();
    while (true) {
      char c = s.charAt(i++);
      if (c == '"') {
        return b.toString();
      }
      if (c < 0x20) {
        throw new IllegalArgumentException("raw control character in a string at " + (i - 1));
      }
      if (c != '\\') {
        b.append(c);
        continue;
      }
      char e = s.charAt(i++);
      switch (e) {
        case '"' -> b.append('"');
        case '\\' -> b.append('\\');
        case '/' -> b.append('/');
        case 'b' -> b.append('\b');
        case 'f' -> b.append('\f');
        case 'n' -> b.append('\n');
        case 'r' -> b.append('\r');
        case 't' -> b.append('\t');
        case 'u' -> {
          b.append((char) Integer.parseInt(s.substring(i, i + 4), 16));
          i += 4;
        }
        default -> throw new IllegalArgumentException("bad escape at " + i);
      }
    }
  }

  private Double number() {
    int start = i;
    if (peek() == '-') {
      i++;
    }
    if (peek() == '0') {
      i++;
    } else {
      digits();
    }
    if (i < s.length() && s.charAt(i) == '.') {
      i++;
      digits();
    }
    if (i < s.length() && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
      i++;
      if (peek() == '+' || peek() == '-') {
        i++;
      }
      digits();
    }
    return Double.valueOf(s.substring(start, i));
  }

  private void digits() {
    int start = i;
    while (i < s.length() && Character.isDigit(s.charAt(i))) {
      i++;
    }
    if (i == start) {
      throw new IllegalArgumentException("digit expected at " + i);
    }
  }

  private Object literal(String word, Object v) {
    if (!s.startsWith(word, i)) {
      throw new IllegalArgumentException("bad literal at " + i);
    }
    i += word.length();
    return v;
  }

  private char peek() {
    if (i >= s.length()) {
      throw new IllegalArgumentException("unexpected end");
    }
    return s.charAt(i);
  }

  private void expect(char c) {
    if (peek() != c) {
      throw new IllegalArgumentException(
          "'" + c + "' expected at " + i + ", found '" + peek() + "'");
    }
    i++;
  }

  private void space() {
    while (i < s.length() && " \t\n\r".indexOf(s.charAt(i)) >= 0) {
      i++;
    }
  }
}
