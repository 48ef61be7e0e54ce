import { COLLAB_CLOSE } from '@sheaf/sheet-doc';
import { describe, expect, it } from 'vitest';
import { connectionNotice, isConnectionUsable, stateAfterClose, stateAfterStatus } from './connectionState';

describe('stateAfterClose', () => {
  it('ends the session on the final codes and names why', () => {
    expect(stateAfterClose(COLLAB_CLOSE.notSignedIn)).toEqual({ kind: 'signed-out' });
    expect(stateAfterClose(COLLAB_CLOSE.forbidden)).toEqual({ kind: 'no-access', code: 4403 });
    expect(stateAfterClose(COLLAB_CLOSE.notFound)).toEqual({ kind: 'no-access', code: 4404 });
    expect(stateAfterClose(COLLAB_CLOSE.badRequest, 'malformed message')).toEqual({
      kind: 'refused',
      code: 4400,
      reason: 'malformed message',
    });
  });

  it('leaves transient closes to the provider, which retries', () => {
    expect(stateAfterClose(COLLAB_CLOSE.unavailable)).toBeNull();
    expect(stateAfterClose(COLLAB_CLOSE.shuttingDown)).toBeNull();
    expect(stateAfterClose(1006)).toBeNull();
  });
});

describe('stateAfterStatus', () => {
  it('is live only when connected after the document arrived', () => {
    expect(stateAfterStatus('connected', true)).toEqual({ kind: 'live' });
    expect(stateAfterStatus('connected', false)).toEqual({ kind: 'connecting' });
    expect(stateAfterStatus('disconnected', true)).toEqual({ kind: 'reconnecting' });
    expect(stateAfterStatus('connecting', false)).toEqual({ kind: 'connecting' });
  });
});

describe('connectionNotice', () => {
  it('says nothing for a live writer and says read-only for a live reader', () => {
    expect(connectionNotice({ kind: 'live' }, false)).toBeNull();
    expect(connectionNotice({ kind: 'live' }, true)?.title).toBe('Read-only');
  });

  it('words each interruption for what the person can do', () => {
    expect(connectionNotice({ kind: 'signed-out' }, false)).toMatchObject({ tone: 'stop', title: 'Signed out' });
    expect(connectionNotice({ kind: 'no-access', code: 4404 }, false)?.detail).toMatch(/no longer exists/);
    expect(connectionNotice({ kind: 'reconnecting' }, false)).toMatchObject({ tone: 'warn', title: 'Reconnecting…' });
    expect(connectionNotice({ kind: 'reconnecting' }, false)?.detail).toMatch(/merge when it returns/);
    expect(connectionNotice({ kind: 'refused', code: 4400, reason: 'malformed message' }, false)?.detail).toMatch(
      /4400: malformed message/,
    );
  });

  it('says saving is paused, and the sheet is read-only meanwhile, keeping what was typed', () => {
    const notice = connectionNotice({ kind: 'saving-paused' }, false);
    expect(notice).toMatchObject({ tone: 'warn', title: 'Saving paused' });
    expect(notice?.detail).toMatch(/read-only for a moment/);
    expect(notice?.detail).toMatch(/kept here and are sent again when saving resumes/);
    expect(connectionNotice({ kind: 'saving-paused' }, true)?.detail).toMatch(/Changes by others will show again/);
    expect(isConnectionUsable({ kind: 'saving-paused' })).toBe(false);
    expect(isConnectionUsable({ kind: 'live' })).toBe(true);
  });
});
