/** The text of every e-mail Benchwright sends. Each has a plain-text and an HTML part. */
export interface EmailContent {
  subject: string;
  text: string;
  html: string;
}

const escapeHtml = (value: string) =>
  value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** A subject is one line: any line break (header injection) becomes a space. */
const oneLine = (value: string) => value.replace(/[\r\n]+/g, ' ').trim();

function compose(
  subject: string,
  greetingName: string,
  paragraphs: string[],
  link?: { url: string; label: string },
): EmailContent {
  const text = [
    `Hello ${oneLine(greetingName)},`,
    '',
    ...paragraphs.flatMap((p) => [p, '']),
    ...(link ? [`${link.label}: ${link.url}`, ''] : []),
    '— Benchwright',
  ].join('\n');
  const html = [
    '<div style="font-family: sans-serif; line-height: 1.5; color: #1c2620">',
    `<p>Hello ${escapeHtml(oneLine(greetingName))},</p>`,
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    link ? `<p><a href="${escapeHtml(link.url)}">${escapeHtml(link.label)}</a></p>` : '',
    '<p>— Benchwright</p>',
    '</div>',
  ].join('\n');
  return { subject: oneLine(subject), text, html };
}

export const mailTemplates = {
  verifyEmail: (name: string, url: string) =>
    compose(
      'Confirm your e-mail address for Benchwright',
      name,
      [
        'Thanks for joining Benchwright. Open the link below to confirm this address; then you can sign in.',
        'The link works once and expires in 48 hours. If you did not ask to join, ignore this message.',
      ],
      { url, label: 'Confirm my address' },
    ),

  alreadyRegistered: (name: string, signInUrl: string, resetUrl: string) =>
    compose('Someone tried to join Benchwright with your address', name, [
      'Somebody — perhaps you — tried to open a new Benchwright account with this e-mail address, which already has an account.',
      `If it was you, sign in at ${signInUrl}. If you have forgotten your password, reset it at ${resetUrl}.`,
      'If it was not you, you can ignore this message; nothing has changed.',
    ]),

  passwordReset: (name: string, url: string) =>
    compose(
      'Reset your Benchwright password',
      name,
      [
        'We received a request to reset the password of your Benchwright account.',
        'The link works once and expires in one hour. If you did not ask for it, ignore this message: your password stays as it is.',
      ],
      { url, label: 'Choose a new password' },
    ),

  passwordChanged: (name: string) =>
    compose('Your Benchwright password was changed', name, [
      'The password of your Benchwright account was just changed, and every other signed-in session was ended.',
      'If you did not do this, reset your password straight away and tell us.',
    ]),

  confirmNewEmail: (name: string, url: string) =>
    compose(
      'Confirm your new e-mail address for Benchwright',
      name,
      [
        'You asked to use this address for your Benchwright account. Open the link to confirm it.',
        'The link works once and expires in 24 hours. Until then your old address stays in use.',
      ],
      { url, label: 'Use this address' },
    ),

  emailChanged: (name: string, newEmail: string) =>
    compose('Your Benchwright e-mail address was changed', name, [
      `Your Benchwright account now uses ${oneLine(newEmail)}. Messages will go there from now on.`,
      'If you did not do this, reply to this message or reset your password straight away.',
    ]),

  listingApproved: (name: string, title: string, url: string) =>
    compose(
      `Your listing is live: ${title}`,
      name,
      [
        `A moderator has checked your listing "${oneLine(title)}" and it is now listed for buyers to find.`,
        'If you change its title, description or price, it is checked again before buyers see the change.',
      ],
      { url, label: 'See your listing' },
    ),

  listingSentBack: (name: string, title: string, reasons: string[], note: string, url: string) =>
    compose(
      `Your listing needs changes: ${title}`,
      name,
      [
        `A moderator has looked at your listing "${oneLine(title)}" and sent it back for these reasons:`,
        ...reasons.map((reason) => `• ${reason}`),
        ...(note ? [`Note from the moderator: ${note}`] : []),
        'Change what is needed, then submit it for review again.',
      ],
      { url, label: 'Open your listing' },
    ),

  listingTakenDown: (name: string, title: string, reason: string, sellerAction: 'none' | 'warn' | 'suspend') =>
    compose(`Your listing was withdrawn: ${title}`, name, [
      `A moderator has withdrawn your listing "${oneLine(title)}".`,
      `Reason: ${reason}`,
      ...(sellerAction === 'warn'
        ? ['This is a warning: further listings that break the rules may lead to your account being suspended.']
        : []),
      ...(sellerAction === 'suspend'
        ? ['Your account has been suspended for this reason, and you can no longer sign in. Reply to ask for a review.']
        : []),
    ]),

  savedSearchMatch: (name: string, searchName: string, title: string, url: string) =>
    compose(
      `New on Benchwright for "${searchName}": ${title}`,
      name,
      [
        `A listing that matches your saved search "${oneLine(searchName)}" has just been listed.`,
        'You can stop these messages by deleting the search from your shortlist page.',
      ],
      { url, label: 'See the listing' },
    ),

  builderProfileApproved: (name: string, url: string) =>
    compose(
      'Your builder profile is approved',
      name,
      ['A moderator has approved your builder profile. You can now list your benchwork-building services.'],
      { url, label: 'List a build service' },
    ),

  builderProfileDeclined: (name: string, reason: string) =>
    compose('Your builder profile was not approved', name, [
      'A moderator has looked at your application for a builder profile and could not approve it this time.',
      `Reason: ${reason}`,
      'You can change your application and apply again.',
    ]),

  /** A new message in a thread: who wrote and about what, with a link; never the message itself. */
  conversationMessage: (name: string, senderName: string, about: string, url: string) =>
    compose(
      `New message from ${senderName} about ${about}`,
      name,
      [
        `${oneLine(senderName)} has sent you a message on Benchwright about "${oneLine(about)}".`,
        'Read it and reply on Benchwright. We will not e-mail you about further messages in this conversation until you have read this one.',
      ],
      { url, label: 'Read the message' },
    ),

  /** The seller has sent the module or made it ready to collect. */
  orderHandedOver: (name: string, title: string, how: 'sent' | 'collect', note: string | null, url: string) =>
    compose(
      how === 'sent' ? `On its way: ${title}` : `Ready to collect: ${title}`,
      name,
      [
        how === 'sent'
          ? `The seller has sent "${oneLine(title)}".`
          : `The seller says "${oneLine(title)}" is ready for you to collect.`,
        ...(note ? [`Their note: ${note}`] : []),
        'When you have it, check it and confirm on the order page that it arrived as described, or raise a problem. If you do neither, receipt is confirmed automatically after 7 days and the seller is paid.',
      ],
      { url, label: 'Open the order' },
    ),

  /** To the seller: the buyer (or the timer) confirmed receipt. */
  orderReceived: (name: string, title: string, automatic: boolean, payout: string, url: string) =>
    compose(
      `Receipt confirmed: ${title}`,
      name,
      [
        automatic
          ? `No problem was raised within 7 days of hand-over, so receipt of "${oneLine(title)}" is now confirmed.`
          : `The buyer has confirmed that "${oneLine(title)}" arrived as described.`,
        `Your payout of ${payout} is sent to your payout account as soon as it is connected and ready.`,
      ],
      { url, label: 'Open the order' },
    ),

  /** To the seller: money transferred to their payout account. */
  payoutMade: (name: string, title: string, payout: string, url: string) =>
    compose(
      `Payout sent: ${title}`,
      name,
      [
        `We have transferred ${payout} for "${oneLine(title)}" to your payout account.`,
        'Your balances page lists every payout.',
      ],
      { url, label: 'See your balances' },
    ),

  /** To both sides: an order was cancelled before hand-over and the buyer refunded. */
  orderCancelled: (name: string, title: string, byWhom: string, refund: string, reason: string | null, url: string) =>
    compose(
      `Order cancelled: ${title}`,
      name,
      [
        `The order for "${oneLine(title)}" was cancelled by ${byWhom} before hand-over.`,
        ...(reason ? [`Reason given: ${reason}`] : []),
        `The buyer's ${refund} goes back to the card it was paid with.`,
      ],
      { url, label: 'Open the order' },
    ),

  /** To both sides: a problem was raised and a moderator will look at it. */
  orderProblemRaised: (name: string, title: string, byWhom: string, reason: string, url: string) =>
    compose(
      `Problem raised: ${title}`,
      name,
      [
        `${byWhom} has raised a problem with the order for "${oneLine(title)}":`,
        reason,
        'The money stays held by Benchwright while a moderator looks at it. They may ask both of you for details.',
      ],
      { url, label: 'Open the order' },
    ),

  /** To both sides: a moderator settled a problem. */
  orderProblemSettled: (name: string, title: string, outcome: string, note: string, url: string) =>
    compose(
      `Problem settled: ${title}`,
      name,
      [`A moderator has settled the problem with the order for "${oneLine(title)}": ${outcome}`, `Their note: ${note}`],
      { url, label: 'Open the order' },
    ),
  /** To the buyer: their payment for a module arrived and is held until they have it. */
  orderPaidBuyer: (name: string, title: string, total: string, handover: string, url: string) =>
    compose(
      `Paid: ${title}`,
      name,
      [
        `Your payment of ${total} for "${oneLine(title)}" has arrived. Benchwright holds it until you have the module.`,
        `How it reaches you: ${handover}. The seller has been told and will be in touch through the order page.`,
        'When you have it, confirm on the order page that it arrived as described, or raise a problem there.',
      ],
      { url, label: 'Open the order' },
    ),

  /** To the seller: the buyer has paid; what to do next, and only now where it goes. */
  orderPaidSeller: (
    name: string,
    title: string,
    handover: string,
    address: string | null,
    payout: string,
    url: string,
  ) =>
    compose(
      `Sold, and paid for: ${title}`,
      name,
      [
        `A buyer has paid for "${oneLine(title)}". The money is held by Benchwright; you are paid ${payout} once the buyer confirms receipt.`,
        `How it goes to them: ${handover}.`,
        ...(address
          ? [`Deliver it to:\n${address}`, 'Pack it well, send it or bring it, then mark it as sent on the order page.']
          : ['Agree a time for collection through the order page, then mark it ready to collect.']),
      ],
      { url, label: 'Open the order' },
    ),

  /** To the buyer: a payment arrived after their order had closed, so it went straight back. */
  latePaymentRefunded: (name: string, title: string, amount: string, url: string) =>
    compose(
      `Payment returned: ${title}`,
      name,
      [
        `Your payment of ${amount} for "${oneLine(title)}" arrived after the order had closed, so we have refunded it in full.`,
        'It goes back to the card you paid with; banks usually show it within a few working days.',
      ],
      { url, label: 'Open the order' },
    ),

  /** To the buyer: an unpaid order closed and the module was offered to others again. */
  orderLapsed: (name: string, title: string, url: string) =>
    compose(
      `Not paid in time: ${title}`,
      name,
      [
        `Your order for "${oneLine(title)}" was not paid within the time it was held for you, so it has closed and nothing was taken.`,
        'If it is still listed you can start again from the listing page.',
      ],
      { url, label: 'Open the order' },
    ),

  /** To a builder: a buyer asks them to price a saved plan. */
  quoteRequested: (name: string, buyerName: string, planName: string, url: string) =>
    compose(
      `Quote request from ${buyerName}: ${planName}`,
      name,
      [
        `${oneLine(buyerName)} has asked you to quote for building "${oneLine(planName)}" on Benchwright.`,
        'Your quote starts from your rate card and the plan’s bill of materials; change any line with a note.',
      ],
      { url, label: 'Open the request' },
    ),

  /** To a buyer: a builder has sent a quote. */
  quoteReceived: (name: string, builderName: string, planName: string, url: string) =>
    compose(
      `Quote received from ${builderName} for ${planName}`,
      name,
      [
        `${oneLine(builderName)} has sent you a quote for building "${oneLine(planName)}".`,
        'Compare it with the other quotes side by side, and accept the one you want.',
      ],
      { url, label: 'Compare your quotes' },
    ),

  /** To a builder: the buyer accepted their quote; a deposit is due next. */
  quoteAccepted: (name: string, buyerName: string, planName: string, url: string) =>
    compose(
      `Quote accepted by ${buyerName}: ${planName}`,
      name,
      [
        `${oneLine(buyerName)} has accepted your quote for "${oneLine(planName)}".`,
        'We will tell you when the deposit is paid; start the build only then.',
      ],
      { url, label: 'See the build order' },
    ),

  /** To a buyer: the builder has finished; the balance is due before hand-over. */
  depositPaidBuyer: (name: string, title: string, deposit: string, url: string) =>
    compose(
      `Deposit paid: ${title}`,
      name,
      [
        `Your deposit of ${deposit} for "${oneLine(title)}" has arrived. Benchwright holds it while the builder works.`,
        'You will be told at each stage, and asked for the balance when the boards are ready.',
      ],
      { url, label: 'See the build' },
    ),
  depositPaidBuilder: (name: string, title: string, deposit: string, url: string) =>
    compose(
      `Deposit paid, start the build: ${title}`,
      name,
      [
        `The buyer has paid the deposit of ${deposit} for "${oneLine(title)}"; Benchwright holds it until hand-over.`,
        'Record each stage on the build page as you go; "ready" asks the buyer for the balance.',
      ],
      { url, label: 'Open the build' },
    ),
  buildStage: (name: string, builderName: string, planName: string, stage: string, url: string) =>
    compose(
      `Build progress: ${stage}`,
      name,
      [`${oneLine(builderName)} has recorded "${oneLine(stage)}" for "${oneLine(planName)}".`],
      { url, label: 'See the build' },
    ),
  buildReady: (name: string, builderName: string, planName: string, balance: string, url: string) =>
    compose(
      `Your boards are built: balance of ${balance} due`,
      name,
      [
        `${oneLine(builderName)} has finished building "${oneLine(planName)}".`,
        `Pay the balance of ${balance} so the boards can be handed over.`,
      ],
      { url, label: 'Pay the balance' },
    ),
};
