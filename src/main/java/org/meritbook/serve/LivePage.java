package org.meritbook.serve;

import java.nio.charset.StandardCharsets;

/**
 * The live page, its style sheet and its script. The page is static: everything that comes from
 * a notebook or a workbook reaches it through {@code /status} and is set with {@code textContent},
 * so user text is never parsed as HTML. The dossier is shown unchanged in a same-origin frame that
 * runs no script of its own; the page's script reads it to explain a clicked number in place (the
 * dossier's own trail step, copied), to show a workbook cell's row, and to offer excluding or
 * restoring that point.
 */
final class LivePage {
    private LivePage() {
    }

    static final byte[] HTML = """
            <!DOCTYPE html>
            <html lang="en">
            <head>
            <meta charset="utf-8">
            <meta name="viewport" content="width=device-width, initial-scale=1">
            <title>meritbook live notebook</title>
            <link rel="stylesheet" href="/live.css">
            <script src="/live.js" defer></script>
            </head>
            <body>
            <header class="bar level-none" id="bar" data-state="running">
              <div class="ident">
                <span class="mark"><span class="glyph" aria-hidden="true">&#x2234;</span>meritbook</span>
                <span class="kind">live notebook</span>
                <span class="notebook" id="notebook"></span>
              </div>
              <div class="verdict" id="verdict">
                <span class="verdict-mark" id="verdict-mark" aria-hidden="true">&middot;</span>
                <span class="verdict-word" id="verdict-word">no outcome yet</span>
                <span class="tally"><b id="n-failed">&ndash;</b> failed <b id="n-na">&ndash;</b> not evaluable
                  <b id="n-passed">&ndash;</b> passed <b id="n-warnings">&ndash;</b> warnings</span>
              </div>
              <dl class="facts">
                <div class="state"><dt>state</dt><dd id="state">starting</dd></div>
                <div><dt>last run</dt><dd id="when">&ndash;</dd></div>
                <div><dt>took</dt><dd id="took">&ndash;</dd></div>
                <div><dt>revision</dt><dd id="revision">&ndash;</dd></div>
                <div><dt>run</dt><dd id="run">0</dd></div>
              </dl>
            </header>
            <p class="announce" id="announce" aria-live="polite"></p>
            <section class="issue-strip" id="issue-strip" hidden aria-live="polite">
              <span class="issue-text" id="issue-text"></span>
              <button type="button" class="act primary" id="issue-open">Issue revision&hellip;</button>
            </section>
            <p class="notice" id="notice" role="status" hidden></p>
            <section class="problems" id="problems" hidden>
              <h2 id="problems-title">The input needs attention</h2>
              <p class="note" id="problems-note"></p>
              <ol id="problem-list"></ol>
            </section>
            <section class="changes" id="changes" hidden aria-labelledby="changes-title">
              <h2 id="changes-title">Changed values</h2>
              <table>
                <thead><tr><th scope="col">section</th><th scope="col">quantity</th><th scope="col">was</th>
                  <th scope="col" aria-hidden="true"></th><th scope="col">now</th></tr></thead>
                <tbody id="change-list"></tbody>
              </table>
            </section>
            <p class="waiting" id="waiting">The study is running for the first time.</p>
            <main>
              <p class="stale" id="stale" hidden></p>
              <iframe id="dossier" title="Dossier preview"></iframe>
            </main>
            <dialog id="exclude-dialog" aria-labelledby="exclude-title">
              <form method="dialog" id="exclude-form">
                <h2 id="exclude-title">Exclude a point</h2>
                <p class="dialog-what" id="exclude-what"></p>
                <label>Reason <span class="req">required</span>
                  <textarea id="exclude-reason" rows="3" aria-required="true"></textarea></label>
                <div class="pair">
                  <label>By <input id="exclude-by" autocomplete="name"></label>
                  <label>On <input id="exclude-on" type="date"></label>
                </div>
                <p class="dialog-note">Written into the cell's <code>exclude:</code> list in the notebook; the workbook is not touched.
                  The previous notebook is kept as a backup beside it.</p>
                <p class="dialog-error" id="exclude-error" role="alert"></p>
                <div class="buttons"><button type="button" class="act" id="exclude-cancel">Cancel</button>
                  <button type="submit" class="act danger" id="exclude-submit">Exclude</button></div>
              </form>
            </dialog>
            <dialog id="issue-dialog" aria-labelledby="issue-title">
              <form method="dialog" id="issue-form">
                <h2 id="issue-title">Issue a new revision</h2>
                <p class="dialog-what" id="issue-what"></p>
                <label>Reason for the revision <span class="req">required</span>
                  <textarea id="issue-reason" rows="3" aria-required="true"></textarea></label>
                <p class="dialog-note">The notebook's <code>revision:</code> is raised and <code>revision-reason:</code> set; the dossier,
                  results.json and trail are written as <code>meritbook run</code> writes them.</p>
                <p class="dialog-error" id="issue-error" role="alert"></p>
                <div class="buttons"><button type="button" class="act" id="issue-cancel">Cancel</button>
                  <button type="submit" class="act primary" id="issue-submit">Issue</button></div>
              </form>
            </dialog>
            <footer><span>The page writes only the notebook (exclusions, revision) and, when you issue, the revision's folder.
              Workbooks are never written.</span>
              <span class="hint" id="hint">Click a number for its calculation step, a workbook value for its row.</span></footer>
            </body>
            </html>
""".getBytes(StandardCharsets.UTF_8);

