package org.lpzplanner.risk;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;
import java.util.function.ToDoubleFunction;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.risk.FireProvisions;
import org.lpzplanner.engine.risk.FireRisk;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.SpecialHazard;
import org.lpzplanner.engine.risk.StructureUse;
import org.lpzplanner.engine.risk.SurfaceType;
import org.lpzplanner.engine.risk.TouchStepProtection;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Component;

/**
 * What the risk page shows: every input as a plain choice with its meaning and default (or that it
 * has none), the collection area on the plan, N_D, the components, R1 against the tolerable risk,
 * the dominant component, the lowest sufficient protection level and the cautions. While an input
 * without a default is missing, the page names it and shows no verdict: no table of options, no
 * outcome, no level.
 */
@Component
class RiskPage {

    private final RiskService risk;
    private final MessageSource messages;

    RiskPage(RiskService risk, MessageSource messages) {
        this.risk = risk;
        this.messages = messages;
    }

    /** One input of the form: a choice ({@code options} not empty) or a number. */
    record Field(String name, String label, String meaning, String defaultText, List<Option> options, String value,
            String unit) {
        public boolean choice() {
            return !options.isEmpty();
        }
    }

    /** One option of a choice: the value sent and the text shown. */
    record Option(String value, String text) {
    }

    /**
     * @param entered the values typed in a form that was refused, to show them again; null to show
     *                the saved (or default) inputs
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id
     */
    Map<String, Object> attributes(long id, Map<String, String> entered, Locale locale) {
        RiskAssessment a = risk.assess(id);
        Map<String, String> values = entered == null ? values(a.settings()) : entered;
        Map<String, Object> model = new LinkedHashMap<>();
        model.put("site", a.site());
        model.put("assessment", a);
        model.put("saved", a.saved());
        model.put("fields", fields(a, values, locale));
        boolean complete = a.complete();
        model.put("complete", complete);
        model.put("outcome", risk.outcome(a, locale));
        model.put("tolerable", complete && a.withoutLps().isTolerable());
        model.put("figures", risk.figures(a, locale));
        model.put("dominance", risk.dominance(a, locale));
        model.put("table", complete ? risk.section(a, locale) : null);
        model.put("explanation", complete ? a.choice().summary() : List.of());
        model.put("suggestion", suggestion(a.suggestion(), locale));
        model.put("lines", a.lines() == null ? null : text(locale, "risk.lines.figures", a.lines().count(),
                RiskFormat.metres(a.lines().length()), RiskFormat.area(a.lines().collectionAreaPerLine()),
                RiskFormat.scientific(a.lines().flashesPerLine())) + " " + text(locale, "risk.lines.near",
                RiskFormat.area(a.lines().nearAreaPerLine()), RiskFormat.scientific(a.lines().flashesNearLine())));
        ProtectionLevel level = complete ? a.choice().level().orElse(null) : null;
        model.put("chosenLevel", level == null ? null : level.name());
        model.put("levelAlreadySet", level != null && a.site().level() == level && a.site().customRadius() == null);
        // levels are declared I to IV, strictest first
        model.put("siteLevelStricter", level != null && a.site().level().ordinal() < level.ordinal()
                ? a.site().level().name() : null);
        model.put("svg", CollectionAreaSvg.render(a.geometry(), a.area().zone(),
                (key, args) -> messages.getMessage(key, args, locale)));
        model.put("cautions", Cautions.lines());
        return model;
    }

    /** The form's text of each field for stored (or initial) settings; empty where nothing is chosen. */
    static Map<String, String> values(RiskSettings s) {
        Map<String, String> v = new LinkedHashMap<>();
        v.put("flashDensitySource", name(s.flashDensitySource()));
        v.put("flashDensity", s.flashDensity() == null ? "" : RiskFormat.significant(s.flashDensity()));
        v.put("thunderstormDays", s.thunderstormDays() == null ? "" : RiskFormat.significant(s.thunderstormDays()));
        v.put("location", s.useSuggestedLocation() ? RiskSettingsParser.SUGGESTED : name(s.location()));
        v.put("surface", s.surface().name());
        v.put("fireRisk", name(s.fireRisk()));
        v.put("fireProvisions", s.fireProvisions().name());
        v.put("specialHazard", name(s.specialHazard()));
        v.put("structureUse", name(s.use()));
        v.put("touchStep", s.touchStep().name());
        v.put("personsInZone", RiskFormat.significant(s.occupancy().personsInZone()));
        v.put("personsTotal", RiskFormat.significant(s.occupancy().personsTotal()));
        v.put("hoursPerYear", RiskFormat.significant(s.occupancy().hoursPerYear()));
        v.put("lineCount", s.lineCount() == null ? "" : String.valueOf(s.lineCount()));
        v.put("lineLength", s.lineLength() == null ? "" : RiskFormat.significant(s.lineLength()));
        return v;
    }

