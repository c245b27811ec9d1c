package org.lpzplanner.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.contentstream.operator.Operator;
import org.apache.pdfbox.cos.COSNumber;
import org.apache.pdfbox.pdfparser.PDFStreamParser;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.lpzplanner.drawing.Colour;
import org.lpzplanner.drawing.Layer;
import org.lpzplanner.drawing.PlanDrawing;
import org.lpzplanner.drawing.PlanItem;
import org.lpzplanner.drawing.PlanStyle;
import org.lpzplanner.drawing.PlanSvgRenderer;

/**
 * One plan drawing with an item on every plan layer, drawn for the pages (SVG) and for the report
 * (PDF): each layer drawn has its style's colour and a legend row on both.
 */
class PlanOnScreenAndPaperTest {

    /** The class the SVG gives the elements of each layer. */
    private static final Map<Layer, String> CLASSES = Map.ofEntries(Map.entry(Layer.PROTECTED_GROUND,
            "protected-ground"), Map.entry(Layer.COLLECTION_AREA, "collection-zone"),
            Map.entry(Layer.STRUCTURE, "structure"), Map.entry(Layer.ROOFTOP_OBJECT, "rooftop-object"),
            Map.entry(Layer.EXPOSED_ROOF, "exposed-roof"), Map.entry(Layer.KEEP_OUT, "keep-out-area"),
            Map.entry(Layer.FACADE_NEGLIGIBLE, "facade-band side-flash-negligible"),
            Map.entry(Layer.FACADE_BAND, "facade-band"), Map.entry(Layer.MODEL_WARNING, "model-warning"),
            Map.entry(Layer.ACCEPTED_ITEM, "exposed-edge accepted"), Map.entry(Layer.EXPOSED_EDGE, "exposed-edge"),
            Map.entry(Layer.EXPOSED_CORNER, "exposed-corner"), Map.entry(Layer.CONDUCTOR, "conductor"),
            Map.entry(Layer.DOWN_CONDUCTOR, "down-conductor"), Map.entry(Layer.ROD, "rod"));

    private static PlanDrawing drawing;
    private static String svg;
    private static Set<Colour> pdfColours;
    private static String pdfText;

    @BeforeAll
    static void drawBoth() throws Exception {
        List<List<double[]>> block = List.of(square(0, 0, 20, 10));
        drawing = PlanDrawing.builder()
                .add(new PlanItem.ProtectedGround(List.of(square(-10, -10, 40, 20))))
                .add(new PlanItem.CollectionArea(List.of(square(-20, -20, 60, 40))))
                .add(new PlanItem.Structure("Block", 8, block))
                .add(new PlanItem.RooftopObject("Vent", List.of(square(2, 2, 2, 2))))
                .add(new PlanItem.ExposedRoof(List.of(square(10, 2, 6, 6))))
                .add(new PlanItem.KeepOutArea("Hatch", square(5, 5, 3, 3), "K1"))
                .add(new PlanItem.FacadeBand(line(0, 0, 20, 0), true, 0, 8, null))
                .add(new PlanItem.FacadeBand(line(20, 0, 20, 10), false, 6, 8, review("band", null)))
                .add(new PlanItem.ModelWarningStretch(List.of(line(0, 5, 30, 5)), "Span wire runs high",
                        review("warning", null)))
                .add(new PlanItem.ExposedEdge(line(0, 10, 20, 10), review("edge", null)))
                .add(new PlanItem.ExposedEdge(line(0, 0, 0, 10), review("accepted", "fenced off")))
                .add(new PlanItem.ExposedCorner(20, 10, review("corner", null)))
                .add(new PlanItem.Conductor("c-1", "Wire", line(0, 5, 30, 5), "A2"))
                .add(new PlanItem.DownConductor(0, 0, "D1"))
                .add(new PlanItem.Rod("rod-1", "Rod", 30, 5, "A1"))
                .numbered().build();
        svg = PlanSvgRenderer.render(drawing, (key, args) -> key, new PlanSvgRenderer.Options("plan", "Plan", 560));
        try (PDDocument document = new PDDocument()) {
            PdfPages pages = new PdfPages(document, new PdfFonts(document), 40);
            pages.newPage();
            PdfPlanPainter.paint(pages, drawing);
            pages.finish();
            ByteArrayOutputStream bytes = new ByteArrayOutputStream();
            document.save(bytes);
            try (PDDocument read = Loader.loadPDF(bytes.toByteArray())) {
                pdfColours = colours(read.getPage(0));
                pdfText = new PDFTextStripper().getText(read).replaceAll("\\s+", " ");
            }
        }
    }

