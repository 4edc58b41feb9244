"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { CRYOGENS, type CryogenId } from "@/lib/safety/cryogens";
import { estimateOxygen, OXYGEN_DEFICIENT_BELOW, roomVolumeM3, type OxygenEstimate, type OxygenResult } from "@/lib/safety/oxygen";
import { SafetyInputError } from "@/lib/safety/errors";
import { Badge } from "@/components/ui/Badge";

const numberText = (what: string) =>
  z.string().trim().refine((s) => s === "" || Number.isFinite(Number(s)), `${what} must be a number`);

const schema = z
  .object({
    liquidLitres: numberText("the volume").refine((s) => s !== "" && Number(s) > 0, "enter the litres of liquid released (more than 0)"),
    cryogen: z.enum(["nitrogen", "argon", "xenon"]),
    roomMode: z.enum(["volume", "dimensions"]),
    roomVolume: numberText("the room volume"),
    length: numberText("the length"),
    width: numberText("the width"),
    height: numberText("the height"),
    lengthUnit: z.enum(["m", "ft"]),
    ventilationRate: numberText("the ventilation rate"),
    ventilationHours: numberText("the ventilation time"),
  })
  .superRefine((v, ctx) => {
    const need = (field: "roomVolume" | "length" | "width" | "height", message: string) => {
      if (v[field] === "" || Number(v[field]) <= 0) ctx.addIssue({ code: "custom", path: [field], message });
    };
    if (v.roomMode === "volume") need("roomVolume", "enter the room's free volume in m³ (more than 0)");
    else (["length", "width", "height"] as const).forEach((f) => need(f, `enter the ${f} (more than 0)`));
    if ((v.ventilationRate === "") !== (v.ventilationHours === "")) {
      const missing = v.ventilationRate === "" ? "ventilationRate" : "ventilationHours";
      ctx.addIssue({ code: "custom", path: [missing], message: "give both a ventilation rate and a time, or neither" });
    }
    for (const f of ["ventilationRate", "ventilationHours"] as const) {
      if (v[f] !== "" && Number(v[f]) < 0) ctx.addIssue({ code: "custom", path: [f], message: "cannot be negative" });
    }
  });

type Values = z.infer<typeof schema>;
type Outcome = { estimate: OxygenEstimate; roomM3: number };

const MODEL_WORDS: Record<OxygenResult["model"], { name: string; means: string }> = {
  displacement: { name: "Displacement", means: "gas pushes air out without mixing (a layer of gas at the floor)" },
  mixing: { name: "Mixing", means: "gas mixes at once with the room air and the mixture flows out" },
  sealed: { name: "Sealed", means: "nothing leaves the room; the gas adds to what is there" },
  ventilated: { name: "Mixing, then ventilated", means: "well-mixed room after the given fresh-air flow and time" },
};

const pct = (f: number) => `${(f * 100).toFixed(1)} %`;
const inputCls = "mt-1 block w-full rounded border border-line bg-raised px-2 py-1.5";

function FieldError({ message }: { message: string | undefined }) {
  return message ? <span role="alert" className="mt-0.5 block text-xs text-bad">⚠ {message}</span> : null;
}

function LineBadge({ r }: { r: OxygenResult }) {
  return r.deficient
    ? <Badge tone="bad" icon="▼">Below the 19.5 % line: oxygen-deficient</Badge>
    : <Badge tone="good" icon="▲">Above the 19.5 % line</Badge>;
}

