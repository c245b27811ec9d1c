package org.lpzplanner.accounts;

import jakarta.servlet.ServletContext;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletRequestWrapper;
import jakarta.servlet.http.HttpSession;
import java.util.Collections;
import java.util.Enumeration;
import java.util.HashMap;
import java.util.Map;
import java.util.UUID;

/**
 * A request that neither sees a stored session nor stores one. Whatever asks it for a session (a
 * page template reading the form token, an error page) gets one that lives as long as this request
 * and is then forgotten: nothing reaches the session store and no session cookie is set. A session
 * cookie sent along is ignored, so the request acts only as its API token says.
 */
final class SessionlessRequest extends HttpServletRequestWrapper {

    private RequestOnlySession session;

    SessionlessRequest(HttpServletRequest request) {
        super(request);
    }

    @Override
    public HttpSession getSession(boolean create) {
        if (session == null && create) {
            session = new RequestOnlySession(getServletContext());
        }
        return session;
    }

    @Override
    public HttpSession getSession() {
        return getSession(true);
    }

    @Override
    public String changeSessionId() {
        if (session == null) {
            throw new IllegalStateException("this request has no session");
        }
        session = new RequestOnlySession(getServletContext());
        return session.getId();
    }

    @Override
    public String getRequestedSessionId() {
        return null;
    }

    @Override
    public boolean isRequestedSessionIdValid() {
        return false;
    }

    @Override
    public boolean isRequestedSessionIdFromCookie() {
        return false;
    }

    @Override
    public boolean isRequestedSessionIdFromURL() {
        return false;
    }

    /** Attributes in memory for one request; never stored, never sent. */
    private static final class RequestOnlySession implements HttpSession {

        private final String id = UUID.randomUUID().toString();
        private final long created = System.currentTimeMillis();
        private final Map<String, Object> attributes = new HashMap<>();
        private final ServletContext context;
        private int maxInactiveSeconds;

        RequestOnlySession(ServletContext context) {
            this.context = context;
        }

        @Override
        public long getCreationTime() {
            return created;
        }

        @Override
        public String getId() {
            return id;
        }

        @Override
        public long getLastAccessedTime() {
            return created;
        }

        @Override
        public ServletContext getServletContext() {
            return context;
        }

        @Override
        public void setMaxInactiveInterval(int interval) {
            maxInactiveSeconds = interval;
        }

        @Override
        public int getMaxInactiveInterval() {
            return maxInactiveSeconds;
        }

        @Override
        public Object getAttribute(String name) {
            return attributes.get(name);
        }

        @Override
        public Enumeration<String> getAttributeNames() {
            return Collections.enumeration(attributes.keySet());
        }

        @Override
        public void setAttribute(String name, Object value) {
            if (value == null) {
                attributes.remove(name);
            } else {
                attributes.put(name, value);
            }
        }

        @Override
        public void removeAttribute(String name) {
            attributes.remove(name);
        }

        @Override
        public void invalidate() {
            attributes.clear();
        }

        @Override
        public boolean isNew() {
            return true;
        }
    }
}
