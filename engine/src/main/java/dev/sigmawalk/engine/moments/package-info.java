/**
 * Window moments at research scale: a cache-blocked kernel for the upper triangle of X'X, and
 * running sums per window length that move from one rebalance to the next by adding and
 * removing rows.
 */
package dev.sigmawalk.engine.moments;
