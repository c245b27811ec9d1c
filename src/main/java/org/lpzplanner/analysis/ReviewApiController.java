package org.lpzplanner.analysis;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.List;
import org.lpzplanner.common.Cautions;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/**
 * JSON API for the review of a site's latest analysis:
 * {@code GET /api/sites/{id}/analyses/latest/items} lists the exposed edges, corners and facade
 * bands and the model warnings with their status; {@code POST /api/sites/{id}/analyses/latest/accepted} with JSON
 * {@code {"key": ..., "reason": ...}} marks one accepted; {@code DELETE
 * /api/sites/{id}/analyses/latest/accepted/{key}} marks it exposed again. Each answers with the
 * whole review, method, level, radius and cautions. An unknown key answers 404, a missing key or a
 * blank reason 400 naming the field; nothing is stored then. Errors are problem details, see
 * {@link org.lpzplanner.system.ApiErrorHandler}.
 */
@RestController
@Tag(name = "Review", description = "Exposed items of the latest analysis and their acceptances")
@RequestMapping("/api/sites/{siteId}/analyses/latest")
public class ReviewApiController {

    private final ReviewService reviews;

    public ReviewApiController(ReviewService reviews) {
        this.reviews = reviews;
    }

    /**
     * One item. {@code status} is {@code exposed} or {@code accepted} (then with its
     * {@code reason}); lengths and heights in metres, {@code bottom} for facade bands only. A model
     * warning (kind {@code free-span}) names its part in {@code owner} and has
     * {@code heightAboveSurface} and {@code text}; both are null for every other item.
     */
    public record ItemView(int number, String key, String owner, String kind, Double length, Double bottom,
            Double top, Double heightAboveSurface, String text, String status, String reason) {
    }

    /**
     * The review with what a client needs to show it responsibly. {@code modelWarnings} counts the
     * items that are model warnings: while any stands, accepted or not, the analysis gives no verdict
     * of full protection. {@code negligibleFacadeBands} counts the facade bands (or their parts)
     * that are not items because flashes to the side are negligible there ({@code sideFlashRule}
     * says why, IEC 62305-3:2010 5.2.3).
     */
    public record ReviewView(long siteId, int revision, String method, String level, double radius,
            int exposedItems, int accepted, int modelWarnings, int negligibleFacadeBands, String sideFlashRule,
            List<ItemView> items, List<String> cautions) {

        static ReviewView of(ReviewService.Review review) {
            AnalysisRevision r = review.revision();
            List<ItemView> items = review.items().stream().map(i -> {
                String reason = review.accepted().get(i.key());
                return new ItemView(i.number(), i.key(), i.owner(), i.kind(), i.length(), i.bottom(), i.top(),
                        i.heightAboveSurface(), i.text(), reason == null ? "exposed" : "accepted", reason);
            }).toList();
            int warnings = (int) review.items().stream().filter(ReviewItems.Item::isModelWarning).count();
            return new ReviewView(r.siteId(), r.revision(), ResultGeoJson.METHOD, r.level().name(),
                    ResultGeoJson.round(r.sphereRadius()), items.size(), review.acceptedCount(), warnings,
                    ReviewItems.negligibleBands(r.resultGeoJson()), ResultGeoJson.NEGLIGIBLE_RULE, items,
                    Cautions.lines());
        }
    }

    @Operation(summary = "Exposed items of the latest analysis",
            description = "Every exposed edge, corner and facade band, and every model warning, with its status.")
    @ApiResponse(responseCode = "200", description = "The review")
    @ApiResponse(responseCode = "404", description = "No such site, or it was never analysed")
    @GetMapping("/items")
    public ReviewView items(@PathVariable long siteId) {
        return ReviewView.of(reviews.latest(siteId).orElseThrow(() -> new ReviewItemNotFoundException(
                "site " + siteId + " has not been analysed yet, so it has no exposed items")));
    }

    @Operation(summary = "Accept an exposed item",
            description = "JSON object with key and reason (required). Kept with this analysis revision.")
    @ApiResponse(responseCode = "200", description = "The review after the change")
    @ApiResponse(responseCode = "400", description = "Key or reason missing or not text, or the reason blank or too long; the field is named")
    @ApiResponse(responseCode = "404", description = "No such site, analysis or item")
    @PostMapping(value = "/accepted", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ReviewView accept(@PathVariable long siteId, @Valid @RequestBody AcceptItem body) {
        return ReviewView.of(reviews.accept(siteId, body.key(), body.reason()));
    }

    @Operation(summary = "Count an accepted item as exposed again")
    @ApiResponse(responseCode = "200", description = "The review after the change")
    @ApiResponse(responseCode = "404", description = "No such site, analysis or accepted item")
    @DeleteMapping("/accepted/{key}")
    public ReviewView remove(@PathVariable long siteId, @PathVariable String key) {
        return ReviewView.of(reviews.remove(siteId, key));
    }
}
