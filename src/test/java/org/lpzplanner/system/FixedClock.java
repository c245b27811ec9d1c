package org.lpzplanner.system;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import java.time.Instant;
import org.junit.jupiter.api.extension.AfterEachCallback;
import org.junit.jupiter.api.extension.BeforeEachCallback;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.extension.ExtensionContext;
import org.junit.platform.commons.support.AnnotationSupport;

/**
 * The app's clock stands still at {@link #value()} while the marked test (or each test of the
 * marked class) runs: what it prints with a time prints the same time every time.
 */
@Retention(RetentionPolicy.RUNTIME)
@Target({ElementType.TYPE, ElementType.METHOD})
@ExtendWith(FixedClock.Extension.class)
public @interface FixedClock {

    /** An ISO-8601 instant, for example {@code 2026-03-14T09:30:00Z}. */
    String value();

    /** Fixes {@link TestClock} before each test and releases it after. */
    final class Extension implements BeforeEachCallback, AfterEachCallback {

        @Override
        public void beforeEach(ExtensionContext context) {
            FixedClock fixed = AnnotationSupport.findAnnotation(context.getRequiredTestMethod(), FixedClock.class)
                    .or(() -> AnnotationSupport.findAnnotation(context.getRequiredTestClass(), FixedClock.class))
                    .orElseThrow();
            TestClock.fixAt(Instant.parse(fixed.value()));
        }

        @Override
        public void afterEach(ExtensionContext context) {
            TestClock.release();
        }
    }
}
