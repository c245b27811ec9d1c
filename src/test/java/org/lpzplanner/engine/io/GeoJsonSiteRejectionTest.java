package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.lpzplanner.engine.io.SiteJson.SOURCE;
import static org.lpzplanner.engine.io.SiteJson.building;
import static org.lpzplanner.engine.io.SiteJson.feature;
import static org.lpzplanner.engine.io.SiteJson.lineString;
import static org.lpzplanner.engine.io.SiteJson.lonLat;
import static org.lpzplanner.engine.io.SiteJson.local;
import static org.lpzplanner.engine.io.SiteJson.point;
import static org.lpzplanner.engine.io.SiteJson.polygon;
import static org.lpzplanner.engine.io.SiteJson.q;
import static org.lpzplanner.engine.io.SiteJson.rectangle;
import static org.lpzplanner.engine.io.SiteJson.ring;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** Every way a GeoJSON site file can be wrong is reported with its place, field and problem. */
class GeoJsonSiteRejectionTest {

    private static SiteFormatException rejected(String json) {
        return assertThrows(SiteFormatException.class, () -> SiteReader.readGeoJson(json, SOURCE));
    }

    private static String structure(String name, String extraProperties, String geometry) {
        return feature("'kind':'structure','name':'" + name + "'" + extraProperties, geometry);
    }

    @Test
    void nonNumericHeightIsReportedWithFileFeatureNameFieldAndValue() {
        SiteFormatException e = rejected(local(building(),
                structure("North hall", ",'height':'abc'", rectangle(30, 0, 50, 10))));

        assertThat(e.getMessage())
                .isEqualTo("site.geojson: feature 1 (\"North hall\"), field \"height\": must be a number > 0, got \"abc\"");
        assertThat(e.source()).isEqualTo(SOURCE);
        assertThat(e.featureIndex()).isEqualTo(1);
        assertThat(e.featureName()).isEqualTo("North hall");
        assertThat(e.field()).isEqualTo("height");
    }

    @Test
    void featureWithoutNameIsNamedByIndexAlone() {
        SiteFormatException e = rejected(local(feature("'kind':'structure','height':'x'", rectangle(0, 0, 5, 5))));

        assertThat(e.getMessage()).startsWith("site.geojson: feature 0, field \"height\": ");
    }

    @Test
    void missingHeightSaysItIsRequiredAndWhatItMeans() {
        SiteFormatException e = rejected(local(structure("Store", "", rectangle(0, 0, 5, 5))));

        assertThat(e.featureIndex()).isZero();
        assertThat(e.field()).isEqualTo("height");
        assertThat(e.getMessage()).contains("feature 0 (\"Store\")", "is required", "wall-top height");
    }

    @Test
    void nanHeightIsRejectedAsNotFinite() {
        SiteFormatException e = rejected(local(structure("Store", ",'height':NaN", rectangle(0, 0, 5, 5))));

        assertThat(e.field()).isEqualTo("height");
        assertThat(e.getMessage()).contains("feature 0", "NaN", "not a finite number");
    }

    @ParameterizedTest
    @ValueSource(strings = {"-3", "0"})
    void heightMustBePositive(String height) {
        SiteFormatException e = rejected(local(structure("Store", ",'height':" + height, rectangle(0, 0, 5, 5))));

        assertThat(e.field()).isEqualTo("height");
        assertThat(e.getMessage()).contains("feature 0", "must be a number > 0, got " + height);
    }

    @Test
    void heightAboveOneKilometreIsTakenForWrongUnits() {
        SiteFormatException e = rejected(local(structure("Store", ",'height':1200", rectangle(0, 0, 5, 5))));

        assertThat(e.field()).isEqualTo("height");
        assertThat(e.getMessage()).contains("feature 0", "at most 1000 m, got 1200", "check the units");
    }

