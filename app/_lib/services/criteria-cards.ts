import "server-only";
import { createCriteriaCard, jurisdictionTaken, updateCriteriaCard } from "@/db/queries/criteria-cards";
import type { CurrentUser } from "../auth";
import { assertCanWrite, cardFor } from "../designs";
import { ValidationError } from "../errors";
import { criteriaCardSchema } from "../schemas/project";
import type { Body } from "./input";

/** Creates a criteria card, or changes the one `cardId` names; one card per jurisdiction in the organisation. */
export async function saveCriteriaCard(user: CurrentUser, cardId: string | null, body: Body): Promise<void> {
  if (cardId) await cardFor(user, cardId);
  assertCanWrite(user);
  const card = criteriaCardSchema.parse(await body());
  if (await jurisdictionTaken(user.organisationId, card.jurisdiction, cardId || undefined)) {
    throw ValidationError.field("jurisdiction", `Your organisation already has a card for ${card.jurisdiction}; edit that one instead`);
  }
  if (cardId) await updateCriteriaCard(cardId, card);
  else await createCriteriaCard({ ...card, organisationId: user.organisationId, createdBy: user.userId });
}
