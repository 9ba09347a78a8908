package veldplan.shared.scenario;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamReadException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * First pass over a scenario or policy file: streams the tokens of a JSON or YAML document and
 * builds a {@link JsonNode} tree while recording the line and column of every field name and
 * value by JSON pointer.
 *
 * <p>Building the tree here, rather than with {@code ObjectMapper.readTree}, lets the reader keep
 * going after problems that do not break the document's structure, so that they are reported
 * together with everything else:
 * <ul>
 *   <li>a duplicate field name is reported at the repeated name, and the first value is kept
 *       (Jackson's {@code STRICT_DUPLICATE_DETECTION} would stop at the first duplicate and
 *       place YAML duplicates one character off);</li>
 *   <li>YAML {@code .nan} and {@code .inf}, which Jackson's YAML parser cannot decode, become
 *       NaN and infinite numbers so that the tree check reports them as not finite;</li>
 *   <li>YAML aliases ({@code *name}), which Jackson 2 reads as the alias's name as text, are
 *       reported instead of being silently misread.</li>
 * </ul>
 * Syntax errors end the pass: they are reported with line and column, and there is no tree.
 */
final class DocumentParser {

  /** The two supported syntaxes. */
  enum Format {
    /** JSON (RFC 8259), without comments. */
    JSON,
    /** YAML 1.1 as read by Jackson's YAML module (SnakeYAML). */
    YAML
  }

  /**
   * The result of the pass.
   *
   * @param root     the document, or {@code null} if it could not be read (syntax error, empty)
   * @param where    line and column of every field name and value
   * @param raw      each number's text as written in the file, by pointer
   * @param reported pointers of values already reported here; the tree check skips them
   * @param problems problems found in this pass
   */
  record Result(
      JsonNode root,
      SourceLocations where,
      Map<String, String> raw,
      Set<String> reported,
      List<ScenarioProblem> problems) {}

  private static final JsonFactory JSON_FACTORY = JsonFactory.builder()
      .enable(StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION)
      .build();

  private static final YAMLFactory YAML_FACTORY = YAMLFactory.builder()
      .enable(StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION)
      // "key:" with nothing after it is null (absent), not an empty string.
      .enable(YAMLParser.Feature.EMPTY_STRING_AS_NULL)
      // "yes", "no", "on", "off" stay text; only true and false are booleans.
      .enable(YAMLParser.Feature.PARSE_BOOLEAN_LIKE_WORDS_AS_STRINGS)
      .build();

  /** SnakeYAML's position text, e.g. "in 'reader', line 3, column 2:". */
  private static final Pattern YAML_MARK = Pattern.compile("line (\\d+), column (\\d+)");

  /** YAML 1.1 spellings of NaN. */
  private static final Set<String> YAML_NAN = Set.of(".nan", ".NaN", ".NAN");

  /** YAML 1.1 spellings of infinity, without sign. */
  private static final Set<String> YAML_INF = Set.of(".inf", ".Inf", ".INF");

  private final Path file;
  private final Format format;
  private final SourceLocations where;
  private final Map<String, String> raw = new HashMap<>();
  private final Set<String> reported = new HashSet<>();
  private final List<ScenarioProblem> problems = new ArrayList<>();
  private JsonParser parser;

  private DocumentParser(Path file, Format format) {
    this.file = file;
    this.format = format;
    this.where = SourceLocations.none(file);
  }

  /** The format for a file name ending in .json, .yaml or .yml (any case), else {@code null}. */
  static Format formatOf(Path file) {
    Path name = file.getFileName();
    String lower = name == null ? "" : name.toString().toLowerCase(Locale.ROOT);
    if (lower.endsWith(".json")) {
      return Format.JSON;
    }
    if (lower.endsWith(".yaml") || lower.endsWith(".yml")) {
      return Format.YAML;
    }
    return null;
  }

  /** Parses {@code bytes}, the content of {@code file}, as {@code format}. */
  static Result parse(Path file, byte[] bytes, Format format) {
    return new DocumentParser(file, format).run(bytes);
  }

  private Result run(byte[] bytes) {
    JsonNode root = null;
    JsonFactory factory = format == Format.JSON ? JSON_FACTORY : YAML_FACTORY;
    try (JsonParser p = factory.createParser(bytes)) {
      parser = p;
      if (p.nextToken() == null) {
        problems.add(new ScenarioProblem(file, 1, 1, "",
            "the file is empty (expected an object with the fields of the document)"));
      } else {
        root = value("", true);
        if (p.nextToken() != null) {
          JsonLocation at = p.currentTokenLocation();
          problems.add(new ScenarioProblem(file, line(at), column(at), "",
              "found more content after the end of the document (expected a single "
                  + (format == Format.JSON ? "JSON value" : "YAML document") + ")"));
        }
      }
    } catch (StreamReadException e) {
      problems.add(syntaxProblem(e));
      root = null;
    } catch (IOException e) {
      problems.add(ScenarioProblem.ofFile(file, "cannot parse the file: " + e.getMessage()));
      root = null;
    }
    return new Result(root, where, Map.copyOf(raw), Set.copyOf(reported),
        List.copyOf(problems));
  }

