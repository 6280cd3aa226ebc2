import "server-only";
import type { BlockPlan, PlannedOperation } from "@/lib/engineering/conversion-plan";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { Fact, Facts } from "./facts";
import { length, psi } from "./format";

function PlugFacts({ plug, unit }: { plug: NonNullable<BlockPlan["plug"]>; unit: DisplayLengthUnit }) {
  return (
    <section aria-label="Vacuum passage plug" className="flex flex-col gap-2">
      <h4 className="text-xs font-semibold uppercase tracking-[0.12em] text-pencil">Plug the vacuum passage</h4>
      <Facts label="Plug">
        <Fact label="Thread">{plug.thread.label}</Fact>
        <Fact label="Drill">
          {plug.drill.label} · {length(plug.drill.diameterM, unit)}
        </Fact>
        <Fact label="Tap" plain>
          {plug.tapLabel}
        </Fact>
        <Fact label="Engagement">{plug.engagementPct.toFixed(0)} %</Fact>
        <Fact label="Drill depth">{length(plug.drillDepthM, unit)}</Fact>
        <Fact label="Tap depth">{length(plug.tapDepthM, unit)}</Fact>
        <Fact label="Set screw">{plug.setScrew?.label ?? "none fits"}</Fact>
        <Fact label="Wall left">{length(plug.remainingWallM, unit)}</Fact>
      </Facts>
      <Warnings items={plug.warnings} />
    </section>
  );
}

function GrindFacts({ grind, unit }: { grind: NonNullable<BlockPlan["grind"]>; unit: DisplayLengthUnit }) {
  const checks = grind.passes.filter((p) => p.clayCheck).map((p) => p.pass);
  return (
    <section aria-label="Clearance grind" className="flex flex-col gap-2">
      <h4 className="text-xs font-semibold uppercase tracking-[0.12em] text-pencil">Clearance grind</h4>
      {grind.grindNeeded ? (
        <Facts label="Grind">
          <Fact label="Depth">{length(grind.depthM, unit)}</Fact>
          <Fact label="Passes">{grind.passes.length}</Fact>
          <Fact label="Clay checks after pass">{checks.length ? checks.join(", ") : "none"}</Fact>
          <Fact label="Wall left">{length(grind.remainingWallM, unit)}</Fact>
        </Facts>
      ) : (
        <p className="text-sm text-graphite">No grind: the clay gap already covers the valve and its running clearance.</p>
      )}
      {!grind.ok && grind.reason ? <Warnings items={[grind.reason.message]} /> : null}
    </section>
  );
}

function TubeFacts({ tube, unit }: { tube: NonNullable<BlockPlan["tube"]>; unit: DisplayLengthUnit }) {
  return (
    <section aria-label="Pickup tube" className="flex flex-col gap-2">
      <h4 className="text-xs font-semibold uppercase tracking-[0.12em] text-pencil">Pickup tube</h4>
      <Facts label="Pickup tube">
        <Fact label="Cut length">
          <span className="font-semibold">{length(tube.cutLengthM, unit)}</span>
        </Fact>
        <Fact label="Straight · arc">
          {length(tube.straightM, unit)} · {length(tube.arcM, unit)}
        </Fact>
        <Fact label="Swage">{length(tube.swageM, unit)}</Fact>
        <Fact label="Fits the bowl">{tube.fitsBowl ? "yes" : "no"}</Fact>
      </Facts>
    </section>
  );
}

function Warnings({ items }: { items: string[] }) {
  if (!items.length) return null;
  return (
    <ul className="list-disc pl-5 text-sm text-fault">
      {items.map((w) => (
        <li key={w}>{w}</li>
      ))}
    </ul>
  );
}

function measurementText(m: PlannedOperation["measurements"][number], unit: DisplayLengthUnit): string {
  const show = (si: number) => (m.quantity === "pressure" ? psi(si, 2) : length(si, unit));
  return `${m.label}: ${show(m.minSi)} to ${show(m.maxSi)}`;
}

export function OperationsList({ operations, unit }: { operations: PlannedOperation[]; unit: DisplayLengthUnit }) {
  return (
    <ol aria-label="Operations" className="flex flex-col">
      {operations.map((op) => {
        const caution = SAFETY_CAUTIONS[op.caution];
        return (
          <li key={op.number} className="grid grid-cols-[3.5rem_1fr] gap-x-3 border-b border-rule py-2 text-sm">
            <span className="numeric text-lg font-bold">{op.number}</span>
            <div className="flex flex-col gap-1">
              <p className="font-semibold">{op.title}</p>
              <p className="text-graphite">{op.instructions}</p>
              {op.measurements.length ? (
                <p className="numeric text-xs whitespace-normal text-graphite">
                  Record: {op.measurements.map((m) => measurementText(m, unit)).join("; ")}
                </p>
              ) : null}
              <p className="text-xs font-semibold text-ink">
                <span aria-hidden>⚠ </span>
                {caution.signal}: {caution.title}
              </p>
            </div>
          </li>
        );
      })}
    </ol>
  );
}

/** The bench work one block needs: plug, grind, tube and the numbered operations approval creates. */
export function BenchWork({ plan, unit }: { plan: BlockPlan; unit: DisplayLengthUnit }) {
  return (
    <div className="flex flex-col gap-5">
      <div className="grid gap-6 md:grid-cols-3">
        {plan.plug ? (
          <PlugFacts plug={plan.plug} unit={unit} />
        ) : plan.plugRefusal ? (
          <section aria-label="Vacuum passage plug" className="flex flex-col gap-2">
            <h4 className="text-xs font-semibold uppercase tracking-[0.12em] text-pencil">Plug the vacuum passage</h4>
            <p className="text-sm font-semibold text-fault" role="alert" data-testid="plug-refusal">
              No plug: {plan.plugRefusal.message}
            </p>
          </section>
        ) : (
          <p className="text-sm text-pencil">No vacuum passage measured: no plug planned.</p>
        )}
        {plan.grind ? <GrindFacts grind={plan.grind} unit={unit} /> : <p className="text-sm text-pencil">No clay measurements: no grind planned.</p>}
        {plan.tube ? <TubeFacts tube={plan.tube} unit={unit} /> : plan.side === "secondary" ? <p className="text-sm text-pencil">No pickup tube measured.</p> : null}
      </div>
      <section aria-label={`${plan.side} operations`} className="flex flex-col gap-2">
        <h4 className="text-xs font-semibold uppercase tracking-[0.12em] text-pencil">Operations</h4>
        <OperationsList operations={plan.operations} unit={unit} />
      </section>
    </div>
  );
}
