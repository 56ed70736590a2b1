package dev.sigmawalk.sample;

import java.util.Objects;

/**
 * One invented sector of the Brennmark economy.
 *
 * @param code two capital letters, the prefix of its companies' ids
 * @param name display name
 * @param betaCentre middle of the range its companies' betas are drawn from
 * @param sharedResidualShare ρ_s in [0, 1): the share of each member's residual variance that is
 *     a common sector shock; two members' residuals then have correlation ρ_s (0 = independent
 *     residuals, the single-index model holds exactly)
 */
record Sector(String code, String name, double betaCentre, double sharedResidualShare) {
    Sector {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(name, "name");
        if (!code.matches("[A-Z]{2}")) {
            throw new IllegalArgumentException("sector code '" + code + "' must be two capital letters");
        }
        if (!(betaCentre > 0 && betaCentre < 3)) {
            throw new IllegalArgumentException("sector " + code + ": beta centre (" + betaCentre + ") must be in (0, 3)");
        }
        if (!(sharedResidualShare >= 0 && sharedResidualShare < 1)) {
            throw new IllegalArgumentException("sector " + code + ": shared residual share ("
                    + sharedResidualShare + ") must be in [0, 1)");
        }
    }

    boolean hasSharedShock() {
        return sharedResidualShare > 0;
    }
}
