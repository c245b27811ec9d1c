package org.lpzplanner.system;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.springframework.beans.factory.config.BeanFactoryPostProcessor;
import org.springframework.beans.factory.config.ConfigurableListableBeanFactory;
import org.springframework.context.EnvironmentAware;
import org.springframework.core.env.ConfigurableEnvironment;
import org.springframework.core.env.Environment;
import org.springframework.core.env.MapPropertySource;

/**
 * Creates the data folder ({@code lpz.data-dir}, default {@code ./data}) before any bean, so that
 * the database can be opened there on first start.
 */
public class DataDirectory implements BeanFactoryPostProcessor, EnvironmentAware {

    private Environment environment;

    @Override
    public void setEnvironment(Environment environment) {
        this.environment = environment;
    }

    @Override
    public void postProcessBeanFactory(ConfigurableListableBeanFactory beanFactory) {
        Path folder = Path.of(environment.getProperty("lpz.data-dir", "./data")).toAbsolutePath().normalize();
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create the data folder " + folder, e);
        }
        // H2 refuses a relative file path without a leading "./" (for example "data2"): every later
        // use of the setting, the database address included, sees the absolute folder instead
        if (environment instanceof ConfigurableEnvironment configurable) {
            configurable.getPropertySources().addFirst(
                    new MapPropertySource("lpz-data-dir", Map.of("lpz.data-dir", folder.toString())));
        }
    }
}
