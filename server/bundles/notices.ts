// The mail a finished bundle download sends: a short note to every active lead, who reviewed the plans
// that have now gone out. A failed send is logged and never undoes the download it reports.
import type { AppContext } from '../context';
import { composeMail } from '../mail/templates';
import { addressesOf } from '../plans/notices';

type Done = { recordId: number; siteName: string; by: string; at: Date; stations: string[]; sha256: string; fileName: string };

export async function bundleDownloaded(ctx: AppContext, d: Done): Promise<void> {
  const to = addressesOf(ctx, 'lead');
  if (to.length === 0) return;
  const count = d.stations.length === 1 ? '1 PC' : `${d.stations.length} PCs`;
  const mail = composeMail({
    to,
    subject: `Rollout bundle for ${d.siteName} downloaded`,
    paragraphs: [
      `${d.by} downloaded rollout bundle #${d.recordId} (${d.fileName}) for ${d.siteName} on ${d.at.toISOString().slice(0, 16).replace('T', ' ')} UTC.`,
      `It holds the approved plans of ${count}: ${d.stations.join(', ')}. Those plan revisions are now released.`,
      `SHA-256 of the zip: ${d.sha256}`,
    ],
    link: { label: 'Open the plans board', url: `${ctx.appUrl}/plans` },
  });
  try {
    await ctx.mailer.send(mail);
  } catch (err) {
    ctx.log(`mail "${mail.subject}" was not sent`, err);
  }
}
