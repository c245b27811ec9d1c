package org.lpzplanner.accounts;

import java.io.Serializable;
import java.util.Collection;
import java.util.List;
import org.springframework.security.core.CredentialsContainer;
import org.springframework.security.core.GrantedAuthority;
import org.springframework.security.core.authority.SimpleGrantedAuthority;
import org.springframework.security.core.userdetails.UserDetails;

/**
 * The principal of a signed-in request: who it is, the role and the team. Kept in the shared
 * session store, so it is small and serializable; the password hash is erased after sign-in.
 */
public final class SignedInAccount implements UserDetails, CredentialsContainer, Serializable {

    private static final long serialVersionUID = 1L;

    private final long accountId;
    private final String email;
    private final String displayName;
    private final Role role;
    private final long teamId;
    private final boolean enabled;
    private String passwordHash;

    public SignedInAccount(Account account) {
        this(account.id(), account.email(), account.displayName(), account.role(), account.teamId(),
                account.enabled(), account.passwordHash());
    }

    public SignedInAccount(long accountId, String email, String displayName, Role role, long teamId,
            boolean enabled, String passwordHash) {
        this.accountId = accountId;
        this.email = email;
        this.displayName = displayName;
        this.role = role;
        this.teamId = teamId;
        this.enabled = enabled;
        this.passwordHash = passwordHash;
    }

    public long accountId() {
        return accountId;
    }

    public String email() {
        return email;
    }

    public String displayName() {
        return displayName;
    }

    public Role role() {
        return role;
    }

    public long teamId() {
        return teamId;
    }

    @Override
    public Collection<? extends GrantedAuthority> getAuthorities() {
        return List.of(new SimpleGrantedAuthority(role.authority()));
    }

    @Override
    public String getPassword() {
        return passwordHash;
    }

    @Override
    public String getUsername() {
        return email;
    }

    @Override
    public boolean isEnabled() {
        return enabled;
    }

    @Override
    public void eraseCredentials() {
        passwordHash = null;
    }
}
