/**
 * Replays of a robot policy, step by step: the worst case of a certified policy, the nominal run, a
 * scenario with events forced by the user, and the counterexample of a mission that is not
 * guaranteed, each with a plain-words explanation.
 * Entry point: {@link dockline.replay.Replayer}; rows are {@link dockline.replay.ReplayStep}s, output
 * formats in {@link dockline.replay.ReplayFormats}.
 */
package dockline.replay;
