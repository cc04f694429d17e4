"use client";
// One step of the entry form: the shared action-form hook plus where to go after saving
// ("Save and continue" → the next step, "Save and finish later" → My entries).
import { useRef } from "react";
import { useRouter } from "next/navigation";
import type { DefaultValues, FieldValues } from "react-hook-form";
import type { z } from "zod";
import { useActionForm } from "@/components/forms/action-form";
import type { ActionResult } from "@/lib/action";
import type { Intent } from "./step-buttons";

export function useStepForm<TIn extends FieldValues, TOut extends FieldValues>(opts: {
  schema: z.ZodType<TOut, TIn>;
  defaultValues: DefaultValues<TIn>;
  action: (values: TOut) => Promise<ActionResult<unknown>>;
  nextHref: string;
}) {
  const router = useRouter();
  const intent = useRef<Intent>("next");
  const ctl = useActionForm<TIn, TOut, unknown>({
    schema: opts.schema,
    defaultValues: opts.defaultValues,
    action: opts.action,
    onSuccess: () => {
      router.push(intent.current === "next" ? opts.nextHref : "/my");
      router.refresh();
    },
  });
  return { ctl, setIntent: (i: Intent) => (intent.current = i) };
}
