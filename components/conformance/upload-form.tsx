"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { postJson } from "@/components/records/post-json";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export interface ConformanceUploadFormProps {
  apiUrl: string;
  pageUrl: string;
  setIds: string[];
}

const INPUT = "mt-1 block w-full rounded-md border border-glaze-line bg-white px-3 py-2 text-sm";

/** Upload of a single-point history; the server reads, replays, compares and records it. */
export function ConformanceUploadForm({ apiUrl, pageUrl, setIds }: ConformanceUploadFormProps) {
  const router = useRouter();
  const [file, setFile] = useState<File | null>(null);
  const [set, setSet] = useState(setIds[0] ?? "");
  const [stressPct, setStressPct] = useState("1");
  const [damage, setDamage] = useState("0.005");
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function submit(event: React.FormEvent) {
    event.preventDefault();
    if (!file) return setError("Choose a CSV file first.");
    setPending(true);
    setError(null);
    const result = await postJson<{ id: string }>(apiUrl, {
      set,
      fileName: file.name,
      text: await file.text(),
      tolerance: { stressFraction: Number(stressPct) / 100, damage: Number(damage) },
    });
    setPending(false);
    if (!result.ok) return setError(result.message);
    router.push(`${pageUrl}?check=${result.data.id}`);
    router.refresh();
  }
  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-5 sm:items-end">
      <label className="text-sm font-medium sm:col-span-2">
        History (CSV: increment, eps11, eps22, gam12, sig11, sig22, sig12, optional d1, d2)
        <input
          type="file"
          accept=".csv,.txt,text/csv"
          className={INPUT}
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
        />
      </label>
      <label className="text-sm font-medium">
        Parameter set
        <select className={INPUT} value={set} onChange={(e) => setSet(e.target.value)}>
          {setIds.map((id) => (
            <option key={id}>{id}</option>
          ))}
        </select>
      </label>
      <label className="text-sm font-medium">
        Stress tolerance (% of peak)
        <input
          className={INPUT}
          inputMode="decimal"
          value={stressPct}
          onChange={(e) => setStressPct(e.target.value)}
        />
      </label>
      <label className="text-sm font-medium">
        Damage tolerance
        <input
          className={INPUT}
          inputMode="decimal"
          value={damage}
          onChange={(e) => setDamage(e.target.value)}
        />
      </label>
      <Button type="submit" pending={pending} className="sm:col-span-1">
        Check conformance
      </Button>
      {error ? (
        <div className="sm:col-span-5">
          <FormMessage tone="error">{error}</FormMessage>
        </div>
      ) : null}
    </form>
  );
}
