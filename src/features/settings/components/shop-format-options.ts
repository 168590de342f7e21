/** The locales and currencies the shop settings offer; a saved value outside the list is kept and shown as it is. */
export const localeChoices = [
  { value: 'en-GB', label: 'English (United Kingdom)' },
  { value: 'en-IE', label: 'English (Ireland)' },
  { value: 'en-US', label: 'English (United States)' },
  { value: 'de-DE', label: 'German (Germany)' },
  { value: 'fr-FR', label: 'French (France)' },
  { value: 'nl-NL', label: 'Dutch (Netherlands)' },
] as const;

export const currencyChoices = [
  { value: 'GBP', label: 'Pound sterling (£)' },
  { value: 'EUR', label: 'Euro (€)' },
  { value: 'USD', label: 'US dollar ($)' },
] as const;

type Choice = { value: string; label: string };

/** The list with the saved value first when it is not one of them, so opening the form never changes it. */
export function withSaved(choices: readonly Choice[], saved: string): Choice[] {
  return choices.some((choice) => choice.value === saved) ? [...choices] : [{ value: saved, label: saved }, ...choices];
}

/** The label of a saved value, or the value itself. */
export const choiceLabel = (choices: readonly Choice[], value: string) => choices.find((choice) => choice.value === value)?.label ?? value;
