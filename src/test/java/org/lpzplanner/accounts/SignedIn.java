package org.lpzplanner.accounts;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Inherited;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.springframework.context.annotation.Import;
import org.springframework.security.test.context.support.WithSecurityContext;

/**
 * Runs a test class (or method) signed in as a real stored account, created on first use with
 * {@link TestAccounts#PASSWORD}: service calls on the test thread act for its team, MockMvc
 * requests are signed in and carry a CSRF token, and browser tests sign in with it
 * ({@code BrowserTestBase}). One line for any test class:
 *
 * <pre>{@code @SpringBootTest @AutoConfigureMockMvc @SignedIn class MyPagesTest { ... }}</pre>
 *
 * A method may override the class's account, e.g. {@code @SignedIn(role = Role.REVIEWER)}.
 */
@Target({ElementType.TYPE, ElementType.METHOD})
@Retention(RetentionPolicy.RUNTIME)
@Inherited
@Documented
@WithSecurityContext(factory = SignedInContextFactory.class)
@Import(CsrfOnEveryRequest.class)
public @interface SignedIn {

    /** The account's role; designers may do everything a test of site editing needs. */
    Role role() default Role.DESIGNER;

    /** The team's name; blank for the default team (the team of the demo sites). */
    String team() default "";

    /** The account's e-mail; blank for {@code <role>@<team>.test}. */
    String email() default "";
}
