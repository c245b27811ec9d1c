package org.lpzplanner.system;

import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/** Start-up wiring shared by all features. */
@Configuration(proxyBeanMethods = false)
public class SystemConfiguration {

    /** Static: it must run before ordinary beans (the data source among them) are made. */
    @Bean
    static DataDirectory dataDirectory() {
        return new DataDirectory();
    }

    /** Migrations run through this strategy so that databases of earlier releases keep starting. */
    @Bean
    PortableMigrationUpgrade portableMigrationUpgrade() {
        return new PortableMigrationUpgrade();
    }
}
