package veldplan.shared.scenario;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * Marks a scenario field that may be left out. Every field without this annotation is required:
 * the reader reports a missing one instead of letting Jackson fill in 0 or null. An optional
 * field that is absent is {@code null} in the record; its meaning when absent is documented on
 * the component (for example "no planned burning").
 */
@Retention(RetentionPolicy.RUNTIME)
@Target({ElementType.RECORD_COMPONENT, ElementType.PARAMETER, ElementType.FIELD})
public @interface Optional {}
