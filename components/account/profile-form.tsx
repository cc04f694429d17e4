"use client";
// The entrant's details: the name for entries, contact details for the show, and consent to
// publish the name. Saved through saveProfileAction.
import { Save } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { CheckboxField, TextField } from "@/components/ui/field";
import { profileSchema, type ProfileInput } from "@/lib/schemas/profile";
import { saveProfileAction } from "@/app/(entrant)/account/actions";

export function ProfileForm({ profile }: { profile: ProfileInput }) {
  const ctl = useActionForm({
    schema: profileSchema,
    defaultValues: profile,
    action: (values) => saveProfileAction(null, values),
  });
  const { register } = ctl.form;
  const text = (name: Exclude<keyof ProfileInput, "publishNameConsent">) => ({ error: ctl.errorOf(name), ...register(name) });

  return (
    <ActionForm controller={ctl} aria-labelledby="profile">
      <TextField label="Name on your entries" required autoComplete="name" hint="As you’d like it beside your quilt." {...text("displayName")} />
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField label="Phone" optional type="tel" autoComplete="tel" {...text("phone")} />
        <TextField label="Guild" optional autoComplete="organization" {...text("guild")} />
      </div>
      <fieldset className="space-y-5">
        <legend className="mb-3 font-display text-xl font-semibold">Address</legend>
        <TextField label="Address line 1" optional autoComplete="address-line1" {...text("addressLine1")} />
        <TextField label="Address line 2" optional autoComplete="address-line2" {...text("addressLine2")} />
        <div className="grid gap-5 sm:grid-cols-2">
          <TextField label="Town or city" optional autoComplete="address-level2" {...text("city")} />
          <TextField label="State, province or region" optional autoComplete="address-level1" {...text("region")} />
          <TextField label="Postal code" optional autoComplete="postal-code" {...text("postalCode")} />
          <TextField label="Country" optional autoComplete="country-name" {...text("country")} />
        </div>
      </fieldset>
      <CheckboxField
        label="Show my name with my quilts"
        hint="On the label beside each quilt and in published results. Leave unticked and the show uses only your entry number."
        error={ctl.errorOf("publishNameConsent")}
        {...register("publishNameConsent")}
      />
      <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />}>
        Save my details
      </Button>
    </ActionForm>
  );
}
