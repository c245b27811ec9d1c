package org.lpzplanner.accounts;

import jakarta.servlet.DispatcherType;
import org.springframework.security.web.csrf.CsrfException;
import java.util.Map;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.context.annotation.Bean;
import org.springframework.boot.web.servlet.FilterRegistrationBean;
import org.springframework.context.annotation.Configuration;
import org.springframework.core.Ordered;
import org.springframework.http.HttpMethod;
import org.springframework.http.HttpStatus;
import org.springframework.security.authentication.AuthenticationManager;
import org.springframework.security.authentication.ProviderManager;
import org.springframework.security.authentication.dao.DaoAuthenticationProvider;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;
import org.springframework.security.crypto.password.DelegatingPasswordEncoder;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.security.web.DefaultRedirectStrategy;
import org.springframework.security.web.authentication.AuthenticationFailureHandler;
import org.springframework.security.web.authentication.LoginUrlAuthenticationEntryPoint;
import org.springframework.security.web.authentication.www.BasicAuthenticationFilter;
import org.springframework.security.web.header.writers.ReferrerPolicyHeaderWriter.ReferrerPolicy;
import org.springframework.security.web.session.DisableEncodeUrlFilter;
import org.springframework.security.web.savedrequest.HttpSessionRequestCache;
import org.springframework.security.web.savedrequest.RequestCache;
import org.springframework.security.web.util.matcher.RequestMatcher;
import org.lpzplanner.system.ApiProblem;
import org.lpzplanner.system.ProblemWriter;
import org.springframework.web.filter.RelativeRedirectFilter;

/**
 * Who may do what. Everything needs a signed-in account except the sign-in page, the first-run
 * setup page, static files, the error page and the health check. Reading is open to every role; comments and the
 * reviewed mark to every role; every other state-changing request needs a designer or an
 * administrator; account management needs an administrator. Team ownership of sites is checked
 * in the services ({@link CurrentAccount}), so another team's site answers 404 everywhere.
 *
 * <p>Pages use a session (shared by all app instances through Spring Session JDBC) and a CSRF
 * token on every form and state-changing call. API clients may instead send
 * {@code Authorization: Bearer <personal token>} to addresses under {@code /api/}, which needs no
 * CSRF token because browsers never add that header on their own; anywhere else a token is refused
 * ({@link ApiTokenScopeFilter}), and no request with a token opens a session. Forms carry the
 * token in a hidden field, the upload forms too: for a multipart body the servlet container parses
 * the parts when the CSRF check asks for the field (the dispatcher servlet has a multipart
 * configuration), so no address ever holds a token.
 */
@Configuration(proxyBeanMethods = false)
public class SecurityConfiguration {

    /** No inline script or style anywhere: every page's JavaScript and CSS are static files. */
    static final String CONTENT_SECURITY_POLICY = "default-src 'self'; script-src 'self'; style-src 'self';"
            + " img-src 'self' data:; object-src 'none'; base-uri 'self'; form-action 'self'; frame-ancestors 'none'";

    /**
     * BCrypt through the delegating encoder (hashes are stored as {@code {bcrypt}...}, so a later
     * algorithm can take over without resetting passwords). Strength 12 by default: 2^12 rounds.
     */
    @Bean
    PasswordEncoder passwordEncoder(@Value("${lpz.password.bcrypt-strength:12}") int strength) {
        return new DelegatingPasswordEncoder("bcrypt", Map.of("bcrypt", new BCryptPasswordEncoder(strength)));
    }

    /** Password sign-in behind the rate limit, with no other provider to fall back to. */
    @Bean
    AuthenticationManager authenticationManager(AccountRepository accounts, PasswordEncoder encoder,
            SignInThrottle throttle) {
        DaoAuthenticationProvider passwords = new DaoAuthenticationProvider(new AccountDetailsService(accounts));
        passwords.setPasswordEncoder(encoder);
        return new ProviderManager(new ThrottledAuthenticationProvider(passwords, throttle));
    }