    private static String name(Enum<?> choice) {
        return choice == null ? "" : choice.name();
    }

    private List<Field> fields(RiskAssessment a, Map<String, String> values, Locale locale) {
        List<Field> fields = new ArrayList<>();
        List<Option> sources = new ArrayList<>();
        sources.add(unchosen(locale));
        for (FlashDensitySource s : FlashDensitySource.values()) {
            sources.add(new Option(s.name(), text(locale, "risk.source." + s.name())));
        }
        fields.add(field("flashDensitySource", sources, values, locale, "", null));
        fields.add(field("flashDensity", List.of(), values, locale, "", "risk.unit.flashDensity"));
        fields.add(field("thunderstormDays", List.of(), values, locale, "", "risk.unit.days"));
        List<Option> locations = new ArrayList<>();
        locations.add(unchosen(locale));
        locations.add(new Option(RiskSettingsParser.SUGGESTED, text(locale, "risk.location.suggestedOption",
                text(locale, "risk.location." + a.suggestion().factor().name()),
                RiskFormat.significant(a.suggestion().factor().value()))));
        for (LocationFactor f : LocationFactor.values()) {
            locations.add(new Option(f.name(), text(locale, "risk.choice.factor", text(locale, "risk.location." + f.name()),
                    "C_D", RiskFormat.significant(f.value()))));
        }
        fields.add(field("location", locations, values, locale, "", null));
        fields.add(field("surface", options(SurfaceType.values(), "r_t", SurfaceType::description, SurfaceType::rt,
                locale), values, locale, SurfaceType.AGRICULTURAL_OR_CONCRETE.description(), null));
        fields.add(field("fireRisk", unchosen(options(FireRisk.values(), "r_f", FireRisk::description, FireRisk::rf,
                locale), locale), values, locale, "", null));
        fields.add(field("fireProvisions", options(FireProvisions.values(), "r_p", FireProvisions::description,
                FireProvisions::rp, locale), values, locale, FireProvisions.NONE.description(), null));
        fields.add(field("specialHazard", unchosen(options(SpecialHazard.values(), "h_z", SpecialHazard::description,
                SpecialHazard::hz, locale), locale), values, locale, "", null));
        fields.add(field("structureUse", unchosen(options(StructureUse.values(), "L_F", StructureUse::description,
                StructureUse::lf, locale), locale), values, locale, "", null));
        fields.add(field("touchStep", options(TouchStepProtection.values(), "P_TA", TouchStepProtection::description,
                TouchStepProtection::pta, locale), values, locale, TouchStepProtection.NONE.description(), null));
        fields.add(field("personsInZone", List.of(), values, locale, "1", null));
        fields.add(field("personsTotal", List.of(), values, locale, "1", null));
        fields.add(field("hoursPerYear", List.of(), values, locale, "8760", "risk.unit.hours"));
        fields.add(field("lineCount", List.of(), values, locale, "", null));
        fields.add(field("lineLength", List.of(), values, locale,
                RiskFormat.significant(RiskSettings.DEFAULT_LINE_LENGTH), "risk.unit.metres"));
        return fields;
    }

    /** The option shown while a choice without a default is not made: sent as an empty value. */
    private Option unchosen(Locale locale) {
        return new Option("", text(locale, "risk.choice.unchosen"));
    }

    private List<Option> unchosen(List<Option> options, Locale locale) {
        List<Option> all = new ArrayList<>();
        all.add(unchosen(locale));
        all.addAll(options);
        return all;
    }

    private <E extends Enum<E>> List<Option> options(E[] constants, String symbol,
            Function<E, String> description, ToDoubleFunction<E> factor,
            Locale locale) {
        List<Option> options = new ArrayList<>();
        for (E e : constants) {
            options.add(new Option(e.name(), text(locale, "risk.choice.factor", description.apply(e), symbol,
                    RiskFormat.scientific(factor.applyAsDouble(e)))));
        }
        return options;
    }

    private Field field(String name, List<Option> options, Map<String, String> values, Locale locale,
            String defaultValue, String unitKey) {
        String prefix = "risk.field." + name + ".";
        String value = values.getOrDefault(name, "");
        return new Field(name, text(locale, prefix + "label"), text(locale, prefix + "meaning"),
                text(locale, prefix + "default", defaultValue), options, value == null ? "" : value,
                unitKey == null ? null : text(locale, unitKey));
    }

    private String suggestion(LocationSuggestion s, Locale locale) {
        String factor = text(locale, "risk.location." + s.factor().name());
        if (s.structureName() == null) {
            return text(locale, "risk.suggestion.empty", factor);
        }
        return text(locale, "risk.suggestion.basis", factor, s.structureName(), RiskFormat.metres(s.height()),
                RiskFormat.metres(s.reach()), s.near(), s.higher(), s.parts() - 1);
    }

    private String text(Locale locale, String key, Object... args) {
        return messages.getMessage(key, args, locale);
    }
}
