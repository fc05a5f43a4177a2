import type { ReactNode } from "react";

const TONES = {
  error: "border-danger bg-danger-bg text-danger",
  info: "border-chalk bg-chalk-light text-chalk-dark",
  success: "border-ok bg-ok-bg text-ok",
} as const;

export function Alert({ tone = "info", children }: { tone?: keyof typeof TONES; children: ReactNode }) {
  return (
    <div role={tone === "error" ? "alert" : "status"} className={`rounded border-l-4 px-4 py-3 font-semibold ${TONES[tone]}`}>
      {children}
    </div>
  );
}
