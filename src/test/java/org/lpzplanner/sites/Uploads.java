package org.lpzplanner.sites;

import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import org.lpzplanner.engine.io.Json;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;

/** Uploading a site file in MockMvc tests, through the API or the page form, as a user would. */
public final class Uploads {

    private Uploads() {
    }

    /** A GeoJSON text as the {@code file} part of an upload. */
    public static MockMultipartFile geoJson(String fileName, String text) {
        return new MockMultipartFile("file", fileName, "application/geo+json", text.getBytes(StandardCharsets.UTF_8));
    }

    /** {@code POST /api/sites} at the level (201 expected); the new site's id. */
    public static long throughApi(MockMvc mvc, MockMultipartFile file, String level) throws Exception {
        String body = mvc.perform(multipart("/api/sites").file(file).param("level", level))
                .andExpect(status().isCreated()).andReturn().getResponse().getContentAsString();
        return Json.MAPPER.readTree(body).path("id").asLong();
    }

    /** {@code POST /sites}, the page's upload form (a redirect to the plan expected); the new site's id. */
    public static long throughPage(MockMvc mvc, MockMultipartFile file, String name, String level) throws Exception {
        String location = mvc.perform(multipart("/sites").file(file).param("name", name).param("level", level))
                .andExpect(status().is3xxRedirection()).andReturn().getResponse().getRedirectedUrl();
        return Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
    }
}
