package org.lpzplanner.accounts;

import org.springframework.security.authentication.AuthenticationProvider;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.AuthenticationException;
import org.springframework.security.web.authentication.WebAuthenticationDetails;

/**
 * Password sign-in behind the {@link SignInThrottle}: every attempt is counted as failed before its
 * password is checked (a locked account is refused right there, unchecked), a failure is recorded
 * against the client address, a success takes the count back and clears the account's failures.
 */
class ThrottledAuthenticationProvider implements AuthenticationProvider {

    private final AuthenticationProvider passwords;
    private final SignInThrottle throttle;

    ThrottledAuthenticationProvider(AuthenticationProvider passwords, SignInThrottle throttle) {
        this.passwords = passwords;
        this.throttle = throttle;
    }

    @Override
    public Authentication authenticate(Authentication authentication) throws AuthenticationException {
        String email = authentication.getName();
        String address = authentication.getDetails() instanceof WebAuthenticationDetails d ? d.getRemoteAddress() : null;
        throttle.reserve(email, address);
        try {
            Authentication result = passwords.authenticate(authentication);
            throttle.succeeded(email, address);
            return result;
        } catch (AuthenticationException e) {
            throttle.failed(email, address);
            throw e;
        }
    }

    @Override
    public boolean supports(Class<?> authentication) {
        return UsernamePasswordAuthenticationToken.class.isAssignableFrom(authentication);
    }
}
