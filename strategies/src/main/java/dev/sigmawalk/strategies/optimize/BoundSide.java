package dev.sigmawalk.strategies.optimize;

/** Where a weight sits in an active-set partition: on its lower bound, strictly free, or on its upper bound. */
public enum BoundSide {
    LOWER,
    FREE,
    UPPER
}
