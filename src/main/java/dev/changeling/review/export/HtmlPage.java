package dev.changeling.review.export;

/** The frame of the HTML report: document head, the inline style sheet (system fonts only) and the body. */
final class HtmlPage {

    private static final String STYLE = """
            :root { color-scheme: light; }
            body { margin: 0; font: 15px/1.45 system-ui, -apple-system, "Segoe UI", Roboto, sans-serif; color: #1d2430; background: #f6f7f9; }
            header { background: #1f3348; color: #fff; padding: 18px 28px; }
            header h1 { margin: 0 0 6px; font-size: 22px; }
            header .summary { margin: 0; color: #d5dfea; }
            main { max-width: 1100px; margin: 0 auto; padding: 8px 28px 40px; }
            section { background: #fff; border: 1px solid #dde2e8; border-radius: 6px; padding: 6px 20px 16px; margin: 18px 0; overflow-x: auto; }
            table.tally { width: 100%; }
            section.further { border: 2px dashed #8aa0b8; }
            h2 { font-size: 18px; border-bottom: 1px solid #e6e9ee; padding-bottom: 4px; }
            h3 { font-size: 15px; font-family: ui-monospace, "DejaVu Sans Mono", monospace; margin-top: 22px; }
            h4 { font-size: 14px; margin: 0 0 4px; }
            code, pre { font-family: ui-monospace, "DejaVu Sans Mono", Menlo, Consolas, monospace; font-size: 13px; }
            .score .figure { font-size: 40px; font-weight: 700; margin-right: 10px; vertical-align: middle; }
            .interval { color: #4a5566; margin-top: 0; }
            .verdict-bar { width: 100%; height: 22px; display: block; border-radius: 3px; }
            .legend { list-style: none; padding: 0; display: flex; flex-wrap: wrap; gap: 6px 18px; }
            .swatch { display: inline-block; width: 11px; height: 11px; border-radius: 2px; margin: 0 5px 0 2px; vertical-align: -1px; }
            table { border-collapse: collapse; margin: 8px 0 14px; }
            th, td { padding: 3px 8px; text-align: left; border-bottom: 1px solid #eceff3; }
            td.num { text-align: right; font-variant-numeric: tabular-nums; }
            td.name { font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-size: 13px; }
            .score-bar { width: 100px; height: 10px; display: block; }
            .strip { margin: 10px 0 14px; }
            .strip-name { font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-size: 13px; }
            .strip-bar { width: 100%; height: 34px; display: block; }
            .strip-bar .axis { font-size: 10px; fill: #6b7686; }
            .strip-lines { font-size: 13px; color: #4a5566; }
            table.heat th.op { writing-mode: vertical-rl; transform: rotate(180deg); font-weight: 600; font-size: 12px; padding: 6px 2px; }
            table.heat td.cell { width: 30px; text-align: center; font-size: 12px; border: 1px solid #fff; }
            .survivor { border-left: 4px solid #c8372d; background: #fdfbfb; padding: 8px 14px; margin: 10px 0; }
            .survivor p { margin: 3px 0; }
            .why-kind { display: inline-block; background: #fbe3e0; color: #8a1f17; border-radius: 3px; padding: 0 6px; font-size: 13px; }
            .tests { color: #4a5566; font-size: 13px; }
            .note { color: #5a4a00; background: #fff6d6; padding: 2px 6px; }
            .warning { color: #8a1f17; font-weight: 600; }
            pre.diff { background: #f3f5f8; padding: 8px 10px; overflow-x: auto; border-radius: 4px; }
            pre.diff .del { color: #a3241b; background: #fde8e6; }
            pre.diff .add { color: #1d6b35; background: #e3f6e8; }
            pre.diff .hunk { color: #2d5f9a; }
            pre.diff .head { color: #4a5566; font-weight: 600; }
            """;

    private HtmlPage() {
    }

    static String wrap(String title, String body) {
        return "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n"
                + "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n"
                + HtmlText.element("title", title) + "\n<style>\n" + STYLE + "</style>\n</head>\n<body>\n"
                + body + "</body>\n</html>\n";
    }
}
