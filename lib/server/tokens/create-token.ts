import "server-only";
import { db } from "@/db/client";
import { apiTokens } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { hashToken, newSecretToken } from "@/lib/server/crypto/secret-token";
import type { CreateTokenInput } from "@/lib/validation/auth";

/** A personal API token: the only time the token itself is returned. */
export async function createToken(actor: Actor, input: CreateTokenInput) {
  const token = newSecretToken("rw");
  const [row] = await db
    .insert(apiTokens)
    .values({
      teamId: actor.teamId,
      userId: actor.userId,
      name: input.name,
      tokenHash: hashToken(token),
      prefix: token.slice(0, 10),
    })
    .returning({ id: apiTokens.id, name: apiTokens.name, prefix: apiTokens.prefix, createdAt: apiTokens.createdAt });
  return { id: row!.id, name: row!.name, prefix: row!.prefix, createdAt: row!.createdAt.toISOString(), token };
}