    static final byte[] CSS = """
            :root { --ink: #17202b; --muted: #5b6675; --rule: #d9dde2; --paper: #eef0ec; --card: #ffffff;
                    --band: #1b2633; --band-ink: #e8edf2; --band-muted: #9fb0c2; --accent: #0e7c74; --accent-soft: #dcefeb;
                    --ok: #237a4b; --busy: #8a6d12; --bad: #b0302a; --warn: #9a6200; }
            [hidden] { display: none !important; }
            html, body { height: 100%; margin: 0; }
            body { display: flex; flex-direction: column; background: var(--paper); color: var(--ink);
                   font: 14px/1.45 system-ui, -apple-system, "Segoe UI", sans-serif; }
            .bar { display: flex; flex-wrap: wrap; align-items: center; justify-content: space-between; gap: 8px 24px;
                   padding: 9px 18px; background: var(--band); color: var(--band-ink); box-shadow: inset 0 -4px 0 var(--busy); }
            .bar.level-fail { box-shadow: inset 0 -4px 0 var(--bad); }
            .bar.level-attention { box-shadow: inset 0 -4px 0 var(--warn); }
            .bar.level-clear { box-shadow: inset 0 -4px 0 var(--ok); }
            .bar[data-state="error"] { box-shadow: inset 0 -4px 0 var(--bad); }
            .ident { display: flex; align-items: baseline; gap: 10px; min-width: 0; }
            .mark { font-weight: 700; letter-spacing: 0.03em; }
            .glyph { color: #7fd1c6; margin-right: 6px; }
            .kind { color: var(--band-muted); font-size: 12px; text-transform: uppercase; letter-spacing: 0.12em; }
            .notebook { font-family: ui-monospace, "DejaVu Sans Mono", monospace; color: var(--band-muted);
                        overflow: hidden; text-overflow: ellipsis; white-space: nowrap; }
            .verdict { display: flex; align-items: baseline; gap: 8px; padding: 3px 12px 3px 10px; border-radius: 3px;
                       background: #2a3747; font-variant-numeric: tabular-nums; border-left: 4px solid var(--band-muted); }
            .verdict-mark { font-weight: 700; }
            .verdict-word { font-weight: 600; }
            .tally { color: var(--band-muted); font-size: 12px; }
            .tally b { color: var(--band-ink); font-weight: 600; margin-left: 4px; }
            .level-fail .verdict { background: #f9e1de; color: var(--bad); border-left-color: var(--bad); }
            .level-attention .verdict { background: #f8ecd2; color: var(--warn); border-left-color: var(--warn); }
            .level-clear .verdict { background: #dcefe3; color: var(--ok); border-left-color: var(--ok); }
            .level-fail .tally, .level-attention .tally, .level-clear .tally { color: #48525e; }
            .level-fail .tally b, .level-attention .tally b, .level-clear .tally b { color: var(--ink); }
            .announce { position: absolute; width: 1px; height: 1px; overflow: hidden; clip-path: inset(50%); white-space: nowrap; }
            .facts { display: flex; flex-wrap: wrap; gap: 4px 20px; margin: 0; }
            .facts div { display: flex; gap: 6px; align-items: baseline; }
            .facts dt { color: var(--band-muted); font-size: 11px; text-transform: uppercase; letter-spacing: 0.08em; }
            .facts dd { margin: 0; font-variant-numeric: tabular-nums; }
            .state dd { font-weight: 600; }
            .bar[data-state="running"] .state dd { color: #f0cf6a; }
            .bar[data-state="error"] .state dd { color: #ff9c92; }
            .issue-strip { display: flex; align-items: center; gap: 14px; padding: 7px 18px; background: var(--accent-soft);
                           border-bottom: 1px solid #b6dbd4; }
            .issue-strip.current { background: #f3f5f2; border-bottom-color: var(--rule); }
            .issue-text { flex: 1; }
            .notice { margin: 0; padding: 7px 18px; background: #fffbe8; border-bottom: 1px solid #eadca0; }
            .notice.bad { background: #fbe9e7; border-bottom-color: #e8b4ae; color: var(--bad); }
            .act { font: inherit; padding: 4px 12px; border-radius: 3px; border: 1px solid #aab4bf; background: #fff; color: var(--ink);
                   cursor: pointer; }
            .act:hover { border-color: var(--accent); }
            .act.primary { background: var(--accent); border-color: var(--accent); color: #fff; }
            .act.danger { background: var(--bad); border-color: var(--bad); color: #fff; }
            .act:disabled { opacity: 0.5; cursor: not-allowed; }
            .problems { padding: 10px 18px 12px; background: var(--card); border-bottom: 3px solid var(--bad);
                        max-height: 40vh; overflow: auto; }
            .problems h2 { margin: 0 0 4px; font-size: 16px; color: var(--bad); }
            .problems .note { margin: 0 0 8px; color: var(--muted); }
            .problems ol { margin: 0; padding-left: 22px; }
            .problems li { margin: 0 0 8px; }
            .problems .where { font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-weight: 600; }
            .problems a.where { color: var(--bad); cursor: pointer; }
            .problems .key { color: var(--muted); font-size: 12px; margin-left: 8px; }
            .problems .line { margin: 1px 0 0; }
            .problems .quote { display: flex; align-items: baseline; gap: 10px; margin: 3px 0 2px; }
            .problems .quote-n { color: var(--muted); font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-size: 12px; }
            .problems .quote code { background: #fbe9e7; padding: 1px 8px; border-left: 3px solid var(--bad);
                                  white-space: pre; }
            .problems a.go { color: var(--accent); font-size: 12px; }
            .problems .line span { color: var(--muted); display: inline-block; min-width: 5.5em; }
            .changes { padding: 8px 18px 10px; background: #fbfbf6; border-bottom: 1px solid var(--rule); max-height: 28vh; overflow: auto; }
            .changes h2 { margin: 0 0 4px; font-size: 12px; font-weight: 600; color: var(--muted); text-transform: uppercase;
                          letter-spacing: 0.08em; }
            .changes table { border-collapse: collapse; font-variant-numeric: tabular-nums; }
            .changes th { text-align: left; font-weight: 400; font-size: 12px; color: var(--muted); padding: 0 14px 2px 0; }
            .changes td { padding: 1px 14px 1px 0; vertical-align: baseline; white-space: nowrap; }
            .changes td.name { font-family: ui-monospace, "DejaVu Sans Mono", monospace; }
            .changes td.was { color: var(--muted); text-decoration: line-through; text-decoration-color: #b9bec6; }
            .changes td.now { font-weight: 600; background: #fff3b8; }
            .changes td.arrow { color: var(--muted); }
            .waiting { margin: 24px 18px; color: var(--muted); }
            main { flex: 1; min-height: 0; display: flex; position: relative; margin: 10px 14px 0; border: 1px solid var(--rule);
                   border-bottom: 0; border-radius: 4px 4px 0 0; overflow: hidden; background: #fff; }
            iframe { flex: 1; border: 0; background: #fff; }
            .hint { color: var(--accent); }
            .stale { position: absolute; left: 0; right: 0; top: 0; margin: 0; padding: 6px 18px; font-weight: 600; color: #fff;
                     background: repeating-linear-gradient(135deg, #8f2b25 0 14px, #a4332c 14px 28px); z-index: 2; }
            main.is-stale iframe { filter: grayscale(0.7); opacity: 0.75; }
            footer { display: flex; justify-content: space-between; gap: 16px; padding: 5px 18px; font-size: 12px; color: var(--muted); }
            dialog { border: 1px solid var(--rule); border-top: 4px solid var(--accent); border-radius: 4px; padding: 16px 20px;
                     width: min(520px, 92vw); box-shadow: 0 18px 48px rgba(20, 30, 40, 0.28); color: var(--ink); }
            dialog::backdrop { background: rgba(23, 32, 43, 0.45); }
            dialog h2 { margin: 0 0 6px; font-size: 17px; }
            dialog label { display: block; margin: 10px 0 0; font-size: 13px; color: var(--muted); }
            dialog textarea, dialog input { display: block; width: 100%; box-sizing: border-box; margin-top: 3px; font: inherit;
                     padding: 5px 7px; border: 1px solid #b5bec8; border-radius: 3px; color: var(--ink); }
            dialog .pair { display: flex; gap: 12px; }
            dialog .pair label { flex: 1; }
            .req { font-size: 11px; color: var(--bad); margin-left: 4px; }
            .dialog-what { margin: 0; font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-size: 13px; }
            .dialog-note { font-size: 12px; color: var(--muted); margin: 12px 0 0; }
            .dialog-error { color: var(--bad); margin: 8px 0 0; min-height: 1em; }
            .buttons { display: flex; justify-content: flex-end; gap: 10px; margin-top: 14px; }
""".getBytes(StandardCharsets.UTF_8);

