package dev.sigmawalk.engine.model;

/**
 * Turns one estimation window into target weights. One instance serves one (strategy, window
 * length) path, called in date order by one thread, so it may keep warm-start state between
 * calls; it must never let that state change the answer beyond solver tolerance.
 */
public interface Allocator {
    Decision decide(EstimationWindow window);
}