    @Bean
    SecurityFilterChain securityFilterChain(HttpSecurity http, AuthenticationManager manager,
            ApiTokenService tokens, ProblemWriter problems) throws Exception {
        RequestMatcher api = ApiTokenScopeFilter::isApi;
        DefaultRedirectStrategy redirects = new DefaultRedirectStrategy();
        AuthenticationFailureHandler failure = (request, response, e) -> redirects.sendRedirect(request, response,
                e instanceof SignInThrottledException locked ? "/login?throttled=" + locked.waitMinutes()
                        : "/login?error");

        RequestCache askedPages = new HttpSessionRequestCache();
        LoginUrlAuthenticationEntryPoint signInPage = new LoginUrlAuthenticationEntryPoint("/login");
        // the entry point would otherwise build an absolute address from the request's Host header
        signInPage.setFavorRelativeUris(true);

        http.authenticationManager(manager)
                .addFilterBefore(new ApiTokenScopeFilter(problems), DisableEncodeUrlFilter.class)
                .addFilterBefore(new BearerTokenFilter(tokens, problems), BasicAuthenticationFilter.class)
                .authorizeHttpRequests(a -> a
                        .requestMatchers("/login", "/setup", "/css/**", "/js/**", "/favicon.ico", "/error").permitAll()
                        // load balancers and container health checks ask without an account; the
                        // answer holds no site data
                        .requestMatchers(HttpMethod.GET, "/actuator/health", "/actuator/health/**").permitAll()
                        .requestMatchers("/admin/**").hasRole(Role.ADMIN.name())
                        .requestMatchers(HttpMethod.POST, "/sites/*/comments", "/sites/*/reviewed",
                                "/api/sites/*/comments", "/api/sites/*/analyses/latest/reviewed", "/account/**")
                        .authenticated()
                        .requestMatchers(HttpMethod.GET, "/sites/*/delete").hasAnyRole(Role.ADMIN.name(),
                                Role.DESIGNER.name())
                        .requestMatchers(HttpMethod.GET, "/**").authenticated()
                        .requestMatchers(HttpMethod.HEAD, "/**").authenticated()
                        .anyRequest().hasAnyRole(Role.ADMIN.name(), Role.DESIGNER.name()))
                .requestCache(c -> c.requestCache(askedPages))
                .formLogin(f -> f.loginPage("/login").usernameParameter("email").failureHandler(failure)
                        .successHandler(new ReturnToAskedPage(askedPages)).permitAll())
                .logout(l -> l.logoutUrl("/logout").logoutSuccessUrl("/login?signedOut"))
                .csrf(c -> c.ignoringRequestMatchers(request -> BearerTokenFilter.hasBearer(request) && api.matches(request)))
                .exceptionHandling(e -> e
                        .defaultAuthenticationEntryPointFor((request, response, refused) -> problems.write(request,
                                response, ApiProblem.UNAUTHORIZED.with("sign in first, or send a personal API token"
                                        + " from the account page as Authorization: Bearer …"), null), api)
                        .defaultAuthenticationEntryPointFor(signInPage, request -> true)
                        .defaultAccessDeniedHandlerFor((request, response, denied) -> problems.write(request,
                                response, ApiProblem.FORBIDDEN.with(denied instanceof CsrfException
                                        ? "the request lacks a valid CSRF token: send the X-CSRF-TOKEN header of"
                                                + " the page, or use a personal API token (Authorization: Bearer)"
                                        : "your role may not do this"), null), api))
                .headers(h -> h
                        .contentSecurityPolicy(c -> c.policyDirectives(CONTENT_SECURITY_POLICY))
                        .frameOptions(f -> f.deny())
                        .referrerPolicy(r -> r.policy(ReferrerPolicy.SAME_ORIGIN)));
        return http.build();
    }

    /**
     * Redirects keep the relative address they are given: the servlet container would otherwise
     * complete it with the request's {@code Host} header, which a client may forge. First of all
     * filters, so that the redirects of the sign-in are covered too.
     */
    @Bean
    FilterRegistrationBean<RelativeRedirectFilter> relativeRedirects() {
        RelativeRedirectFilter filter = new RelativeRedirectFilter();
        filter.setRedirectStatus(HttpStatus.FOUND);
        FilterRegistrationBean<RelativeRedirectFilter> registration = new FilterRegistrationBean<>(filter);
        registration.setOrder(Ordered.HIGHEST_PRECEDENCE);
        registration.setDispatcherTypes(DispatcherType.REQUEST, DispatcherType.ERROR, DispatcherType.ASYNC);
        return registration;
    }
}