  /**
   * Reads the value whose first token is the current token, and everything inside it.
   *
   * @param pointer JSON pointer of the value
   * @param record  false inside a duplicate field's value, which is read only to skip it
   */
  private JsonNode value(String pointer, boolean record) throws IOException {
    JsonParser p = parser;
    JsonNodeFactory nodes = JsonNodeFactory.instance;
    JsonLocation at = p.currentTokenLocation();
    if (record) {
      where.putValue(pointer, line(at), column(at));
    }
    if (p instanceof YAMLParser && ((YAMLParser) p).isCurrentAlias()) {
      report(pointer, record, at, "found the YAML alias *" + p.getText()
          + " (aliases are not supported; write the value out in full)");
      return nodes.nullNode();
    }
    JsonToken token = p.currentToken();
    switch (token) {
      case START_OBJECT:
        return object(pointer, record);
      case START_ARRAY: {
        ArrayNode list = nodes.arrayNode();
        int index = 0;
        while (p.nextToken() != JsonToken.END_ARRAY) {
          list.add(value(Texts.child(pointer, index), record));
          index++;
        }
        return list;
      }
      case VALUE_STRING:
        return nodes.textNode(p.getText());
      case VALUE_NUMBER_INT:
      case VALUE_NUMBER_FLOAT:
        return number(pointer, record, at);
      case VALUE_TRUE:
        return nodes.booleanNode(true);
      case VALUE_FALSE:
        return nodes.booleanNode(false);
      case VALUE_NULL:
        return nodes.nullNode();
      default:
        // VALUE_EMBEDDED_OBJECT: YAML !!binary and similar tagged values.
        report(pointer, record, at, "found a value of an unsupported YAML type (expected text, "
            + "a number, true or false, a list or an object)");
        return nodes.nullNode();
    }
  }

  private ObjectNode object(String pointer, boolean record) throws IOException {
    JsonParser p = parser;
    ObjectNode object = JsonNodeFactory.instance.objectNode();
    while (p.nextToken() == JsonToken.FIELD_NAME) {
      String name = p.currentName();
      String child = Texts.child(pointer, name);
      JsonLocation at = p.currentTokenLocation();
      boolean duplicate = object.has(name);
      if (duplicate && record) {
        ScenarioProblem first = where.atKey(child, "");
        String firstLine = first.line() > 0 ? " (first given on line " + first.line() + ")" : "";
        problems.add(new ScenarioProblem(file, line(at), column(at), child,
            "duplicate field " + Texts.quote(name) + firstLine
                + "; give each field once"));
      } else if (record) {
        where.putKey(child, line(at), column(at));
      }
      p.nextToken();
      JsonNode value = value(child, record && !duplicate);
      if (!duplicate) {
        object.set(name, value);
      }
    }
    return object;
  }

  private JsonNode number(String pointer, boolean record, JsonLocation at) throws IOException {
    JsonParser p = parser;
    JsonNodeFactory nodes = JsonNodeFactory.instance;
    String text = p.getText();
    if (record) {
      raw.put(pointer, text);
    }
    try {
      switch (p.getNumberType()) {
        case INT:
          return nodes.numberNode(p.getIntValue());
        case LONG:
          return nodes.numberNode(p.getLongValue());
        case BIG_INTEGER:
          return nodes.numberNode(p.getBigIntegerValue());
        case BIG_DECIMAL:
          return nodes.numberNode(p.getDecimalValue());
        default:
          return nodes.numberNode(p.getDoubleValue());
      }
    } catch (StreamReadException e) {
      String unsigned = text.startsWith("+") || text.startsWith("-") ? text.substring(1) : text;
      if (YAML_NAN.contains(text)) {
        return nodes.numberNode(Double.NaN);
      }
      if (YAML_INF.contains(unsigned)) {
        return nodes.numberNode(
            text.startsWith("-") ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY);
      }
      report(pointer, record, at, "found " + text + " (expected a number)");
      return nodes.nullNode();
    }
  }

  private void report(String pointer, boolean record, JsonLocation at, String message) {
    if (record) {
      problems.add(new ScenarioProblem(file, line(at), column(at), pointer, message));
      reported.add(pointer);
    }
  }

  /** A syntax error, with the place SnakeYAML or Jackson gives and a one-line message. */
  private ScenarioProblem syntaxProblem(StreamReadException e) {
    JsonLocation at = e.getLocation();
    int line = line(at);
    int column = column(at);
    String original = e.getOriginalMessage() == null ? "" : e.getOriginalMessage();
    String message;
    if (format == Format.YAML) {
      // SnakeYAML's text: context, position, source line, caret, problem, position, ...
      // Keep the descriptive lines; take the place from the last position (the problem's).
      StringBuilder text = new StringBuilder();
      for (String part : original.split("\\R")) {
        String trimmed = part.trim();
        if (trimmed.isEmpty() || part.startsWith("  ") || part.startsWith("\t")
            || trimmed.startsWith("in '")) {
          continue;
        }
        if (text.length() > 0) {
          text.append(": ");
        }
        text.append(trimmed);
      }
      Matcher mark = YAML_MARK.matcher(original);
      while (mark.find()) {
        line = Integer.parseInt(mark.group(1));
        column = Integer.parseInt(mark.group(2));
      }
      message = "invalid YAML: " + (text.length() > 0 ? text : original.trim());
    } else {
      message = "invalid JSON: " + original.replaceAll("\\s*\\R\\s*", " ").trim();
    }
    return new ScenarioProblem(file, line, column, "", message);
  }

  private static int line(JsonLocation at) {
    return at == null ? 0 : Math.max(0, at.getLineNr());
  }

  private static int column(JsonLocation at) {
    return at == null ? 0 : Math.max(0, at.getColumnNr());
  }
}
