import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { CAUTION, codeLabel, formatQuantity, quantityText, type Dimension } from 'ligament';
import { CalcFile } from '../calc-files/models/calc-file.model.js';
import { Discrepancy } from '../discrepancies/models/discrepancy.model.js';
import { Project } from '../projects/models/project.model.js';
import { MemberResult } from '../results/models/member-result.model.js';
import { stampWords, SubmittalsService } from '../submittals/submittals.service.js';

function esc(value: unknown): string {
  return String(value ?? '').replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** The printable review report of a submittal (HTML; print it to PDF from any browser). */
@Injectable()
export class ReviewReportService {
  constructor(
    @InjectModel(MemberResult) private readonly results: typeof MemberResult,
    @InjectModel(Discrepancy) private readonly discrepancies: typeof Discrepancy,
    @InjectModel(CalcFile) private readonly files: typeof CalcFile,
    @InjectModel(Project) private readonly projects: typeof Project,
    private readonly submittals: SubmittalsService,
  ) {}

  async html(submittalId: number): Promise<string> {
    const s = await this.submittals.get(submittalId);
    const [project, results, findings, files] = await Promise.all([
      this.projects.findByPk(s.projectId),
      this.results.findAll({ where: { submittalId }, order: [['id', 'ASC']] }),
      this.discrepancies.findAll({ where: { submittalId }, order: [['id', 'ASC']] }),
      this.files.findAll({
        where: { submittalId },
        attributes: ['id', 'fileName', 'sha256'],
        order: [['id', 'ASC']],
      }),
    ]);
    const names = new Map(files.map((f) => [f.id, f.fileName]));
    const memberRows = results
      .map((r) => {
        // Each member's numbers in its own file's units: a submittal may mix in and mm files.
        const q = (value: number, dimension: Dimension) =>
          esc(formatQuantity(value, dimension, r.profile.units));
        const chains = r.directions
          .map(
            (d) =>
              `${esc(d.direction)}: ${d.governing ? `${esc(d.governing.holes.join('–'))} (wn ${q(d.governing.netWidth, 'length')})` : 'no chain forms'}`,
          )
          .join('<br>');
        return `<tr><td>${esc(names.get(r.calcFileId))}</td><td>${esc(r.memberId)}</td><td>${esc(codeLabel(r.profile))}</td>
<td class="n">${q(r.Ag, 'area')}</td><td class="n">${q(r.An, 'area')}</td><td class="n">${q(r.U, 'ratio')}</td><td class="n">${q(r.Ae, 'area')}</td>
<td>${chains}</td><td class="n">${q(r.yielding, 'force')}</td><td class="n">${q(r.rupture, 'force')}</td><td class="n"><b>${q(r.available, 'force')}</b>${(r.result as { governing?: { limitState?: string } } | null)?.governing?.limitState === 'block shear' ? '<br><small>block shear</small>' : ''}</td></tr>`;
      })
      .join('\n');
    const findingRows = findings
      .map(
        (
          d,
        ) => `<tr class="${esc(d.severity)}"><td>${esc(d.code)}</td><td>${esc(d.severity)}</td><td>${esc(d.class)}</td><td>${esc(d.memberId ?? '')}</td>
<td>${esc(d.chain ? d.chain.split(',').join('–') : '')}</td><td class="n">${esc(quantityText(d.claimed, d.quantity, d.units))}</td><td class="n">${esc(quantityText(d.recomputed, d.quantity, d.units))}</td><td>${esc(d.message)}</td><td>${esc(d.status)}</td></tr>`,
      )
      .join('\n');
    const stamp = s.stamp
      ? `<div class="stamp"><div class="action">${esc(stampWords(s.stamp.action))}</div><div>${esc(s.stamp.comment)}</div>
<div class="by">${esc(s.stamp.stampedBy)} · ${esc(s.stamp.stampedAt.slice(0, 10))}</div>${s.stamp.overrideReason ? `<div class="override">Stamped over open errors: ${esc(s.stamp.overrideReason)}</div>` : ''}</div>`
      : '<div class="stamp pending">Not stamped yet.</div>';
    return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>Review report — ${esc(s.title)}</title>
<style>
body{font-family:system-ui,sans-serif;font-size:10pt;margin:2em;color:#111}
h1{font-size:16pt;margin:0 0 .2em}h2{font-size:12pt;margin:1.4em 0 .4em;border-bottom:1px solid #999}
table{border-collapse:collapse;width:100%}th,td{border:1px solid #bbb;padding:3px 5px;vertical-align:top;text-align:left}
th{background:#eee}td.n{text-align:right;font-variant-numeric:tabular-nums}tr.error td:first-child{font-weight:bold}
.meta td{border:none;padding:1px 8px 1px 0}.stamp{border:3px double #333;padding:.6em 1em;display:inline-block;margin:.5em 0}
.stamp .action{font-size:13pt;font-weight:bold;text-transform:uppercase}.stamp.pending{border-style:dashed;color:#555}
.override{margin-top:.3em;font-style:italic}.caution{margin-top:2em;border-top:1px solid #999;padding-top:.5em;font-weight:bold}
@media print{body{margin:1cm}h2{break-after:avoid}tr{break-inside:avoid}}
</style></head><body>
<h1>Review report: ${esc(s.title)}</h1>
<table class="meta">
<tr><td>Project</td><td>${esc(project?.name ?? s.projectId)}</td></tr>
<tr><td>Submittal</td><td>#${s.id}${s.revisionOfId ? ` (revises #${s.revisionOfId})` : ''}, submitted by ${esc(s.submittedBy)} on ${esc(s.createdAt.slice(0, 10))}</td></tr>
<tr><td>Recomputed with</td><td>ligament engine ${esc(s.engineVersion)}</td></tr>
<tr><td>Files</td><td>${files.map((f) => `${esc(f.fileName)} <small>(sha256 ${esc(f.sha256.slice(0, 12))}…)</small>`).join(', ')}</td></tr>
<tr><td>Findings</td><td>${s.summary.bySeverity.error} error, ${s.summary.bySeverity.warning} warning, ${s.summary.bySeverity.note} note; ${s.openDiscrepancies} still open</td></tr>
</table>
<h2>Review action</h2>
${stamp}
<h2>Members (available strengths; each in its file's units)</h2>
<table><thead><tr><th>File</th><th>Member</th><th>Code</th><th>Ag</th><th>An</th><th>U</th><th>Ae</th><th>Governing chain by load direction</th><th>Yielding</th><th>Rupture</th><th>Available</th></tr></thead>
<tbody>
${memberRows}
</tbody></table>
<h2>Findings</h2>
${
  findings.length === 0
    ? '<p>No findings.</p>'
    : `<table><thead><tr><th>Code</th><th>Severity</th><th>Class</th><th>Member</th><th>Chain</th><th>Claimed</th><th>Recomputed</th><th>Finding</th><th>Status</th></tr></thead>
<tbody>
${findingRows}
</tbody></table>`
}
<p class="caution">${esc(CAUTION)}</p>
</body></html>
`;
  }
}
