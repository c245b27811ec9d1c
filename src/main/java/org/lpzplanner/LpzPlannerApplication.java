package org.lpzplanner;

import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;

@SpringBootApplication
public class LpzPlannerApplication {
    public static void main(String[] args) {
        SpringApplication.run(LpzPlannerApplication.class, args);
    }
}
