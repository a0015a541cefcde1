import type { HTMLAttributes, ReactNode } from "react";
import { cn } from "./cn";

export function Card({ className, ...props }: HTMLAttributes<HTMLDivElement>) {
  return <div className={cn("rounded-card border border-line bg-surface p-5 shadow-card", className)} {...props} />;
}

export function PageHeader({ title, lead, actions }: { title: string; lead?: ReactNode; actions?: ReactNode }) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div>
        <h1 className="font-display text-3xl font-bold tracking-tight text-ink">{title}</h1>
        {lead ? <p className="mt-1 max-w-2xl text-muted">{lead}</p> : null}
      </div>
      {actions ? <div className="flex gap-2">{actions}</div> : null}
    </header>
  );
}

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-card border border-dashed border-line bg-surface/60 p-8 text-center">
      <p className="font-display text-lg font-semibold text-ink">{title}</p>
      {children ? <div className="mx-auto mt-2 max-w-md text-sm text-muted">{children}</div> : null}
      {action ? <div className="mt-4 flex justify-center">{action}</div> : null}
    </div>
  );
}

type Tone = "neutral" | "moss" | "ember" | "danger" | "sky";
const TONES: Record<Tone, string> = {
  neutral: "bg-sunken text-ink",
  moss: "bg-moss-soft text-moss-strong",
  ember: "bg-ember-soft text-ember",
  danger: "bg-danger-soft text-danger",
  sky: "bg-sky-soft text-sky",
};

export function Badge({ tone = "neutral", children }: { tone?: Tone; children: ReactNode }) {
  return (
    <span className={cn("inline-flex items-center rounded-full px-2 py-0.5 text-xs font-semibold", TONES[tone])}>
      {children}
    </span>
  );
}

export function Notice({ tone = "sky", children }: { tone?: Tone; children: ReactNode }) {
  return <div className={cn("rounded-lg px-4 py-3 text-sm", TONES[tone])}>{children}</div>;
}
