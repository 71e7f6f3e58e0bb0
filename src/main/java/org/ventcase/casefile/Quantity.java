package org.ventcase.casefile;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

import org.ventcase.units.Dimension;

/**
 * Marks a text field of a case-file record that holds a quantity with its unit ("17.2 barg",
 * "3.2 m"). The structural check uses it to say which unit a bare number lacks; the schema test
 * uses it to check that the schema asks for a number followed by a unit. A {@link Dimension#PRESSURE}
 * field must also say gauge or absolute.
 */
@Retention(RetentionPolicy.RUNTIME)
@Target({ElementType.RECORD_COMPONENT, ElementType.FIELD, ElementType.PARAMETER, ElementType.METHOD})
public @interface Quantity {
    /** The dimension of the quantity. */
    Dimension value();

    /**
     * Other accepted text forms besides a plain quantity, in words (e.g. a level may also be a
     * percentage), or "" when there are none.
     */
    String alsoAccepts() default "";
}
