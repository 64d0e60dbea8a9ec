"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { postJson } from "@/components/records/post-json";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";

/** Names the new parameter set and saves the fit; the server recomputes what it stores. */
export function SaveFitForm({ slug, body }: { slug: string; body: Record<string, unknown> }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [error, setError] = useState<string | undefined>();
  const [pending, setPending] = useState(false);

  async function save(e: React.FormEvent) {
    e.preventDefault();
    setPending(true);
    setError(undefined);
    const res = await postJson<{ id: string }>(`/api/v1/teams/${slug}/fits`, { ...body, name });
    setPending(false);
    if (res.ok) router.push(`/teams/${slug}/fits/${res.data.id}`);
    else setError(res.message);
  }

  return (
    <form onSubmit={save} className="flex flex-wrap items-end gap-3" noValidate>
      <Field
        id="fit-set-name"
        label="Name of the new parameter set"
        value={name}
        onChange={(e) => setName(e.target.value)}
        error={error}
        className="min-w-64"
      />
      <Button type="submit" pending={pending}>
        Save as parameter set
      </Button>
    </form>
  );
}
