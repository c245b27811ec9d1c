package org.lpzplanner;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.JavaMethodCall;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.plan.SitePageController;
import org.lpzplanner.sites.SiteRepository;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import tools.jackson.databind.json.JsonMapper;

/**
 * The engine is a plain library: the rest of the product depends on it, never the reverse. The
 * product's features (top-level packages) form no cycle, and the low packages (system, jobs, heavywork,
 * drawing, common) know no feature. A site's file changes only through the edit pipeline, which
 * alone analyses after a change.
 */
class ArchitectureTest {

    private static JavaClasses classes;

    @BeforeAll
    static void importProduct() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.lpzplanner");
    }

    @Test
    void engineUsesNoSpringServletOrPersistence() {
        noClasses().that().resideInAPackage("org.lpzplanner.engine..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "org.springframework..", "jakarta..", "javax.servlet..", "javax.persistence..",
                        "java.sql..", "org.hibernate..", "org.flywaydb..", "org.thymeleaf..")
                .check(classes);
    }

    @Test
    void engineDependsOnNothingElseOfTheProduct() {
        noClasses().that().resideInAPackage("org.lpzplanner.engine..")
                .should().dependOnClassesThat().resideOutsideOfPackages(
                        "org.lpzplanner.engine..", "java..", "javax.annotation..", "org.locationtech..",
                        "tools.jackson..", "com.fasterxml.jackson..")
                .check(classes);
    }

    @Test
    void engineLayersPointOneWay() {
        noClasses().that().resideInAnyPackage("org.lpzplanner.engine.model..", "org.lpzplanner.engine.geom..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "org.lpzplanner.engine.envelope..", "org.lpzplanner.engine.exposure..", "org.lpzplanner.engine.io..")
                .check(classes);
        noClasses().that().resideInAPackage("org.lpzplanner.engine.envelope..")
                .should().dependOnClassesThat().resideInAnyPackage("org.lpzplanner.engine.exposure..", "org.lpzplanner.engine.io..")
                .check(classes);
    }

    /**
     * One JSON mapper: Spring components take the application's bean, code without a context
     * {@code engine.io.Json.MAPPER}; nothing else builds one.
     */
    @Test
    void onlyTheSharedJsonSettingsBuildAMapper() {
        noClasses().that().doNotHaveFullyQualifiedName("org.lpzplanner.engine.io.Json")
                .should().callMethod(JsonMapper.class, "builder")
                .orShould().callConstructor(JsonMapper.class)
                .check(classes);
    }

    @Test
    void featurePackagesFormNoCycle() {
        slices().matching("org.lpzplanner.(*)..").should().beFreeOfCycles().check(classes);
    }

    @Test
    void engineSubpackagesFormNoCycle() {
        slices().matching("org.lpzplanner.engine.(*)..").should().beFreeOfCycles().check(classes);
    }

    @Test
    void systemCommonAndJobsKnowNoFeature() {
        // heavywork: the one bound on long computations, which every feature uses
        noClasses().that().resideInAnyPackage("org.lpzplanner.system..", "org.lpzplanner.common..",
                "org.lpzplanner.jobs..", "org.lpzplanner.heavywork..")
                .should().dependOnClassesThat().resideInAnyPackage("org.lpzplanner.accounts..",
                        "org.lpzplanner.airtermination..", "org.lpzplanner.analysis..", "org.lpzplanner.audit..",
                        "org.lpzplanner.cli..", "org.lpzplanner.comments..", "org.lpzplanner.demo..",
                        "org.lpzplanner.design..", "org.lpzplanner.drawing..", "org.lpzplanner.editing..",
                        "org.lpzplanner.keepout..",
                        "org.lpzplanner.plan..",
                        "org.lpzplanner.report..", "org.lpzplanner.risk..", "org.lpzplanner.sections..",
                        "org.lpzplanner.sites..", "org.lpzplanner.transfer..")
                .check(classes);
    }

    @Test
    void drawingsKnowNoFeature() {
        // the plan drawing model, its style table and renderers: every feature may draw with them
        noClasses().that().resideInAPackage("org.lpzplanner.drawing..")
                .should().dependOnClassesThat().resideOutsideOfPackages("org.lpzplanner.drawing..",
                        "org.lpzplanner.common..", "java..")
                .check(classes);
    }

    @Test
    void storedSitesKnowNothingAboveThem() {
        noClasses().that().resideInAPackage("org.lpzplanner.sites..")
                .should().dependOnClassesThat().resideInAnyPackage("org.lpzplanner.analysis..",
                        "org.lpzplanner.editing..", "org.lpzplanner.airtermination..", "org.lpzplanner.plan..", "org.lpzplanner.sections..",
                        "org.lpzplanner.design..", "org.lpzplanner.report..", "org.lpzplanner.keepout..",
                        "org.lpzplanner.comments..", "org.lpzplanner.risk..", "org.lpzplanner.transfer..")
                .check(classes);
    }

    @Test
    void onlyTheEditPipelineAndAnalyseAgainRunAnAnalysisOfAStoredSite() {
        DescribedPredicate<JavaMethodCall> runsAnAnalysis = DescribedPredicate.describe("AnalysisService.run",
                call -> call.getName().equals("run") && call.getTargetOwner().isAssignableTo(AnalysisService.class));
        // after a change the edit pipeline analyses; "analyse again" is the page form, the API and its jobs
        noClasses().that().resideOutsideOfPackages("org.lpzplanner.analysis..", "org.lpzplanner.editing..")
                .and().doNotHaveFullyQualifiedName(SitePageController.class.getName())
                .should().callMethodWhere(runsAnAnalysis)
                .check(classes);
    }

    @Test
    void onlyTheEditPipelineReplacesASiteFile() {
        noClasses().that().resideOutsideOfPackages("org.lpzplanner.sites..", "org.lpzplanner.editing..")
                .should().callMethod(SiteService.class, "replaceFile", StoredSite.class, String.class,
                        org.lpzplanner.engine.io.SiteDocument.class)
                .orShould().callMethod(SiteRepository.class, "replaceFile", long.class, long.class, String.class,
                        java.time.Instant.class)
                .check(classes);
    }
}
