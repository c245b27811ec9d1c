package org.lpzplanner.risk;

import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.json.JsonMapper;

/** Invented test sites for the risk feature, in local metres, and their check values. */
final class RiskSites {

    /** One flat-roofed block, 40 m × 20 m, 10 m high, no parapet, nothing else on the site. */
    static final String BLOCK = """
            {"type": "FeatureCollection", "name": "Test block", "coordinates": "local-metres", "features": [
              {"type": "Feature", "properties": {"kind": "structure", "name": "Block", "height": 10},
               "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [40, 0], [40, 20], [0, 20], [0, 0]]]}}
            ]}
            """;

    /**
     * A_D of {@link #BLOCK} by the rectangle formula L·W + 2·(3H)·(L + W) + π·(3H)² with L = 40,
     * W = 20, H = 10 [IEC 62305-2:2010 Annex A]: 800 + 3600 + 900π = 7227.43 m².
     */
    static final double BLOCK_AREA = 800 + 2 * 30 * 60 + Math.PI * 900;


    static final JsonMapper JSON = JsonMapper.builder().build();

    private RiskSites() {
    }

    /** Uploads a site through the API and returns its id. */
    static long upload(MockMvc mvc, String geojson, String name) throws Exception {
        MockMultipartFile file = new MockMultipartFile("file", "block.geojson", "application/geo+json",
                geojson.getBytes(StandardCharsets.UTF_8));
        String body = mvc.perform(multipart("/api/sites").file(file).param("name", name).param("level", "IV"))
                .andExpect(status().isCreated()).andReturn().getResponse().getContentAsString(StandardCharsets.UTF_8);
        return JSON.readTree(body).path("id").asLong();
    }
}
