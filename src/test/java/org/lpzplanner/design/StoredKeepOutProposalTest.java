package org.lpzplanner.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.RequestBuilder;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * A proposal keeps out of the site's stored keep-out areas without being told, and out of the
 * request's own areas as well. The site is a plain box and the areas are axis-aligned rectangles,
 * so "inside" is checked in closed form (x and y between the rectangle's sides; a conductor's
 * segment by clipping it to the rectangle), independently of the geometry library the app uses.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class StoredKeepOutProposalTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    /** A bare 30 × 12 m flat-roofed block, 8 m high (invented). */
    private static final String BLOCK = """
            {"type": "FeatureCollection", "name": "Keep-out block", "coordinates": "local-metres", "features": [
              {"type": "Feature", "properties": {"kind": "structure", "name": "Block", "height": 8, "roof": "flat"},
               "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [30, 0], [30, 12], [0, 12], [0, 0]]]}}
            ]}""";

    /** Stored: a walkway 4 m wide across the roof from the south edge to the north edge and beyond. */
    private static final double[] WALKWAY = {13, -0.5, 17, 12.5};
    /** The request's own: solar panels in the north-east corner. */
    private static final double[] PANELS = {24, 7, 30.5, 12.5};

    @Autowired
    MockMvc mvc;

    private JsonNode send(RequestBuilder request, int status) throws Exception {
        String body = mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
        return body.isEmpty() ? null : JSON.readTree(body);
    }

    @Test
    void noProposedPartStandsInAStoredKeepOutAreaNorInTheRequestsOwn() throws Exception {
        long id = JSON.readTree(mvc.perform(multipart("/api/sites").file(new MockMultipartFile("file", "block.geojson",
                        "application/geo+json", BLOCK.getBytes(StandardCharsets.UTF_8))).param("level", "I"))
                .andExpect(status().isCreated()).andReturn().getResponse().getContentAsString()).path("id").asLong();
        send(post("/api/sites/{id}/keep-out-areas", id).contentType(MediaType.APPLICATION_JSON)
                .content("{\"name\": \"Walkway\", \"corners\": " + rectangle(WALKWAY) + "}"), 201);

        JsonNode started = send(post("/api/sites/{id}/proposals", id).contentType(MediaType.APPLICATION_JSON)
                .content("{\"rodHeights\": [0.5, 1, 2], \"edgeConductors\": true, \"keepOut\": ["
                        + rectangle(PANELS) + "]}"), 202);
        JsonNode done = started;
        for (int i = 0; i < 600 && done.path("state").asString().equals("running"); i++) {
            Thread.sleep(100);
            done = send(get("/api/sites/{id}/proposals/{job}", id, started.path("jobId").asString()), 200);
        }

        assertThat(done.path("state").asString()).isEqualTo("done");
        assertThat(done.path("count").asInt()).isPositive();
        for (JsonNode part : done.path("parts")) {
            if (part.has("path")) {
                JsonNode path = part.path("path");
                for (int k = 1; k < path.size(); k++) {
                    double[] a = {path.get(k - 1).get(0).asDouble(), path.get(k - 1).get(1).asDouble()};
                    double[] b = {path.get(k).get(0).asDouble(), path.get(k).get(1).asDouble()};
                    assertThat(segmentMeets(a, b, WALKWAY)).as("conductor %s crosses the stored walkway", part)
                            .isFalse();
                    assertThat(segmentMeets(a, b, PANELS)).as("conductor %s crosses the panels", part).isFalse();
                }
            } else {
                double x = part.path("x").asDouble(), y = part.path("y").asDouble();
                assertThat(inside(x, y, WALKWAY)).as("part %s in the stored walkway", part).isFalse();
                assertThat(inside(x, y, PANELS)).as("part %s in the panels", part).isFalse();
            }
        }
    }

    private static String rectangle(double[] r) {
        return "[[" + r[0] + ", " + r[1] + "], [" + r[2] + ", " + r[1] + "], [" + r[2] + ", " + r[3] + "], [" + r[0]
                + ", " + r[3] + "]]";
    }

    /** On or inside the rectangle {minX, minY, maxX, maxY}: the boundary counts as inside. */
    private static boolean inside(double x, double y, double[] r) {
        return x >= r[0] && x <= r[2] && y >= r[1] && y <= r[3];
    }

    /** Whether segment ab meets the closed rectangle: Liang–Barsky clipping of the segment to its sides. */
    private static boolean segmentMeets(double[] a, double[] b, double[] r) {
        double t0 = 0, t1 = 1;
        double dx = b[0] - a[0], dy = b[1] - a[1];
        double[] p = {-dx, dx, -dy, dy};
        double[] q = {a[0] - r[0], r[2] - a[0], a[1] - r[1], r[3] - a[1]};
        for (int i = 0; i < 4; i++) {
            if (p[i] == 0) {
                if (q[i] < 0) {
                    return false;
                }
            } else {
                double t = q[i] / p[i];
                if (p[i] < 0) {
                    t0 = Math.max(t0, t);
                } else {
                    t1 = Math.min(t1, t);
                }
            }
        }
        return t0 <= t1;
    }
}
