/**
 * The review sheet's surge section: the event, its envelope drawing, the key figures, the
 * cavities and findings, and always what the surge screening does not model.
 */
import { surgeEnvelopeSvg } from '../chart/surgeChart';
import type { HeadrouteDocument } from '../model/types';
import type { SurgeResult } from '../solver/surge/types';
import { SURGE_NOT_MODELLED } from '../solver/surge/types';
import { formatQuantity, type UnitSystem } from '../units';
import { escapeHtml } from './html';

function eventText(doc: HeadrouteDocument, run: SurgeResult): string {
  const e = run.event;
  const id = e.kind === 'close' ? e.element : e.pump;
  const name = doc.nodes[id]?.name || id;
  if (e.kind === 'close')
    return `Valve “${name}” closing over ${e.time} s (${e.law === 'linear' ? 'linear in opening' : 'by its characteristic'})`;
  return `Trip of pump “${name}”${e.inertia === null ? ' (inertia estimated)' : ` with inertia ${e.inertia} kg·m²`}`;
}

/** HTML body of the surge section; `run` absent says no event was run. */
export function surgeSectionHtml(
  doc: HeadrouteDocument,
  run: SurgeResult | undefined,
  system: UnitSystem,
): string {
  const limits = `<p><strong>Not modelled:</strong> ${escapeHtml(SURGE_NOT_MODELLED.join('; '))}.</p>`;
  if (!run) {
    return `<p class="empty">No surge event was run for this sheet (open Surge in the app, or run <code>headroute surge</code>).</p>${limits}`;
  }
  const head = (v: number) => formatQuantity(v, 'head', system);
  const len = (v: number) => formatQuantity(v, 'length', system);
  const parts = [`<p><strong>Event:</strong> ${escapeHtml(eventText(doc, run))}</p>`];
  if (run.ok) {
    const top = run.envelope.reduce((m, p) => (p.hglMax > m.hglMax ? p : m));
    const low = run.envelope.reduce((m, p) => (p.hglMin < m.hglMin ? p : m));
    const cav = run.cavities.reduce<SurgeResult['cavities'][number] | null>(
      (m, c) => (!m || c.maxVolume > m.maxVolume ? c : m),
      null,
    );
    const facts: Array<[string, string]> = [];
    if (run.joukowsky) {
      facts.push(
        ['Joukowsky a·Δv/g', head(run.joukowsky.headRise)],
        ['2L/a', `${run.joukowsky.criticalTime.toFixed(3)} s`],
      );
    }
    facts.push(
      ['Highest HGL', `${head(top.hglMax)} at chainage ${len(top.chainage)}`],
      ['Lowest HGL', `${head(low.hglMin)} at chainage ${len(low.chainage)}`],
      [
        'Column separation',
        cav
          ? `largest cavity ${(cav.maxVolume * 1000).toPrecision(3)} L at chainage ${len(cav.chainage)}, open ${cav.duration.toFixed(2)} s in all`
          : 'none',
      ],
      [
        'Time step',
        `${(run.timeStep * 1000).toFixed(3)} ms over ${run.duration.toFixed(1)} s; wave speeds adjusted by up to ${(run.waveSpeedAdjustment * 100).toFixed(1)} %`,
      ],
    );
    parts.push(
      `<dl class="facts">${facts.map(([k, v]) => `<dt>${escapeHtml(k)}</dt><dd>${escapeHtml(v)}</dd>`).join('')}</dl>`,
    );
    parts.push(
      `<figure data-part="surge">${surgeEnvelopeSvg(run, { title: eventText(doc, run), width: 1100, height: 520 })}<figcaption>${escapeHtml('Surge envelope: highest and lowest HGL over the event, steady HGL, vapour line, pipe and cavities')}</figcaption></figure>`,
    );
    const pipes = run.pipes
      .map(
        (p) =>
          `<tr><td>${escapeHtml(p.name)}</td><td>${p.waveSpeed.toFixed(0)}</td><td>${p.waveSpeedUsed.toFixed(0)}</td><td>${p.velocity.toFixed(2)}</td><td>${escapeHtml(p.waveSpeedSource)}</td></tr>`,
      )
      .join('');
    parts.push(
      `<table><thead><tr><th>pipe</th><th>wave speed (m/s)</th><th>used (m/s)</th><th>steady velocity (m/s)</th><th>source</th></tr></thead><tbody>${pipes}</tbody></table>`,
    );
  }
  const findings = run.findings.filter((f) => f.code !== 'surge-not-modelled');
  parts.push(
    `<ul>${findings.map((f) => `<li class="${f.level}"><strong>${f.level}</strong> ${escapeHtml(f.message)}</li>`).join('')}</ul>`,
  );
  parts.push(limits);
  return parts.join('\n');
}
