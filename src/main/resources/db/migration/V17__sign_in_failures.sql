-- Failed sign-ins per account (by e-mail, also for e-mails no account has). An attempt is counted
-- here before its password is checked, by a compare-and-set on version, so that concurrent
-- attempts on any app instance never get more checks than the limit; a success deletes the row.
-- locked_until: no attempt is checked before then. Failures per client address stay in
-- sign_in_attempts.
CREATE TABLE sign_in_failures (
    email           VARCHAR(254) NOT NULL,
    failures        INT NOT NULL,
    locked_until    TIMESTAMP WITH TIME ZONE,
    last_failure_at TIMESTAMP WITH TIME ZONE NOT NULL,
    version         BIGINT NOT NULL,
    CONSTRAINT sign_in_failures_pk PRIMARY KEY (email)
);
CREATE INDEX sign_in_failures_last ON sign_in_failures (last_failure_at);
