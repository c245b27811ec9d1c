package org.lpzplanner.risk;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;
import java.util.function.ToDoubleFunction;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.risk.EntrySurgeProtection;
import org.lpzplanner.engine.risk.FireProvisions;
import org.lpzplanner.engine.risk.FireRisk;
import org.lpzplanner.engine.risk.IncomingLine;
import org.lpzplanner.engine.risk.LineEnvironment;
import org.lpzplanner.engine.risk.LineInstallation;
import org.lpzplanner.engine.risk.LineShielding;
import org.lpzplanner.engine.risk.LineTouchProtection;
import org.lpzplanner.engine.risk.LineTransformer;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.SpecialHazard;
import org.lpzplanner.engine.risk.StructureUse;
import org.lpzplanner.engine.risk.SurfaceType;
import org.lpzplanner.engine.risk.TouchStepProtection;
import org.lpzplanner.engine.risk.WithstandVoltage;
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
        model.put("lineRows", lineRows(values, locale));
        boolean verdict = a.hasVerdict();
        model.put("complete", verdict);
        model.put("outside", a.complete() && !verdict);
        model.put("outcome", risk.outcome(a, locale));
        model.put("tolerable", verdict && a.withoutLps().isTolerable());
        model.put("figures", risk.figures(a, locale));
        model.put("lineResults", risk.lineResults(a, locale));
        model.put("dominance", risk.dominance(a, locale));
        model.put("table", verdict ? risk.section(a, locale) : null);
        model.put("explanation", verdict ? a.choice().summary() : List.of());
        model.put("suggestion", suggestion(a.suggestion(), locale));
        ProtectionLevel level = verdict ? a.choice().level().orElse(null) : null;
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
        v.put("lifeCriticalSystems", s.lifeCriticalSystems() == null ? ""
                : s.lifeCriticalSystems() ? RiskSettingsParser.YES : RiskSettingsParser.NO);
        v.put("lineCount", s.lineCount() == null ? "" : String.valueOf(s.lineCount()));
        List<IncomingLine> lines = s.lines() == null ? List.of() : s.lines();
        for (int i = 0; i < lines.size(); i++) {
            StoredLine l = StoredLine.of(lines.get(i));
            v.put(RiskSettingsParser.lineField(i, "installation"), l.installation());
            v.put(RiskSettingsParser.lineField(i, "length"), RiskFormat.significant(l.length()));
            v.put(RiskSettingsParser.lineField(i, "environment"), l.environment());
            v.put(RiskSettingsParser.lineField(i, "transformer"), l.transformer());
            v.put(RiskSettingsParser.lineField(i, "surgeProtection"), l.surgeProtection());
            v.put(RiskSettingsParser.lineField(i, "shielding"), l.shielding());
            v.put(RiskSettingsParser.lineField(i, "withstandVoltage"), l.withstandVoltage());
            v.put(RiskSettingsParser.lineField(i, "touchProtection"), l.touchProtection());
        }
        return v;
    }

    /** One incoming line of the form: its number from 1 and its fields. */
    record LineRow(int number, List<Field> fields) {
    }

    /** A form row per line: as many as the count typed (or saved), at most the most the form takes. */
    private List<LineRow> lineRows(Map<String, String> values, Locale locale) {
        String count = values.get("lineCount");
        int n = 0;
        if (count != null && count.strip().matches("\\d{1,2}")) {
            n = Math.min(Integer.parseInt(count.strip()), RiskSettingsParser.MAX_LINES);
        }
        IncomingLine d = StoredLine.conservative(RiskSettings.DEFAULT_LINE_LENGTH);
        List<LineRow> rows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            List<Field> fields = new ArrayList<>();
            fields.add(lineField(i, "installation", options(LineInstallation.values(), "C_I",
                    LineInstallation::description, LineInstallation::ci, locale), values, locale,
                    d.installation().name(), d.installation().description(), null));
            String length = RiskFormat.significant(RiskSettings.DEFAULT_LINE_LENGTH);
            fields.add(lineField(i, "length", List.of(), values, locale, length, length, "risk.unit.metres"));
            fields.add(lineField(i, "environment", options(LineEnvironment.values(), "C_E",
                    LineEnvironment::description, LineEnvironment::ce, locale), values, locale,
                    d.environment().name(), d.environment().description(), null));
            fields.add(lineField(i, "transformer", options(LineTransformer.values(), "C_T",
                    LineTransformer::description, LineTransformer::ct, locale), values, locale,
                    d.transformer().name(), d.transformer().description(), null));
            fields.add(lineField(i, "surgeProtection", options(EntrySurgeProtection.values(), "P_EB",
                    EntrySurgeProtection::description, EntrySurgeProtection::peb, locale), values, locale,
                    d.surgeProtection().name(), d.surgeProtection().description(), null));
            List<Option> shielding = new ArrayList<>();
            for (LineShielding sh : LineShielding.values()) {
                List<String> pld = new ArrayList<>();
                for (WithstandVoltage w : WithstandVoltage.values()) {
                    pld.add(RiskFormat.significant(sh.pld(w)));
                }
                shielding.add(new Option(sh.name(), text(locale, "risk.line.shieldingOption", sh.description(),
                        String.join(" / ", pld), RiskFormat.significant(sh.cld()))));
            }
            fields.add(lineField(i, "shielding", shielding, values, locale, d.shielding().name(),
                    d.shielding().description(), null));
            List<Option> withstand = new ArrayList<>();
            for (WithstandVoltage w : WithstandVoltage.values()) {
                withstand.add(new Option(w.name(), text(locale, "risk.line.withstandOption",
                        RiskFormat.significant(w.kilovolts()))));
            }
            fields.add(lineField(i, "withstandVoltage", withstand, values, locale, d.withstand().name(),
                    RiskFormat.significant(d.withstand().kilovolts()), null));
            fields.add(lineField(i, "touchProtection", options(LineTouchProtection.values(), "P_TU",
                    LineTouchProtection::description, LineTouchProtection::ptu, locale), values, locale,
                    d.touchProtection().name(), d.touchProtection().description(), null));
            rows.add(new LineRow(i + 1, fields));
        }
        return rows;
    }

    /**
     * A field of line {@code index}; shown at {@code initial} (a choice's name, or a number) when
     * nothing is typed or saved for it, the line's most conservative start.
     */
    private Field lineField(int index, String name, List<Option> options, Map<String, String> values, Locale locale,
            String initial, String defaultText, String unitKey) {
        String prefix = "risk.line." + name + ".";
        String value = values.get(RiskSettingsParser.lineField(index, name));
        return new Field(RiskSettingsParser.lineField(index, name), text(locale, prefix + "label"),
                text(locale, prefix + "meaning"), text(locale, prefix + "default", defaultText), options,
                value == null || value.isBlank() ? initial : value, unitKey == null ? null : text(locale, unitKey));
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
        List<Option> answers = unchosen(List.of(new Option(RiskSettingsParser.NO, text(locale, "risk.answer.no")),
                new Option(RiskSettingsParser.YES, text(locale, "risk.answer.yes"))), locale);
        fields.add(field("lifeCriticalSystems", answers, values, locale, "", null));
        fields.add(field("touchStep", options(TouchStepProtection.values(), "P_TA", TouchStepProtection::description,
                TouchStepProtection::pta, locale), values, locale, TouchStepProtection.NONE.description(), null));
        fields.add(field("personsInZone", List.of(), values, locale, "1", null));
        fields.add(field("personsTotal", List.of(), values, locale, "1", null));
        fields.add(field("hoursPerYear", List.of(), values, locale, "8760", "risk.unit.hours"));
        fields.add(field("lineCount", List.of(), values, locale, "", null));
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
        return text(locale, "risk.suggestion.basis", factor, s.structureName(), Formats.height(s.height()),
                Formats.length(s.reach()), s.near(), s.higher(), s.parts() - 1);
    }

    private String text(Locale locale, String key, Object... args) {
        return messages.getMessage(key, args, locale);
    }
}
