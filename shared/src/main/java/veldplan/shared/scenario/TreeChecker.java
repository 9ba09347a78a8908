package veldplan.shared.scenario;

import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.databind.JsonNode;
import java.lang.reflect.Field;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Second pass over a scenario or policy file: walks the {@link JsonNode} tree against the record
 * classes by reflection, so that every record gets the same checks without per-field code.
 *
 * <p>It reports unknown fields (with the closest known name), missing required fields (every
 * component without {@link Optional}), values of the wrong JSON type, whole numbers that are not
 * whole or do not fit, enum spellings that do not exist, numbers that are not finite, and
 * {@link Range} violations with the unit. Only a tree with no problem is handed to Jackson.
 *
 * <p>Supported component types: records, {@code List<T>} of a supported type, enums (spelled as
 * their {@link JsonProperty} names), {@code String}, {@code double}/{@code Double},
 * {@code int}/{@code Integer}, {@code long}/{@code Long} and {@code boolean}/{@code Boolean}.
 * Any other type is a programming error in the records.
 */
final class TreeChecker {

  private final SourceLocations where;
  private final Map<String, String> raw;
  private final Set<String> reported;
  private final List<ScenarioProblem> problems;

  /**
   * Creates a checker.
   *
   * @param where    places by pointer, from the first pass
   * @param raw      numbers as written, by pointer, from the first pass
   * @param reported pointers already reported by the first pass (skipped here)
   * @param problems where to add problems
   */
  TreeChecker(SourceLocations where, Map<String, String> raw, Set<String> reported,
      List<ScenarioProblem> problems) {
    this.where = where;
    this.raw = raw;
    this.reported = reported;
    this.problems = problems;
  }

  /** Checks {@code node}, found at {@code pointer}, against {@code type}. */
  void check(JsonNode node, Type type, String pointer) {
    check(node, type, pointer, null);
  }

  private void check(JsonNode node, Type type, String pointer, Range range) {
    if (reported.contains(pointer)) {
      return;
    }
    if (type instanceof ParameterizedType) {
      ParameterizedType generic = (ParameterizedType) type;
      if (generic.getRawType() != List.class) {
        throw unsupported(type);
      }
      checkList(node, generic.getActualTypeArguments()[0], pointer);
      return;
    }
    if (!(type instanceof Class)) {
      throw unsupported(type);
    }
    Class<?> c = (Class<?>) type;
    if (c.isRecord()) {
      checkRecord(node, c, pointer);
    } else if (c == double.class || c == Double.class) {
      checkDouble(node, pointer, range);
    } else if (c == int.class || c == Integer.class) {
      checkWhole(node, pointer, range, Integer.MIN_VALUE, Integer.MAX_VALUE);
    } else if (c == long.class || c == Long.class) {
      checkWhole(node, pointer, range, Long.MIN_VALUE, Long.MAX_VALUE);
    } else if (c == String.class) {
      if (!node.isTextual()) {
        String hint = node.isNumber() || node.isBoolean() ? "; put it in quotes" : "";
        wrongType(node, pointer, "text" + hint, range);
      }
    } else if (c == boolean.class || c == Boolean.class) {
      if (!node.isBoolean()) {
        wrongType(node, pointer, "true or false", range);
      }
    } else if (c.isEnum()) {
      checkEnum(node, c, pointer);
    } else {
      throw unsupported(type);
    }
  }

  private void checkRecord(JsonNode node, Class<?> type, String pointer) {
    if (!node.isObject()) {
      wrongType(node, pointer, "an object", null);
      return;
    }
    RecordComponent[] components = type.getRecordComponents();
    List<String> known = new ArrayList<>(components.length);
    for (RecordComponent component : components) {
      known.add(component.getName());
    }
    for (Map.Entry<String, JsonNode> field : node.properties()) {
      String name = field.getKey();
      if (!known.contains(name)) {
        String suggestion = Texts.didYouMean(name, known);
        String message = suggestion.isEmpty()
            ? "unknown field (expected one of " + Texts.quotedList(known) + ")"
            : "unknown field" + suggestion;
        problems.add(where.atKey(Texts.child(pointer, name), message));
      }
    }
    for (RecordComponent component : components) {
      String name = component.getName();
      String child = Texts.child(pointer, name);
      JsonNode value = node.get(name);
      boolean optional = component.isAnnotationPresent(Optional.class);
      Range range = component.getAnnotation(Range.class);
      if (value == null) {
        if (!optional) {
          String expected = range != null ? range.unit() : kind(component.getGenericType());
          problems.add(where.at(pointer,
              "missing required field " + Texts.quote(name) + " (" + expected + ")"));
        }
      } else if (!(value.isNull() && optional)) {
        check(value, component.getGenericType(), child, range);
      }
    }
  }

