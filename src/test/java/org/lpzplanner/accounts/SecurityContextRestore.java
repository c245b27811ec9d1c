package org.lpzplanner.accounts;

import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.test.context.TestSecurityContextHolder;

/** Gives the test thread its signed-in account back after a MockMvc request cleared it. */
final class SecurityContextRestore {

    private SecurityContextRestore() {
    }

    static void restore() {
        SecurityContextHolder.setContext(TestSecurityContextHolder.getContext());
    }
}
