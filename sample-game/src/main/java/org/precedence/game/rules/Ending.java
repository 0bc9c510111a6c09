package org.precedence.game.rules;

/** Why a game ended. */
public enum Ending {
    /** Every lantern on the board is lit. */
    ALL_LIT("every lantern is lit"),
    /** The last round was played. */
    ROUNDS_OUT("the last round is over"),
    /** Only one boat is left in the game. */
    LAST_BOAT("only one boat is left");

    private final String description;

    Ending(String description) {
        this.description = description;
    }

    /** Returns the reason as the table says it. */
    public String description() {
        return description;
    }
}
