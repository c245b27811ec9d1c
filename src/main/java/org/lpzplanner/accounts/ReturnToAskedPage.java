package org.lpzplanner.accounts;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.net.URI;
import org.springframework.security.core.Authentication;
import org.springframework.security.web.DefaultRedirectStrategy;
import org.springframework.security.web.RedirectStrategy;
import org.springframework.security.web.authentication.AuthenticationSuccessHandler;
import org.springframework.security.web.savedrequest.RequestCache;
import org.springframework.security.web.savedrequest.SavedRequest;

/**
 * After signing in, back to the page that was asked for before (a GET of it), or else to the site
 * list. The target is the saved request's path and query only: the full address Spring Security
 * saves is built from the request's {@code Host} header, which a client may forge.
 */
final class ReturnToAskedPage implements AuthenticationSuccessHandler {

    private final RequestCache requests;
    private final RedirectStrategy redirects = new DefaultRedirectStrategy();

    ReturnToAskedPage(RequestCache requests) {
        this.requests = requests;
    }

    @Override
    public void onAuthenticationSuccess(HttpServletRequest request, HttpServletResponse response,
            Authentication authentication) throws IOException {
        SavedRequest saved = requests.getRequest(request, response);
        requests.removeRequest(request, response);
        redirects.sendRedirect(request, response, target(saved));
    }

    /** The saved request's path and query when it was a GET of a local path; the site list otherwise. */
    static String target(SavedRequest saved) {
        if (saved == null || !"GET".equals(saved.getMethod())) {
            return "/";
        }
        URI asked;
        try {
            asked = URI.create(saved.getRedirectUrl());
        } catch (IllegalArgumentException e) {
            return "/";
        }
        String path = asked.getRawPath();
        if (path == null || !path.startsWith("/") || path.startsWith("//") || path.contains("\\")) {
            return "/";
        }
        // Spring Security marks the saved address with "continue"; the page itself does not need it
        String query = asked.getRawQuery() == null ? null
                : asked.getRawQuery().replaceAll("(^|&)continue(=[^&]*)?(?=&|$)", "").replaceFirst("^&", "");
        return query == null || query.isEmpty() ? path : path + "?" + query;
    }
}