    static final byte[] SCRIPT = """
            'use strict';
            (function () {
              const byId = (id) => document.getElementById(id);
              const words = { ok: 'up to date', running: 'running', error: 'input needs attention' };
              let shown = 0;
              let spoken = '';
              let status = null;
              // A word and a mark for each level, so colour is never the only signal.
              const levels = {
                fail: ['\\u2717', 'criteria failed'],
                attention: ['!', 'check before issuing'],
                clear: ['\\u2713', 'nothing to flag'],
                none: ['\\u00b7', 'no outcome yet']
              };
              // The reader's place, kept as an element of the dossier rather than a pixel offset.
              let place = null;
              const ADDRESS = /^(?:'[^']+'|[^\\s!]+)![A-Z]{1,3}[0-9]{1,7}$/;

              function set(id, text) { byId(id).textContent = text; }
              function el(doc, tag, cls, text) {
                const e = doc.createElement(tag);
                if (cls) { e.className = cls; }
                if (text !== undefined) { e.textContent = text; }
                return e;
              }

              // ---- the dossier frame: every number explained in place ----------------------------------

              const FRAME_CSS = `
                .mb-pop { position: absolute; z-index: 50; width: min(620px, 92vw); background: #fff; color: #17202b;
                  border: 1px solid #c9d0d7; border-top: 3px solid #0e7c74; border-radius: 4px; padding: 10px 14px 12px;
                  box-shadow: 0 14px 40px rgba(20, 30, 40, 0.25); font: 13px/1.45 system-ui, sans-serif; }
                .mb-pop .mb-kicker { font-size: 11px; text-transform: uppercase; letter-spacing: 0.1em; color: #0e7c74; margin: 0 0 4px; }
                .mb-pop .mb-close { position: absolute; right: 8px; top: 6px; border: 0; background: none; font-size: 18px;
                  cursor: pointer; color: #5b6675; }
                .mb-pop .step { border-left: 0; padding: 0; margin: 0; }
                .mb-pop .step-formula { font-family: "DejaVu Serif", Georgia, serif; font-size: 14px; padding: 6px 8px; margin: 6px 0;
                  background: #f2f5f4; border-radius: 3px; }
                .mb-pop table { font-size: 12px; }
                .mb-pop a, .mb-pop .mb-addr { color: #0e7c74; cursor: pointer; text-decoration: underline dotted; }
                .mb-pop .mb-row th { text-align: left; color: #5b6675; font-weight: 400; padding: 1px 12px 1px 0; }
                .mb-pop .mb-row td { padding: 1px 12px 1px 0; font-variant-numeric: tabular-nums; }
                .mb-pop .mb-row tr.mb-this td, .mb-pop .mb-row tr.mb-this th { font-weight: 700; color: #17202b; }
                .mb-pop .mb-actions { margin-top: 10px; display: flex; gap: 8px; align-items: center; }
                .mb-pop button.mb-act { font: inherit; padding: 3px 11px; border-radius: 3px; border: 1px solid #b0302a;
                  background: #b0302a; color: #fff; cursor: pointer; }
                .mb-pop button.mb-act.mb-restore { background: #0e7c74; border-color: #0e7c74; }
                .mb-pop .mb-muted { color: #5b6675; font-size: 12px; }
                .mb-pop .mb-back { font-size: 12px; margin: 0 0 6px; }
                .mb-click { cursor: pointer; }
                .mb-click:hover { background: #dcefeb !important; outline: 1px solid #0e7c74; }
                .mb-changed { background: #fff3b8 !important; }
                .mb-target { outline: 3px solid #b0302a !important; background: #fbe0dc !important; }
              `;

              function frameDoc() {
                try { return byId('dossier').contentDocument; } catch (e) { return null; }
              }

              function closePop(doc) {
                const old = doc.getElementById('mb-pop');
                if (old) { old.remove(); }
              }

              function popAt(doc, anchor, kicker) {
                closePop(doc);
                const pop = el(doc, 'div', 'mb-pop');
                pop.id = 'mb-pop';
                pop.setAttribute('role', 'dialog');
                const close = el(doc, 'button', 'mb-close', '\\u00d7');
                close.type = 'button';
                close.setAttribute('aria-label', 'Close');
                close.dataset.mbClose = '1';
                pop.append(close, el(doc, 'p', 'mb-kicker', kicker));
                doc.body.append(pop);
                const r = anchor.getBoundingClientRect();
                const win = doc.defaultView;
                const left = Math.max(8, Math.min(r.left + win.scrollX, win.scrollX + win.innerWidth - pop.offsetWidth - 16));
                pop.style.left = left + 'px';
                pop.style.top = (r.bottom + win.scrollY + 6) + 'px';
                return pop;
              }

              function stripIds(node) {
                node.removeAttribute && node.removeAttribute('id');
                node.querySelectorAll('[id]').forEach((n) => n.removeAttribute('id'));
                return node;
              }

              /** The trail step behind an anchor (#step-N): a whole step, or one row of a step table. */
              function stepContent(doc, anchorId) {
                const target = doc.getElementById(anchorId);
                if (!target) { return null; }
                const box = doc.createElement('div');
                if (target.classList.contains('step')) {
                  box.append(stripIds(target.cloneNode(true)));
                  return box;
                }
                const block = target.closest('.step-table');
                const row = target.closest('tr');
                if (!block || !row) { return null; }
                const step = el(doc, 'div', 'step');
                const parts = ':scope > .step-head, :scope > .step-formula, :scope > .step-method, :scope > .step-common';
                for (const part of block.querySelectorAll(parts)) {
                  step.append(stripIds(part.cloneNode(true)));
                }
                const table = el(doc, 'table', 'grid steps');
                table.append(stripIds(block.querySelector('thead').cloneNode(true)));
                const body = doc.createElement('tbody');
                body.append(stripIds(row.cloneNode(true)));
                table.append(body);
                step.append(table);
                box.append(step);
                return box;
              }

              function markAddresses(doc, root) {
                // Sources that are workbook cells open that cell's row.
                for (const n of root.querySelectorAll('.src, td.mono, .mono')) {
                  if (n.children.length === 0 && ADDRESS.test(n.textContent.trim())) {
                    n.classList.add('mb-addr');
                    n.dataset.mbAddress = n.textContent.trim();
                  }
                }
              }

              function showStep(doc, anchor, anchorId, trailBack) {
                const content = stepContent(doc, anchorId);
                const pop = popAt(doc, anchor, 'calculation step');
                if (trailBack) {
                  const back = el(doc, 'p', 'mb-back');
                  const a = el(doc, 'a', '', '\\u2190 back to ' + trailBack.label);
                  a.dataset.mbStep = trailBack.id;
                  back.append(a);
                  pop.append(back);
                }
                if (!content) {
                  pop.append(el(doc, 'p', 'mb-muted', 'This value has no step of its own in the trail.'));
                  return;
                }
                markAddresses(doc, content);
                for (const a of content.querySelectorAll('a[href^="#"]')) {
                  a.dataset.mbStep = a.getAttribute('href').slice(1);
                  a.dataset.mbFrom = anchorId;
                }
                pop.append(content);
                pop.dataset.step = anchorId;
              }

              function sectionOf(node) {
                const section = node.closest('.section');
                if (!section) { return null; }
                const marks = section.querySelectorAll('.section-id .mono');
                return marks.length > 1 ? marks[marks.length - 1].textContent.trim() : null;
              }

              function showCell(doc, anchor, address) {
                const pop = popAt(doc, anchor, 'workbook cell ' + address);
                const cell = doc.querySelector('td[title="' + CSS.escape(address) + '"]');
                if (!cell) {
                  pop.append(el(doc, 'p', 'mb-muted', address + ' is read by the study but shown in no data table.'));
                  return;
                }
                const tr = cell.closest('tr');
                const table = cell.closest('table');
                const heads = Array.from(table.querySelectorAll('thead th'));
                const cells = Array.from(tr.children);
                pop.append(el(doc, 'p', '', 'Value as read: '));
                pop.lastChild.append(el(doc, 'b', '', cell.textContent.trim() === '' ? '(empty)' : cell.textContent.trim()));
                const rowTable = el(doc, 'table', 'mb-row');
                cells.forEach((c, i) => {
                  const r = el(doc, 'tr', c === cell ? 'mb-this' : '');
                  const name = heads[i] ? heads[i].querySelector('.col-name') : null;
                  r.append(el(doc, 'th', '', name ? name.textContent : (heads[i] ? heads[i].textContent : '')));
                  const v = el(doc, 'td', '', c.textContent.trim());
                  r.append(v, el(doc, 'td', 'mb-muted', c.getAttribute('title') || ''));
                  rowTable.append(r);
                });
                pop.append(rowTable);
                const section = sectionOf(cell);
                if (!section || cell.classList.contains('computed')) { return; }
                const actions = el(doc, 'div', 'mb-actions');
                const excluded = tr.classList.contains('excluded');
                const button = el(doc, 'button', 'mb-act' + (excluded ? ' mb-restore' : ''), excluded ? 'Restore this row' : 'Exclude this point');
                button.type = 'button';
                button.dataset.mbAction = excluded ? 'restore' : 'exclude';
                button.dataset.mbAddress = address;
                button.dataset.mbSection = section;
                actions.append(button, el(doc, 'span', 'mb-muted', excluded
                  ? 'The row is left out of the statistics of cell ' + section + '.'
                  : 'Leaves the row out of the statistics of cell ' + section + ' (a reason is required).'));
                pop.append(actions);
              }

              /** The step anchor behind a value the reader clicked, or null. */
              function stepFor(doc, td) {
                const row = td.closest('tr');
                if (!row) { return null; }
                const table = row.closest('table');
                if (table.classList.contains('results')) {
                  const a = row.querySelector('a[href^="#step-"]');
                  return a ? a.getAttribute('href').slice(1) : null;
                }
                if (table.classList.contains('summary')) {
                  // The summary shows a section's value as its results table does: find it there.
                  const link = row.querySelector('a[href^="#"]');
                  const section = link ? doc.getElementById(link.getAttribute('href').slice(1)) : null;
                  if (!section) { return null; }
                  const text = td.firstChild ? td.firstChild.textContent.trim() : td.textContent.trim();
                  for (const r of section.querySelectorAll('table.results tbody tr')) {
                    const v = r.querySelector('td.value');
                    if (v && v.textContent.trim() === text) {
                      const a = r.querySelector('a[href^="#step-"]');
                      return a ? a.getAttribute('href').slice(1) : null;
                    }
                  }
                }
                return null;
              }

              function onFrameClick(ev) {
                const doc = ev.currentTarget;
                const t = ev.target;
                if (!(t instanceof doc.defaultView.Element)) { return; }
                const pop = t.closest('.mb-pop');
                if (t.closest('[data-mb-close]')) { closePop(doc); return; }
                const action = t.closest('[data-mb-action]');
                if (action) {
                  askExclude(action.dataset.mbAction, action.dataset.mbSection, action.dataset.mbAddress);
                  return;
                }
                const stepLink = t.closest('[data-mb-step], a[href^="#step-"]');
                if (stepLink) {
                  ev.preventDefault();
                  const id = stepLink.dataset.mbStep || stepLink.getAttribute('href').slice(1);
                  let back = null;
                  if (pop && stepLink.dataset.mbFrom) {
                    const head = pop.querySelector('.step-head');
                    back = { id: stepLink.dataset.mbFrom, label: head ? head.textContent.trim().slice(0, 60) : 'the step' };
                  }
                  showStep(doc, pop ? pop.querySelector('.mb-kicker') : stepLink, id, back);
                  if (pop) { doc.getElementById('mb-pop').style.top = pop.style.top; doc.getElementById('mb-pop').style.left = pop.style.left; }
                  return;
                }
                const addr = t.closest('[data-mb-address]');
                if (addr) { showCell(doc, addr, addr.dataset.mbAddress); return; }
                if (pop) { return; }
                const td = t.closest('td');
                if (td && td.classList.contains('value') && ADDRESS.test(td.getAttribute('title') || '')) {
                  showCell(doc, td, td.getAttribute('title'));
                  return;
                }
                if (td && td.classList.contains('value')) {
                  const id = stepFor(doc, td);
                  if (id) { showStep(doc, td, id, null); return; }
                }
                if (t.closest('a[href^="#"]')) { return; }
                closePop(doc);
              }

              function decorate(doc) {
                const style = doc.createElement('style');
                style.textContent = FRAME_CSS;
                doc.head.append(style);
                for (const td of doc.querySelectorAll('table.results td.value, table.summary td.value, table.data td.value')) {
                  td.classList.add('mb-click');
                }
                markAddresses(doc, doc.querySelector('#trail') || doc.body);
                doc.addEventListener('click', onFrameClick);
                doc.addEventListener('keydown', (e) => { if (e.key === 'Escape') { closePop(doc); } });
                highlightChanges(doc);
              }

              function highlightChanges(doc) {
                if (!doc || !status) { return; }
                doc.querySelectorAll('.mb-changed').forEach((n) => n.classList.remove('mb-changed'));
                for (const sec of doc.querySelectorAll('.section')) {
                  const id = sectionOf(sec.querySelector('.section-id') || sec);
                  for (const c of status.changes.results.filter((x) => x.section === id)) {
                    for (const name of sec.querySelectorAll('table.results .sub.mono')) {
                      if (name.textContent.trim() === c.name) { name.closest('tr').classList.add('mb-changed'); }
                    }
                  }
                }
              }

              /** The element nearest the top of the view, to come back to after a reload. */
              function remember() {
                const doc = frameDoc();
                if (!doc || !doc.body) { return; }
                let best = null;
                for (const n of doc.querySelectorAll('.chapter[id], .figure[id], .step[id], .trail-group[id], td[title]')) {
                  const top = n.getBoundingClientRect().top;
                  if (top >= -2) {
                    const sel = n.id ? '#' + CSS.escape(n.id) : 'td[title="' + CSS.escape(n.getAttribute('title')) + '"]';
                    best = { sel: sel, top: top };
                    break;
                  }
                }
                place = best;
              }

              function restore() {
                const doc = frameDoc();
                if (!doc || !place) { return; }
                const n = doc.querySelector(place.sel);
                if (n) { doc.defaultView.scrollBy(0, n.getBoundingClientRect().top - place.top); }
              }

              function goTo(address) {
                const doc = frameDoc();
                if (!doc) { return; }
                doc.querySelectorAll('.mb-target').forEach((n) => n.classList.remove('mb-target'));
                const cell = doc.querySelector('td[title="' + CSS.escape(address) + '"]');
                if (cell) {
                  cell.closest('tr').classList.add('mb-target');
                  cell.scrollIntoView({ block: 'center' });
                }
              }

              function goToCell(id) {
                const doc = frameDoc();
                if (!doc) { return; }
                doc.querySelectorAll('.mb-target').forEach((n) => n.classList.remove('mb-target'));
                for (const sec of doc.querySelectorAll('.section')) {
                  const head = sec.querySelector('.section-id');
                  if (head && sectionOf(head) === id) {
                    head.classList.add('mb-target');
                    sec.scrollIntoView({ block: 'start' });
                    return;
                  }
                }
              }

              // ---- the page -----------------------------------------------------------------------------

              function problemItem(p) {
                const li = document.createElement('li');
                const head = document.createElement('div');
                const m = /([^\\s,]+![A-Z]{1,3}[0-9]{1,7})/.exec(p.where);
                const where = el(document, m ? 'a' : 'span', 'where', p.where);
                if (m) {
                  where.href = '#';
                  where.title = 'Show ' + m[1] + ' in the dossier below';
                  where.addEventListener('click', (e) => { e.preventDefault(); goTo(m[1]); });
                }
                head.append(where, el(document, 'span', 'key', p.key));
                li.append(head);
                if (p.line) {
                  const quote = el(document, 'div', 'quote');
                  quote.append(el(document, 'span', 'quote-n', String(p.line)), el(document, 'code', '', p.line_text));
                  if (p.cell) {
                    const go = el(document, 'a', 'go', 'cell ' + p.cell + ' in the dossier');
                    go.href = '#';
                    go.addEventListener('click', (e) => { e.preventDefault(); goToCell(p.cell); });
                    quote.append(go);
                  }
                  li.append(quote);
                }
                for (const [label, text] of [['expected', p.expected], ['found', p.found], ['fix', p.fix]]) {
                  const line = el(document, 'div', 'line');
                  line.append(el(document, 'span', '', label), document.createTextNode(text));
                  li.append(line);
                }
                return li;
              }

              function showVerdicts(v, run) {
                const level = v ? v.level : 'none';
                byId('bar').className = 'bar level-' + level;
                set('verdict-mark', levels[level][0]);
                set('verdict-word', level === 'clear' && v.passed > 0 ? 'criteria met' : levels[level][1]);
                const count = (n) => (v ? String(n) : '\\u2013');
                set('n-failed', count(v && v.failed));
                set('n-na', count(v && v.not_evaluable));
                set('n-passed', count(v && v.passed));
                set('n-warnings', count(v && v.warnings));
                if (!v) { return; }
                const sentence = 'Acceptance, run ' + run + ': ' + byId('verdict-word').textContent + '; ' + v.failed + ' failed, '
                  + v.not_evaluable + ' not evaluable, ' + v.passed + ' passed, ' + v.warnings + ' warnings.';
                const key = [v.level, v.failed, v.not_evaluable, v.passed, v.warnings].join('/');
                // Said once per change of outcome, not once per run.
                if (key !== spoken) {
                  spoken = key;
                  set('announce', sentence);
                }
              }

              function changeRow(c) {
                const tr = document.createElement('tr');
                const cells = [['section', c.section], ['name', c.name], ['was', c.before === null ? '(new)' : c.before],
                  ['arrow', '\\u2192'], ['now', c.after === null ? '(removed)' : c.after]];
                for (const [cls, text] of cells) { tr.append(el(document, 'td', cls, text)); }
                return tr;
              }

              function showChanges(c, run) {
                byId('change-list').replaceChildren(...c.results.map(changeRow));
                byId('changes').hidden = c.results.length === 0;
                set('changes-title', c.results.length + (c.results.length === 1 ? ' value' : ' values')
                  + ' changed in run ' + run + ' (since run ' + c.since_run + ')');
              }

              function showIssue(s) {
                const strip = byId('issue-strip');
                const i = s.issued;
                strip.hidden = !i;
                if (!i) { return; }
                const open = s.problems.length > 0 || s.state !== 'ok';
                let text;
                if (i.latest === null) {
                  text = 'No revision of this study is issued yet. The preview is revision ' + s.revision + '.';
                } else if (!i.differs) {
                  text = 'The preview is the same as issued revision ' + i.latest + '.';
                } else if (i.needs_new_revision) {
                  text = 'The preview differs from issued revision ' + i.latest + ': issuing it needs revision ' + i.next_revision + '.';
                } else {
                  text = 'The preview (revision ' + s.revision + ') differs from issued revision ' + i.latest + '.';
                }
                if (open && i.differs) { text += ' Resolve the open problems before issuing.'; }
                set('issue-text', text);
                strip.classList.toggle('current', !i.differs);
                byId('issue-open').hidden = !i.differs;
                byId('issue-open').disabled = open;
              }

              function show(s) {
                status = s;
                showVerdicts(s.verdicts, s.dossier_run);
                showChanges(s.changes, s.dossier_run);
                showIssue(s);
                byId('bar').dataset.state = s.state;
                set('state', words[s.state] || s.state);
                set('notebook', s.notebook);
                set('run', String(s.run));
                set('revision', s.revision === null ? '\\u2013' : String(s.revision));
                set('when', s.finished_at ? new Date(s.finished_at).toLocaleTimeString() : '\\u2013');
                set('took', s.elapsed_ms === null ? '\\u2013' : s.elapsed_ms + ' ms');
                if (s.title) { document.title = s.title + ' \\u2013 meritbook live notebook'; }
                byId('problem-list').replaceChildren(...s.problems.map(problemItem));
                byId('problems').hidden = s.problems.length === 0;
                set('problems-note', s.dossier_run > 0
                  ? 'The dossier below is from run ' + s.dossier_run + ', the last run that succeeded.'
                  : 'No run has succeeded yet.');
                const stale = s.problems.length > 0 && s.dossier_run > 0;
                byId('stale').hidden = !stale;
                document.querySelector('main').classList.toggle('is-stale', stale);
                if (stale) {
                  const at = new Date(s.dossier_finished_at).toLocaleTimeString();
                  set('stale', 'Stale: this dossier is from run ' + s.dossier_run + ' of ' + at
                    + '; the input changed since and needs attention.');
                }
                byId('waiting').hidden = s.dossier_run > 0 || s.problems.length > 0;
                if (s.dossier_run !== shown && s.dossier_run > 0) {
                  remember();
                  shown = s.dossier_run;
                  byId('dossier').src = '/dossier?run=' + shown;
                }
              }

              function lost() {
                byId('bar').dataset.state = 'error';
                set('state', 'not connected (is meritbook serve still running?)');
              }

              async function poll() {
                try {
                  const response = await fetch('/status', { cache: 'no-store' });
                  show(await response.json());
                } catch (e) {
                  lost();
                }
                setTimeout(poll, 1000);
              }

              // ---- changes asked from the page ----------------------------------------------------------

              function notice(text, bad) {
                const n = byId('notice');
                n.textContent = text;
                n.className = 'notice' + (bad ? ' bad' : '');
                n.hidden = false;
              }

              async function post(path, body) {
                const response = await fetch(path, { method: 'POST', headers: { 'Content-Type': 'application/json' },
                  body: JSON.stringify(body), cache: 'no-store' });
                let reply;
                try { reply = await response.json(); } catch (e) { reply = { ok: false, message: 'The server answered ' + response.status + '.' }; }
                return reply;
              }

              let pending = null;

              function askExclude(action, section, address) {
                if (action === 'restore') {
                  const doc = frameDoc();
                  if (doc) { closePop(doc); }
                  post('/restore', { run: shown, section: section, address: address }).then((r) => notice(r.message, !r.ok));
                  return;
                }
                pending = { section: section, address: address };
                set('exclude-what', address + ' in cell ' + section);
                set('exclude-error', '');
                byId('exclude-reason').value = '';
                byId('exclude-dialog').showModal();
                byId('exclude-reason').focus();
              }

              byId('exclude-form').addEventListener('submit', async (e) => {
                e.preventDefault();
                const reason = byId('exclude-reason').value.trim();
                if (!reason) { set('exclude-error', 'A reason is required.'); return; }
                const r = await post('/exclude', { run: shown, section: pending.section, address: pending.address, reason: reason,
                  by: byId('exclude-by').value.trim() || null, on: byId('exclude-on').value || null });
                if (!r.ok) { set('exclude-error', r.message); return; }
                byId('exclude-dialog').close();
                const doc = frameDoc();
                if (doc) { closePop(doc); }
                notice(r.message + ' The study is re-running.', false);
              });
              byId('exclude-cancel').addEventListener('click', () => byId('exclude-dialog').close());
              byId('exclude-reason').addEventListener('input', () => set('exclude-error', ''));
              byId('issue-reason').addEventListener('input', () => set('issue-error', ''));

              byId('issue-open').addEventListener('click', () => {
                set('issue-what', byId('issue-text').textContent);
                set('issue-error', '');
                byId('issue-dialog').showModal();
                byId('issue-reason').focus();
              });
              byId('issue-form').addEventListener('submit', async (e) => {
                e.preventDefault();
                const reason = byId('issue-reason').value.trim();
                if (!reason) { set('issue-error', 'A reason is required.'); return; }
                byId('issue-submit').disabled = true;
                set('issue-error', 'Issuing\\u2026 (the PDF takes a while)');
                try {
                  const r = await post('/issue', { reason: reason });
                  if (!r.ok) { set('issue-error', r.message); return; }
                  byId('issue-dialog').close();
                  notice(r.message, false);
                } finally {
                  byId('issue-submit').disabled = false;
                }
              });
              byId('issue-cancel').addEventListener('click', () => byId('issue-dialog').close());

              // The cookie now carries the token; keep it out of the address bar and the history.
              if (location.search.indexOf('token=') >= 0) { history.replaceState(null, '', '/'); }
              byId('dossier').addEventListener('load', () => {
                const doc = frameDoc();
                if (doc && doc.body) {
                  decorate(doc);
                  restore();
                }
              });
              poll();
            })();
""".getBytes(StandardCharsets.UTF_8);
}
