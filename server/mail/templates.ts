// Wording of every e-mail Patchcast sends; links point at app routes.
import type { OutgoingMail } from './mailer';
import type { Role } from '../../shared/schemas';

export function verificationMail(appUrl: string, to: string, name: string, token: string): OutgoingMail {
  return {
    to,
    subject: 'Confirm your e-mail address for Patchcast',
    text: `Hello ${name},\n\nConfirm your address to start using Patchcast:\n${appUrl}/verify?token=${token}\n\nThe link works once and expires in 48 hours. If you did not sign up, ignore this message.\n`,
  };
}

export function accountExistsMail(appUrl: string, to: string, name: string): OutgoingMail {
  return {
    to,
    subject: 'Someone tried to sign up to Patchcast with your address',
    text: `Hello ${name},\n\nSomeone (perhaps you) tried to create a Patchcast account with this address, which already has one.\nSign in here: ${appUrl}/sign-in\nForgot the password? Reset it: ${appUrl}/forgot\n\nIf it was not you, you can ignore this message; nothing has changed.\n`,
  };
}

export function resetMail(appUrl: string, to: string, name: string, token: string): OutgoingMail {
  return {
    to,
    subject: 'Reset your Patchcast password',
    text: `Hello ${name},\n\nChoose a new password here:\n${appUrl}/reset?token=${token}\n\nThe link works once and expires in 1 hour. If you did not ask for it, ignore this message; your password stays as it is.\n`,
  };
}

export function invitationMail(appUrl: string, to: string, teamName: string, inviter: string, role: Role, token: string): OutgoingMail {
  return {
    to,
    subject: `${inviter} invited you to ${teamName} on Patchcast`,
    text: `${inviter} invited you to join the team "${teamName}" on Patchcast as ${role}.\n\nAccept here (sign up or sign in with this address):\n${appUrl}/invitation?token=${token}\n\nThe invitation expires in 7 days.\n`,
  };
}

export function runEndedMail(to: string, name: string, what: { scenario: string; studyArea: string; runId: number; ended: 'finished' | 'failed'; reason: string | null; link: string }): OutgoingMail {
  const outcome = what.ended === 'finished' ? 'finished' : `failed: ${what.reason ?? 'no reason recorded'}`;
  return {
    to,
    subject: `Run ${what.runId} of "${what.scenario}" ${what.ended}`,
    text: `Hello ${name},\n\nRun ${what.runId} of the scenario "${what.scenario}" (${what.studyArea}) ${outcome}.\n\nOpen it here:\n${what.link}\n\nYou get this because you started the run or asked to hear about your team's runs (team settings).\n`,
  };
}
