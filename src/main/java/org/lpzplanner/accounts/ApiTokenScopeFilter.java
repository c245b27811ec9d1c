package org.lpzplanner.accounts;

import jakarta.servlet.DispatcherType;
import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import org.lpzplanner.system.ApiProblem;
import org.lpzplanner.system.ProblemWriter;
import org.springframework.web.filter.OncePerRequestFilter;

/**
 * Keeps API tokens to the JSON API and away from sessions. The first filter of the security chain:
 * a request that carries {@code Authorization: Bearer …} to any address outside {@code /api/} (a
 * page, a page's form, the sign-in and sign-out addresses, static files) is refused with 403 (a
 * problem detail, as the API's refusals) before anything else reads it, whether the token is valid or not; pages need a signed-in session and
 * its CSRF token. A token request to the API goes on as a {@link SessionlessRequest}, so nothing
 * it does, down to the error page the container may render for it, opens a session.
 */
class ApiTokenScopeFilter extends OncePerRequestFilter {

    static final String OUTSIDE_API = "an API token (Authorization: Bearer) works only for the JSON API under"
            + " /api/; pages and their forms need you to sign in with your password on /login";

    private final ProblemWriter problems;

    ApiTokenScopeFilter(ProblemWriter problems) {
        this.problems = problems;
    }

    /** Whether the request addresses the JSON API. */
    static boolean isApi(HttpServletRequest request) {
        return request.getRequestURI().startsWith(request.getContextPath() + "/api/");
    }

    @Override
    protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
            throws ServletException, IOException {
        if (!BearerTokenFilter.hasBearer(request)) {
            chain.doFilter(request, response);
            return;
        }
        // the container's own error page for an API request is reached by an error dispatch: let it through
        if (request.getDispatcherType() == DispatcherType.REQUEST && !isApi(request)) {
            problems.write(request, response, ApiProblem.FORBIDDEN.with(OUTSIDE_API), "Authorization");
            return;
        }
        chain.doFilter(new SessionlessRequest(request), response);
    }

    /** Error dispatches of token requests must stay without a session too. */
    @Override
    protected boolean shouldNotFilterErrorDispatch() {
        return false;
    }
}
