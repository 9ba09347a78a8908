package veldplan.optimiser.report;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLGenerator;
import java.util.List;
import veldplan.shared.scenario.Policy;

/**
 * A policy as a policy file (the schema {@code simulate --policy} reads), in YAML, with comment
 * lines at the top.
 */
public final class PolicyFile {
  private static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory()
      .disable(YAMLGenerator.Feature.WRITE_DOC_START_MARKER)
      .enable(YAMLGenerator.Feature.MINIMIZE_QUOTES))
      .setSerializationInclusion(JsonInclude.Include.NON_NULL);

  private PolicyFile() {}

  /**
   * The file's text.
   *
   * @param policy   the policy
   * @param comments lines written as YAML comments before it (without "# ")
   */
  public static String yaml(Policy policy, List<String> comments) {
    StringBuilder text = new StringBuilder();
    for (String comment : comments) {
      for (String line : comment.split("\\R")) {
        text.append(line.isEmpty() ? "#" : "# " + line).append('\n');
      }
    }
    try {
      return text.append(YAML.writeValueAsString(policy)).toString();
    } catch (JsonProcessingException e) {
      throw new IllegalStateException("a policy could not be written as YAML", e);
    }
  }
}
