package org.lpzplanner.accounts;

import java.util.Locale;
import org.springframework.security.core.userdetails.UserDetails;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.core.userdetails.UsernameNotFoundException;

/** Loads an account by e-mail (case-insensitive) for password sign-in. */
class AccountDetailsService implements UserDetailsService {

    private final AccountRepository accounts;

    AccountDetailsService(AccountRepository accounts) {
        this.accounts = accounts;
    }

    @Override
    public UserDetails loadUserByUsername(String email) {
        String key = email == null ? "" : email.strip().toLowerCase(Locale.ROOT);
        return accounts.findByEmail(key).map(SignedInAccount::new)
                .orElseThrow(() -> new UsernameNotFoundException("no such account"));
    }
}
