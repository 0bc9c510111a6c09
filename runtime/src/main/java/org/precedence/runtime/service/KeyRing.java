package org.precedence.runtime.service;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * The keys a server holds, oldest first. The newest (last) key seals new session tokens; every
 * key in the ring opens the tokens sealed under it. Rotation: add a new key at the end, deploy
 * the ring to every replica, and drop an old key once the sessions it sealed have expired.
 */
public final class KeyRing {
    private final List<ServiceKey> keys;
    private final Map<Integer, ServiceKey> byId;

    /**
     * @param keys at least one key, oldest first, with distinct ids
     * @throws IllegalArgumentException if the list is empty or two keys share an id
     */
    public KeyRing(List<ServiceKey> keys) {
        Objects.requireNonNull(keys, "keys");
        if (keys.isEmpty()) {
            throw new IllegalArgumentException("a key ring needs at least one key");
        }
        Map<Integer, ServiceKey> map = new HashMap<>();
        for (ServiceKey k : keys) {
            Objects.requireNonNull(k, "key");
            if (map.putIfAbsent(k.id(), k) != null) {
                throw new IllegalArgumentException("key id " + k.id() + " appears twice");
            }
        }
        this.keys = List.copyOf(keys);
        this.byId = Map.copyOf(map);
    }

    /** Returns a ring of the given keys, oldest first. */
    public static KeyRing of(ServiceKey... keys) {
        return new KeyRing(List.of(keys));
    }

    /** Returns the key that seals new tokens: the newest (last) one. */
    public ServiceKey sealingKey() {
        return keys.get(keys.size() - 1);
    }

    /** Returns the key with this id, if the ring holds it. */
    public Optional<ServiceKey> find(int id) {
        return Optional.ofNullable(byId.get(id));
    }

    /** Returns all keys, oldest first. */
    public List<ServiceKey> keys() {
        return keys;
    }

    /** Returns the smallest id greater than every id in the ring, for the next key. */
    public int nextId() {
        int max = 0;
        for (ServiceKey k : keys) {
            max = Math.max(max, k.id());
        }
        if (max == Integer.MAX_VALUE) {
            throw new IllegalStateException("key ids are exhausted; start a new ring");
        }
        return max + 1;
    }

    /** Returns a ring with {@code key} added as the newest. */
    public KeyRing with(ServiceKey key) {
        java.util.ArrayList<ServiceKey> all = new java.util.ArrayList<>(keys);
        all.add(key);
        return new KeyRing(all);
    }
}
