package org.lpzplanner.system;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.springframework.beans.factory.config.BeanFactoryPostProcessor;
import org.springframework.beans.factory.config.ConfigurableListableBeanFactory;
import org.springframework.context.EnvironmentAware;
import org.springframework.core.env.Environment;

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
        Path folder = Path.of(environment.getProperty("lpz.data-dir", "./data"));
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create the data folder " + folder.toAbsolutePath(), e);
        }
    }
}
