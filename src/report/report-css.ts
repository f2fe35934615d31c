/** The report's inline style sheet: paper and ink, a serif for prose, a mono face for boundary strings. */
export const REPORT_CSS = `
:root { --paper:#fdfbf6; --ink:#2a241e; --soft:#6b6157; --rule:#e4dccd; --accent:#8a2f1c; --card:#fffdf9; --ok:#3f7d68; --bad:#b24a5e; }
* { box-sizing: border-box; }
body { margin:0; background:var(--paper); color:var(--ink); font:15px/1.5 'DejaVu Serif', Georgia, 'Times New Roman', serif; }
main { max-width:1180px; margin:0 auto; padding:28px 32px 60px; }
h1 { font:700 26px/1.2 'DejaVu Sans', 'Helvetica Neue', Arial, sans-serif; margin:0 0 6px; letter-spacing:-0.01em; }
h2 { font:700 17px/1.3 'DejaVu Sans', 'Helvetica Neue', Arial, sans-serif; margin:34px 0 10px; padding-bottom:4px; border-bottom:2px solid var(--ink); }
h3 { font:700 15px/1.3 'DejaVu Sans', Arial, sans-serif; margin:0; }
.statement { font-size:17px; font-style:italic; max-width:60em; margin:4px 0 14px; }
.meta { display:flex; flex-wrap:wrap; gap:6px 18px; font:13px/1.5 'DejaVu Sans', Arial, sans-serif; color:var(--soft); }
.meta b { color:var(--ink); font-weight:600; }
.tally { display:flex; gap:12px; margin:18px 0 4px; flex-wrap:wrap; }
.tally div { border:1px solid var(--rule); background:var(--card); padding:8px 14px; border-radius:4px; font:13px 'DejaVu Sans', Arial, sans-serif; color:var(--soft); }
.tally strong { display:block; font-size:21px; color:var(--ink); }
.tally .bad strong { color:var(--bad); } .tally .ok strong { color:var(--ok); }
table { border-collapse:collapse; font:13px/1.4 'DejaVu Sans', Arial, sans-serif; }
th { text-align:left; font-weight:600; border-bottom:1.5px solid var(--ink); padding:5px 12px 5px 0; }
td { border-bottom:1px solid var(--rule); padding:4px 12px 4px 0; vertical-align:top; }
td.num, th.num { text-align:right; font-variant-numeric:tabular-nums; }
.status-verified { color:var(--ok); } .status-refuted { color:var(--bad); font-weight:600; } .status-partial { color:#8a6d1c; }
.classes { display:flex; gap:36px; flex-wrap:wrap; align-items:flex-start; }
code, .sides { font-family:'DejaVu Sans Mono', Menlo, Consolas, monospace; font-size:13px; }
.value { font-size:16px; }
.value sub, .value sup { font-size:70%; }
article.cx { border:1px solid var(--rule); border-left:4px solid var(--bad); background:var(--card); margin:18px 0; padding:14px 18px; border-radius:3px; }
article.cx header { display:flex; justify-content:space-between; gap:12px; flex-wrap:wrap; margin-bottom:8px; }
article.cx header span { font:12.5px 'DejaVu Sans', Arial, sans-serif; color:var(--soft); }
.pair { display:grid; grid-template-columns:1fr; gap:10px; }
figure { margin:0; padding:8px 0 0; border-top:1px dashed var(--rule); }
figcaption { display:flex; flex-wrap:wrap; gap:4px 20px; align-items:baseline; font:13px 'DejaVu Sans', Arial, sans-serif; margin-bottom:4px; }
figcaption .role { font-weight:700; text-transform:uppercase; letter-spacing:0.06em; font-size:11px; color:var(--accent); }
.drawing { overflow-x:auto; }
.drawing svg { display:block; max-width:none; }
.note { font:12.5px 'DejaVu Sans', Arial, sans-serif; color:var(--soft); margin:4px 0; }
.ne { color:var(--bad); font-weight:700; padding:0 6px; }
details { margin-top:8px; } summary { cursor:pointer; font:13px 'DejaVu Sans', Arial, sans-serif; color:var(--soft); }
pre { background:#f6f1e6; border:1px solid var(--rule); padding:10px 12px; overflow:auto; font-size:12px; line-height:1.4; }
footer { margin-top:40px; font:12px 'DejaVu Sans', Arial, sans-serif; color:var(--soft); }
`;