/** The oxygen-deficiency estimate: a spill of cryogen into a room, under three limiting assumptions. */
export function OxygenForm() {
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const { register, handleSubmit, watch, setError, formState: { errors, isSubmitting } } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { liquidLitres: "", cryogen: "nitrogen", roomMode: "volume", roomVolume: "", length: "", width: "", height: "", lengthUnit: "m", ventilationRate: "", ventilationHours: "" },
  });
  const mode = watch("roomMode");

  const onSubmit = (v: Values) => {
    try {
      const roomM3 = v.roomMode === "volume" ? Number(v.roomVolume) : roomVolumeM3(Number(v.length), Number(v.width), Number(v.height), v.lengthUnit);
      const estimate = estimateOxygen({
        liquidLitres: Number(v.liquidLitres),
        cryogen: v.cryogen,
        roomVolumeM3: roomM3,
        ...(v.ventilationRate !== "" ? { ventilationM3PerH: Number(v.ventilationRate), ventilationHours: Number(v.ventilationHours) } : {}),
      });
      setOutcome({ estimate, roomM3 });
    } catch (err) {
      if (!(err instanceof SafetyInputError)) throw err;
      const map: Record<string, keyof Values> = { liquidLitres: "liquidLitres", roomVolumeM3: "roomVolume", ventilationM3PerH: "ventilationRate", ventilationHours: "ventilationHours", length: "length", width: "width", height: "height" };
      setError(map[err.field] ?? "liquidLitres", { message: err.reason });
      setOutcome(null);
    }
  };

  return (
    <div className="grid gap-5 lg:grid-cols-[minmax(0,26rem)_1fr]">
      <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-3 rounded-lg border border-line bg-panel p-4" aria-label="Spill and room">
        <label className="block text-sm">
          <span className="text-xs text-muted">Liquid released (L)</span>
          <input {...register("liquidLitres")} inputMode="decimal" className={inputCls} />
          <FieldError message={errors.liquidLitres?.message} />
        </label>
        <label className="block text-sm">
          <span className="text-xs text-muted">Cryogen</span>
          <select {...register("cryogen")} className={inputCls}>
            {(Object.keys(CRYOGENS) as CryogenId[]).map((id) => <option key={id} value={id}>{CRYOGENS[id].name}</option>)}
          </select>
        </label>
        <fieldset className="text-sm">
          <legend className="text-xs text-muted">Room</legend>
          <label className="mr-4 inline-flex items-center gap-1.5"><input type="radio" value="volume" {...register("roomMode")} /> Volume</label>
          <label className="inline-flex items-center gap-1.5"><input type="radio" value="dimensions" {...register("roomMode")} /> Length × width × height</label>
        </fieldset>
        {mode === "volume" ? (
          <label className="block text-sm">
            <span className="text-xs text-muted">Room volume (m³)</span>
            <input {...register("roomVolume")} inputMode="decimal" className={inputCls} />
            <FieldError message={errors.roomVolume?.message} />
          </label>
        ) : (
          <div className="grid grid-cols-4 gap-2">
            {(["length", "width", "height"] as const).map((f) => (
              <label key={f} className="block text-sm">
                <span className="text-xs text-muted">{f[0]?.toUpperCase()}{f.slice(1)}</span>
                <input {...register(f)} inputMode="decimal" className={inputCls} />
                <FieldError message={errors[f]?.message} />
              </label>
            ))}
            <label className="block text-sm">
              <span className="text-xs text-muted">Unit</span>
              <select {...register("lengthUnit")} className={inputCls}><option value="m">m</option><option value="ft">ft</option></select>
            </label>
          </div>
        )}
        <div className="grid grid-cols-2 gap-2">
          <label className="block text-sm">
            <span className="text-xs text-muted">Ventilation rate (m³/h, optional)</span>
            <input {...register("ventilationRate")} inputMode="decimal" className={inputCls} />
            <FieldError message={errors.ventilationRate?.message} />
          </label>
          <label className="block text-sm">
            <span className="text-xs text-muted">Ventilation time (h, optional)</span>
            <input {...register("ventilationHours")} inputMode="decimal" className={inputCls} />
            <FieldError message={errors.ventilationHours?.message} />
          </label>
        </div>
        <button type="submit" disabled={isSubmitting} className="rounded bg-accent px-4 py-1.5 font-medium text-ground">Estimate oxygen</button>
      </form>
      <div aria-live="polite">
        {!outcome ? (
          <p className="text-sm text-muted">Enter the spill and the room, then &ldquo;Estimate oxygen&rdquo;.</p>
        ) : (
          <div className="rounded-lg border border-line bg-panel p-4" data-testid="oxygen-result">
            <p className="mb-2 text-sm font-medium text-warn">⚠ Estimate only. It does not replace the laboratory&apos;s own oxygen-deficiency hazard assessment.</p>
            <table className="w-full text-sm" aria-label="Oxygen fraction by assumption">
              <thead className="text-left text-xs text-muted"><tr><th className="py-1 pr-2">Assumption</th><th className="pr-2 text-right">Oxygen</th><th>Against 19.5 % (OSHA 29 CFR 1910.134)</th></tr></thead>
              <tbody>
                {[outcome.estimate.displacement, outcome.estimate.mixing, outcome.estimate.sealed, ...(outcome.estimate.ventilated ? [outcome.estimate.ventilated] : [])].map((r) => (
                  <tr key={r.model} className="border-t border-line" data-testid={`oxygen-${r.model}`}>
                    <td className="py-1.5 pr-2"><div className="font-medium">{MODEL_WORDS[r.model].name}</div><div className="text-xs text-muted">{MODEL_WORDS[r.model].means}</div></td>
                    <td className="tabular pr-2 text-right text-base">{pct(r.oxygenFraction)}</td>
                    <td><LineBadge r={r} /></td>
                  </tr>
                ))}
              </tbody>
            </table>
            <dl className="mt-3 grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
              <dt className="text-muted">Worst case</dt><dd>{MODEL_WORDS[outcome.estimate.worst.model].name}: {pct(outcome.estimate.worst.oxygenFraction)}</dd>
              <dt className="text-muted">Gas released</dt><dd className="tabular">{outcome.estimate.gasVolumeM3.toFixed(2)} m³ at 20 °C, 1 atm</dd>
              <dt className="text-muted">Room volume</dt><dd className="tabular">{outcome.roomM3.toFixed(2)} m³</dd>
              <dt className="text-muted">Expansion ratio used</dt>
              <dd><span className="tabular">{outcome.estimate.cryogen.expansionRatio}</span> ({outcome.estimate.cryogen.name}: litres of gas at 20 °C and 1 atm per litre of liquid at its boiling point; ideal-gas density)<div className="text-xs text-muted">Source: {outcome.estimate.cryogen.source}</div></dd>
              <dt className="text-muted">Deficiency line</dt><dd>{pct(OXYGEN_DEFICIENT_BELOW)} oxygen by volume (US OSHA 29 CFR 1910.134); normal air 20.9 %</dd>
            </dl>
          </div>
        )}
      </div>
    </div>
  );
}
