import type { QuoteSettingsInput } from '../../../shared/schemas/quotes';
import type { QuoteSettingsView } from '../../../shared/types/quotes';
import type { AppContext } from '../../app-context';
import { conflict } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import type { ListingActor } from '../listings/listing-actor';
import { BuilderQuoteSettings } from './builder-quote-settings.entity';
import { depositRates } from './quote-records';

/** GET /api/quotes/settings */
export async function getQuoteSettings(ctx: AppContext, actor: ListingActor): Promise<QuoteSettingsView> {
  const deposits = await depositRates(ctx.dataSource.manager, [actor.id]);
  return { depositBps: deposits.get(actor.id)!, builder: actor.role === 'builder' };
}

/** PUT /api/quotes/settings: only builders quote, so only they set a deposit. Applies to quotes sent from now on. */
export async function saveQuoteSettings(
  ctx: AppContext,
  actor: ListingActor,
  input: QuoteSettingsInput,
): Promise<QuoteSettingsView> {
  if (actor.role !== 'builder')
    throw conflict('not_a_builder', 'Only builders set a deposit: apply for a builder profile first.');
  const depositBps = input.depositPercent * 100;
  await ctx.transaction(async (m) => {
    await m.upsert(BuilderQuoteSettings, { userId: actor.id, depositBps }, ['userId']);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'quote_settings.saved',
      targetType: 'user',
      targetId: actor.id,
      detail: { depositBps },
      ip: actor.ip,
    });
  });
  return getQuoteSettings(ctx, actor);
}
