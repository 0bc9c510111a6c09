package org.precedence.cli;

import java.util.Locale;
import org.precedence.api.OrderRule;
import picocli.CommandLine.ITypeConverter;

/**
 * Reads {@code --rule}: the enum name in any case, with hyphens or underscores
 * ({@code balanced-lead}, {@code BALANCED_LEAD}).
 */
final class RuleNames implements ITypeConverter<OrderRule> {
    /** The accepted spellings, for help and messages. */
    static final String ALLOWED = "fresh-each-round, first-player-then-seating, snake, balanced-lead";

    @Override
    public OrderRule convert(String value) {
        String key = value.strip().replace('-', '_').toUpperCase(Locale.ROOT);
        for (OrderRule r : OrderRule.values()) {
            if (r.name().equals(key)) {
                return r;
            }
        }
        throw new UserInputException("unknown rule '" + value + "'; allowed: " + ALLOWED);
    }

    static String display(OrderRule rule) {
        return rule.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
