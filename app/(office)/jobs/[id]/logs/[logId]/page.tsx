import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { RequestRefusal } from "@/db/refusal";
import { OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { idParams } from "@/lib/http/route-params";
import { fixed } from "@/lib/format/display";
import { fromSI } from "@/lib/engineering/units";
import type { ThrottleMode } from "@/lib/engineering/staging";
import { getLogAnalysis } from "@/lib/tuning/logs";
import type { AnalysedCorrection, LogAnalysis } from "@/lib/tuning/log-analysis";
import { LineChart } from "@/components/charts/line-chart";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { area } from "../../_plan/format";
import { formatDateTime } from "@/lib/format/dates";
import { shopTimeZone } from "@/lib/server/env";
import { AcceptCorrections } from "../_components/accept-corrections";

export const metadata: Metadata = { title: "Air-fuel log" };

const MODE_TITLE: Record<ThrottleMode, string> = { part: "Part throttle (primary side)", full: "Full throttle (both sides)" };
const LIMIT_TEXT: Record<Exclude<AnalysedCorrection["limitedBy"], null>, string> = {
  valve: "the valve's own window limits the flow: more holes will not add fuel",
  channel: "the channel has no room for the holes this needs",
  rack: "the closest layout from the rack differs from the exact area",
  readings: "no bin with enough readings where this stage is the last open: it stays as it is",
};

const psi = (pa: number) => fromSI("pressure", pa, "psi");
function pressureText(pa: number): string {
  return pa < 0 ? `${fixed(fromSI("pressure", -pa, "inHg"), 1)} inHg vacuum` : `${fixed(psi(pa), 1)} psi boost`;
}

function ModeChart({ analysis, mode }: { analysis: LogAnalysis; mode: ThrottleMode }) {
  const bins = analysis.bins.filter((b) => b.mode === mode);
  const curve = analysis.curves[mode];
  if (bins.length === 0) return null;
  return (
    <LineChart
      title={`${MODE_TITLE[mode]}: measured against plan`}
      description={`Median lambda of ${bins.length} pressure bins against the plan's predicted mixture and the target; vertical lines mark the stages' opening points.`}
      xLabel="Manifold pressure, psi gauge (below 0: vacuum)"
      yLabel="lambda"
      lines={[
        { label: "target", points: curve.map((p) => [psi(p.gaugePa), p.targetLambda] as const), color: "var(--color-ink)", dashed: true },
        { label: "plan predicts", points: curve.map((p) => [psi(p.gaugePa), p.predictedLambda] as const), color: "var(--color-accent)" },
      ]}
      points={bins.map((b) => ({
        x: psi(b.gaugePa),
        y: b.lambda,
        hollow: !b.enough,
        color: "var(--color-fault)",
        label: `${pressureText(b.gaugePa)}: lambda ${fixed(b.lambda, 3)} from ${b.count} readings`,
      }))}
      markers={analysis.openings
        .filter((o) => o.mode === mode)
        .map((o) => ({ x: psi(o.gaugePa), label: `${o.side} ${o.index}` }))}
    />
  );
}

export default async function LogPage({ params }: { params: Promise<{ id: string; logId: string }> }) {
  const raw = await params;
  const user = await requireRole(OFFICE_ROLES, `/jobs/${raw.id}/logs/${raw.logId}`);
  const parsed = idParams("id", "logId").safeParse(raw);
  if (!parsed.success) notFound();
  let found;
  try {
    found = await getLogAnalysis(user, parsed.data.id, parsed.data.logId);
  } catch (error) {
    if (error instanceof RequestRefusal && error.status === 404) notFound();
    throw error;
  }
  const { record, log, analysis } = found;
  const { job } = record;
  const setAside = log.setAside as { fastThrottle: number; cold: number; blank?: number; repeated?: number };
  const rejected = log.rejected as { line: number; reason: string }[];
  const acceptable = analysis.corrections.filter((c) => c.changes);
  const canAccept = !log.acceptedAt && job.currentRevision === log.revisionNumber && job.state !== "draft" && job.state !== "planned";
  const accepted = (log.acceptedChanges as { stageId: string; change: string }[] | null) ?? [];

  return (
    <>
      <PageHeader
        kicker={`Job ${job.number} · air-fuel log`}
        title={log.fileName}
        actions={
          <ButtonLink href={`/jobs/${job.id}`} variant="secondary">
            Back to the job
          </ButtonLink>
        }
      />
      <div className="mb-6 grid gap-6 lg:grid-cols-2">
        <Sheet title="What was read">
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            <dt className="text-graphite">Engine ran on</dt>
            <dd className="font-semibold">revision {log.revisionNumber}</dd>
            <dt className="text-graphite">Read</dt>
            <dd>
              {formatDateTime(log.uploadedAt, shopTimeZone())}
            </dd>
            <dt className="text-graphite">Rows</dt>
            <dd className="whitespace-normal" data-testid="log-counts">
              {log.totalRows} rows: {log.usedRows} used, {setAside.fastThrottle + setAside.cold} set aside ({setAside.fastThrottle} during fast throttle movement, {setAside.cold} on a cold engine), {log.rejectedCount} refused
              {setAside.blank || setAside.repeated ? `; ${setAside.blank ?? 0} blank and ${setAside.repeated ?? 0} repeated rows skipped` : ""}
            </dd>
          </dl>
        </Sheet>
        <Sheet title="Main jets">
          {analysis.jetAdvice ? (
            <p role="alert" className="text-sm">
              {analysis.jetAdvice.message}
            </p>
          ) : (
            <p className="text-sm text-graphite">Cruise readings under vacuum are within the cruise target (or too few to judge): no jet change. No stage is changed for cruise.</p>
          )}
        </Sheet>
      </div>

      <section aria-labelledby="chart-heading" className="mb-8 flex flex-col gap-4">
        <h2 id="chart-heading" className="border-b-2 border-ink pb-2 text-xl font-bold">
          Measured against plan
        </h2>
        <p className="text-sm text-graphite">
          Readings binned by manifold pressure per throttle mode; a bin counts with enough readings, and a stage is corrected only beyond ±{fixed(analysis.counts.band * 100, 0)} % of
          the target. Under vacuum at part throttle the target is the cruise lambda.
        </p>
        <div className="grid gap-6 xl:grid-cols-2">
          <ModeChart analysis={analysis} mode="part" />
          <ModeChart analysis={analysis} mode="full" />
        </div>
        <Table aria-label="Pressure bins">
          <thead>
            <tr>
              <Th>Mode</Th>
              <Th>Pressure (median)</Th>
              <Th numeric>Readings</Th>
              <Th numeric>Lambda (median)</Th>
              <Th numeric>Spread (IQR)</Th>
              <Th numeric>Target</Th>
              <Th numeric>Plan predicts</Th>
              <Th numeric>Off target</Th>
            </tr>
          </thead>
          <tbody>
            {analysis.bins.map((b, i) => (
              <tr key={i} className={b.enough ? "" : "text-pencil"}>
                <Td>{b.mode === "part" ? "part" : "full"}</Td>
                <Td className="numeric">{pressureText(b.gaugePa)}</Td>
                <Td numeric>
                  {b.count}
                  {b.enough ? "" : " (too few to count)"}
                </Td>
                <Td numeric>{fixed(b.lambda, 3)}</Td>
                <Td numeric>{fixed(b.spread, 3)}</Td>
                <Td numeric>
                  {fixed(b.targetLambda, 3)}
                  {b.use === "cruise" ? " cruise" : ""}
                </Td>
                <Td numeric>{fixed(b.predictedLambda, 3)}</Td>
                <Td numeric>
                  {b.lambda > b.targetLambda ? "lean " : b.lambda < b.targetLambda ? "rich " : ""}
                  {fixed(Math.abs(b.lambda / b.targetLambda - 1) * 100, 1)} %
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
      </section>

      <section aria-labelledby="corrections-heading" className="mb-8 flex flex-col gap-4">
        <h2 id="corrections-heading" className="border-b-2 border-ink pb-2 text-xl font-bold">
          Stage corrections
        </h2>
        <Table aria-label="Stage corrections">
          <thead>
            <tr>
              <Th>Stage</Th>
              <Th>Opens at</Th>
              <Th numeric>Bins</Th>
              <Th numeric>Area now</Th>
              <Th numeric>Area wanted</Th>
              <Th numeric>Change</Th>
              <Th>As drilled</Th>
            </tr>
          </thead>
          <tbody>
            {analysis.corrections.map((c) => (
              <tr key={c.stageId} data-testid={`correction-${c.side}-${c.index}`}>
                <Td>
                  {c.side} stage {c.index} <span className="text-xs text-graphite">({c.mode} throttle)</span>
                </Td>
                <Td className="numeric">{pressureText(c.openingGaugePa)}</Td>
                <Td numeric>{c.binsUsed}</Td>
                <Td numeric>{area(c.currentAreaM2, user.lengthUnit)}</Td>
                <Td numeric>{area(c.proposedAreaM2, user.lengthUnit)}</Td>
                <Td numeric>{c.changePct === null ? "—" : `${c.changePct > 0 ? "+" : ""}${fixed(c.changePct, 1)} %`}</Td>
                <Td className="whitespace-normal">
                  <span className="numeric font-semibold">{c.change}</span>
                  {c.clamped ? <span className="block text-xs text-fault">Clamped: the readings ask for less than a closed channel; the stage stays rich.</span> : null}
                  {c.limitedBy ? <span className="block text-xs text-graphite">{LIMIT_TEXT[c.limitedBy]}</span> : null}
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
        {log.acceptedAt ? (
          <Sheet title={`Accepted into revision ${log.nextRevisionNumber}`}>
            <ul className="list-disc pl-5 text-sm">
              {accepted.map((c) => (
                <li key={c.stageId} className="numeric">
                  {c.change}
                </li>
              ))}
            </ul>
          </Sheet>
        ) : canAccept && acceptable.length ? (
          <Sheet>
            <AcceptCorrections
              jobId={job.id}
              logId={log.id}
              nextRevision={job.currentRevision + 1}
              corrections={acceptable.map((c) => ({
                stageId: c.stageId,
                change: c.change,
                note: c.opening
                  ? `Move the opening ${c.opening.direction}: ${pressureText(c.opening.currentGaugePa)} -> ${pressureText(c.opening.proposedGaugePa)}; the holes stay.`
                  : `${c.changePct === null ? "" : `${c.changePct > 0 ? "+" : ""}${fixed(c.changePct, 1)} % area, `}from ${c.binsUsed} bin${c.binsUsed === 1 ? "" : "s"}${c.limitedBy ? `; ${LIMIT_TEXT[c.limitedBy]}` : ""}.`,
              }))}
            />
          </Sheet>
        ) : (
          <p className="text-sm text-graphite">
            {acceptable.length === 0
              ? "Nothing to change: every stage is within the band, or has too few readings to judge."
              : `Not open for acceptance: the job is ${job.state} at revision ${job.currentRevision}; this log was read on revision ${log.revisionNumber}.`}
          </p>
        )}
      </section>

      {rejected.length ? (
        <Sheet title={`Refused rows (${log.rejectedCount})`}>
          <Table aria-label="Refused rows">
            <thead>
              <tr>
                <Th numeric>Line</Th>
                <Th>Why</Th>
              </tr>
            </thead>
            <tbody>
              {rejected.map((r) => (
                <tr key={r.line}>
                  <Td numeric>{r.line}</Td>
                  <Td className="whitespace-normal">{r.reason}</Td>
                </tr>
              ))}
            </tbody>
          </Table>
          {log.rejectedCount > rejected.length ? <p className="mt-2 text-xs text-graphite">The first {rejected.length} are listed.</p> : null}
        </Sheet>
      ) : null}
      <p className="mt-6 text-xs text-graphite">
        Corrections are planning aids from the readings given; a qualified person checks them before the engine runs under boost again.
      </p>
    </>
  );
}
