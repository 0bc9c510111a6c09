package org.precedence.runtime.service;

import com.github.benmanes.caffeine.cache.Cache;
import com.github.benmanes.caffeine.cache.Caffeine;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;

/**
 * Opens session tokens into ready sources. The token is the whole state; the bounded cache
 * only saves re-opening the same token (one AES-GCM decryption and one provider open) on every
 * round request, so a replica that has never seen a token serves it just the same.
 */
final class Sessions {
    /** An opened token. */
    record OpenSession(SessionClaims claims, TurnOrderSource source) {
    }

    private final TokenSealer sealer;
    private final TurnOrderProvider provider;
    private final Clock clock;
    private final Duration maxAge;
    private final Cache<String, OpenSession> cache = Caffeine.newBuilder().maximumSize(10_000).build();

    Sessions(TokenSealer sealer, TurnOrderProvider provider, Clock clock, Duration maxAge) {
        this.sealer = sealer;
        this.provider = provider;
        this.clock = clock;
        this.maxAge = maxAge;
    }

    String seal(SessionClaims claims) {
        return sealer.seal(claims);
    }

    int sealingKeyId() {
        return sealer.ring().sealingKey().id();
    }

    Instant expiresAt(SessionClaims claims) {
        return claims.createdAt().plus(maxAge);
    }

    /**
     * Opens a token, refusing it when it is invalid (400) or older than the session lifetime
     * (410).
     */
    OpenSession open(String token) {
        OpenSession s = cache.getIfPresent(token);
        if (s == null) {
            SessionClaims claims = sealer.open(token);
            s = new OpenSession(claims, provider.open(claims.spec()));
            cache.put(token, s);
        }
        Instant expires = expiresAt(s.claims());
        if (!clock.instant().isBefore(expires)) {
            throw new ApiException(410, "session_expired", "the session expired at " + expires
                    + " (sessions last " + maxAge.toDays() + " days); create a new one");
        }
        return s;
    }
}
