package org.lpzplanner.cli;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/**
 * The command line and the shared texts are plain Java: running a command must not pull in Spring,
 * so that it starts no application context or web server.
 */
class PlainJavaTest {

    @Test
    void commandLineAndSharedTextsUseNoSpring() {
        JavaClasses classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.lpzplanner.cli", "org.lpzplanner.common");
        noClasses().that().resideInAnyPackage("org.lpzplanner.cli..", "org.lpzplanner.common..")
                .should().dependOnClassesThat().resideInAnyPackage("org.springframework..", "jakarta..")
                .check(classes);
    }
}
