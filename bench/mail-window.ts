// The one gap in which an e-mail could go out twice: from the mail server's acceptance of a
// message to the commit that marks it sent (lib/jobs/mail-job.ts). A worker that dies inside
// it leaves the message queued, and its retry sends it again. This measures the gap the way
// deliverMessage runs it (row locked, SMTP, UPDATE, COMMIT), against the local mail fake:
//   source scripts/lib.sh-style env, then:
//   DATABASE_URL=… SMTP_URL=smtp://127.0.0.1:54325 node --conditions=react-server --import tsx bench/mail-window.ts
// It prints the median, 99th percentile and maximum of the gap and of the SMTP send itself.
// The messages it writes (kind "invite", no organisation, to bench-window@bench.example) stay as sent.
import { audited } from "@/db/audit";
import { db } from "@/db";
import * as mail from "@/db/mail";
import { smtpSend } from "@/lib/mail/send";

const N = Number(process.env.BENCH_MESSAGES ?? 200);

const quantile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
const line = (name: string, values: number[]) => {
  const s = [...values].sort((a, b) => a - b);
  console.log(`${name.padEnd(34)} median ${quantile(s, 0.5).toFixed(2)} ms  p99 ${quantile(s, 0.99).toFixed(2)} ms  max ${s.at(-1)!.toFixed(2)} ms`);
};

async function main() {
  const stamp = Date.now().toString(36);
  const ids = await audited(null, async (trx) => {
    const out: string[] = [];
    for (let i = 0; i < N; i++) {
      const id = await mail.insertMessage({ organisationId: null, userId: null, kind: "invite", idempotencyKey: `bench-window-${stamp}-${i}`, to: "bench-window@bench.example", subject: `Bench ${i}`, text: "A bench message." }, trx);
      out.push(id!);
    }
    return out;
  });
  const smtp: number[] = [];
  const gap: number[] = [];
  for (const id of ids) {
    let accepted = 0;
    await audited(null, async (trx) => {
      const m = (await mail.lockMessageForSending(id, trx))!;
      const started = performance.now();
      await smtpSend({ id: m.id, to: m.to, subject: m.subject, text: m.text!, headers: m.headers });
      accepted = performance.now();
      smtp.push(accepted - started);
      await mail.markSent(id, trx);
    });
    gap.push(performance.now() - accepted);
  }
  console.log(`${N} messages, one at a time`);
  line("SMTP send (connect to 250 reply)", smtp);
  line("250 reply to 'sent' committed", gap);
  await db.destroy();
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
