package dev.coilwise.cli;

import dev.coilwise.model.Ranking;
import dev.coilwise.model.Requirement;

/** Command-line overrides of a requirement. */
final class Requirements {
    private Requirements() {
    }

    static Requirement withShortlist(Requirement r, int n) {
        Ranking k = r.ranking();
        return new Requirement(r.title(), r.job(), r.limits(), r.envelope(), r.spring(),
                new Ranking(k.by(), n, k.prefer(), k.dynamicsStrict(), k.minProbability()), r.units(), r.stock());
    }
}
