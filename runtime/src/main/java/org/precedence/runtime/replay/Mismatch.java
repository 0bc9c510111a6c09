package org.precedence.runtime.replay;

/**
 * The first disagreement between a log and its recomputation.
 *
 * @param round    the round (-1 for session-level fields such as the commitment)
 * @param field    what disagreed: {@code faces}, {@code order}, {@code setId}, {@code setSha256},
 *                 {@code commitment}, {@code seed}, {@code mode}
 * @param player   the player concerned (-1 if none); for {@code order}, the expected player
 * @param position the position in the order (-1 unless {@code field} is {@code order})
 * @param expected what recomputation gives
 * @param found    what the log says
 */
public record Mismatch(long round, String field, int player, int position, String expected, String found) {

    /** One line for people. */
    public String describe() {
        StringBuilder sb = new StringBuilder();
        if (round >= 0) {
            sb.append("round ").append(round).append(": ");
        }
        sb.append(field);
        if (position >= 0) {
            sb.append(" at position ").append(position);
        } else if (player >= 0) {
            sb.append(" of player ").append(player);
        }
        return sb.append(": expected ").append(expected).append(", found ").append(found).toString();
    }
}
