package org.precedence.runtime.service;

import java.util.Set;
import org.precedence.api.FairnessGrade;

/** GET /v1/sets/{players}[?grade=…]: the set served for a player count. */
final class SetEndpoint implements Endpoint {
    private final Backend backend;

    SetEndpoint(Backend backend) {
        this.backend = backend;
    }

    @Override
    public Reply handle(Request request) {
        request.allowQuery(Set.of("grade"));
        int players = backend.players(SessionEndpoints.parseCount(request.path("players")), "players");
        FairnessGrade grade = FairnessGrade.ORDER_FAIR;
        String g = request.query().get("grade");
        if (g != null) {
            grade = grade(g);
        }
        return Reply.ok(Shapes.set(backend.set(players, grade)));
    }

    private static FairnessGrade grade(String text) {
        for (FairnessGrade g : FairnessGrade.values()) {
            if (Wire.name(g).equalsIgnoreCase(text)) {
                return g;
            }
        }
        throw ApiException.badRequest("query parameter \"grade\" must be one of order_fair, seat_fair, lead_fair, "
                + "unfair; got \"" + JsonFields.abbreviate(text) + "\"");
    }
}
