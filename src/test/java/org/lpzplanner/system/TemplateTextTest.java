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

/** Every visible word of the pages comes from messages.properties, none is written into a template. */
class TemplateTextTest {

    private static final Path TEMPLATES = Path.of("src", "main", "resources", "templates");
    private static final Pattern COMMENT = Pattern.compile("<!--.*?-->", Pattern.DOTALL);
    private static final Pattern TAG = Pattern.compile("<[^>]*>", Pattern.DOTALL);
    private static final Pattern TEXT_ATTRIBUTE = Pattern.compile(
            "(?<![:\\w-])(title|alt|placeholder|aria-label|label)\\s*=\\s*\"[^\"]*\\p{L}");

    @Test
    void templatesContainNoHardCodedText() throws IOException {
        List<String> problems = new ArrayList<>();
        List<Path> files;
        try (Stream<Path> walk = Files.walk(TEMPLATES)) {
            files = walk.filter(p -> p.toString().endsWith(".html")).toList();
        }
        assertThat(files).isNotEmpty();
        for (Path file : files) {
            String html = COMMENT.matcher(Files.readString(file)).replaceAll(" ");
            for (String text : TAG.split(html)) {
                if (text.codePoints().anyMatch(Character::isLetterOrDigit)) {
                    problems.add(file.getFileName() + ": text \"" + text.strip() + "\"");
                }
            }
            Matcher attribute = TEXT_ATTRIBUTE.matcher(html);
            while (attribute.find()) {
                problems.add(file.getFileName() + ": attribute " + attribute.group());
            }
        }
        assertThat(problems).as("hard-coded text in templates").isEmpty();
    }

    @Test
    void checkFindsHardCodedText() {
        String html = "<p>Hello</p><img alt=\"a plan\"><span th:title=\"#{x}\"></span>";
        assertThat(TAG.split(html)).anyMatch(t -> t.contains("Hello"));
        Matcher attribute = TEXT_ATTRIBUTE.matcher(html);
        assertThat(attribute.find()).isTrue();
        assertThat(attribute.group()).startsWith("alt");
        assertThat(attribute.find()).isFalse();
    }
}
