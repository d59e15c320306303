"use client";

import { useEffect, useRef, useState } from "react";
import { FormProvider, useFieldArray, useForm, useFormContext, useWatch, type Resolver } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { assessInput, type AssessInput, type AssessInputRaw } from "../../lib/schema/assess-input";
import { culvertDemo, DEMO_LABEL } from "../../lib/demo/culvert-demo";
import { CheckboxField, GroupError, ModeRadios, NumberField, SelectField, TextField } from "./fields";
import { OxideFields } from "./oxide-fields";
import { AmbientSeriesFields } from "./ambient-series-fields";
import { ServiceTemperatureFields, serviceTemperatureModeOf, type ServiceTemperatureMode } from "./service-temperature-fields";
import { StrengthTargetFields } from "./strength-target-fields";
import { HeatCurveFields } from "./heat-curve-fields";
import { LimitOverrideFields } from "./limit-override-fields";
import { ErrorSummary } from "./error-summary";
import { fieldId, flattenFormErrors, withoutUnionMessageBesideBounds } from "./form-errors";
import { cementPhasesForThermalModel, prepareAssessInput } from "./prepare-input";
import { newAssessmentDefaults } from "./default-values";
import {
  cationChoices,
  cementPresetChoices,
  coverChoices,
  elementTypeChoices,
  scmPresetChoices,
  scmPresetForType,
  scmTypeChoices,
  seawaterChoices,
  seawaterValue,
  strengthClassChoices,
  sulfateResistanceChoices,
  wettingChoices,
  yesNoChoices,
  yesNoOrUndefined,
} from "./form-choices";
import { formValuesOf } from "./form-values";

const schemaResolver = zodResolver(assessInput);

/** Completes the derived fields, then validates with the shared schema (the same one the API and CLI use). */
const resolver: Resolver<AssessInputRaw, unknown, AssessInput> = async (values, context, options) => {
  const result = await schemaResolver(prepareAssessInput(values) as AssessInputRaw, context, options as never);
  return { ...result, errors: withoutUnionMessageBesideBounds(result.errors, "exposure.serviceTemperatureC") } as Awaited<ReturnType<Resolver<AssessInputRaw, unknown, AssessInput>>>;
};

export type AssessmentFormProps = {
  onSubmit: (input: AssessInput) => void | Promise<void>;
  initialValues?: AssessInputRaw;
  busy?: boolean;
  submitLabel?: string;
};

