package org.lpzplanner.risk;

import java.time.Clock;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Function;
import org.lpzplanner.common.Formats;
import org.lpzplanner.common.ReportSection;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.risk.CollectionArea;
import org.lpzplanner.engine.risk.CollectionAreaOp;
import org.lpzplanner.engine.risk.DangerousEvents;
import org.lpzplanner.engine.risk.IncomingLine;
import org.lpzplanner.engine.risk.LevelChoice;
import org.lpzplanner.engine.risk.LifeRisk;
import org.lpzplanner.engine.risk.LifeRiskEstimate;
import org.lpzplanner.engine.risk.LifeRiskInputs;
import org.lpzplanner.engine.risk.LineRisk;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.OutsideEstimate;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * The risk of loss of human life of a site (IEC 62305-2:2010, R1 = R_A + R_B + R_U + R_V, flashes
 * to the structure and to its incoming lines): keeps each site's inputs, runs the engine's estimate
 * on the site's real geometry, and hands the lowest sufficient protection level to the site's
 * analysis settings. No verdict while an input without a default is missing, or for a structure
 * outside the estimate (a risk of explosion, life-critical internal systems).
 */
@Service
public class RiskService {

    private final SiteService sites;
    private final RiskRepository inputs;
    private final MessageSource messages;
    private final Clock clock;

    RiskService(SiteService sites, RiskRepository inputs, MessageSource messages, Clock clock) {
        this.sites = sites;
        this.inputs = inputs;
        this.messages = messages;
        this.clock = clock;
    }

    /**
     * The assessment with the saved inputs, or with {@link RiskSettings#initial()} while none are
     * saved; without a verdict while an input is missing ({@link RiskAssessment#complete()}).
     *
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id
     */
    @Transactional(readOnly = true)
    public RiskAssessment assess(long siteId) {
        StoredSite site = sites.get(siteId);
        Optional<RiskSettings> saved = inputs.find(siteId);
        return assess(site, saved.orElse(RiskSettings.initial()), saved.isPresent());
    }

    /**
     * Checks and saves the inputs of a site; a missing field takes its default, or stays unchosen
     * where it has none (the inputs are saved all the same, and the result names what is missing).
     *
     * @param values each field's text by name (see {@link RiskSettingsParser#FIELDS})
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id (nothing is saved)
     * @throws InvalidInputException naming the first field that cannot be used (nothing is saved)
     */
    @Transactional
    public RiskAssessment save(long siteId, Function<String, String> values) {
        StoredSite site = sites.get(siteId);
        RiskSettings settings = RiskSettingsParser.parse(values);
        RiskAssessment assessment = assess(site, settings, true);
        inputs.save(siteId, settings, clock.instant().truncatedTo(ChronoUnit.MILLIS));
        return assessment;
    }

    /**
     * Makes the lowest sufficient protection level the site's level for its next analysis; the
     * site's custom radius is dropped so that the level's own sphere is used.
     *
     * @param expectedVersion the site's version as last read
     * @return the level set
     * @throws InvalidInputException when inputs are missing, no LPS is needed, or none of the levels is sufficient
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site changed meanwhile
     */
    @Transactional
    public ProtectionLevel selectLevel(long siteId, long expectedVersion) {
        RiskAssessment assessment = assess(siteId);
        if (!assessment.complete()) {
            throw new InvalidInputException("level", "risk inputs are missing (" + String.join(", ",
                    assessment.missing()) + "), so there is no estimate to take a level from; enter them first");
        }
        if (!assessment.hasVerdict()) {
            throw new InvalidInputException("level", "this estimate does not cover the structure ("
                    + String.join("; ", assessment.outside().stream().map(OutsideEstimate::description).toList())
                    + "), so there is no level to take from it");
        }
        ProtectionLevel level = assessment.choice().level().orElseThrow(() -> new InvalidInputException("level",
                assessment.choice().chosen().isPresent()
                        ? "R1 is tolerable without an LPS, so there is no protection level to select"
                        : "even protection level I leaves R1 above the tolerable risk, so no level can be selected;"
                                + " add further measures and assess again"));
        sites.update(siteId, expectedVersion, null, level.name(), "");
        return level;
    }

    /**
     * The risk result of a site as a report section: one row per option (no LPS, levels IV to I)
     * with P_B, R_A, R_B, R_U, R_V, R1 and whether it is tolerable, and notes with the inputs, each
     * line's figures, the outcome, the dominant component and the limits of the estimate. Without a
     * verdict (inputs missing, or a structure outside the estimate) it has no table: its notes say
     * why, with the figures known so far.
     *
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id
     */
    @Transactional(readOnly = true)
    public ReportSection reportSection(long siteId, Locale locale) {
        return section(assess(siteId), locale);
    }

