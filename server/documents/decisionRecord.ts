// The decision record: one PDF an auditor can file, with the request in full, the engineering
// check and its caution, every step of the trail, the decision and its conditions, and the hash
// that closes the trail's chain.
import PDFDocument from 'pdfkit';
import { requestTypeLabels, type RequestType } from '../../shared/requests/requestBody';
import { stateLabel } from '../../shared/requests/states';
import { labelledBodyFields } from '../../shared/requests/bodyFields';
import type { RequestDetail } from '../../shared/requests/types';
import { roleLabels } from '../../shared/roles';
import { engineeringCaution } from '../../shared/engineering';
import { workflowEventPastTense } from '../../shared/workflow/events';
import { workSans } from './workSansFonts';

const decisionWords: Record<string, string> = {
  approved: 'Approved',
  approved_with_conditions: 'Approved with conditions',
  rejected: 'Rejected',
};

const when = (iso: string) => new Date(iso).toISOString().replace('T', ' ').slice(0, 16) + ' UTC';

export type DecisionRecordInput = { request: RequestDetail; chain: { ok: boolean; events: number; lastHash: string }; generatedAt: Date };

export function renderDecisionRecord({ request: r, chain, generatedAt }: DecisionRecordInput): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'LETTER', margin: 54, info: { Title: `${r.number} decision record`, Author: 'Spanrelay' } });
  doc.registerFont('body', workSans.body);
  doc.registerFont('strong', workSans.strong);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const finished = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const heading = (text: string) => doc.moveDown(0.8).font('strong').fontSize(13).fillColor('#1F3A4D').text(text).moveDown(0.3).font('body').fontSize(10).fillColor('#17242E');
  const pair = (label: string, value: string) => doc.font('strong').text(`${label}: `, { continued: true }).font('body').text(value);

  doc.font('strong').fontSize(18).fillColor('#1F3A4D').text(`Decision record ${r.number}`);
  doc.font('body').fontSize(10).fillColor('#4E5D68').text(`${r.project.name} · structure ${r.project.structureNumber} · generated ${when(generatedAt.toISOString())}`);
  doc.moveDown(0.5).fillColor('#17242E');
  pair('Request type', requestTypeLabels[r.type as RequestType] ?? r.type);
  pair('Title', r.title);
  pair('Filed by', `${r.filedBy.name}${r.filedBy.organization ? `, ${r.filedBy.organization}` : ''}`);
  pair('Engineer of record', r.assignedEor ? `${r.assignedEor.name}${r.assignedEor.organization ? `, ${r.assignedEor.organization}` : ''}` : 'not assigned');
  pair('Decision', r.decision ? decisionWords[r.decision] ?? r.decision : 'none yet');
  pair('State', stateLabel(r.state));

  const current = r.revisions.at(-1);
  heading(`The request (revision ${current?.revision ?? 1} of ${r.revisions.length})`);
  for (const field of labelledBodyFields(current?.body ?? {})) pair(field.label, field.value);

  heading('Engineering check');
  const check = current?.engineering as { verdict?: string; findings?: string[]; engineeringVersion?: string } | null | undefined;
  if (check) {
    pair('Verdict', (check.verdict ?? '').replace(/_/g, ' '));
    pair('Module version', check.engineeringVersion ?? '');
    for (const finding of check.findings ?? []) doc.text(`• ${finding}`, { indent: 8 });
  } else {
    doc.text('No computed check for this type of request; the reviewers judged it from its documents.');
  }
  doc.moveDown(0.4).fillColor('#8A5A00').text(engineeringCaution).fillColor('#17242E');

  heading('Conditions');
  if (r.conditions.length === 0) doc.text('None.');
  for (const c of r.conditions) {
    doc.font('strong').text(`${c.seq}. ${c.text}`).font('body');
    doc.text(`Due ${c.dueBefore}. ${c.satisfied ? `Satisfied ${when(c.satisfiedAt!)} by ${c.satisfiedBy?.name ?? ''}: ${c.note ?? ''}` : 'Open.'}`, { indent: 12 });
  }

  heading('Attachments');
  for (const a of r.attachments) doc.text(`${a.fileName} (revision ${a.revision}, ${a.purpose.replace(/_/g, ' ')}, ${a.sizeBytes} bytes), SHA-256 ${a.sha256}`);
  if (r.attachments.length === 0) doc.text('None.');

  heading('Trail');
  for (const e of r.trail) {
    const what = (workflowEventPastTense as Record<string, string>)[e.eventType] ?? e.eventType;
    doc.font('strong').text(`${e.seq}. ${when(e.at)}: ${what}`, { continued: true }).font('body').text(` by ${e.actor.name} (${roleLabels[e.actorRole]}) → ${stateLabel(e.stateAfter)}`);
    if (e.comment) doc.text(`“${e.comment}”`, { indent: 12 });
  }

  heading('Integrity');
  doc.text(`The trail is a chain of SHA-256 hashes, each over the previous hash and the event. Verified when this record was made: ${chain.ok ? `intact, ${chain.events} events` : 'BROKEN'}.`);
  doc.font('strong').text('Final hash: ', { continued: true }).font('body').text(chain.lastHash);
  doc.moveDown(1).fillColor('#4E5D68').fontSize(8).text('Spanrelay keeps this record; it assists the licensed engineers involved and does not replace the sealed plans, the engineer of record or local codes.');
  doc.end();
  return finished;
}
