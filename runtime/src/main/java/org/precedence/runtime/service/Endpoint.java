package org.precedence.runtime.service;

/** Handles one routed request; throws {@link ApiException} for anything it refuses. */
@FunctionalInterface
interface Endpoint {
    Reply handle(Request request);
}