    /** The report section of an assessment already made; see {@link #reportSection(long, Locale)}. */
    public ReportSection section(RiskAssessment a, Locale locale) {
        if (!a.hasVerdict()) {
            List<String> notes = new ArrayList<>();
            notes.add(outcome(a, locale));
            notes.addAll(figures(a, locale));
            notes.add(text(locale, "risk.limits.components"));
            notes.add(text(locale, "risk.limits.edition"));
            return new ReportSection(text(locale, "risk.report.title"), List.of(), List.of(), notes);
        }
        List<String> columns = List.of(text(locale, "risk.table.option"), text(locale, "risk.table.pb"),
                text(locale, "risk.table.ra"), text(locale, "risk.table.rb"), text(locale, "risk.table.ru"),
                text(locale, "risk.table.rv"), text(locale, "risk.table.r1"), text(locale, "risk.table.tolerable"));
        List<List<String>> rows = new ArrayList<>();
        for (LifeRisk option : a.choice().options()) {
            rows.add(List.of(optionName(option, locale), RiskFormat.significant(option.pb()),
                    RiskFormat.scientific(option.ra()), RiskFormat.scientific(option.rb()),
                    RiskFormat.scientific(option.ru()), RiskFormat.scientific(option.rv()),
                    RiskFormat.scientific(option.r1()),
                    text(locale, option.isTolerable() ? "risk.table.yes" : "risk.table.no")));
        }
        List<String> notes = new ArrayList<>();
        notes.add(outcome(a, locale));
        notes.addAll(figures(a, locale));
        notes.addAll(lineResults(a, locale));
        notes.add(dominance(a, locale));
        notes.add(text(locale, "risk.limits.components"));
        notes.add(text(locale, "risk.limits.edition"));
        notes.add(text(locale, "risk.limits.memory"));
        notes.add(text(locale, "risk.limits.geometry"));
        return new ReportSection(text(locale, "risk.report.title"), columns, rows, notes);
    }

    /**
     * The outcome in one sentence; while inputs are missing, which ones; for a structure outside the
     * estimate, why and what to do; no verdict in either case.
     */
    String outcome(RiskAssessment a, Locale locale) {
        if (!a.complete()) {
            return text(locale, "risk.outcome.missing", missingText(a, locale));
        }
        if (!a.hasVerdict()) {
            return text(locale, "risk.outcome.outside", String.join("; ", a.outside().stream()
                    .map(o -> text(locale, "risk.outside." + o.name())).toList()));
        }
        LevelChoice choice = a.choice();
        if (choice.chosen().isEmpty()) {
            return text(locale, "risk.outcome.none", RiskFormat.scientific(choice.options().get(4).r1()));
        }
        LifeRisk chosen = choice.chosen().get();
        if (chosen.level() == null) {
            return text(locale, "risk.outcome.noLps", RiskFormat.scientific(chosen.r1()));
        }
        String outcome = text(locale, "risk.outcome.level", chosen.level().name(),
                RiskFormat.scientific(a.withoutLps().r1()), RiskFormat.scientific(chosen.r1()));
        return chosen.lines().isEmpty() ? outcome : outcome + " " + text(locale, "risk.outcome.bonding",
                chosen.level().name());
    }

    /** The labels of the missing inputs, joined in the form's order. */
    String missingText(RiskAssessment a, Locale locale) {
        return String.join("; ", a.missing().stream().map(f -> "flashDensity".equals(f)
                && a.settings().flashDensitySource() == null ? text(locale, "risk.missing.groundFlashDensity")
                : text(locale, "risk.field." + f + ".label")).toList());
    }

