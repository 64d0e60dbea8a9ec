"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { postJson } from "@/components/records/post-json";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export interface StudyFormProps {
  team: string;
  file: Record<string, unknown>;
  parameters: string[];
  pageUrl: string;
}

const INPUT = "mt-1 block w-full rounded-md border border-glaze-line bg-white px-2 py-1.5 text-sm";

interface AxisDraft {
  parameter: string;
  from: string;
  to: string;
  count: string;
}

function AxisFields({
  label,
  axis,
  onChange,
  parameters,
}: {
  label: string;
  axis: AxisDraft;
  onChange: (a: AxisDraft) => void;
  parameters: string[];
}) {
  const field = (key: keyof AxisDraft, text: string) => (
    <label className="text-sm">
      {text}
      <input
        className={INPUT}
        value={axis[key]}
        inputMode="decimal"
        onChange={(e) => onChange({ ...axis, [key]: e.target.value })}
      />
    </label>
  );
  return (
    <fieldset className="grid grid-cols-4 gap-2">
      <legend className="text-sm font-medium">{label}</legend>
      <label className="text-sm">
        Parameter
        <select
          className={INPUT}
          value={axis.parameter}
          onChange={(e) => onChange({ ...axis, parameter: e.target.value })}
        >
          <option value="">(none)</option>
          {parameters.map((p) => (
            <option key={p}>{p}</option>
          ))}
        </select>
      </label>
      {field("from", "From")}
      {field("to", "To")}
      {field("count", "Values")}
    </fieldset>
  );
}

const toAxis = (a: AxisDraft) => ({
  parameter: a.parameter,
  from: Number(a.from),
  to: Number(a.to),
  count: Number(a.count),
});

/** The revision's path for a grid over one or two parameters of its first set, or for all its sets. */
export function StudyForm({ team, file, parameters, pageUrl }: StudyFormProps) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [first, setFirst] = useState<AxisDraft>({
    parameter: "Y0_1",
    from: "",
    to: "",
    count: "5",
  });
  const [second, setSecond] = useState<AxisDraft>({ parameter: "", from: "", to: "", count: "5" });
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function submit(event: React.FormEvent) {
    event.preventDefault();
    setPending(true);
    setError(null);
    const axes = [first, second].filter((a) => a.parameter !== "").map(toAxis);
    const body = { name, scenario: file, ...(axes.length > 0 ? { grid: { axes } } : {}) };
    const result = await postJson<{ id: string }>(`/api/v1/teams/${team}/studies`, body);
    setPending(false);
    if (!result.ok) return setError(result.message);
    router.push(`${pageUrl}?study=${result.data.id}`);
  }
  return (
    <form onSubmit={submit} className="space-y-3">
      <label className="block text-sm font-medium">
        Study name
        <input
          className={INPUT}
          value={name}
          maxLength={200}
          onChange={(e) => setName(e.target.value)}
        />
      </label>
      <AxisFields
        label="First parameter"
        axis={first}
        onChange={setFirst}
        parameters={parameters}
      />
      <AxisFields
        label="Second parameter (optional)"
        axis={second}
        onChange={setSecond}
        parameters={parameters}
      />
      <p className="text-xs text-ink-faint">
        Choose no parameter to run every parameter set of this revision on its path.
      </p>
      <Button type="submit" pending={pending}>
        Submit the study
      </Button>
      {error ? <FormMessage tone="error">{error}</FormMessage> : null}
    </form>
  );
}
