import type { UseFormRegister } from 'react-hook-form';
import { notificationKindLabels, notificationKinds } from '../../../../shared/schemas/notification';
import type { UpdateMeInput } from '../../../../shared/schemas/user';

/** One checkbox per kind of e-mail; part of the preferences form, saved with it. */
export function NotifyPrefsFieldset({ register }: { register: UseFormRegister<UpdateMeInput> }) {
  return (
    <fieldset>
      <legend className="mb-1 font-medium">E-mail me about</legend>
      <p className="mb-2 text-sm text-maple-700">Untick anything you would rather not hear about by e-mail. The screens show it either way.</p>
      <div className="space-y-2">
        {notificationKinds.map((kind) => (
          <label
            key={kind}
            className="flex min-h-touch cursor-pointer items-center gap-3 rounded-panel border border-maple-300 bg-white px-3 py-2 has-checked:border-lacquer-600 has-checked:bg-lacquer-50"
          >
            <input type="checkbox" className="size-5 accent-lacquer-700" {...register(`notify.${kind}`)} />
            <span>{notificationKindLabels[kind]}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
