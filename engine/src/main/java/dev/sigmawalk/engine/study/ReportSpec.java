package dev.sigmawalk.engine.study;

import java.util.Objects;

/**
 * The optional {@code report:} section: how the report is laid out.
 *
 * @param paper the paper of {@code report.pdf} and of the report's print style sheet
 */
public record ReportSpec(Paper paper) {
    public ReportSpec {
        Objects.requireNonNull(paper, "paper");
    }

    public static ReportSpec defaults() {
        return new ReportSpec(StudyDefaults.PAPER);
    }
}
