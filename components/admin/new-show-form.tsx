"use client";
// The administrator's "New show" form: creates the show in draft and invites its chair.
import { CalendarPlus } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextareaField, TextField } from "@/components/ui/field";
import { createShowSchema } from "@/lib/schemas/show";
import { createShowAction } from "@/app/(admin)/admin/actions";
import type { TimeZoneOptions } from "./time-zones";

const slugify = (s: string) =>
  s
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60);

const zoneLabel = (z: string) => z.replace(/_/g, " ");

export function NewShowForm({ timeZones }: { timeZones: TimeZoneOptions }) {
  const ctl = useActionForm({
    schema: createShowSchema,
    defaultValues: { name: "", slug: "", guildName: "", venueName: "", venueAddress: "", timeZone: "America/Chicago", chairEmail: "" },
    action: (values) => createShowAction(null, values),
    resetOnSuccess: true,
  });
  const { register, setValue, getFieldState } = ctl.form;

  return (
    <ActionForm controller={ctl} aria-labelledby="new-show">
      <div className="grid gap-5 md:grid-cols-2">
        <TextField
          label="Show name"
          required
          error={ctl.errorOf("name")}
          {...register("name", {
            // Suggest the web address from the name until someone edits it by hand.
            onChange: (e: { target: { value: string } }) => {
              if (!getFieldState("slug").isDirty) setValue("slug", slugify(e.target.value));
            },
          })}
        />
        <TextField
          label="Web address"
          required
          hint="Lower-case letters, digits and hyphens: /shows/spring-show-2027"
          autoCapitalize="none"
          spellCheck={false}
          error={ctl.errorOf("slug")}
          {...register("slug")}
        />
        <TextField label="Guild or committee" required error={ctl.errorOf("guildName")} {...register("guildName")} />
        <TextField label="Venue" required error={ctl.errorOf("venueName")} {...register("venueName")} />
        <TextareaField label="Venue address" optional rows={2} error={ctl.errorOf("venueAddress")} {...register("venueAddress")} className="md:col-span-2" />
        <SelectField label="Time zone" required hint="All the show’s dates and times are shown in this zone." error={ctl.errorOf("timeZone")} {...register("timeZone")}>
          <optgroup label="Common">
            {timeZones.common.map((z) => (
              <option key={`c-${z}`} value={z}>
                {zoneLabel(z)}
              </option>
            ))}
          </optgroup>
          <optgroup label="All time zones">
            {timeZones.all.map((z) => (
              <option key={z} value={z}>
                {zoneLabel(z)}
              </option>
            ))}
          </optgroup>
        </SelectField>
        <TextField
          label="Chair’s e-mail"
          type="email"
          inputMode="email"
          autoComplete="off"
          required
          hint="We’ll e-mail them an invitation to chair the show."
          error={ctl.errorOf("chairEmail")}
          {...register("chairEmail")}
        />
      </div>
      <Button type="submit" pending={ctl.pending} pendingLabel="Creating…" icon={<CalendarPlus aria-hidden className="size-5" />}>
        Create the show
      </Button>
    </ActionForm>
  );
}
