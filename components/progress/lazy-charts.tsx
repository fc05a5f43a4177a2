"use client";

import dynamic from "next/dynamic";

// The chart library runs only in the browser; the page around it, its summaries and its tables
// arrive rendered from the server, and a quiet placeholder holds the chart's place meanwhile.
function Placeholder() {
  return <div className="h-40 animate-pulse rounded bg-paper-sunk" />;
}

export const ColumnChart = dynamic(() => import("./charts").then((m) => m.ColumnChart), { ssr: false, loading: Placeholder });
export const RowChart = dynamic(() => import("./charts").then((m) => m.RowChart), { ssr: false, loading: Placeholder });
