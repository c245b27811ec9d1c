package org.lpzplanner.plan;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;
import org.lpzplanner.sites.CoverDetails;
import org.lpzplanner.system.ClearableText;
import org.lpzplanner.system.TextOrNumber;
import tools.jackson.databind.annotation.JsonDeserialize;

/**
 * Changes to a site as {@code PATCH /api/sites/{id}} takes them: the site's version and any of the
 * other members; a member left out keeps its stored value. A radius or cover detail sent as null is
 * cleared (read as ""): the radius goes back to the level's own. The values are checked by the
 * service, as for the page's forms. Other members are ignored (clients may send back a site as read).
 */
@Schema(description = "Changes to a site: its version and any of the other members; those left out keep their value")
@JsonIgnoreProperties(ignoreUnknown = true)
public record SiteChanges(
        @Schema(description = "The site's version as last read; a stale one answers 409",
                requiredMode = Schema.RequiredMode.REQUIRED, example = "3")
        @NotNull(message = "is required: the site's version as last read (GET /api/sites/ID)")
        Long version,
        @Schema(description = "New name, not blank (text or a number)", example = "Harbour warehouse")
        @JsonDeserialize(using = TextOrNumber.class)
        String name,
        @Schema(description = "Protection level I, II, III or IV (also 1 to 4)", example = "II")
        @JsonDeserialize(using = TextOrNumber.class)
        String level,
        @Schema(description = "Custom sphere radius in metres, above 0 and at most 1000 (a number or text); null goes"
                + " back to the level's own radius", example = "46")
        @JsonDeserialize(using = TextOrNumber.NullClears.class)
        String radius,
        @Schema(description = "Address printed on the report's cover: one line, at most " + CoverDetails.MAX_LENGTH
                + " characters, no control characters; null or blank clears it", example = "12 Quay Road, Porthaven")
        @JsonDeserialize(using = ClearableText.class)
        String address,
        @Schema(description = "Designer printed on the report's cover, as address", example = "A. Lee, LPS designer")
        @JsonDeserialize(using = ClearableText.class)
        String designer) {
}