    @Test
    void theDrawingHasAnItemOnEveryPlanLayer() {
        for (Layer layer : Layer.values()) {
            assertThat(drawing.has(layer)).as(layer.name()).isEqualTo(layer.onPlan());
            assertThat(CLASSES.containsKey(layer)).as(layer.name()).isEqualTo(layer.onPlan());
        }
    }

    @Test
    void everyLayerDrawnHasItsColourOnScreenAndOnPaper() {
        for (Layer layer : Layer.values()) {
            if (!layer.onPlan()) {
                continue;
            }
            Colour colour = PlanStyle.of(layer).colour();
            // structures are shaded by height: their outline is the style's, and the legend shows its colour
            Colour drawn = layer == Layer.STRUCTURE || layer == Layer.KEEP_OUT ? PlanStyle.of(layer).outline() : colour;
            assertThat(svgColours(CLASSES.get(layer))).as(layer.name() + " on screen").contains(drawn.hex());
            assertThat(pdfColours).as(layer.name() + " on paper").contains(drawn);
        }
    }

    @Test
    void everyLayerDrawnHasALegendRowOnScreenAndOnPaper() {
        for (Layer layer : Layer.values()) {
            if (layer.onPlan()) {
                assertThat(svg).as(layer.name()).contains(">" + PlanStyle.of(layer).legendKey() + "</text>");
                assertThat(pdfText).as(layer.name()).contains(PlanStyle.of(layer).reportLegend());
            }
        }
    }

    @Test
    void bothWriteTheSameNamesAndNumbers() {
        for (var label : drawing.labels()) {
            assertThat(svg).contains(">" + label.text() + "</text>");
            assertThat(pdfText).contains(label.text());
        }
    }

    /** The fill and stroke colours of the SVG elements whose class is exactly {@code cssClass}. */
    private static Set<String> svgColours(String cssClass) {
        Set<String> colours = new HashSet<>();
        Matcher element = Pattern.compile("<(path|circle|rect) class=\"" + Pattern.quote(cssClass) + "\"[^>]*>")
                .matcher(svg);
        while (element.find()) {
            Matcher colour = Pattern.compile("(?:fill|stroke)=\"(#[0-9a-f]{6})\"").matcher(element.group());
            while (colour.find()) {
                colours.add(colour.group(1));
            }
        }
        return colours;
    }

    /** Every RGB colour the page's content sets for fills and strokes (sc, SC, rg, RG with three values). */
    private static Set<Colour> colours(PDPage page) throws Exception {
        Set<Colour> out = new HashSet<>();
        List<Object> tokens = new PDFStreamParser(page).parse();
        for (int i = 0; i < tokens.size(); i++) {
            if (i >= 3 && tokens.get(i) instanceof Operator op && Set.of("sc", "SC", "rg", "RG").contains(op.getName())
                    && tokens.get(i - 3) instanceof COSNumber) {
                out.add(new Colour(channel(tokens.get(i - 3)), channel(tokens.get(i - 2)), channel(tokens.get(i - 1))));
            }
        }
        return out;
    }

    private static int channel(Object token) {
        return Math.round(((COSNumber) token).floatValue() * 255);
    }

    private static PlanItem.Review review(String key, String reason) {
        return new PlanItem.Review(key, "E" + key.length(), reason);
    }

    private static List<double[]> line(double x1, double y1, double x2, double y2) {
        return List.of(new double[] {x1, y1}, new double[] {x2, y2});
    }

    private static List<double[]> square(double x, double y, double w, double h) {
        return List.of(new double[] {x, y}, new double[] {x + w, y}, new double[] {x + w, y + h},
                new double[] {x, y + h}, new double[] {x, y});
    }
}
