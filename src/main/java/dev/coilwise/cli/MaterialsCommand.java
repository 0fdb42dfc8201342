package dev.coilwise.cli;

import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.materials.StrengthBand;
import dev.coilwise.report.Caution;
import java.util.Locale;
import picocli.CommandLine.Command;

@Command(name = "materials", header = "List the spring materials, their data and sources.")
final class MaterialsCommand extends BaseCommand {
    @Override
    int execute() {
        MaterialTable t = MaterialTable.loadDefault();
        out().println(String.format(Locale.ROOT, "%-16s %-11s %-15s %-28s %-9s %-10s %-6s %s", "key", "standard",
                "d range mm", "Sut = A/d^m (A MPa*mm^m; m)", "G GPa", "allow %", "cost", "density kg/m3"));
        for (Material m : t.all()) {
            StringBuilder fit = new StringBuilder();
            for (StrengthBand b : m.strength()) {
                if (fit.length() > 0) {
                    fit.append(" | ");
                }
                fit.append(String.format(Locale.ROOT, "%.0f; %.3f", b.constantMpaMm(), b.exponent()));
            }
            double dMid = Math.sqrt(m.minDiameter() * m.maxDiameter());
            out().println(String.format(Locale.ROOT, "%-16s %-11s %-15s %-28s %-9.1f %-10s %-6.1f %.0f", m.key(),
                    m.standard(), String.format(Locale.ROOT, "%.2f-%.2f", m.minDiameter() * 1e3, m.maxDiameter() * 1e3),
                    fit, m.shearModulus(dMid) * 1e-9,
                    String.format(Locale.ROOT, "%.0f/%.0f", m.allowableStatic() * 100, m.allowableSetRemoved() * 100),
                    m.relativeCost(), m.density()));
        }
        out().println();
        out().println("allow %: static allowable torsional stress as % of Sut, before / after set removal.");
        out().println("G is shown at the middle of the diameter range; it varies by diameter band for some wires.");
        out().println();
        for (Material m : t.all()) {
            out().println(m.key() + ": " + m.source());
        }
        out().println();
        out().print(t.sources());
        out().println();
        out().println(Caution.TEXT);
        return ExitCode.OK;
    }
}
