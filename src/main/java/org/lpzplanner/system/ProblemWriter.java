package org.lpzplanner.system;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.net.URI;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;
import org.springframework.stereotype.Component;
import tools.jackson.databind.json.JsonMapper;

/**
 * Writes a problem detail ({@link ApiProblem}) straight to a response, for refusals made before a
 * controller is chosen (sign-in and access checks of the JSON API), so that they look like every
 * other error answer of the API.
 */
@Component
public class ProblemWriter {

    private final JsonMapper json;

    public ProblemWriter(JsonMapper json) {
        this.json = json;
    }

    /** Writes {@code problem} with its status as {@code application/problem+json}; {@code field} if not null. */
    public void write(HttpServletRequest request, HttpServletResponse response, ProblemDetail problem, String field)
            throws IOException {
        problem.setInstance(URI.create(request.getRequestURI()));
        if (field != null) {
            problem.setProperty("field", field);
        }
        response.setStatus(problem.getStatus());
        response.setContentType(MediaType.APPLICATION_PROBLEM_JSON_VALUE);
        response.setCharacterEncoding("UTF-8");
        response.getOutputStream().write(json.writeValueAsBytes(problem));
    }
}
