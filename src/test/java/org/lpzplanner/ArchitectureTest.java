package org.lpzplanner;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The engine is a plain library: the rest of the product depends on it, never the reverse. */
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
}
