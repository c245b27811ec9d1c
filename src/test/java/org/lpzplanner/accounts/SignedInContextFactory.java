package org.lpzplanner.accounts;

import java.util.Locale;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.context.SecurityContext;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.test.context.support.WithSecurityContextFactory;

/** Finds or creates the account a {@link SignedIn} test runs as, and signs it in. */
class SignedInContextFactory implements WithSecurityContextFactory<SignedIn> {

    private final TestAccounts accounts;

    SignedInContextFactory(AccountService accounts, AccountRepository repository) {
        this.accounts = new TestAccounts(accounts, repository);
    }

    @Override
    public SecurityContext createSecurityContext(SignedIn annotation) {
        SignedInAccount principal = new SignedInAccount(accounts.account(annotation.role(), annotation.team(),
                annotation.email()));
        principal.eraseCredentials();
        SecurityContext context = SecurityContextHolder.createEmptyContext();
        context.setAuthentication(UsernamePasswordAuthenticationToken.authenticated(principal, null,
                principal.getAuthorities()));
        return context;
    }

    static String defaultEmail(Role role, String team) {
        String t = team == null || team.isBlank() ? "default" : team.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]", "");
        return role.name().toLowerCase(Locale.ROOT) + "@" + t + ".test";
    }
}
