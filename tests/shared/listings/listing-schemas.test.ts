import { describe, expect, it } from 'vitest';
import { fieldErrors } from '../../../server/http/middlewares/validate';
import { listingInputSchema, listingSearchSchema } from '../../../shared/schemas/listings';
import { moduleBody, serviceBody } from '../../support/listing-bodies';

const errorsOf = (schema: typeof listingInputSchema | typeof listingSearchSchema, value: unknown) => {
  const result = schema.safeParse(value);
  return result.success ? {} : fieldErrors(result.error.issues);
};

describe('listingInputSchema', () => {
  it('accepts a whole module and a whole service listing', () => {
    expect(listingInputSchema.safeParse(moduleBody()).success).toBe(true);
    expect(listingInputSchema.safeParse(serviceBody()).success).toBe(true);
  });

  it('refuses fields that are the server’s to set, naming each', () => {
    const fields = errorsOf(listingInputSchema, { ...moduleBody(), state: 'listed', ownerId: 1 });
    expect(fields).toMatchObject({ state: expect.any(String), ownerId: expect.any(String) });
  });

  it('refuses a price of zero or less, saying how to write it', () => {
    for (const priceMinor of [0, -100])
      expect(errorsOf(listingInputSchema, moduleBody({ priceMinor })).priceMinor).toMatch(/more than zero/);
    expect(errorsOf(listingInputSchema, moduleBody({ priceMinor: 12.5 })).priceMinor).toMatch(/whole pence/);
  });

  it('asks for a kind it knows', () => {
    expect(errorsOf(listingInputSchema, { ...moduleBody(), kind: 'layout' }).kind).toMatch(/module.*service/);
  });

  it('checks the track offsets against the width and each other', () => {
    const endA = { trackOffsetsMm: [200, 500], railTopHeightMm: 1000, railTopFrom: 'floor' as const };
    const tooWide = moduleBody({ widthMm: 450, endProfiles: { a: endA, b: endA } });
    expect(errorsOf(listingInputSchema, tooWide)['endProfiles.a.trackOffsetsMm']).toMatch(/width \(450 mm\)/);
    const unordered = { ...endA, trackOffsetsMm: [300, 200] };
    expect(
      errorsOf(listingInputSchema, moduleBody({ endProfiles: { a: unordered, b: endA } }))[
        'endProfiles.a.trackOffsetsMm'
      ],
    ).toMatch(/smallest first/);
  });

  it('asks for at least one way to get the board, and for notes on a used one', () => {
    const none = moduleBody({ handling: { collection: false, delivery: null, courier: null } });
    expect(errorsOf(listingInputSchema, none)['handling.collection']).toMatch(/at least one way/);
    const silent = moduleBody({ condition: 'worn', conditionNotes: '' });
    expect(errorsOf(listingInputSchema, silent).conditionNotes).toMatch(/condition/);
  });

  it('rounds a given position to two decimal places', () => {
    const parsed = listingInputSchema.parse(moduleBody({ position: { lat: 53.098765, lon: -2.441234 } }));
    expect(parsed.position).toEqual({ lat: 53.1, lon: -2.44 });
  });

  it('keeps the description as plain text, dropping control characters', () => {
    const parsed = listingInputSchema.parse(
      moduleBody({ description: '  Line one\r\nLine two\u0007 <b>bold</b>  ' + 'x'.repeat(20) }),
    );
    expect(parsed.description).toBe('Line one\nLine two <b>bold</b>  ' + 'x'.repeat(20));
  });
});

describe('listingSearchSchema', () => {
  it('reads repeated and comma-separated values as one list', () => {
    expect(listingSearchSchema.parse({ scale: ['oo', 'h0'] }).scale).toEqual(['oo', 'h0']);
    expect(listingSearchSchema.parse({ scale: 'oo,h0' }).scale).toEqual(['oo', 'h0']);
    expect(listingSearchSchema.parse({ joinOffsets: '150,196' }).joinOffsets).toEqual([150, 196]);
  });

  it('refuses unknown sorts, filters and values, naming the parameter', () => {
    expect(errorsOf(listingSearchSchema, { sort: 'price; DROP TABLE listings' }).sort).toMatch(/Sort must be one of/);
    expect(errorsOf(listingSearchSchema, { colour: 'green' }).colour).toBeDefined();
    expect(errorsOf(listingSearchSchema, { scale: 'oo,xx' })['scale.1']).toMatch(/Unknown scale/);
  });

  it('asks for a town before a distance, and words before relevance', () => {
    expect(errorsOf(listingSearchSchema, { withinKm: '20' }).town).toMatch(/town/);
    expect(errorsOf(listingSearchSchema, { sort: 'distance' }).sort).toMatch(/town/);
    expect(errorsOf(listingSearchSchema, { sort: 'relevance' }).sort).toMatch(/search words/);
  });

  it('refuses a range whose low end is above its high end', () => {
    expect(errorsOf(listingSearchSchema, { priceMin: '5000', priceMax: '100' }).priceMax).toMatch(/at least priceMin/);
  });
});