export function AssessmentForm({ onSubmit, initialValues, busy = false, submitLabel = "Run the assessment" }: AssessmentFormProps) {
  const methods = useForm<AssessInputRaw, unknown, AssessInput>({
    resolver,
    defaultValues: initialValues ? formValuesOf(initialValues) : newAssessmentDefaults,
    shouldUnregister: true,
    mode: "onSubmit",
    reValidateMode: "onChange",
    shouldFocusError: false,
  });
  const { handleSubmit, reset, formState } = methods;
  const [thermal, setThermal] = useState(Boolean(initialValues?.curing?.thermal));
  const [steam, setSteam] = useState(Boolean(initialValues?.curing?.thermal?.steamCuring));
  const [evaporation, setEvaporation] = useState(Boolean(initialValues?.curing?.thermal?.evaporation));
  const [heatCurve, setHeatCurve] = useState(Boolean(initialValues?.curing?.thermal?.heatCurve));
  const [monteCarlo, setMonteCarlo] = useState(Boolean(initialValues?.options?.monteCarlo));
  const [serviceTemperatureMode, setServiceTemperatureMode] = useState<ServiceTemperatureMode>(serviceTemperatureModeOf(initialValues?.exposure?.serviceTemperatureC));
  const [demoLoaded, setDemoLoaded] = useState(false);
  const summaryRef = useRef<HTMLDivElement>(null);
  const issues = flattenFormErrors(formState.errors);

  useEffect(() => {
    if (formState.submitCount > 0 && issues.length > 0) summaryRef.current?.focus();
    // Focus the summary once per failed submit.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [formState.submitCount]);

  // The sections a demo needs are shown first; the values are reset after they have mounted, so that every
  // watcher of the conditional parts (ambient kind, composition kind) has subscribed and sees the new values.
  const [pendingReset, setPendingReset] = useState<AssessInputRaw | null>(null);
  useEffect(() => {
    if (pendingReset) {
      reset(pendingReset);
      setPendingReset(null);
    }
  }, [pendingReset, reset]);

  const loadDemo = () => {
    setThermal(Boolean(culvertDemo.curing?.thermal));
    setSteam(false);
    setEvaporation(false);
    setHeatCurve(Boolean(culvertDemo.curing?.thermal?.heatCurve));
    setMonteCarlo(false);
    setServiceTemperatureMode(serviceTemperatureModeOf(culvertDemo.exposure.serviceTemperatureC));
    setPendingReset(formValuesOf(culvertDemo));
    setDemoLoaded(true);
  };

  return (
    <FormProvider {...methods}>
      <form className="assessment-form" noValidate onSubmit={handleSubmit(onSubmit)} aria-labelledby="form-title">
        <div className="form-head">
          <h2 id="form-title">Assessment input</h2>
          <button type="button" className="secondary" onClick={loadDemo}>
            Load the demo scenario
          </button>
        </div>
        {demoLoaded ? (
          <p className="demo-banner" role="status">
            {DEMO_LABEL}. Replace every value with your own before relying on the output.
          </p>
        ) : null}
        <div ref={summaryRef} tabIndex={-1}>
          <ErrorSummary issues={issues} />
        </div>

        <ProjectSection />
        <BinderSection />
        <MixSection />
        <AgeSection />
        <ExposureSection serviceTemperatureMode={serviceTemperatureMode} setServiceTemperatureMode={setServiceTemperatureMode} />

        <fieldset className="section">
          <legend>6. Curing and climate</legend>
          <fieldset className="mode-radios">
            <legend>Temperature history</legend>
            <label className="radio">
              <input type="radio" name="curing-mode" checked={!thermal} onChange={() => setThermal(false)} /> Give the maximum concrete temperature
            </label>
            <label className="radio">
              <input type="radio" name="curing-mode" checked={thermal} onChange={() => setThermal(true)} /> Compute it with the element thermal model
            </label>
          </fieldset>
          {!thermal ? (
            <NumberField name="curing.maxTemperatureC" label="Maximum concrete temperature" unit="°C" hint="Peak temperature during curing; checked against the 70 °C delayed-ettringite limit (Taylor, Famy & Scrivener 2001). Leave empty if unknown." />
          ) : (
            <ThermalSection steam={steam} setSteam={setSteam} evaporation={evaporation} setEvaporation={setEvaporation} heatCurve={heatCurve} setHeatCurve={setHeatCurve} />
          )}
        </fieldset>

        <fieldset className="section">
          <legend>7. Run options</legend>
          <NumberField name="options.sweepPoints" label="Points per scenario sweep" hint="Between 5 and 80; default 40 (schema default). Fewer points compute faster." />
          <div className="field checkbox">
            <input id="f-monte-carlo" type="checkbox" checked={monteCarlo} onChange={(e) => setMonteCarlo(e.target.checked)} />
            <label htmlFor="f-monte-carlo">Monte Carlo run over the uncertain data (runs as a background job with progress)</label>
          </div>
          {monteCarlo ? (
            <div className="row">
              <NumberField name="options.monteCarlo.samples" label="Samples" required hint="10–1000; 100 gives fractions to about ±5 % (standard error √(p(1−p)/n))." />
              <NumberField name="options.monteCarlo.seed" label="Random seed" hint="Same seed, same samples (default 1)." />
            </div>
          ) : null}
        </fieldset>

        <div className="form-actions">
          <button type="submit" className="primary" disabled={busy} aria-describedby="submit-note">
            {busy ? "Computing…" : submitLabel}
          </button>
          <p id="submit-note" className="hint">
            The input is checked with the same rules as the API; every message names the limit.
          </p>
        </div>
      </form>
    </FormProvider>
  );
}

function ProjectSection() {
  return (
    <fieldset className="section">
      <legend>1. Project and element</legend>
      <div className="row">
        <TextField name="project.name" label="Project name" required optional={false} hint="Printed on the report and the saved project file." />
        <TextField name="project.reference" label="Reference" hint="Your job or drawing number (optional)." />
      </div>
      <div className="row">
        <SelectField name="project.element.type" label="Element type" choices={elementTypeChoices} />
        <NumberField name="project.element.thicknessM" label="Thickness" unit="m" required hint="Least dimension of the element, 0.05–10 m." />
        <NumberField name="project.element.coverMm" label="Nominal cover" unit="mm" hint="10–150 mm; used for the carbonation and chloride checks." />
      </div>
    </fieldset>
  );
}

function BinderSection() {
  const { control } = useFormContextTyped();
  const kind = useWatch({ control, name: "binder.cement.kind" });
  const { fields, append, remove } = useFieldArray({ control, name: "binder.supplementaryMaterials" });
  return (
    <fieldset className="section">
      <legend>2. Binder</legend>
      <ModeRadios
        name="binder.cement.kind"
        legend="Cement given as"
        choices={[
          { value: "preset", label: "a cement type (typical composition)" },
          { value: "oxides", label: "an oxide analysis (mill certificate)" },
          { value: "phases", label: "a phase analysis (XRD / Rietveld)" },
        ]}
      />
      {kind === "preset" ? (
        <SelectField name="binder.cement.presetId" label="Cement type" choices={cementPresetChoices} hint="Typical compositions from lib/data/binders/cement-presets.json; the blended types (CEM II–V, ASTM C595) include their own supplementary materials. Replace with your certificate." />
      ) : null}
      {kind === "oxides" ? <OxideFields prefix="binder.cement.oxidesMassPercent" /> : null}
      {kind === "phases" ? (
        <div className="oxide-grid">
          {["alite", "belite", "aluminate", "ferrite"].map((p) => (
            <NumberField key={p} name={`binder.cement.phasesMassPercent.${p}`} label={p} unit="mass %" required />
          ))}
          {["calcite", "gypsum", "bassanite", "anhydrite", "periclase", "freeLime", "arcanite", "aphthitalite"].map((p) => (
            <NumberField key={p} name={`binder.cement.phasesMassPercent.${p}`} label={p} unit="mass %" />
          ))}
        </div>
      ) : null}
      <NumberField name="binder.cement.blaineM2PerKg" label="Blaine fineness" unit="m²/kg" hint="200–800 m²/kg; empty takes the preset's or the model's default." />

      <fieldset className="subsection" id={fieldId("binder.supplementaryMaterials")} tabIndex={-1}>
        <legend>Supplementary materials</legend>
        <GroupError name="binder.supplementaryMaterials" />
        {fields.length === 0 ? <p className="hint">None. Add slag, fly ash, silica fume, metakaolin, limestone or a natural pozzolan.</p> : null}
        {fields.map((field, index) => (
          <ScmEntry key={field.id} index={index} onRemove={() => remove(index)} />
        ))}
        <button
          type="button"
          className="secondary"
          onClick={() => append({ type: "slag", massPercentOfBinder: undefined as unknown as number, composition: { kind: "preset", presetId: scmPresetForType("slag") ?? "slag-typical" } })}
        >
          Add a supplementary material
        </button>
      </fieldset>
    </fieldset>
  );
}

function ScmEntry({ index, onRemove }: { index: number; onRemove: () => void }) {
  const { control } = useFormContextTyped();
  const base = `binder.supplementaryMaterials.${index}` as const;
  const kind = useWatch({ control, name: `${base}.composition.kind` });
  const type = useWatch({ control, name: `${base}.type` }) as string | undefined;
  const presetName = scmPresetChoices.find((c) => c.value === scmPresetForType(type ?? ""))?.label;
  return (
    <fieldset className="scm-entry">
      <legend>Material {index + 1}</legend>
      <div className="row">
        <SelectField name={`${base}.type`} label="Type" choices={scmTypeChoices} />
        <NumberField name={`${base}.massPercentOfBinder`} label="Share of binder" unit="mass %" required hint="0–95; all materials together at most 95 % (EN 197-1 CEM III/C)." />
        <NumberField name={`${base}.reactiveFraction`} label="Reactive fraction" unit="0–1" hint="Glassy / reactive share; empty takes the preset's value. Required with an analysis." />
      </div>
      <ModeRadios
        name={`${base}.composition.kind`}
        legend="Composition"
        choices={[
          { value: "preset", label: "typical for the type" },
          { value: "oxides", label: "oxide analysis" },
        ]}
      />
      {kind === "preset" ? <p className="hint">Typical composition: {presetName ?? "none for this type"} (lib/data/binders/scm-presets.json).</p> : null}
      {kind === "oxides" ? <OxideFields prefix={`${base}.composition.oxidesMassPercent`} required={[]} /> : null}
      <button type="button" className="link-button" onClick={onRemove}>
        Remove material {index + 1}
      </button>
    </fieldset>
  );
}

function MixSection() {
  return (
    <fieldset className="section">
      <legend>3. Mix</legend>
      <div className="row">
        <NumberField name="mix.waterBinderRatio" label="Water/binder ratio" unit="–" required hint="By mass, 0.25–0.80." />
        <NumberField name="mix.binderContentKgPerM3" label="Binder content" unit="kg/m³" required hint="200–700 kg/m³." />
      </div>
      <div className="row">
        <NumberField name="mix.aggregateVolume.value" label="Aggregate volume" unit="L/m³" hint="0–850 L/m³; empty: the rest of the cubic metre." />
        <input type="hidden" value="litresPerM3" {...useFormContextTyped().register("mix.aggregateVolume.unit")} />
        <NumberField name="mix.airVolume.value" label="Air" unit="L/m³" hint="0–150 L/m³ (10 L/m³ = 1 %); entrapped air is typically 10–20 L/m³ (common practice). Also compared with the air content required for freeze–thaw classes." />
        <input type="hidden" value="litresPerM3" {...useFormContextTyped().register("mix.airVolume.unit")} />
      </div>
      <fieldset className="subsection">
        <legend>Specification (for the exposure-class limits)</legend>
        <p className="hint">Compared with EN 206 Annex F and ACI 318 Table 19.3.2.1; an item left empty is reported as not assessed.</p>
        <div className="row">
          <SelectField name="specification.strengthClass" label="Strength class" choices={strengthClassChoices} emptyLabel="not stated" hint="EN 206 Table 12; its fck,cyl is also compared with the ACI 318 f'c minimums." />
          <NumberField name="specification.specifiedStrengthMPa" label="Specified strength" unit="MPa" hint="Cylinder f'c (ACI 318) or fck,cyl, 8–100 MPa; used when no class is chosen." />
        </div>
        <div className="row">
          <SelectField name="specification.sulfateResistance" label="Sulfate resistance of the binder" choices={sulfateResistanceChoices} emptyLabel="not stated" hint="As certified for the cement or the blend." />
          <SelectField name="specification.calciumChlorideAdmixture" label="Calcium chloride admixture" choices={yesNoChoices} emptyLabel="not stated" setValueAs={yesNoOrUndefined} />
        </div>
      </fieldset>
    </fieldset>
  );
}

function AgeSection() {
  const { control } = useFormContextTyped();
  const mode = useWatch({ control, name: "age.mode" });
  const scms = (useWatch({ control, name: "binder.supplementaryMaterials" }) ?? []) as { type?: string }[];
  return (
    <fieldset className="section">
      <legend>4. Age</legend>
      <ModeRadios
        name="age.mode"
        legend="Hydration given as"
        choices={[
          { value: "age", label: "age and curing temperature (hydration model)" },
          { value: "degrees", label: "reaction degrees (measured)" },
        ]}
      />
      {mode === "age" ? (
        <div className="row">
          <NumberField name="age.ageDays" label="Age" unit="d" required hint="1 hour (0.0417 d) to 10 years; default 28 d, the compliance age of EN 206." />
          <NumberField name="age.curingTemperatureC" label="Curing temperature" unit="°C" required hint="0–100 °C; default 20 °C, the standard specimen curing of EN 12390-2." />
        </div>
      ) : (
        <div className="row">
          {["alite", "belite", "aluminate", "ferrite"].map((p) => (
            <NumberField key={p} name={`age.clinkerDegrees.${p}`} label={`Degree of reaction, ${p}`} unit="0–1" required />
          ))}
          {scms
            .filter((s) => s?.type && s.type !== "limestone")
            .map((s) => (
              <NumberField key={s.type} name={`age.scmDegrees.${s.type}`} label={`Degree of reaction, ${s.type}`} unit="0–1" required />
            ))}
        </div>
      )}
    </fieldset>
  );
}

function ExposureSection({ serviceTemperatureMode, setServiceTemperatureMode }: { serviceTemperatureMode: ServiceTemperatureMode; setServiceTemperatureMode: (mode: ServiceTemperatureMode) => void }) {
  return (
    <fieldset className="section">
      <legend>5. Exposure</legend>
      <fieldset className="subsection">
        <legend>Sulfate and ground chemistry</legend>
        <div className="row">
          <NumberField name="exposure.sulfateMgPerL" label="Sulfate in groundwater" unit="mg/L SO₄" hint="EN 206 Table 2: XA1 from 200 mg/L." />
          <SelectField name="exposure.sulfateCation" label="Sulfate cation" choices={cationChoices} emptyLabel="not known" />
          <NumberField name="exposure.soilSulfateMgPerKg" label="Sulfate in soil" unit="mg/kg SO₄" hint="EN 206 Table 2: XA1 from 2000 mg/kg (acid-soluble)." />
          <SelectField name="exposure.soilSulfateExtraction" label="Soil sulfate extraction" choices={[{ value: "acid-soluble", label: "acid-soluble (EN 196-2)" }, { value: "water-soluble", label: "water-soluble (ASTM C1580)" }]} emptyLabel="not stated" />
        </div>
        <div className="row">
          <NumberField name="exposure.magnesiumMgPerL" label="Magnesium" unit="mg/L" />
          <NumberField name="exposure.waterPH" label="Water pH" unit="pH" hint="0–14." />
          <NumberField name="exposure.aggressiveCo2MgPerL" label="Aggressive CO₂" unit="mg/L" hint="Lime-aggressive CO₂ by EN 13577." />
          <NumberField name="exposure.ammoniumMgPerL" label="Ammonium" unit="mg/L NH₄" />
          <NumberField name="exposure.bicarbonateMgPerL" label="Bicarbonate" unit="mg/L HCO₃" />
        </div>
      </fieldset>
      <fieldset className="subsection">
        <legend>Chloride and sea water</legend>
        <div className="row">
          <NumberField name="exposure.chlorideMgPerL" label="Chloride in water" unit="mg/L Cl" />
          <SelectField name="exposure.seawater" label="Sea water" choices={seawaterChoices} emptyLabel="no" setValueAs={seawaterValue} />
          <CheckboxField name="exposure.deIcingSalts" label="De-icing salts" />
        </div>
      </fieldset>
      <fieldset className="subsection">
        <legend>Air, climate and water</legend>
        <div className="row">
          <NumberField name="exposure.co2Percent" label="CO₂ in air" unit="% by volume" hint="Default 0.04 % (about 420 µmol/mol outdoors; from memory)." />
          <NumberField name="exposure.relativeHumidityPercent" label="Relative humidity" unit="%" hint="0–100 %." />
        </div>
        <ServiceTemperatureFields mode={serviceTemperatureMode} onModeChange={setServiceTemperatureMode} />
        <div className="row">
          <SelectField name="exposure.wetting" label="Wetting" choices={wettingChoices} emptyLabel="not stated" />
          <CheckboxField name="exposure.freezing.exposed" label="Freeze–thaw cycles in service" />
          <SelectField name="exposure.freezing.waterSaturation" label="Saturation when freezing" choices={[{ value: "moderate", label: "moderate (XF1/XF2)" }, { value: "high", label: "high (XF3/XF4)" }]} emptyLabel="from wetting" />
        </div>
        <div className="row">
          <CheckboxField name="exposure.reinforced" label="Reinforced (embedded steel)" hint="EN 206 XC/XD/XS apply only to reinforced concrete." />
          <CheckboxField name="exposure.carbonateAggregate" label="Carbonate aggregate" hint="Matters for thaumasite." />
          <CheckboxField name="exposure.lowPermeabilityRequired" label="Low permeability required (ACI 318 W2)" />
        </div>
      </fieldset>
    </fieldset>
  );
}

type ThermalSectionProps = {
  steam: boolean;
  setSteam: (v: boolean) => void;
  evaporation: boolean;
  setEvaporation: (v: boolean) => void;
  heatCurve: boolean;
  setHeatCurve: (v: boolean) => void;
};

function ThermalSection({ steam, setSteam, evaporation, setEvaporation, heatCurve, setHeatCurve }: ThermalSectionProps) {
  const { control } = useFormContextTyped();
  const ambientKind = useWatch({ control, name: "curing.thermal.ambient.kind" as never }) as string | undefined;
  const geometry = useWatch({ control, name: "curing.thermal.element.geometry" as never }) as string | undefined;
  const cement = useWatch({ control, name: "binder.cement" });
  const phases = cementPhasesForThermalModel(cement as never);
  return (
    <div className="thermal">
      <p className="hint">
        Thickness, binder content, w/b and supplementary materials are taken from sections 1–3.
        {phases
          ? ` Cement phases for the heat model (ASTM C150 Bogue of the cement above): C₃S ${phases.C3S}, C₂S ${phases.C2S}, C₃A ${phases.C3A}, C₄AF ${phases.C4AF} mass %.`
          : " Give the cement above to compute its phases."}
      </p>
      <div className="row">
        <NumberField name="curing.thermal.placementTemperatureC" label="Placement temperature" unit="°C" required hint="0–45 °C (ACI 305R/306R working range)." />
        <NumberField name="curing.thermal.concrete.fcm28MPa" label="Mean 28-day strength" unit="MPa" required hint="10–150 MPa; fcm = fck + 8 MPa (EN 1992-1-1 Table 3.1)." />
        <SelectField name="curing.thermal.concrete.cementClass" label="Cement strength class" choices={[{ value: "R", label: "R (rapid)" }, { value: "N", label: "N (normal)" }, { value: "S", label: "S (slow)" }]} emptyLabel="default N (fib MC2010)" />
        <SelectField name="curing.thermal.element.geometry" label="Faces" choices={[{ value: "symmetric", label: "both faces alike" }, { value: "two-faces", label: "two different faces" }]} />
      </div>
      <fieldset className="subsection">
        <legend>Heat of hydration</legend>
        <div className="field checkbox">
          <input id="f-heat-curve" type="checkbox" checked={heatCurve} onChange={(e) => setHeatCurve(e.target.checked)} aria-describedby="f-heat-curve-hint" />
          <label htmlFor="f-heat-curve">Use a measured heat curve (calorimetry) instead of the heat model</label>
          <p className="hint" id="f-heat-curve-hint">
            Unticked, the heat comes from the cement phases and supplementary materials (Schindler &amp; Folliard 2005 hydration model).
          </p>
        </div>
        {heatCurve ? <HeatCurveFields /> : null}
      </fieldset>
      <fieldset className="subsection">
        <legend>Ambient profile</legend>
        <ModeRadios name="curing.thermal.ambient.kind" legend="Air temperature" choices={[{ value: "constant", label: "constant" }, { value: "daily-sine", label: "daily cycle" }, { value: "series", label: "entered series (hour, °C)" }]} />
        {ambientKind === "daily-sine" ? (
          <div className="row">
            <NumberField name="curing.thermal.ambient.meanC" label="Daily mean" unit="°C" required hint="−40 to 50 °C." />
            <NumberField name="curing.thermal.ambient.amplitudeC" label="Amplitude" unit="°C" required hint="0–25 °C (half the daily range)." />
            <NumberField name="curing.thermal.ambient.placementHourOfDay" label="Placement hour" unit="h" hint="0–24; default 8 h (typical morning placement)." />
          </div>
        ) : ambientKind === "series" ? (
          <AmbientSeriesFields />
        ) : (
          <NumberField name="curing.thermal.ambient.temperatureC" label="Air temperature" unit="°C" required hint="−40 to 50 °C." />
        )}
      </fieldset>
      <fieldset className="subsection">
        <legend>Formwork and insulation (face A)</legend>
        <div className="row">
          <SelectField name="curing.thermal.faces.a.cover" label="Cover while curing" choices={coverChoices} />
          <NumberField name="curing.thermal.faces.a.stripAtH" label="Strip at" unit="h" hint="Hours after placement; empty keeps the cover." />
          <SelectField name="curing.thermal.faces.a.coverAfterStrip" label="Cover after stripping" choices={coverChoices} />
          <NumberField name="curing.thermal.faces.a.windSpeedMPerS" label="Wind speed" unit="m/s" hint="0–30 m/s; default 2 m/s (typical light wind)." />
        </div>
      </fieldset>
      {geometry === "two-faces" ? (
        <fieldset className="subsection">
          <legend>Formwork and insulation (face B)</legend>
          <div className="row">
            <SelectField name="curing.thermal.faces.b.cover" label="Cover while curing (face B)" choices={coverChoices} />
            <NumberField name="curing.thermal.faces.b.stripAtH" label="Strip at (face B)" unit="h" hint="Hours after placement; empty keeps the cover." />
            <SelectField name="curing.thermal.faces.b.coverAfterStrip" label="Cover after stripping (face B)" choices={coverChoices} />
            <NumberField name="curing.thermal.faces.b.windSpeedMPerS" label="Wind speed (face B)" unit="m/s" hint="0–30 m/s; default 2 m/s." />
          </div>
        </fieldset>
      ) : null}
      <div className="field checkbox">
        <input id="f-steam" type="checkbox" checked={steam} onChange={(e) => setSteam(e.target.checked)} />
        <label htmlFor="f-steam">Steam curing cycle</label>
      </div>
      {steam ? (
        <div className="row">
          <NumberField name="curing.thermal.steamCuring.presetH" label="Preset (delay)" unit="h" required hint="0–24 h." />
          <NumberField name="curing.thermal.steamCuring.rampCPerH" label="Heating rate" unit="°C/h" required hint="1–60 °C/h." />
          <NumberField name="curing.thermal.steamCuring.holdTemperatureC" label="Hold temperature" unit="°C" required hint="20–90 °C." />
          <NumberField name="curing.thermal.steamCuring.holdH" label="Hold" unit="h" required hint="0–72 h." />
          <NumberField name="curing.thermal.steamCuring.coolingCPerH" label="Cooling rate" unit="°C/h" required hint="1–60 °C/h." />
        </div>
      ) : null}
      <fieldset className="subsection">
        <legend>Curing plan</legend>
        <div className="row">
          <SelectField name="curing.thermal.curing.curingClass" label="Curing class (EN 13670)" choices={[1, 2, 3, 4].map((c) => ({ value: String(c), label: `class ${c}` }))} emptyLabel="default class 2" setValueAs={(v) => (v === "" || v === undefined ? undefined : Number(v))} />
          <NumberField name="curing.thermal.curing.plannedCuringDays" label="Planned curing" unit="d" hint="0–90 d; compared with the EN 13670 minimum." />
          <NumberField name="curing.thermal.durationH" label="Simulated time" unit="h" hint="1–2160 h; default 168 h (one week)." />
        </div>
      </fieldset>
      <StrengthTargetFields />
      <LimitOverrideFields />
      <div className="field checkbox">
        <input id="f-evaporation" type="checkbox" checked={evaporation} onChange={(e) => setEvaporation(e.target.checked)} />
        <label htmlFor="f-evaporation">Check plastic-shrinkage evaporation (weather at placement)</label>
      </div>
      {evaporation ? (
        <div className="row">
          <NumberField name="curing.thermal.evaporation.airTemperatureC" label="Air temperature" unit="°C" required hint="−10 to 50 °C." />
          <NumberField name="curing.thermal.evaporation.relativeHumidityPercent" label="Relative humidity" unit="%" required />
          <NumberField name="curing.thermal.evaporation.windSpeedKmH" label="Wind speed" unit="km/h" required hint="0–100 km/h; Uno (1998) uses km/h." />
        </div>
      ) : null}
    </div>
  );
}

function useFormContextTyped() {
  return useFormContext<AssessInputRaw, unknown, AssessInput>();
}