    @Test
    void negativeParapetIsRejected() {
        SiteFormatException e = rejected(local(structure("Store", ",'height':8,'parapet':-1", rectangle(0, 0, 5, 5))));

        assertThat(e.field()).isEqualTo("parapet");
        assertThat(e.getMessage()).contains("feature 0", "must be a number ≥ 0, got -1");
    }

    @Test
    void malformedJsonGivesLineAndColumn() {
        String text = "{\"type\": \"FeatureCollection\",\n  \"features\": [ {\"type\": \"Feature\" \"id\": 1} ]}";

        SiteFormatException e = rejected(text);

        assertThat(e.line()).isEqualTo(2);
        assertThat(e.column()).isNotNull();
        assertThat(e.getMessage()).startsWith("site.geojson: line 2, column ").contains("not valid JSON");
    }

    @Test
    void repeatedMemberIsRejectedAsInvalidJson() {
        SiteFormatException e = rejected(local(q("{'type':'Feature','properties':{'kind':'structure','height':5,"
                + "'height':6},'geometry':" + rectangle(0, 0, 5, 5) + "}")));

        assertThat(e.line()).isEqualTo(1);
        assertThat(e.getMessage()).contains("not valid JSON", "height");
    }

    @Test
    void singleFeatureInsteadOfCollectionIsRejected() {
        SiteFormatException e = rejected(building());

        assertThat(e.featureIndex()).isNull();
        assertThat(e.field()).isEqualTo("type");
        assertThat(e.getMessage()).contains("must be \"FeatureCollection\", got \"Feature\"");
    }

    @Test
    void topLevelArrayIsRejected() {
        SiteFormatException e = rejected("[" + building() + "]");

        assertThat(e.getMessage()).isEqualTo(
                "site.geojson: the file must hold a GeoJSON FeatureCollection object, got an array");
    }

    @Test
    void collectionWithoutFeaturesArrayIsRejected() {
        SiteFormatException e = rejected(q("{'type':'FeatureCollection','features':{}}"));

        assertThat(e.field()).isEqualTo("features");
        assertThat(e.getMessage()).contains("must be an array of features, got an object");
    }

    @Test
    void unknownCoordinatesDeclarationIsRejected() {
        SiteFormatException e = rejected(q("{'type':'FeatureCollection','coordinates':'utm','features':[]}"));

        assertThat(e.field()).isEqualTo("coordinates");
        assertThat(e.getMessage()).contains("\"local-metres\"", "got \"utm\"");
    }

    @Test
    void missingKindListsTheKinds() {
        SiteFormatException e = rejected(local(building(), feature("'name':'Shed','height':4", rectangle(30, 0, 35, 5))));

        assertThat(e.featureIndex()).isEqualTo(1);
        assertThat(e.field()).isEqualTo("kind");
        assertThat(e.getMessage()).contains("feature 1 (\"Shed\")", "is required",
                "structure, rooftop-object, rod, conductor");
    }

    @Test
    void unknownKindIsRejectedWithTheValueFound() {
        SiteFormatException e = rejected(local(feature("'kind':'building','height':4", rectangle(0, 0, 5, 5))));

        assertThat(e.field()).isEqualTo("kind");
        assertThat(e.getMessage()).contains("feature 0", "must be one of structure, rooftop-object, rod, conductor",
                "got \"building\"");
    }

