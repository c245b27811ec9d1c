package org.lpzplanner.accounts;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.util.Optional;
import org.lpzplanner.system.ApiProblem;
import org.lpzplanner.system.ProblemWriter;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.context.SecurityContext;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.web.filter.OncePerRequestFilter;

/**
 * Signs in an API request that carries {@code Authorization: Bearer <token>}, for that request
 * only: {@link ApiTokenScopeFilter} has already refused such requests outside {@code /api/} and
 * hidden every session from them. A wrong token answers 401 at once rather than falling back to a
 * session.
 */
class BearerTokenFilter extends OncePerRequestFilter {

    private final ApiTokenService tokens;
    private final ProblemWriter problems;

    BearerTokenFilter(ApiTokenService tokens, ProblemWriter problems) {
        this.tokens = tokens;
        this.problems = problems;
    }

    /** Whether the request authenticates with a bearer token (such requests need no CSRF token). */
    static boolean hasBearer(HttpServletRequest request) {
        String header = request.getHeader("Authorization");
        return header != null && header.regionMatches(true, 0, "Bearer ", 0, 7);
    }

    @Override
    protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
            throws ServletException, IOException {
        if (!hasBearer(request)) {
            chain.doFilter(request, response);
            return;
        }
        Optional<SignedInAccount> account = tokens.authenticate(request.getHeader("Authorization").substring(7).strip());
        if (account.isEmpty()) {
            response.setHeader("WWW-Authenticate", "Bearer error=\"invalid_token\"");
            problems.write(request, response, ApiProblem.UNAUTHORIZED.with("the API token is unknown, revoked or its"
                    + " account disabled"), "Authorization");
            return;
        }
        SecurityContext context = SecurityContextHolder.createEmptyContext();
        context.setAuthentication(UsernamePasswordAuthenticationToken.authenticated(account.get(), null,
                account.get().getAuthorities()));
        SecurityContextHolder.setContext(context);
        try {
            chain.doFilter(request, response);
        } finally {
            SecurityContextHolder.clearContext();
        }
    }
}
