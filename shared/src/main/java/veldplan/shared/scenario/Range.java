package veldplan.shared.scenario;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * Valid range and unit of a numeric scenario field. The scenario reader checks every annotated
 * component against it and reports a violation with the unit, e.g.
 * {@code /park/blocks/2/sandFraction: 1.4 is out of range (expected 0 <= value <= 1, fraction of mass)}.
 *
 * <p>The same annotations feed the field table in {@code examples/README.md}.
 */
@Retention(RetentionPolicy.RUNTIME)
@Target({ElementType.RECORD_COMPONENT, ElementType.PARAMETER, ElementType.FIELD})
public @interface Range {
  /** Smallest valid value, inclusive. */
  double min() default Double.NEGATIVE_INFINITY;

  /** Largest valid value, inclusive. */
  double max() default Double.POSITIVE_INFINITY;

  /** Unit as written in messages and in the field table, e.g. "ha", "mm/yr", "fraction". */
  String unit();
}
