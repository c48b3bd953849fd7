/**
 * Every e-mail Leastline sends, rendered to plain text at the moment it is queued (so a retry an hour
 * later sends exactly what the action produced). Links point at console pages; tokens travel in the URL
 * fragment, which browsers never send to a server, so they stay out of access logs.
 */
export interface RenderedMail {
  template: MailTemplateName;
  subject: string;
  text: string;
}

export type MailTemplateName = 'invitation' | 'password-reset' | 'api-key-rotated' | 'usage-alert';

const SIGNATURE = '\n\n— Leastline\nYou receive this because of an action in a Leastline team. Ignore it if it was not expected.';

export function invitationMail(input: {
  teamName: string;
  role: string;
  inviterName: string;
  acceptUrl: string;
  expiresAt: Date;
}): RenderedMail {
  return {
    template: 'invitation',
    subject: `You are invited to ${input.teamName} on Leastline`,
    text:
      `${input.inviterName} invited you to join "${input.teamName}" as ${input.role}.\n\n` +
      `Accept the invitation: ${input.acceptUrl}\n\n` +
      `The link works once and expires at ${input.expiresAt.toISOString()}.` +
      SIGNATURE,
  };
}

export function passwordResetMail(input: { displayName: string; resetUrl: string; expiresAt: Date }): RenderedMail {
  return {
    template: 'password-reset',
    subject: 'Reset your Leastline password',
    text:
      `Hello ${input.displayName},\n\nSomeone (hopefully you) asked to reset the password of this Leastline account.\n\n` +
      `Choose a new password: ${input.resetUrl}\n\n` +
      `The link works once and expires at ${input.expiresAt.toISOString()}. If you did not ask for this, ` +
      'you can ignore this message; your password stays as it is.' +
      SIGNATURE,
  };
}

export function apiKeyRotatedMail(input: {
  teamName: string;
  keyName: string;
  oldKeyPrefix: string;
  newKeyPrefix: string;
  rotatedBy: string;
  oldKeyRetiresAt: Date;
}): RenderedMail {
  return {
    template: 'api-key-rotated',
    subject: `API key "${input.keyName}" was rotated in ${input.teamName}`,
    text:
      `${input.rotatedBy} rotated the API key "${input.keyName}" (${input.oldKeyPrefix}) in "${input.teamName}".\n\n` +
      `The replacement is ${input.newKeyPrefix}. The old key keeps working until ${input.oldKeyRetiresAt.toISOString()}; ` +
      'deploy the new key before then.' +
      SIGNATURE,
  };
}

export function usageAlertMail(input: { teamName: string; metric: string; used: number; limit: number }): RenderedMail {
  const percent = input.limit > 0 ? Math.round((100 * input.used) / input.limit) : 100;
  return {
    template: 'usage-alert',
    subject: `${input.teamName} has used ${percent}% of its ${input.metric} allowance`,
    text:
      `"${input.teamName}" has used ${input.used} of ${input.limit} ${input.metric} this billing period (${percent}%).` +
      SIGNATURE,
  };
}
