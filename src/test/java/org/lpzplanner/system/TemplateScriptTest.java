package org.lpzplanner.system;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The Content-Security-Policy allows no inline script or style (script-src 'self'; style-src
 * 'self'), so no template may have an inline script block, an event-handler attribute or a style
 * attribute or element: each would silently stop working in the browser.
 */
class TemplateScriptTest {

    private static final Path TEMPLATES = Path.of("src", "main", "resources", "templates");
    static final Pattern INLINE = Pattern.compile(
            "<script(?![^>]*\\b(th:)?src=)[^>]*>|\\s(th:)?on[a-z]+\\s*=|\\s(th:)?style\\s*=|<style[\\s>]",
            Pattern.CASE_INSENSITIVE);

    @Test
    void templatesHaveNoInlineScriptHandlersOrStyles() throws IOException {
        List<String> problems = new ArrayList<>();
        try (Stream<Path> walk = Files.walk(TEMPLATES)) {
            for (Path file : walk.filter(p -> p.toString().endsWith(".html")).toList()) {
                Matcher m = INLINE.matcher(Files.readString(file));
                while (m.find()) {
                    problems.add(file.getFileName() + ": " + m.group().strip());
                }
            }
        }
        assertThat(problems).as("inline script or style in templates").isEmpty();
    }

    @Test
    void checkFindsEachKind() {
        for (String bad : new String[] {"<script>alert(1)</script>", "<button onclick=\"x()\">",
            "<p th:onclick=\"x\">", "<div style=\"color: red\">", "<style>p{}</style>"}) {
            assertThat(INLINE.matcher(bad).find()).as(bad).isTrue();
        }
        assertThat(INLINE.matcher("<script type=\"module\" th:src=\"@{/js/a.js}\"></script>").find()).isFalse();
    }
}
