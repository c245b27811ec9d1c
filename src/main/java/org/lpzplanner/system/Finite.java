package org.lpzplanner.system;

import jakarta.validation.Constraint;
import jakarta.validation.ConstraintValidator;
import jakarta.validation.ConstraintValidatorContext;
import jakarta.validation.Payload;
import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * A number of a request that must be finite: JSON cannot carry NaN or Infinity, but a number such as
 * {@code 1e999} reads as infinite. Null passes (pair with {@code @NotNull} where a value is required).
 */
@Documented
@Constraint(validatedBy = Finite.Validator.class)
@Target({ElementType.FIELD, ElementType.PARAMETER, ElementType.RECORD_COMPONENT, ElementType.TYPE_USE,
        ElementType.METHOD})
@Retention(RetentionPolicy.RUNTIME)
public @interface Finite {

    String message() default "must be a finite number";

    Class<?>[] groups() default {};

    Class<? extends Payload>[] payload() default {};

    /** Checks {@link Finite}. */
    class Validator implements ConstraintValidator<Finite, Number> {

        @Override
        public boolean isValid(Number value, ConstraintValidatorContext context) {
            return value == null || Double.isFinite(value.doubleValue());
        }
    }
}
