package dockline.arena;

import dockline.model.Cell;

/**
 * A robot action as users and policy files see it: the kind and the cell it aims at (the
 * neighbour for a move, the robot's own cell for wait and charge).
 */
public record Action(ActionKind kind, Cell target) {

    @Override
    public String toString() {
        return kind == ActionKind.MOVE ? "move " + target : kind.word();
    }
}
