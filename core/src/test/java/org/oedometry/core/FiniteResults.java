package org.oedometry.core;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.OptionalLong;

/**
 * Test support shared by the modules (core's test jar): a walk over a result's public accessors
 * that lists every NaN or infinite number in it, for the project rule that no NaN or infinity
 * leaves the library. Tested by {@code FiniteResultsTest}.
 */
public final class FiniteResults {

  private FiniteResults() {}

  /**
   * Every number reachable from a value through its public no-argument accessors (record components
   * and derived values), lists, optionals and arrays, that is NaN or infinite, or a null, or an
   * accessor that throws; also calls toString.
   *
   * @return the paths of the offending values; empty when all is well
   */
  public static List<String> notFinite(Object value) {
    List<String> found = new ArrayList<>();
    walk(value, "result", found, new IdentityHashMap<>(), 0);
    return found;
  }

  private static void walk(
      Object value, String path, List<String> found, Map<Object, Boolean> seen, int depth) {
    if (value == null) {
      found.add(path + " is null");
    } else if (value instanceof Double d) {
      if (!Double.isFinite(d)) {
        found.add(path + " = " + d);
      }
    } else if (value instanceof Float f) {
      if (!Float.isFinite(f)) {
        found.add(path + " = " + f);
      }
    } else if (value instanceof Number
        || value instanceof Boolean
        || value instanceof Character
        || value instanceof String
        || value instanceof Enum<?>
        || value instanceof OptionalInt
        || value instanceof OptionalLong) {
      return;
    } else if (value instanceof OptionalDouble o) {
      if (o.isPresent()) {
        walk(o.getAsDouble(), path + ".get", found, seen, depth);
      }
    } else if (value instanceof Optional<?> o) {
      if (o.isPresent()) {
        walk(o.get(), path + ".get", found, seen, depth);
      }
    } else if (value instanceof double[] a) {
      for (int i = 0; i < a.length; i++) {
        walk(a[i], path + "[" + i + "]", found, seen, depth);
      }
    } else if (value instanceof Object[] a) {
      for (int i = 0; i < a.length; i++) {
        walk(a[i], path + "[" + i + "]", found, seen, depth);
      }
    } else if (value.getClass().isArray()) {
      return; // int[], boolean[], ...: no NaN possible
    } else if (value instanceof Collection<?> list) {
      int i = 0;
      for (Object element : list) {
        walk(element, path + "[" + i++ + "]", found, seen, depth);
      }
    } else if (value.getClass().getName().startsWith("org.oedometry.")) {
      if (seen.put(value, Boolean.TRUE) != null || depth > 12) {
        return;
      }
      try {
        String text = value.toString();
        if (text == null || text.isEmpty()) {
          found.add(path + ".toString() is empty");
        }
      } catch (RuntimeException e) {
        found.add(path + ".toString() threw " + e);
      }
      for (Method accessor : accessors(value.getClass())) {
        Object next;
        try {
          next = accessor.invoke(value);
        } catch (InvocationTargetException e) {
          found.add(path + "." + accessor.getName() + "() threw " + e.getCause());
          continue;
        } catch (IllegalAccessException e) {
          found.add(path + "." + accessor.getName() + "() is not accessible: " + e);
          continue;
        }
        walk(next, path + "." + accessor.getName() + "()", found, seen, depth + 1);
      }
    } else {
      found.add(path + " has a type the walk does not know: " + value.getClass().getName());
    }
  }

  /** Public, non-static, no-argument, value-returning methods of our own types, sorted by name. */
  private static List<Method> accessors(Class<?> type) {
    List<Method> out = new ArrayList<>();
    for (Method m : type.getMethods()) {
      if (m.getParameterCount() == 0
          && !Modifier.isStatic(m.getModifiers())
          && m.getReturnType() != void.class
          && !m.isSynthetic()
          && !m.isBridge()
          && m.getDeclaringClass().getName().startsWith("org.oedometry.")
          && !m.getName().equals("toString")
          && !m.getName().equals("hashCode")) {
        out.add(m);
      }
    }
    out.sort(Comparator.comparing(Method::getName));
    return out;
  }
}
