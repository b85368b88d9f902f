// In-app notices (run finished or failed): a person's own list, newest first, and marking one read.
import { Notice, type User } from '../models';
import { notFound } from '../http/errors';
import type { Notice as NoticeView } from '../../shared/schemas';

const NOTICES_LISTED = 50;

const noticeView = (n: Notice): NoticeView => ({ id: n.id, message: n.message, link: n.link, runId: n.runId, createdAt: n.createdAt.toISOString(), readAt: n.readAt?.toISOString() ?? null });

export async function listNotices(user: User): Promise<{ notices: NoticeView[]; unread: number }> {
  const notices = await Notice.findAll({ where: { userId: user.id }, order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: NOTICES_LISTED });
  const unread = await Notice.count({ where: { userId: user.id, readAt: null } });
  return { notices: notices.map(noticeView), unread };
}

export async function markNoticeRead(user: User, noticeId: number): Promise<NoticeView> {
  const notice = await Notice.findOne({ where: { id: noticeId, userId: user.id } });
  if (!notice) throw notFound('Notice');
  if (!notice.readAt) await notice.update({ readAt: new Date() });
  return noticeView(notice);
}
