package org.lpzplanner.system;

import java.util.List;
import org.springframework.beans.factory.support.BeanDefinitionRegistry;
import org.springframework.beans.factory.support.RootBeanDefinition;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.test.context.ContextConfigurationAttributes;
import org.springframework.test.context.ContextCustomizer;
import org.springframework.test.context.ContextCustomizerFactory;
import org.springframework.test.context.MergedContextConfiguration;

/**
 * Puts {@link TestClock} into every Spring test context as the primary clock. The customizer is
 * the same for every test class, so it does not split the context cache.
 */
public class TestClockCustomizerFactory implements ContextCustomizerFactory {

    @Override
    public ContextCustomizer createContextCustomizer(Class<?> testClass,
            List<ContextConfigurationAttributes> configAttributes) {
        return new Customizer();
    }

    private record Customizer() implements ContextCustomizer {

        @Override
        public void customizeContext(ConfigurableApplicationContext context, MergedContextConfiguration config) {
            RootBeanDefinition clock = new RootBeanDefinition(TestClock.class);
            clock.setPrimary(true);
            ((BeanDefinitionRegistry) context.getBeanFactory()).registerBeanDefinition("testClock", clock);
        }
    }
}