    @ParameterizedTest(name = "{0} with a {2}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', value = {
        "structure      | 'height':5                 | Point      | a structure needs a Polygon or MultiPolygon geometry, got Point",
        "rooftop-object | 'top':5                    | LineString | a rooftop object needs a Polygon or Point geometry, got LineString",
        "rod            | 'height':2                 | Polygon    | a rod needs a Point geometry, got Polygon",
        "conductor      | 'heightAboveRoof':0.1      | Point      | a conductor needs a LineString geometry, got Point",
    })
    void geometryTypeMustSuitTheKind(String kind, String properties, String type, String expected) {
        String geometry = switch (type) {
            case "Point" -> point(1, 1);
            case "LineString" -> lineString(new double[] {0, 0}, new double[] {1, 1});
            default -> rectangle(1, 1, 2, 2);
        };
        SiteFormatException e = rejected(local(building(), feature("'kind':'" + kind + "'," + properties, geometry)));

        assertThat(e.featureIndex()).isEqualTo(1);
        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 1", expected);
    }

    @Test
    void missingGeometryIsRejected() {
        SiteFormatException e = rejected(local(feature("'kind':'rod','height':2", "null"), building()));

        assertThat(e.featureIndex()).isZero();
        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("is required", "a rod needs a Point geometry");
    }

    @Test
    void selfIntersectingFootprintIsLocated() {
        // A bow tie: its edges (0,0)-(10,10) and (10,0)-(0,10) cross at (5,5).
        SiteFormatException e = rejected(local(structure("Bow", ",'height':6",
                polygon(ring(0, 0, 10, 10, 10, 0, 0, 10, 0, 0)))));

        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 0 (\"Bow\")", "not a valid polygon",
                "self-intersection", "at x=5, y=5 m", "no two edges cross");
    }

    @Test
    void selfIntersectionInLonLatFileIsAlsoGivenInLonLat() {
        SiteFormatException e = rejected(lonLat(structure("Bow", ",'height':6",
                polygon(ring(8, 50, 8.0001, 50.0001, 8.0001, 50, 8, 50.0001, 8, 50)))));

        assertThat(e.getMessage()).contains("self-intersection", "(lon 8.00005", "lat 50.00005");
    }

    @Test
    void holeOutsideTheOuterBoundaryIsRejected() {
        SiteFormatException e = rejected(local(structure("Yard", ",'height':6",
                polygon(ring(0, 0, 10, 0, 10, 10, 0, 10, 0, 0), ring(20, 20, 22, 20, 22, 22, 20, 22, 20, 20)))));

        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 0", "hole (courtyard) lies outside the outer boundary");
    }

    @Test
    void ringWithFewerThanFourPositionsIsRejected() {
        SiteFormatException e = rejected(local(structure("Tri", ",'height':6", polygon(ring(0, 0, 10, 0, 0, 0)))));

        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 0 (\"Tri\")", "ring 0 (outer boundary) has 3 positions",
                "at least 4");
    }

    @Test
    void unclosedRingIsRejected() {
        SiteFormatException e = rejected(local(structure("Open", ",'height':6",
                polygon(ring(0, 0, 10, 0, 10, 10, 0, 10)))));

        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("ring 0 (outer boundary) is not closed", "must repeat its first");
    }

    @Test
    void nonNumericPositionIsRejected() {
        SiteFormatException e = rejected(local(q("{'type':'Feature','properties':{'kind':'rod','height':2},"
                + "'geometry':{'type':'Point','coordinates':['east',4]}}")));

        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 0", "the point must be an array of 2 or 3 numbers",
                "[\"east\",4]");
    }

    @Test
    void metresInALonLatFileAreRejectedWithAHint() {
        SiteFormatException e = rejected(lonLat(structure("Depot", ",'height':6", rectangle(0, 0, 400, 120))));

        assertThat(e.featureIndex()).isZero();
        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 0 (\"Depot\")", "position 1 of ring 0 (outer boundary) [400.0,0.0]",
                "is not a longitude/latitude", "these look like metres", "add \"coordinates\": \"local-metres\"");
    }

    @Test
    void duplicateIdNamesBothFeatures() {
        String first = q("{'type':'Feature','id':'A','properties':{'kind':'structure','height':5},'geometry':"
                + rectangle(0, 0, 5, 5) + "}");
        String second = q("{'type':'Feature','properties':{'kind':'rod','id':'A','name':'Mast','height':9},"
                + "'geometry':" + point(20, 20) + "}");

        SiteFormatException e = rejected(local(first, building(), second));

        assertThat(e.featureIndex()).isEqualTo(2);
        assertThat(e.field()).isEqualTo("id");
        assertThat(e.getMessage()).contains("feature 2 (\"Mast\")", "\"A\" is already used by feature 0",
                "must be unique");
    }

    @Test
    void conflictingIdMemberAndPropertyAreRejected() {
        SiteFormatException e = rejected(local(q("{'type':'Feature','id':'A','properties':{'kind':'structure',"
                + "'id':'B','height':5},'geometry':" + rectangle(0, 0, 5, 5) + "}")));

        assertThat(e.field()).isEqualTo("id");
        assertThat(e.getMessage()).contains("feature 0", "\"A\"", "\"B\"", "differ");
    }

    @Test
    void emptyCollectionHasNoStructure() {
        SiteFormatException e = rejected(local());

        assertThat(e.featureIndex()).isNull();
        assertThat(e.getMessage()).isEqualTo("site.geojson: the site has no structure; add at least one feature with"
                + " \"kind\": \"structure\"");
    }

    @Test
    void siteWithOnlyARodHasNoStructure() {
        SiteFormatException e = rejected(local(feature("'kind':'rod','height':20", point(0, 0))));

        assertThat(e.getMessage()).contains("the site has no structure");
    }

    @Test
    void siteWiderThanTwentyKilometresNamesTheFeaturesAtTheExtremes() {
        SiteFormatException e = rejected(local(building(),
                structure("Far barn", ",'height':5", rectangle(25_000, 0, 25_010, 10))));

        assertThat(e.featureIndex()).isNull();
        assertThat(e.getMessage()).contains("the site spans 25.01 km east-west", "at most 20 km",
                "westmost point belongs to feature 0", "eastmost to feature 1 (\"Far barn\")", "stray coordinate");
    }

    @Test
    void strayLonLatCoordinateMakesTheSiteTooLarge() {
        // 0.5° of longitude at 50°N is about 36 km (71,696 m per degree, WGS84 ellipsoid formula).
        SiteFormatException e = rejected(lonLat(structure("Here", ",'height':5", rectangle(8, 50, 8.0002, 50.0001)),
                structure("Stray", ",'height':5", rectangle(8.5, 50, 8.5002, 50.0001))));

        assertThat(e.getMessage()).contains("east-west", "feature 1 (\"Stray\")");
    }

    @Test
    void gableWithoutRidgeHeightIsRejected() {
        SiteFormatException e = rejected(local(structure("Barn", ",'height':5,'roof':'gable','ridgeBearing':0",
                rectangle(0, 0, 10, 20))));

        assertThat(e.field()).isEqualTo("ridgeHeight");
        assertThat(e.getMessage()).contains("feature 0 (\"Barn\")", "is required", "ridge");
    }

    @Test
    void ridgeMustRiseAboveTheWalls() {
        SiteFormatException e = rejected(local(structure("Barn",
                ",'height':5,'roof':'gable','ridgeHeight':4,'ridgeBearing':0", rectangle(0, 0, 10, 20))));

        assertThat(e.field()).isEqualTo("ridgeHeight");
        assertThat(e.getMessage()).contains("must be greater than \"height\" (5 m), got 4 m");
    }

    @Test
    void gableWithoutRidgeBearingIsRejected() {
        SiteFormatException e = rejected(local(structure("Barn", ",'height':5,'roof':'gable','ridgeHeight':8",
                rectangle(0, 0, 10, 20))));

        assertThat(e.field()).isEqualTo("ridgeBearing");
        assertThat(e.getMessage()).contains("is required", "clockwise from north");
    }

    @Test
    void hipRoofOnNonConvexFootprintSuggestsSplitting() {
        // An L: 20 x 20 with the north-east 10 x 10 quarter cut away.
        SiteFormatException e = rejected(local(structure("Ell", ",'height':5,'roof':'hip','ridgeHeight':9",
                polygon(ring(0, 0, 20, 0, 20, 10, 10, 10, 10, 20, 0, 20, 0, 0)))));

        assertThat(e.field()).isEqualTo("roof");
        assertThat(e.getMessage()).contains("feature 0 (\"Ell\")", "hip roof needs a convex footprint", "not convex",
                "split the building into convex parts", "overlapping structures form one solid");
    }

    @Test
    void hipRoofOnFootprintWithCourtyardIsRejected() {
        SiteFormatException e = rejected(local(structure("Ring", ",'height':5,'roof':'hip','ridgeHeight':9",
                polygon(ring(0, 0, 30, 0, 30, 30, 0, 30, 0, 0), ring(10, 10, 10, 20, 20, 20, 20, 10, 10, 10)))));

        assertThat(e.field()).isEqualTo("roof");
        assertThat(e.getMessage()).contains("has a hole (courtyard)", "split");
    }

    @Test
    void shedWithoutHighSideBearingIsRejected() {
        SiteFormatException e = rejected(local(structure("Lean-to", ",'height':3,'roof':'shed','ridgeHeight':4",
                rectangle(0, 0, 10, 4))));

        assertThat(e.field()).isEqualTo("highSideBearing");
        assertThat(e.getMessage()).contains("feature 0 (\"Lean-to\")", "is required", "towards the high side");
    }

    @Test
    void shedHighSideMustRiseAboveTheWalls() {
        SiteFormatException e = rejected(local(structure("Lean-to",
                ",'height':3,'roof':'shed','ridgeHeight':3,'highSideBearing':90", rectangle(0, 0, 10, 4))));

        assertThat(e.field()).isEqualTo("ridgeHeight");
        assertThat(e.getMessage()).contains("must be greater than \"height\" (3 m)");
    }

    @Test
    void fieldOfAnotherRoofFormIsRejected() {
        SiteFormatException e = rejected(local(structure("Barn",
                ",'height':5,'roof':'gable','ridgeHeight':8,'ridgeBearing':0,'parapet':1", rectangle(0, 0, 10, 20))));

        assertThat(e.field()).isEqualTo("parapet");
        assertThat(e.getMessage()).contains("does not apply to a gable roof", "flat roofs");
    }

    @Test
    void ridgeHeightWithoutRoofFormIsRejected() {
        SiteFormatException e = rejected(local(structure("Barn", ",'height':5,'ridgeHeight':8",
                rectangle(0, 0, 10, 20))));

        assertThat(e.field()).isEqualTo("ridgeHeight");
        assertThat(e.getMessage()).contains("does not apply to a flat roof", "set \"roof\"");
    }

    @Test
    void unknownRoofFormIsRejected() {
        SiteFormatException e = rejected(local(structure("Dome", ",'height':5,'roof':'dome'", rectangle(0, 0, 10, 10))));

        assertThat(e.field()).isEqualTo("roof");
        assertThat(e.getMessage()).contains("must be one of flat, gable, hip, shed, got \"dome\"");
    }

    @Test
    void circularRooftopObjectNeedsARadius() {
        SiteFormatException e = rejected(local(building(),
                feature("'kind':'rooftop-object','name':'Flue','top':14", point(5, 5))));

        assertThat(e.featureIndex()).isEqualTo(1);
        assertThat(e.field()).isEqualTo("radius");
        assertThat(e.getMessage()).contains("feature 1 (\"Flue\")", "is required", "radius");
    }

    @Test
    void zeroRadiusIsRejected() {
        SiteFormatException e = rejected(local(building(),
                feature("'kind':'rooftop-object','radius':0,'top':14", point(5, 5))));

        assertThat(e.field()).isEqualTo("radius");
        assertThat(e.getMessage()).contains("feature 1", "must be a number > 0, got 0");
    }

    /** Sizes below a centimetre are unit mistakes or noise, whatever part they belong to. */
    @Test
    void heightsAndSizesBelowACentimetreAreRefused() {
        SiteFormatException circle = rejected(local(building(),
                feature("'kind':'rooftop-object','name':'Flue','radius':1e-9,'top':14", point(5, 5))));
        assertThat(circle.field()).isEqualTo("radius");
        assertThat(circle.getMessage()).contains("feature 1 (\"Flue\")", "at least 0.01 m", "got 1.0E-9", "check the units");

        SiteFormatException tiny = rejected(local(structure("Flat", ",'height':1e-320", rectangle(0, 0, 5, 5))));
        assertThat(tiny.field()).isEqualTo("height");
        assertThat(tiny.getMessage()).contains("at least 0.01 m");

        SiteFormatException rod = rejected(local(building(), feature("'kind':'rod','height':0.001", point(5, 5))));
        assertThat(rod.field()).isEqualTo("height");

        SiteFormatException clip = rejected(local(building(), feature("'kind':'conductor','heightAboveRoof':0.005",
                lineString(new double[] {1, 1}, new double[] {9, 1}))));
        assertThat(clip.field()).isEqualTo("heightAboveRoof");
        assertThat(clip.getMessage()).contains("must be 0 or at least 0.01 m");
        // a conductor lying on the roof and a one-centimetre size are fine
        SiteReader.readGeoJson(local(building(), feature("'kind':'conductor','heightAboveRoof':0",
                lineString(new double[] {1, 1}, new double[] {9, 1})),
                feature("'kind':'rooftop-object','radius':0.01,'top':10.5", point(5, 5))), SOURCE);
    }

    @Test
    void aConductorHasAtMostAsManyPointsAsTheAppAllowsWhenDrawing() {
        double[][] points = new double[501][];
        for (int i = 0; i < points.length; i++) {
            points[i] = new double[] {1 + i * 0.01, 1};
        }
        SiteFormatException e = rejected(local(building(), feature("'kind':'conductor','name':'Zigzag','heightAboveRoof':0.2",
                lineString(points))));
        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 1 (\"Zigzag\")", "501 positions", "at most 500");
        SiteReader.readGeoJson(local(building(), feature("'kind':'conductor','heightAboveRoof':0.2",
                lineString(java.util.Arrays.copyOf(points, 500)))), SOURCE);
    }

    @Test
    void rooftopObjectNeedsItsTop() {
        SiteFormatException e = rejected(local(building(),
                feature("'kind':'rooftop-object','name':'Box'", rectangle(2, 2, 4, 4))));

        assertThat(e.field()).isEqualTo("top");
        assertThat(e.getMessage()).contains("feature 1 (\"Box\")", "is required", "top above ground");
    }

    @Test
    void rodNeedsPositiveHeight() {
        SiteFormatException e = rejected(local(building(), feature("'kind':'rod','name':'Mast','height':-2", point(5, 5))));

        assertThat(e.field()).isEqualTo("height");
        assertThat(e.getMessage()).contains("feature 1 (\"Mast\")", "must be a number > 0, got -2");
    }

    @Test
    void conductorWithoutElevationOrHeightAboveRoofIsRejected() {
        SiteFormatException e = rejected(local(building(), feature("'kind':'conductor','name':'Wire'",
                lineString(new double[] {0, 0, 12}, new double[] {10, 0}))));

        assertThat(e.featureIndex()).isEqualTo(1);
        assertThat(e.field()).isEqualTo("heightAboveRoof");
        assertThat(e.getMessage()).contains("feature 1 (\"Wire\")", "position 1 has no elevation",
                "\"heightAboveRoof\"", "third value on every position");
    }

    @Test
    void conductorElevationBelowGroundIsRejected() {
        SiteFormatException e = rejected(local(building(), feature("'kind':'conductor'",
                lineString(new double[] {0, 0, 12}, new double[] {10, 0, -1}))));

        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 1", "position 1 has elevation -1");
    }

    @Test
    void negativeHeightAboveRoofIsRejected() {
        SiteFormatException e = rejected(local(building(), feature("'kind':'conductor','heightAboveRoof':-0.2",
                lineString(new double[] {0, 0}, new double[] {10, 0}))));

        assertThat(e.field()).isEqualTo("heightAboveRoof");
        assertThat(e.getMessage()).contains("feature 1", "must be a number ≥ 0, got -0.2");
    }

    @Test
    void smallMetreValuesInALonLatFileMakeAHugeSiteAndTheMessageSaysWhy() {
        // 20 x 10 "metres" read as degrees: a footprint about 2,200 km wide.
        SiteFormatException e = rejected(lonLat(structure("Shed", ",'height':5", rectangle(0, 0, 20, 10))));

        assertThat(e.getMessage()).contains("east-west", "points both belong to feature 0 (\"Shed\")",
                "add \"coordinates\": \"local-metres\"");
    }

    @Test
    void overlappingPartsOfAMultiPolygonAreRejected() {
        String geometry = q("{'type':'MultiPolygon','coordinates':[[[[0,0],[20,0],[20,10],[0,10],[0,0]]],"
                + "[[[5,5],[25,5],[25,15],[5,15],[5,5]]]]}");

        SiteFormatException e = rejected(local(structure("Twin", ",'height':5", geometry)));

        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 0 (\"Twin\")", "its parts overlap", "separate structures");
    }

    @Test
    void jsonErrorsAreFreeOfParserInternals() {
        SiteFormatException e = rejected("{\"type\": \"FeatureCollection\", \"features\": [ ");

        assertThat(e.getMessage()).startsWith("site.geojson: line 1, column ").contains("not valid JSON")
                .doesNotContain("Source:", "REDACTED");
    }

    @Test
    void lonLatPositionsInALocalMetreFileAreRejectedWithAHint() {
        // a 20 m x 20 m building written in degrees (about 0.0002 deg at latitude 47) encloses
        // 4e-8 "square metres" when the file claims local metres
        SiteFormatException e = rejected(local(structure("Depot", ",'height':6", rectangle(8.5400, 47.3700, 8.5402, 47.3702))));

        assertThat(e.featureIndex()).isZero();
        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 0 (\"Depot\")", "encloses only less than 0.01 m²",
                "look like longitudes and latitudes", "remove \"coordinates\": \"local-metres\"");
    }

    @Test
    void footprintSmallerThanOneSquareMetreIsNotABuilding() {
        SiteFormatException e = rejected(local(structure("Kiosk", ",'height':3", rectangle(500, 500, 500.5, 500.5))));

        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("encloses only 0.25 m²", "at least 1 m²", "check the units");
    }

    @Test
    void repeatedFeatureIsRejectedNamingBoth() {
        String copy = structure("Hall", ",'height':8", rectangle(40, 0, 60, 10));
        // the same outline starting at another corner is the same geometry
        String sameRingOtherStart = structure("Hall again", ",'height':9", polygon(ring(60, 10, 40, 10, 40, 0, 60, 0, 60, 10)));

        SiteFormatException e = rejected(local(copy, building(), sameRingOtherStart));

        assertThat(e.featureIndex()).isEqualTo(2);
        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("feature 2 (\"Hall again\")", "repeats feature 0 (\"Hall\")",
                "kind (structure)");
    }

    @Test
    void twoRodsOnTheSamePointAreRejected() {
        String rod = feature("'kind':'rod','height':2", point(30, 30));

        SiteFormatException e = rejected(local(building(), rod, rod));

        assertThat(e.featureIndex()).isEqualTo(2);
        assertThat(e.getMessage()).contains("repeats feature 1", "kind (rod)");
    }

    @Test
    void overflowingNumberIsNotFinite() {
        // 1e999 overflows an IEEE 754 double (largest finite about 1.8e308) and reads as Infinity
        SiteFormatException e = rejected(local(structure("Tower", ",'height':1e999", rectangle(0, 0, 10, 10))));

        assertThat(e.field()).isEqualTo("height");
        assertThat(e.getMessage()).contains("not a finite number");
    }
}
