package org.meritbook.serve;

import java.nio.charset.StandardCharsets;

/**
 * The live page, its style sheet and its script. The page is static: everything that comes from
 * a notebook or a workbook reaches it through {@code /status} and is set with {@code textContent},
 * so user text is never parsed as HTML. The dossier is shown unchanged in a frame.
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
            <title>meritbook live preview</title>
            <link rel="stylesheet" href="/live.css">
            <script src="/live.js" defer></script>
            </head>
            <body>
            <header class="bar level-none" id="bar" data-state="running">
              <div class="ident">
                <span class="mark">meritbook</span>
                <span class="kind">live preview</span>
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
            <main><iframe id="dossier" title="Dossier preview"></iframe></main>
            <footer>A preview: nothing is written. Issue the dossier with <code>meritbook run</code>.</footer>
            </body>
            </html>
            """.getBytes(StandardCharsets.UTF_8);

    static final byte[] CSS = """
            :root { --ink: #1d2430; --muted: #5d6673; --rule: #d4d8de; --paper: #f7f7f5;
                    --ok: #2e6b4f; --busy: #6a5d1f; --bad: #9b2f22; --warn: #8a5a00; }
            [hidden] { display: none !important; }
            html, body { height: 100%; margin: 0; }
            body { display: flex; flex-direction: column; background: var(--paper); color: var(--ink);
                   font: 14px/1.4 system-ui, -apple-system, "Segoe UI", sans-serif; }
            .bar { display: flex; flex-wrap: wrap; align-items: center; justify-content: space-between; gap: 8px 24px;
                   padding: 8px 16px; background: #fff; border-bottom: 1px solid var(--rule); border-left: 6px solid var(--busy); }
            .bar[data-state="ok"] { border-left-color: var(--ok); }
            .bar.level-fail { border-left-color: var(--bad); }
            .bar.level-attention { border-left-color: var(--warn); }
            .bar.level-clear { border-left-color: var(--ok); }
            .bar[data-state="error"] { border-left-color: var(--bad); }
            .verdict { display: flex; align-items: baseline; gap: 8px; padding: 3px 10px; border-radius: 4px;
                       background: #eef0f2; font-variant-numeric: tabular-nums; }
            .verdict-mark { font-weight: 700; }
            .verdict-word { font-weight: 600; }
            .tally { color: var(--muted); font-size: 12px; }
            .tally b { color: var(--ink); font-weight: 600; margin-left: 4px; }
            .level-fail .verdict { background: #f7e3df; color: var(--bad); }
            .level-attention .verdict { background: #f6eed6; color: var(--warn); }
            .level-clear .verdict { background: #e2efe7; color: var(--ok); }
            .announce { position: absolute; width: 1px; height: 1px; overflow: hidden; clip-path: inset(50%); white-space: nowrap; }
            .ident { display: flex; align-items: baseline; gap: 10px; min-width: 0; }
            .mark { font-weight: 700; letter-spacing: 0.02em; }
            .kind { color: var(--muted); }
            .notebook { font-family: ui-monospace, "DejaVu Sans Mono", monospace; color: var(--muted);
                        overflow: hidden; text-overflow: ellipsis; white-space: nowrap; }
            .facts { display: flex; flex-wrap: wrap; gap: 4px 20px; margin: 0; }
            .facts div { display: flex; gap: 6px; align-items: baseline; }
            .facts dt { color: var(--muted); font-size: 12px; }
            .facts dd { margin: 0; font-variant-numeric: tabular-nums; }
            .state dd { font-weight: 600; }
            .bar[data-state="ok"] .state dd { color: var(--ink); }
            .bar[data-state="running"] .state dd { color: var(--busy); }
            .bar[data-state="error"] .state dd { color: var(--bad); }
            .problems { padding: 10px 16px 12px; background: #fff; border-bottom: 3px solid var(--bad);
                        max-height: 40vh; overflow: auto; }
            .problems h2 { margin: 0 0 4px; font-size: 16px; color: var(--bad); }
            .problems .note { margin: 0 0 8px; color: var(--muted); }
            .problems ol { margin: 0; padding-left: 22px; }
            .problems li { margin: 0 0 8px; }
            .problems .where { font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-weight: 600; }
            .problems .key { color: var(--muted); font-size: 12px; margin-left: 8px; }
            .problems .line { margin: 1px 0 0; }
            .problems .line span { color: var(--muted); display: inline-block; min-width: 5.5em; }
            .changes { padding: 8px 16px 10px; background: #fbfaf4; border-bottom: 1px solid var(--rule);
                       max-height: 28vh; overflow: auto; }
            .changes h2 { margin: 0 0 4px; font-size: 13px; font-weight: 600; color: var(--muted); text-transform: lowercase;
                          letter-spacing: 0.04em; }
            .changes table { border-collapse: collapse; font-variant-numeric: tabular-nums; }
            .changes th { text-align: left; font-weight: 400; font-size: 12px; color: var(--muted); padding: 0 14px 2px 0; }
            .changes td { padding: 1px 14px 1px 0; vertical-align: baseline; white-space: nowrap; }
            .changes td.name { font-family: ui-monospace, "DejaVu Sans Mono", monospace; }
            .changes td.was { color: var(--muted); text-decoration: line-through; text-decoration-color: #b9bec6; }
            .changes td.now { font-weight: 600; }
            .changes td.arrow { color: var(--muted); }
            .waiting { margin: 24px 16px; color: var(--muted); }
            main { flex: 1; min-height: 0; display: flex; }
            iframe { flex: 1; border: 0; background: #fff; }
            footer { padding: 4px 16px; font-size: 12px; color: var(--muted); border-top: 1px solid var(--rule); }
            """.getBytes(StandardCharsets.UTF_8);

    static final byte[] SCRIPT = """
            'use strict';
            (function () {
              const byId = (id) => document.getElementById(id);
              const words = { ok: 'up to date', running: 'running', error: 'input needs attention' };
              let shown = 0;
              let spoken = '';
              // A word and a mark for each level, so colour is never the only signal.
              const levels = {
                fail: ['\u2717', 'criteria failed'],
                attention: ['!', 'check before issuing'],
                clear: ['\u2713', 'nothing to flag'],
                none: ['\u00b7', 'no outcome yet']
              };
              let keepScroll = 0;

              function set(id, text) { byId(id).textContent = text; }

              function problemItem(p) {
                const li = document.createElement('li');
                const head = document.createElement('div');
                const where = document.createElement('span');
                where.className = 'where';
                where.textContent = p.where;
                const key = document.createElement('span');
                key.className = 'key';
                key.textContent = p.key;
                head.append(where, key);
                li.append(head);
                for (const [label, text] of [['expected', p.expected], ['found', p.found], ['fix', p.fix]]) {
                  const line = document.createElement('div');
                  line.className = 'line';
                  const name = document.createElement('span');
                  name.textContent = label;
                  line.append(name, document.createTextNode(text));
                  li.append(line);
                }
                return li;
              }

              function showVerdicts(v, run) {
                const level = v ? v.level : 'none';
                byId('bar').className = 'bar level-' + level;
                set('verdict-mark', levels[level][0]);
                set('verdict-word', level === 'clear' && v.passed > 0 ? 'criteria met' : levels[level][1]);
                const count = (n) => (v ? String(n) : '\u2013');
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
                  ['arrow', '\u2192'], ['now', c.after === null ? '(removed)' : c.after]];
                for (const [cls, text] of cells) {
                  const td = document.createElement('td');
                  td.className = cls;
                  td.textContent = text;
                  tr.append(td);
                }
                return tr;
              }

              function showChanges(c, run) {
                byId('change-list').replaceChildren(...c.results.map(changeRow));
                byId('changes').hidden = c.results.length === 0;
                set('changes-title', c.results.length + (c.results.length === 1 ? ' value' : ' values')
                  + ' changed in run ' + run + ' (since run ' + c.since_run + ')');
              }

              function show(s) {
                showVerdicts(s.verdicts, s.dossier_run);
                showChanges(s.changes, s.dossier_run);
                byId('bar').dataset.state = s.state;
                set('state', words[s.state] || s.state);
                set('notebook', s.notebook);
                set('run', String(s.run));
                set('revision', s.revision === null ? '\\u2013' : String(s.revision));
                set('when', s.finished_at ? new Date(s.finished_at).toLocaleTimeString() : '\\u2013');
                set('took', s.elapsed_ms === null ? '\\u2013' : s.elapsed_ms + ' ms');
                if (s.title) { document.title = s.title + ' \\u2013 meritbook live preview'; }
                const list = byId('problem-list');
                list.replaceChildren(...s.problems.map(problemItem));
                byId('problems').hidden = s.problems.length === 0;
                set('problems-note', s.dossier_run > 0
                  ? 'The dossier below is from run ' + s.dossier_run + ', the last run that succeeded.'
                  : 'No run has succeeded yet.');
                byId('waiting').hidden = s.dossier_run > 0 || s.problems.length > 0;
                if (s.dossier_run !== shown && s.dossier_run > 0) {
                  const frame = byId('dossier');
                  try { keepScroll = frame.contentWindow ? frame.contentWindow.scrollY : 0; } catch (e) { keepScroll = 0; }
                  shown = s.dossier_run;
                  frame.src = '/dossier?run=' + shown;
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

              // The cookie now carries the token; keep it out of the address bar and the history.
              if (location.search.indexOf('token=') >= 0) { history.replaceState(null, '', '/'); }
              // Keep the reader's place in the dossier across reloads.
              byId('dossier').addEventListener('load', () => {
                try { byId('dossier').contentWindow.scrollTo(0, keepScroll); } catch (e) { /* not reachable */ }
              });
              poll();
            })();
            """.getBytes(StandardCharsets.UTF_8);
}
