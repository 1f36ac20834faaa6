import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import { estimateModuleWeight, estimateToKg } from '../../shared/planner/estimate-module-weight';
import { moduleListingSchema } from '../../shared/schemas/listing-module';
import { buildUser } from '../support/factories';
import { buildListing, moduleBody } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
let seller: User;
/** The planner's estimate for the standard test body (1200 × 450 mm on legs), as the weight field takes it. */
let estimatedKg: number;

beforeAll(async () => {
  app = await startTestApp();
  seller = await buildUser(app.ctx.dataSource);
  const estimate = estimateModuleWeight(moduleListingSchema.parse(moduleBody()));
  if (!estimate.ok) throw new Error(estimate.reason);
  estimatedKg = estimateToKg(estimate.boardG);
});
afterAll(() => app.close());

describe('a module’s weight, weighed or estimated from its construction', () => {
  it('keeps a weight taken from the estimate as estimated, and shows it so', async () => {
    const agent = await signedInAs(app, seller);
    const res = await agent
      .post('/api/listings')
      .send(moduleBody({ weightKg: estimatedKg, weightSource: 'estimated' }));

    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.listing.module).toMatchObject({ weightKg: estimatedKg, weightSource: 'estimated' });
    const again = await agent.get(`/api/listings/${res.body.listing.id}`);
    expect(again.body.listing.module.weightSource).toBe('estimated');
  });

  it('takes a weight sent without saying as entered by the seller', async () => {
    const res = await (await signedInAs(app, seller)).post('/api/listings').send(moduleBody({ weightKg: 11 }));

    expect(res.body.listing.module).toMatchObject({ weightKg: 11, weightSource: 'entered' });
  });

  it('answers 422 at the weight when an "estimated" weight is not the estimate', async () => {
    const res = await (
      await signedInAs(app, seller)
    )
      .post('/api/listings')
      .send(moduleBody({ weightKg: estimatedKg + 2, weightSource: 'estimated' }));

    expect(res.status).toBe(422);
    expect(res.body.error.fields.weightKg).toContain(`now comes to an estimated ${estimatedKg} kg`);
  });

  it('answers 422 when the top has no density to estimate from', async () => {
    const body = moduleBody({ weightKg: 5, weightSource: 'estimated' });
    const res = await (
      await signedInAs(app, seller)
    )
      .post('/api/listings')
      .send({ ...body, construction: { ...body.construction, topMaterial: 'softboard' } });

    expect(res.status).toBe(422);
    expect(res.body.error.fields.weightKg).toBe(
      'The planner has no density for fibre softboard, so weigh the board instead. Type the weight you measured.',
    );
  });

  it('shows a listing saved before the question was asked as entered', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const { weightSource: _dropped, ...olderDetails } = listing.details as { weightSource?: string };
    await app.ctx.dataSource.getRepository(Listing).update(listing.id, { details: olderDetails as Listing['details'] });

    const res = await (await signedInAs(app, seller)).get(`/api/listings/${listing.id}`);
    expect(res.body.listing.module.weightSource).toBe('entered');
  });
});