    /** N_G, A_D, C_D, N_D and the flashes to each line in words, one line each, as far as they are known. */
    List<String> figures(RiskAssessment a, Locale locale) {
        RiskSettings s = a.settings();
        List<String> lines = new ArrayList<>();
        if (s.hasGroundFlashDensity()) {
            lines.add(s.flashDensitySource() == FlashDensitySource.MEASURED
                    ? text(locale, "risk.figure.ngMeasured", RiskFormat.significant(s.groundFlashDensity()))
                    : text(locale, "risk.figure.ngDays", RiskFormat.significant(s.groundFlashDensity()),
                            RiskFormat.significant(s.thunderstormDays())));
        }
        lines.add(text(locale, "risk.figure.ad", RiskFormat.area(a.area().upperBound()),
                RiskFormat.percent(a.area().maxRelativeError() * 100), RiskFormat.area(a.area().area())));
        if (a.location() != null) {
            lines.add(text(locale, s.location() == null ? "risk.figure.cdSuggested" : "risk.figure.cdChosen",
                    RiskFormat.significant(a.location().value()),
                    text(locale, "risk.location." + a.location().name())));
        }
        if (a.events() != null) {
            lines.add(text(locale, "risk.figure.nd", RiskFormat.scientific(a.events().perYear())));
        }
        if (s.lines() != null && s.lines().isEmpty()) {
            lines.add(text(locale, "risk.figure.noLines"));
        }
        for (int i = 0; i < a.lines().size(); i++) {
            RiskAssessment.LineFlashes f = a.lines().get(i);
            IncomingLine l = f.line();
            lines.add(text(locale, "risk.figure.line", i + 1, l.installation().description(),
                    Formats.oneDecimal(l.length()), l.environment().description(), l.transformer().description(),
                    RiskFormat.area(f.collectionArea()), RiskFormat.significant(l.lineFactors()),
                    RiskFormat.scientific(f.flashesPerYear()), RiskFormat.area(f.nearArea()),
                    RiskFormat.scientific(f.flashesNearPerYear())));
        }
        return lines;
    }

    /** For each line: P_LD, C_LD, P_TU and P_EB with R_U and R_V without an LPS and at the level chosen. */
    List<String> lineResults(RiskAssessment a, Locale locale) {
        List<String> out = new ArrayList<>();
        if (!a.hasVerdict()) {
            return out;
        }
        LifeRisk none = a.withoutLps();
        LifeRisk shown = a.choice().chosen().orElse(a.choice().options().get(a.choice().options().size() - 1));
        for (int i = 0; i < none.lines().size(); i++) {
            LineRisk l = none.lines().get(i);
            LineRisk with = shown.lines().get(i);
            IncomingLine line = l.line();
            String result = text(locale, "risk.figure.lineRisk", i + 1,
                    line.shielding().description(),
                    RiskFormat.significant(line.pld()), RiskFormat.significant(line.withstand().kilovolts()),
                    RiskFormat.significant(line.cld()), RiskFormat.significant(line.touchProtection().ptu()),
                    RiskFormat.significant(l.peb()), RiskFormat.scientific(l.ru()), RiskFormat.scientific(l.rv()));
            if (shown.level() != null) {
                result += " " + text(locale, "risk.figure.lineRiskWithLps", shown.level().name(),
                        RiskFormat.significant(with.peb()), RiskFormat.scientific(with.ru()),
                        RiskFormat.scientific(with.rv()));
            }
            out.add(result);
        }
        return out;
    }

    /** Which component dominates without an LPS, and its share of R1; null without a verdict. */
    String dominance(RiskAssessment a, Locale locale) {
        if (!a.hasVerdict()) {
            return null;
        }
        LifeRisk none = a.withoutLps();
        if (none.r1() == 0) {
            return text(locale, "risk.dominant.zero");
        }
        double part = none.component(none.dominant());
        return text(locale, "risk.dominant." + none.dominant().name(), Formats.percent(100 * part / none.r1()));
    }

    String optionName(LifeRisk option, Locale locale) {
        return option.level() == null ? text(locale, "risk.option.none")
                : text(locale, "risk.option.level", option.level().name());
    }

    private RiskAssessment assess(StoredSite site, RiskSettings settings, boolean saved) {
        Site geometry = sites.document(site).site();
        CollectionArea area = CollectionAreaOp.of(geometry);
        LocationSuggestion suggestion = LocationSuggestion.of(geometry);
        LocationFactor location = settings.location() != null ? settings.location()
                : settings.useSuggestedLocation() ? suggestion.factor() : null;
        DangerousEvents events = location == null || !settings.hasGroundFlashDensity() ? null
                : new DangerousEvents(settings.groundFlashDensity(), area.upperBound(), location);
        List<OutsideEstimate> outside = List.of();
        LevelChoice choice = null;
        if (settings.complete()) {
            LifeRiskInputs inputs = settings.lifeRiskInputs(events);
            outside = inputs.outsideEstimate();
            choice = outside.isEmpty() ? LifeRiskEstimate.choose(inputs) : null;
        }
        List<RiskAssessment.LineFlashes> lines = settings.lines() == null || !settings.hasGroundFlashDensity()
                ? List.of() : settings.lines().stream()
                        .map(l -> RiskAssessment.LineFlashes.of(l, settings.groundFlashDensity())).toList();
        return new RiskAssessment(site, geometry, settings, saved, area, suggestion, events, outside, choice, lines);
    }

    private String text(Locale locale, String key, Object... args) {
        return messages.getMessage(key, args, locale);
    }
}