  private void checkList(JsonNode node, Type element, String pointer) {
    if (!node.isArray()) {
      wrongType(node, pointer, "a list", null);
      return;
    }
    for (int index = 0; index < node.size(); index++) {
      check(node.get(index), element, Texts.child(pointer, index), null);
    }
  }

  private void checkDouble(JsonNode node, String pointer, Range range) {
    if (!node.isNumber()) {
      wrongType(node, pointer, "a number", range);
      return;
    }
    double value = node.doubleValue();
    if (!Double.isFinite(value)) {
      wrongType(node, pointer, "a finite number", range);
      return;
    }
    checkRange(value, node, pointer, range);
  }

  private void checkWhole(JsonNode node, String pointer, Range range, long min, long max) {
    if (!node.isNumber()) {
      wrongType(node, pointer, "a whole number", range);
      return;
    }
    if (!node.isIntegralNumber()) {
      wrongType(node, pointer, "a whole number", range);
      return;
    }
    if (!checkRange(node.doubleValue(), node, pointer, range)) {
      return;
    }
    BigInteger value = node.bigIntegerValue();
    if (value.compareTo(BigInteger.valueOf(min)) < 0
        || value.compareTo(BigInteger.valueOf(max)) > 0) {
      wrongType(node, pointer, "a whole number from " + min + " to " + max, range);
    }
  }

  /** Adds a problem if {@code value} is outside {@code range}; returns whether it is inside. */
  private boolean checkRange(double value, JsonNode node, String pointer, Range range) {
    if (range == null || (value >= range.min() && value <= range.max())) {
      return true;
    }
    problems.add(where.at(pointer, shown(node, pointer) + " is out of range (expected "
        + bounds(range) + ", " + range.unit() + ")"));
    return false;
  }

  private void checkEnum(JsonNode node, Class<?> type, String pointer) {
    List<String> spellings = spellings(type);
    if (!node.isTextual()) {
      wrongType(node, pointer, "one of " + Texts.quotedList(spellings), null);
      return;
    }
    String text = node.textValue();
    if (!spellings.contains(text)) {
      problems.add(where.at(pointer, "found " + Texts.quote(text) + " (expected one of "
          + Texts.quotedList(spellings) + ")" + Texts.didYouMean(text, spellings)));
    }
  }

  private void wrongType(JsonNode node, String pointer, String expected, Range range) {
    String unit = range == null ? "" : ", " + range.unit();
    problems.add(where.at(pointer,
        "found " + shown(node, pointer) + " (expected " + expected + unit + ")"));
  }

  /** The value as the user wrote it, or a description of it for lists, objects and text. */
  private String shown(JsonNode node, String pointer) {
    if (node.isNumber()) {
      String text = raw.get(pointer);
      return text != null ? text : node.asText();
    }
    if (node.isTextual()) {
      return node.textValue().isEmpty() ? "empty text" : "text " + Texts.quote(node.textValue());
    }
    if (node.isObject()) {
      return "an object";
    }
    if (node.isArray()) {
      return "a list";
    }
    return node.asText(); // true, false, null
  }

  /** {@code min <= value <= max}, or the one-sided form if a bound is infinite. */
  static String bounds(Range range) {
    boolean hasMin = range.min() != Double.NEGATIVE_INFINITY;
    boolean hasMax = range.max() != Double.POSITIVE_INFINITY;
    if (hasMin && hasMax) {
      return Texts.number(range.min()) + " <= value <= " + Texts.number(range.max());
    }
    if (hasMin) {
      return "value >= " + Texts.number(range.min());
    }
    return "value <= " + Texts.number(range.max());
  }

  /** What a value of {@code type} looks like, for "missing required field" messages. */
  private static String kind(Type type) {
    if (type instanceof ParameterizedType) {
      return "a list";
    }
    Class<?> c = (Class<?>) type;
    if (c.isRecord()) {
      return "an object";
    }
    if (c == String.class) {
      return "text";
    }
    if (c.isEnum()) {
      return "one of " + Texts.quotedList(spellings(c));
    }
    if (c == double.class || c == Double.class) {
      return "a number";
    }
    if (c == boolean.class || c == Boolean.class) {
      return "true or false";
    }
    return "a whole number";
  }

  /** The spellings of an enum's constants in files: their {@link JsonProperty} names. */
  static List<String> spellings(Class<?> enumType) {
    List<String> names = new ArrayList<>();
    for (Object constant : enumType.getEnumConstants()) {
      String name = ((Enum<?>) constant).name();
      try {
        Field field = enumType.getField(name);
        JsonProperty property = field.getAnnotation(JsonProperty.class);
        names.add(property != null && !property.value().isEmpty() ? property.value() : name);
      } catch (NoSuchFieldException e) {
        throw new IllegalStateException("enum constant without a field: " + name, e);
      }
    }
    return names;
  }

  private static IllegalStateException unsupported(Type type) {
    return new IllegalStateException("scenario records use a type the reader cannot check: "
        + type.getTypeName() + "; add it to TreeChecker");
  }
}
