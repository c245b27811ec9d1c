package org.lpzplanner.system;

import org.lpzplanner.accounts.SignedIn;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The OpenAPI document at {@code /api/docs} (OpenAPI Specification 3.x: {@code paths}, operations
 * by HTTP method, {@code responses} by status code, {@code requestBody}, {@code components/schemas})
 * describes the main endpoints with their error answers, and the browsable page is served. Error
 * answers are problem details of RFC 9457 (section 3: members {@code type}, {@code title},
 * {@code status}, {@code detail}, {@code instance}; section 6.1: media type
 * {@code application/problem+json}); request bodies are described by the records the API reads.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class ApiDocsTest {

    @Autowired
    MockMvc mvc;

    private JsonNode document() throws Exception {
        String body = mvc.perform(get("/api/docs")).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
        return JsonMapper.builder().build().readTree(body);
    }

    /** Asserts that the operation exists and lists exactly these status codes, errors with the Problem body. */
    private static void hasResponses(JsonNode doc, String path, String method, List<String> codes) {
        JsonNode operation = doc.path("paths").path(path).path(method);
        assertThat(operation.isObject()).as(method + " " + path).isTrue();
        assertThat(operation.path("summary").asString()).as("summary of " + method + " " + path).isNotBlank();
        JsonNode responses = operation.path("responses");
        assertThat(responses.propertyNames()).as("responses of " + method + " " + path)
                .containsExactlyInAnyOrderElementsOf(codes);
        for (String code : codes) {
            if (code.startsWith("4") || code.startsWith("5")) {
                assertThat(responses.path(code).path("description").asString()).isNotBlank();
                assertThat(responses.path(code).path("content").propertyNames()).as(code + " of " + method + " "
                        + path).containsExactly("application/problem+json");
                assertThat(responses.path(code).path("content").path("application/problem+json").path("schema")
                        .path("$ref").asString()).as(code + " of " + method + " " + path)
                        .isEqualTo("#/components/schemas/Problem");
            }
        }
    }

    private static String requestSchema(JsonNode doc, String path, String method) {
        return doc.path("paths").path(path).path(method).path("requestBody").path("content")
                .path("application/json").path("schema").path("$ref").asString();
    }

    @Test
    void documentListsTheMainEndpointsWithTheirErrorAnswers() throws Exception {
        JsonNode doc = document();

        assertThat(doc.path("openapi").asString()).startsWith("3.");
        assertThat(doc.path("info").path("title").asString()).isEqualTo("LPZ Planner API");
        assertThat(doc.path("info").path("description").asString()).contains("licensed");
        hasResponses(doc, "/api/sites", "get", List.of("200"));
        hasResponses(doc, "/api/sites", "post", List.of("201", "400", "413"));
        hasResponses(doc, "/api/sites/{siteId}/analyses", "post", List.of("201", "202", "400", "404", "429", "503"));
        hasResponses(doc, "/api/sites/{siteId}/analyses/jobs/{jobId}", "get", List.of("200", "404"));
        hasResponses(doc, "/api/sites/{siteId}/analyses/jobs/{jobId}", "delete", List.of("200", "404"));
        hasResponses(doc, "/api/sites/{id}/conductors", "post", List.of("201", "400", "404", "409", "413"));
        hasResponses(doc, "/api/sites/{id}/conductors/{conductorId}", "delete", List.of("200", "400", "404", "409"));
        hasResponses(doc, "/api/sites/{id}/conductors/{conductorId}", "put", List.of("200", "400", "404", "409", "413"));
        hasResponses(doc, "/api/sites/{id}", "get", List.of("200", "400", "404"));
        hasResponses(doc, "/api/sites/{id}", "patch", List.of("200", "400", "404", "409", "413"));
        hasResponses(doc, "/api/sites/{id}", "delete", List.of("204", "404", "409"));
        hasResponses(doc, "/api/sites/{siteId}/analyses/latest", "get", List.of("200", "404"));
        hasResponses(doc, "/api/sites/{siteId}/analyses/latest/items", "get", List.of("200", "404"));
        hasResponses(doc, "/api/sites/{siteId}/analyses/latest/accepted", "post", List.of("200", "400", "404", "413"));
        hasResponses(doc, "/api/sites/{id}/rods", "post", List.of("201", "400", "404", "409", "413"));
        hasResponses(doc, "/api/sites/{id}/rods/{rodId}", "put", List.of("200", "400", "404", "409", "413"));
        hasResponses(doc, "/api/sites/{id}/risk", "get", List.of("200", "400", "404"));
        hasResponses(doc, "/api/sites/{id}/risk", "put", List.of("200", "400", "404", "413"));
        hasResponses(doc, "/api/sites/{id}/keep-out-areas", "get", List.of("200", "404"));
        hasResponses(doc, "/api/sites/{id}/keep-out-areas", "post", List.of("201", "400", "403", "404", "413"));
        hasResponses(doc, "/api/sites/{id}/keep-out-areas/{areaId}", "patch", List.of("200", "400", "403", "404", "413"));
        hasResponses(doc, "/api/sites/{id}/keep-out-areas/{areaId}", "delete", List.of("204", "403", "404"));
        hasResponses(doc, "/api/sites/{siteId}/revisions/{revision}/report", "get",
                List.of("200", "400", "404", "409", "429", "503"));
        hasResponses(doc, "/api/sites/import", "post", List.of("201", "400", "413", "429", "503"));

        assertThat(doc.path("tags").findValuesAsString("name")).containsExactlyInAnyOrder("Sites", "Analyses",
                "Review", "Air-termination", "Risk", "Report", "Design");
        assertThat(doc.path("tags").toString()).contains("IEC 62305-2:2010");

        JsonNode problem = doc.path("components").path("schemas").path("Problem");
        assertThat(problem.path("properties").propertyNames()).contains("type", "title", "status", "detail",
                "instance", "error", "field");
        assertThat(problem.path("required").toString()).contains("\"type\"", "\"title\"", "\"status\"",
                "\"detail\"", "\"error\"");
        assertThat(problem.path("properties").path("type").path("enum").values())
                .allMatch(t -> t.asString().startsWith(ApiProblem.TYPE_PREFIX))
                .hasSize(ApiProblem.values().length);
        // request bodies are the records the API reads, with their required members
        assertThat(requestSchema(doc, "/api/sites/{id}/risk", "put")).isEqualTo("#/components/schemas/RiskInputs");
        assertThat(requestSchema(doc, "/api/sites/{id}", "patch")).isEqualTo("#/components/schemas/SiteChanges");
        assertThat(requestSchema(doc, "/api/sites/{id}/cuts", "post")).isEqualTo("#/components/schemas/SaveCut");
        assertThat(requestSchema(doc, "/api/sites/{id}/keep-out-areas", "post"))
                .isEqualTo("#/components/schemas/KeepOutAreaRequest");
        assertThat(requestSchema(doc, "/api/sites/{siteId}/comments", "post"))
                .isEqualTo("#/components/schemas/NewComment");
        assertThat(requestSchema(doc, "/api/sites/{siteId}/analyses/latest/accepted", "post"))
                .isEqualTo("#/components/schemas/AcceptItem");
        assertThat(requestSchema(doc, "/api/sites/{id}/rods", "post")).isEqualTo("#/components/schemas/RodRequest");
        assertThat(requestSchema(doc, "/api/sites/{id}/rods/{rodId}", "put"))
                .isEqualTo("#/components/schemas/RodRequest");
        assertThat(requestSchema(doc, "/api/sites/{id}/conductors", "post"))
                .isEqualTo("#/components/schemas/ConductorRequest");
        assertThat(requestSchema(doc, "/api/sites/{id}/conductors/{conductorId}", "put"))
                .isEqualTo("#/components/schemas/ConductorRequest");
        assertThat(requestSchema(doc, "/api/sites/{id}/proposals", "post"))
                .isEqualTo("#/components/schemas/ProposalRequest");
        assertThat(requestSchema(doc, "/api/sites/{id}/proposals/{jobId}/accept", "post"))
                .isEqualTo("#/components/schemas/ProposalVersion");
        assertThat(requestSchema(doc, "/api/sites/{id}/proposals/{jobId}/undo", "post"))
                .isEqualTo("#/components/schemas/ProposalVersion");
        assertThat(requestSchema(doc, "/api/sites/{id}/down-conductors/{buildingId}", "put"))
                .isEqualTo("#/components/schemas/DownConductorPositions");
        assertThat(requestSchema(doc, "/api/sites/{id}/metal-installations", "post"))
                .isEqualTo("#/components/schemas/NewInstallation");
        hasResponses(doc, "/api/sites/{id}/proposals", "post", List.of("202", "400", "404", "413"));
        hasResponses(doc, "/api/sites/{id}/proposals/{jobId}/accept", "post", List.of("200", "400", "404", "409", "413"));
        hasResponses(doc, "/api/sites/{id}/down-conductors/{buildingId}", "put", List.of("200", "400", "404", "413"));
        JsonNode schemas = doc.path("components").path("schemas");
        assertThat(schemas.path("SiteChanges").path("required").toString()).isEqualTo("[\"version\"]");
        assertThat(schemas.path("RodRequest").path("required").toString()).isEqualTo("[\"version\"]");
        assertThat(schemas.path("RodRequest").path("properties").propertyNames())
                .containsExactlyInAnyOrder("version", "id", "name", "x", "y", "height");
        assertThat(schemas.path("ConductorRequest").path("required").values()).extracting(JsonNode::asString)
                .containsExactlyInAnyOrder("version", "points");
        assertThat(schemas.path("ProposalRequest").path("properties").path("rodHeights").toString())
                .contains("array").doesNotContain("Sent");
        assertThat(schemas.path("ProposalRequest").path("properties").path("keepOut").toString()).contains("array");
        assertThat(schemas.path("ProposalVersion").path("required").toString()).isEqualTo("[\"version\"]");
        assertThat(schemas.path("DownConductorPositions").path("required").toString()).isEqualTo("[\"positions\"]");
        // answers are records too: a finished proposal's members sit beside the job's own
        assertThat(schemas.path("ProposalJobView").path("properties").propertyNames()).contains("jobId", "state",
                "parts", "count", "cautions");
        assertThat(schemas.path("SaveCut").path("required").values()).extracting(JsonNode::asString)
                .containsExactlyInAnyOrder("name", "x1", "y1", "x2", "y2");
        assertThat(schemas.path("RiskInputs").path("properties").path("lines").path("maxItems").asInt())
                .isEqualTo(org.lpzplanner.risk.RiskSettings.MAX_LINES);
        // only the JSON API is described, not the pages
        assertThat(doc.path("paths").propertyNames()).allMatch(p -> p.startsWith("/api/"));
    }

    @Test
    void browsablePageIsServed() throws Exception {
        String target = mvc.perform(get("/api/docs/ui")).andExpect(status().is3xxRedirection()).andReturn()
                .getResponse().getRedirectedUrl();
        assertThat(target).contains("swagger-ui/index.html");
        String page = mvc.perform(get(target.replaceFirst("^https?://[^/]+", "").replaceFirst("\\?.*$", "")))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsString(StandardCharsets.UTF_8);
        assertThat(page).contains("swagger-ui");
        String config = mvc.perform(get("/api/docs/swagger-config")).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsString(StandardCharsets.UTF_8);
        assertThat(config).contains("/api/docs");
    }
}
