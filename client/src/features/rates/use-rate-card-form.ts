import { useForm } from '@mantine/form';
import { rateCardProblems, type RateCard } from '@keenroute/shared';
import { useMemo, type ReactNode } from 'react';
import { cardToDraft, draftErrors, draftToCard, type RateCardDraft } from './rate-card-draft';

/** The rate card form with the shared rules checking every change; a server's field errors come first. */
export function useRateCardForm(card: RateCard) {
  const form = useForm<RateCardDraft>({ mode: 'controlled', initialValues: cardToDraft(card) });
  const draftCard = useMemo(() => draftToCard(form.values), [form.values]);
  const problems = useMemo(() => rateCardProblems(draftCard), [draftCard]);
  const ruleErrors = useMemo(() => draftErrors(problems, form.values.currency), [problems, form.values.currency]);

  const errorOf = (path: string): ReactNode => form.errors[path] ?? ruleErrors[path];

  /** After a save: the saved card becomes the form's starting point. */
  const startFrom = (saved: RateCard) => {
    const draft = cardToDraft(saved);
    form.setInitialValues(draft);
    form.setValues(draft);
    form.resetDirty(draft);
  };

  return { form, draftCard, problems, valid: problems.length === 0, errorOf, startFrom };
}

export type RateCardForm = ReturnType<typeof useRateCardForm>;
