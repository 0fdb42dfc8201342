package dev.coilwise.search;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.Requirement;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Sizes a requirement: search, shortlist, and a diagnosis when nothing is feasible. */
public final class Sizer {
    private final MaterialTable materials;
    private final SpringSearch search;

    public Sizer(MaterialTable materials) {
        this(materials, new PrunedSearch());
    }

    public Sizer(MaterialTable materials, SpringSearch search) {
        this.materials = materials;
        this.search = search;
    }

    public SizingResult size(Requirement req) {
        DesignSpace space = DesignSpace.of(req, materials);
        SearchResult result = search.run(space);
        List<ShortlistEntry> list = new ArrayList<>();
        List<Candidate> top = result.top(req.ranking().shortlist());
        for (int i = 0; i < top.size(); i++) {
            list.add(new ShortlistEntry(i + 1, top.get(i)));
        }
        List<String> warnings = new ArrayList<>();
        for (ShortlistEntry e : list) {
            e.evaluation().margins().stream().filter(m -> !m.hard() && !m.holds()).forEach(m -> warnings.add(
                    "design " + e.rank() + ": " + softWarning(m)));
        }
        Optional<Diagnosis> diagnosis = list.isEmpty() ? Optional.of(Diagnoser.diagnose(space)) : Optional.empty();
        return new SizingResult(req, result, list, diagnosis, warnings);
    }

    private static String softWarning(Margin m) {
        return switch (m.key()) {
            case "buckling" -> "would buckle unguided at its working deflection; it relies on the bore or rod to guide it";
            case "stress_solid" -> "is over-stressed if compressed solid (solid_safe is off): it must never reach solid";
            default -> m.key() + " limit exceeded by " + Math.round(-m.value() * 100) + " %";
        };
    }
}
