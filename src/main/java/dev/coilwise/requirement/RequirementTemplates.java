package dev.coilwise.requirement;

import dev.coilwise.error.InternalFaultException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/**
 * Commented requirement templates, one per job, for a user to copy and fill in. Each lists every key with its
 * meaning and default, and parses as it stands (tested). The {@code new} command adds the safety caution, which has
 * one source for every output ({@code report.Caution}).
 */
public final class RequirementTemplates {
    static final String ARREST_RESOURCE = "/dev/coilwise/requirement/template-arrest.yaml";
    static final String LAUNCH_RESOURCE = "/dev/coilwise/requirement/template-launch.yaml";

    private RequirementTemplates() {
    }

    /** Template for {@code job: arrest}. */
    public static String arrest() {
        return load(ARREST_RESOURCE);
    }

    /** Template for {@code job: launch}. */
    public static String launch() {
        return load(LAUNCH_RESOURCE);
    }

    private static String load(String resource) {
        try (InputStream in = RequirementTemplates.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new InternalFaultException("requirement template missing from the jar: " + resource);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
