package org.tracewell.report;

/**
 * The report's own style sheet: plain, print-friendly (A4, black text, tables that break cleanly, charts
 * kept whole), status colours paired with their words so nothing is said by colour alone.
 */
final class ReportStyle {

    static final String CSS = """
            :root { --ink: #1f2933; --muted: #52606d; --rule: #cbd2d9; --band: #f5f7fa;
                    --met: #1e6b3a; --met-bg: #e3f4e8; --violated: #9b1c2c; --violated-bg: #fbe4e6;
                    --open: #7a5a00; --open-bg: #fdf3d3; }
            html { font-family: "Segoe UI", "Helvetica Neue", Arial, sans-serif; color: var(--ink);
                   font-size: 14px; line-height: 1.45; }
            body { max-width: 1120px; margin: 0 auto; padding: 24px 28px 48px; }
            h1 { font-size: 1.9em; margin: 0 0 4px; }
            h2 { font-size: 1.4em; margin: 36px 0 10px; padding-bottom: 4px; border-bottom: 2px solid var(--ink); }
            h3 { font-size: 1.15em; margin: 24px 0 8px; }
            h4 { font-size: 1em; margin: 16px 0 6px; color: var(--muted); }
            p.subtitle { color: var(--muted); margin: 0 0 16px; }
            nav.contents ol { columns: 2; margin: 8px 0 0; padding-left: 20px; }
            nav.contents a { color: var(--ink); }
            .caution { border: 3px solid var(--violated); background: var(--violated-bg); padding: 10px 14px;
                       margin: 16px 0; font-weight: 600; }
            .caution strong { text-transform: uppercase; letter-spacing: 0.04em; margin-right: 6px; }
            .verdict { font-size: 1.25em; font-weight: 700; padding: 10px 14px; margin: 12px 0;
                       border-left: 8px solid var(--rule); background: var(--band); }
            .verdict.met { border-color: var(--met); }
            .verdict.violated { border-color: var(--violated); }
            .verdict.not-evaluated { border-color: var(--open); }
            .status { display: inline-block; padding: 1px 8px; border-radius: 3px; font-weight: 700;
                      border: 1px solid currentColor; white-space: nowrap; }
            .status.met { color: var(--met); background: var(--met-bg); }
            .status.violated { color: var(--violated); background: var(--violated-bg); }
            .status.not-evaluated { color: var(--open); background: var(--open-bg); }
            .status.none { color: var(--muted); border-style: dotted; font-weight: 400; }
            .table-wrap { overflow-x: auto; margin: 8px 0 16px; }
            table { border-collapse: collapse; width: 100%; font-size: 0.93em; }
            caption { text-align: left; font-weight: 600; padding: 4px 0; color: var(--muted); }
            th, td { border: 1px solid var(--rule); padding: 3px 7px; vertical-align: top; text-align: left; }
            thead th { background: var(--band); }
            table.budget td:last-child { min-width: 16em; }
            td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
            tr.level-1 td:first-child { padding-left: 22px; }
            tr.level-2 td:first-child { padding-left: 40px; }
            dl.facts { display: grid; grid-template-columns: max-content 1fr; gap: 2px 16px; margin: 8px 0; }
            dl.facts dt { font-weight: 600; }
            dl.facts dd { margin: 0; }
            figure { margin: 10px 0 18px; }
            figure img { max-width: 100%; height: auto; border: 1px solid var(--rule); }
            figcaption { color: var(--muted); font-size: 0.9em; margin-top: 2px; }
            .charts { display: flex; flex-wrap: wrap; gap: 12px; }
            .charts figure { flex: 1 1 460px; }
            ul.notes { color: var(--muted); }
            .muted { color: var(--muted); }
            footer { margin-top: 40px; color: var(--muted); font-size: 0.9em; border-top: 1px solid var(--rule);
                     padding-top: 8px; }
            @page { size: A4; margin: 14mm; }
            @media print {
              html { font-size: 10.5pt; }
              body { max-width: none; padding: 0; }
              nav.contents { display: none; }
              h2 { break-before: page; }
              h2.first { break-before: avoid; }
              h2, h3, h4 { break-after: avoid; }
              figure, tr, .caution, .verdict { break-inside: avoid; }
              thead { display: table-header-group; }
              .table-wrap { overflow: visible; }
              .status, .caution, .verdict { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
              a { color: inherit; text-decoration: none; }
            }
            """;

    private ReportStyle() {
    }
}
