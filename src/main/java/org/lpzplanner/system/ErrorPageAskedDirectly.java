package org.lpzplanner.system;

import jakarta.servlet.DispatcherType;
import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;
import org.springframework.web.filter.OncePerRequestFilter;

/**
 * The error page ({@code server.error.path}, {@code /error}) shows the container's errors. Asked
 * for directly it has no error to show, and would answer 500 as if the app had failed: it answers
 * 404 instead, with the page that says the address does not exist.
 */
@Component
public class ErrorPageAskedDirectly extends OncePerRequestFilter {

    private final String errorPath;

    public ErrorPageAskedDirectly(@Value("${server.error.path:/error}") String errorPath) {
        this.errorPath = errorPath;
    }

    @Override
    protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
            throws ServletException, IOException {
        if (request.getDispatcherType() == DispatcherType.REQUEST
                && request.getRequestURI().equals(request.getContextPath() + errorPath)) {
            response.sendError(HttpServletResponse.SC_NOT_FOUND);
            return;
        }
        chain.doFilter(request, response);
    }
}
