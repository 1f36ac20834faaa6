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
};
