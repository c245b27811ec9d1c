# LPZ Planner as a container: built from source in a Maven stage, run on a Java 17 runtime as an
# unprivileged user. Configuration comes from environment variables (see docs/deployment.md).
FROM maven:3.9-eclipse-temurin-17 AS build
WORKDIR /src
COPY pom.xml .
RUN mvn -B -ntp -q dependency:go-offline
COPY src ./src
RUN mvn -B -ntp -q -DskipTests package

FROM eclipse-temurin:17-jre
RUN useradd --system --uid 10001 --home-dir /app lpz \
    && mkdir -p /app /data && chown lpz /data
COPY --from=build /src/target/lpz-planner.jar /app/lpz-planner.jar
USER lpz
WORKDIR /app
# The H2 data folder when no PostgreSQL is configured; unused under the postgres profile.
ENV LPZ_DATA_DIR=/data
EXPOSE 8080
# /actuator/health answers {"status":"UP"} once the app and its database are up (bash is in the image; curl is not).
HEALTHCHECK --interval=15s --timeout=5s --start-period=60s --retries=3 \
  CMD bash -c 'exec 3<>/dev/tcp/127.0.0.1/8080 && printf "GET /actuator/health HTTP/1.0\r\n\r\n" >&3 && grep -q "\"status\":\"UP\"" <&3'
ENTRYPOINT ["java", "-XX:MaxRAMPercentage=75", "-jar", "/app/lpz-planner.jar"]
