package org.tjmargin.design;

import java.util.List;
import org.tjmargin.derating.Policy;

/**
 * A derating policy read from a profile (and the profiles it extends), with the files it came from.
 *
 * @param policy the policy, its inheritance resolved
 * @param inputs every profile file read, the named one first (shipped profiles are named by their resource)
 */
public record LoadedPolicy(Policy policy, List<InputFile> inputs) {
    public LoadedPolicy {
        inputs = List.copyOf(inputs);
    }
}
