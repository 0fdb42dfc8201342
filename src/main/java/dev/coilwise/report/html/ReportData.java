package dev.coilwise.report.html;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import dev.coilwise.model.UnitSystem;
import dev.coilwise.report.DisplayUnits;
import dev.coilwise.report.Json;
import dev.coilwise.report.ShortlistJson;
import dev.coilwise.search.SizingResult;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Everything the HTML report shows, SI inside. Built only from the content of {@code shortlist.json}: a fresh sizing
 * goes through the same JSON text ({@link #of(SizingResult)}), so {@code size --out} and {@code report} cannot
 * render different reports from the same shortlist.
 *
 * @param title       requirement title
 * @param arrest      arrest (true) or launch
 * @param units       display unit system (that of the requirement)
 * @param asked       the requirement in plain sentences, with units
 * @param stroke      the stroke limit, m
 * @param forceLimit  the peak (arrest) or cocking (launch) force limit, N, or NaN
 * @param rankedBy    ranking criterion key
 * @param search      what was searched
 * @param designs     the shortlist, best first
 * @param families    the best feasible design of every family, in ranking order (empty when not saved)
 * @param diagnosis   why nothing was feasible, when nothing was
 * @param warnings    notes for the designer
 */
public record ReportData(String title, boolean arrest, UnitSystem units, List<String> asked,
                         double stroke, double forceLimit, String rankedBy, SearchCounts search,
                         List<ReportDesign> designs, List<FamilyPoint> families, Optional<ReportDiagnosis> diagnosis,
                         List<String> warnings) {
    /** The format marker of a saved shortlist. */
    public static final String FORMAT = "coilwise-shortlist";

    public ReportData {
        asked = List.copyOf(asked);
        designs = List.copyOf(designs);
        families = List.copyOf(families);
        warnings = List.copyOf(warnings);
    }

    /**
     * What the search covered.
     *
     * @param families         families in the design space (material × end type × wire diameter)
     * @param materials        materials searched
     * @param ends             end types searched
     * @param wireSizes        wire diameters searched
     * @param evaluated        candidates fully evaluated
     * @param feasibleFamilies families with at least one feasible design
     */
    public record SearchCounts(long families, int materials, int ends, int wireSizes, long evaluated,
                               long feasibleFamilies) {
        static SearchCounts from(JsonIn s) {
            return new SearchCounts((long) s.number("families"), s.texts("materials").size(),
                    s.texts("ends").size(), s.numbers("wire_diameters_mm").length,
                    (long) s.number("candidates_evaluated"), (long) s.number("feasible_families"));
        }
    }

    public DisplayUnits display() {
        return new DisplayUnits(units);
    }

    public boolean feasible() {
        return !designs.isEmpty();
    }

    /** The report data of a fresh sizing, read back from its shortlist.json text. */
    public static ReportData of(SizingResult result) {
        return parse(ShortlistJson.write(result));
    }

    /** The report data of a saved shortlist.json text. */
    public static ReportData parse(String shortlistJson) {
        try {
            return fromJson(Json.MAPPER.readTree(shortlistJson));
        } catch (JsonProcessingException e) {
            throw BadInputException.of(Message.JSON_SYNTAX, e.getOriginalMessage());
        }
    }

    public static ReportData fromJson(JsonNode tree) {
        JsonIn root = JsonIn.root(tree);
        String format = root.text("format", null);
        if (!FORMAT.equals(format)) {
            throw BadInputException.of(Message.NOT_A_SHORTLIST, format == null ? "missing" : "'" + format + "'");
        }
        if (!root.has("format_version") || root.number("format_version") != ShortlistJson.FORMAT) {
            throw BadInputException.of(Message.SHORTLIST_VERSION,
                    root.has("format_version") ? String.valueOf(tree.get("format_version")) : "(missing)",
                    ShortlistJson.FORMAT);
        }
        JsonIn req = root.object("requirement");
        boolean arrest = switch (req.text("job")) {
            case "arrest" -> true;
            case "launch" -> false;
            default -> throw BadInputException.of(Message.SAVED_FIELD, "requirement.job", "'" + req.text("job") + "'",
                    "arrest or launch");
        };
        UnitSystem units = switch (req.text("units").toLowerCase(Locale.ROOT)) {
            case "si" -> UnitSystem.SI;
            case "us" -> UnitSystem.US;
            default -> throw BadInputException.of(Message.SAVED_FIELD, "requirement.units",
                    "'" + req.text("units") + "'", "si or us");
        };
        List<ReportDesign> designs = new ArrayList<>();
        root.objects("designs").forEach(d -> designs.add(ReportDesign.from(d, arrest)));
        List<FamilyPoint> families = new ArrayList<>();
        if (root.has("feasible_families")) {
            root.objects("feasible_families").forEach(f -> families.add(FamilyPoint.from(f, arrest)));
        }
        JsonIn limits = req.object("limits");
        return new ReportData(req.text("title", ""), arrest, units,
                RequirementWords.sentences(req, new DisplayUnits(units)), limits.mm("stroke_mm"),
                limits.optionalNumber("peak_force_N"), req.object("ranking").text("by"),
                SearchCounts.from(root.object("search")), designs, families,
                root.optionalObject("diagnosis").map(ReportDiagnosis::from), root.texts("warnings"));
    }
}
