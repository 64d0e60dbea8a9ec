"use client";

import { useState } from "react";

import { Pager } from "@/components/scenarios/pager";
import { messageOf } from "@/lib/client/data/api-fetch";
import { describeAuditEvent } from "@/lib/client/data/audit-words";
import { formatWhen, personName } from "@/lib/client/data/format";
import type { AuditLogResponse } from "@/lib/client/data/types";
import { useAuditLog } from "@/lib/client/data/use-audit-log";

// The audit route's default page size, so the server's first page and the client agree.
export const AUDIT_PAGE_SIZE = 50;

export interface AuditTableProps {
  slug: string;
  initial: AuditLogResponse;
}

export function AuditTable({ slug, initial }: AuditTableProps) {
  const [page, setPage] = useState(1);
  const log = useAuditLog(slug, page, initial);
  const data = log.data;
  return (
    <div className="space-y-3">
      {log.isError ? <p className="text-sm text-kiln-dark">{messageOf(log.error)}</p> : null}
      <div className="overflow-x-auto rounded-lg border border-glaze-line bg-white/70">
        <table className="w-full text-left text-sm" data-testid="audit-log">
          <thead className="border-b border-glaze-line bg-glaze-deep/60 text-xs text-ink-soft">
            <tr>
              <th className="px-3 py-2 font-medium">When</th>
              <th className="px-3 py-2 font-medium">Who</th>
              <th className="px-3 py-2 font-medium">What</th>
            </tr>
          </thead>
          <tbody>
            {data?.items.map((e) => (
              <tr key={e.id} className="border-b border-glaze-line/70 last:border-0">
                <td className="whitespace-nowrap px-3 py-1.5 text-ink-soft">{formatWhen(e.at)}</td>
                <td className="px-3 py-1.5">{personName(e.actor)}</td>
                <td className="px-3 py-1.5">{describeAuditEvent(e.action, e.detail)}</td>
              </tr>
            ))}
            {data && data.items.length === 0 ? (
              <tr>
                <td colSpan={3} className="px-3 py-6 text-center text-ink-soft">
                  Nothing recorded yet.
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      {data ? (
        <Pager
          page={data.page}
          pageSize={data.pageSize}
          total={data.total}
          what="entries"
          onPage={setPage}
        />
      ) : null}
    </div>
  );
}
