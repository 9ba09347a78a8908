package veldplan.shared.scenario;

import java.math.BigDecimal;
import java.util.Collection;
import java.util.Locale;

/** Small text helpers for problem messages: pointers, quoting, numbers and "did you mean". */
final class Texts {

  /** Longest text value quoted in full in a message; longer ones are cut. */
  private static final int MAX_QUOTED = 40;

  private Texts() {}

  /** The JSON pointer of field {@code name} inside the object at {@code parent} (RFC 6901). */
  static String child(String parent, String name) {
    return parent + "/" + name.replace("~", "~0").replace("/", "~1");
  }

  /** The JSON pointer of element {@code index} of the list at {@code parent}. */
  static String child(String parent, int index) {
    return parent + "/" + index;
  }

  /** {@code text} in double quotes, with quotes, backslashes and control characters escaped. */
  static String quote(String text) {
    String shown = text.length() > MAX_QUOTED ? text.substring(0, MAX_QUOTED) + "..." : text;
    StringBuilder out = new StringBuilder(shown.length() + 2).append('"');
    for (int i = 0; i < shown.length(); i++) {
      char c = shown.charAt(i);
      if (c == '"' || c == '\\') {
        out.append('\\').append(c);
      } else if (c < 0x20) {
        out.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
      } else {
        out.append(c);
      }
    }
    return out.append('"').toString();
  }

  /** A bound of a range as a person would write it: 0, 1, 0.1, 10000000, -40. */
  static String number(double value) {
    if (Double.isNaN(value) || Double.isInfinite(value)) {
      return Double.toString(value);
    }
    return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
  }

  /** The names quoted and separated by commas: {@code "a", "b", "c"}. */
  static String quotedList(Collection<String> names) {
    StringBuilder out = new StringBuilder();
    for (String name : names) {
      if (out.length() > 0) {
        out.append(", ");
      }
      out.append(quote(name));
    }
    return out.toString();
  }

  /**
   * The candidate closest to {@code input} by edit distance (optimal string alignment, ignoring
   * case), or {@code null} if none is close enough to be a likely typo: at most 2 edits, or a
   * third of the input's length for longer names. Failing that, the one candidate that starts
   * with an input of at least 3 characters ("early" for "early-dry"), if exactly one does.
   */
  static String closest(String input, Collection<String> candidates) {
    String lower = input.toLowerCase(Locale.ROOT);
    int limit = Math.max(2, input.length() / 3);
    String best = null;
    int bestDistance = Integer.MAX_VALUE;
    for (String candidate : candidates) {
      int distance = editDistance(lower, candidate.toLowerCase(Locale.ROOT));
      if (distance < bestDistance) {
        best = candidate;
        bestDistance = distance;
      }
    }
    if (bestDistance <= limit) {
      return best;
    }
    String prefixed = null;
    if (lower.length() >= 3) {
      for (String candidate : candidates) {
        if (candidate.toLowerCase(Locale.ROOT).startsWith(lower)) {
          if (prefixed != null) {
            return null;
          }
          prefixed = candidate;
        }
      }
    }
    return prefixed;
  }

  /** {@code "; did you mean \"x\"?"} for the closest candidate, or {@code ""} if none is close. */
  static String didYouMean(String input, Collection<String> candidates) {
    String closest = closest(input, candidates);
    return closest == null ? "" : "; did you mean " + quote(closest) + "?";
  }

  /**
   * Optimal string alignment distance: insertions, deletions, substitutions and transpositions
   * of two neighbouring characters each cost 1, so "sandFractoin" is 1 from "sandFraction".
   */
  static int editDistance(String a, String b) {
    int[][] d = new int[a.length() + 1][b.length() + 1];
    for (int i = 0; i <= a.length(); i++) {
      d[i][0] = i;
    }
    for (int j = 0; j <= b.length(); j++) {
      d[0][j] = j;
    }
    for (int i = 1; i <= a.length(); i++) {
      for (int j = 1; j <= b.length(); j++) {
        int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
        int best = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
        if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2)
            && a.charAt(i - 2) == b.charAt(j - 1)) {
          best = Math.min(best, d[i - 2][j - 2] + 1);
        }
        d[i][j] = best;
      }
    }
    return d[a.length()][b.length()];
  }
}
