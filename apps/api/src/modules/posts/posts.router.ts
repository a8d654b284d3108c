import { Router } from 'express';
import {
  acceptAnswerSchema,
  commentInputSchema,
  createPostSchema,
  idParam,
  postListQuerySchema,
  postPatchSchema,
} from '@app/shared';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import { acceptAnswer, addComment, unvote, vote } from './comments.service';
import { approvedCommentCounts, loadOwnPost, loadVisiblePost } from './post-access';
import { toPostDetailDto } from './post-detail';
import { anonymousPostDetail } from './post-read-cache';
import { toCommentDto, toPostSummaryDto } from './posts.presenter';
import * as posts from './posts.service';

const params = idParam('postId');
const postId = (p: unknown) => Number(params.parse(p).postId);

/** Posts: list, read, write (drafts autosave through PATCH), submit, comments, helpful votes, answers. */
export function postsRouter() {
  const r = Router();
  r.get('/', async (req, res) => {
    const q = postListQuerySchema.parse(req.query);
    const { rows, total } = await posts.listPosts(req.user ?? null, q);
    const counts = await approvedCommentCounts(rows.map((p) => p.id));
    res.json({
      data: rows.map((p) => toPostSummaryDto(p, counts.get(p.id) ?? 0)),
      meta: { page: q.page, pageSize: posts.PAGE_SIZE, total },
    });
  });
  r.get('/mine', requireAuth(), async (req, res) => {
    const rows = await posts.listOwnPosts(currentUser(req));
    const counts = await approvedCommentCounts(rows.map((p) => p.id));
    res.json({ data: rows.map((p) => toPostSummaryDto(p, counts.get(p.id) ?? 0)) });
  });
  r.post('/', requireAuth(), async (req, res) => {
    const actor = currentUser(req);
    const post = await posts.createPost(actor, createPostSchema.parse(req.body));
    res.status(201).json({ data: await toPostDetailDto(await loadOwnPost(actor, post.id), actor) });
  });
  r.get('/:postId', async (req, res) => {
    const viewer = req.user ?? null;
    const id = postId(req.params);
    res.json({
      data: viewer
        ? await toPostDetailDto(await loadVisiblePost(viewer, id), viewer)
        : await anonymousPostDetail(id),
    });
  });
  r.patch('/:postId', requireAuth(), async (req, res) => {
    const actor = currentUser(req);
    const post = await posts.updatePost(actor, postId(req.params), postPatchSchema.parse(req.body));
    res.json({ data: await toPostDetailDto(await loadOwnPost(actor, post.id), actor) });
  });
  r.post('/:postId/submit', requireAuth(), async (req, res) => {
    const actor = currentUser(req);
    const post = await posts.submitPost(actor, postId(req.params));
    res.json({ data: await toPostDetailDto(await loadOwnPost(actor, post.id), actor) });
  });
  r.delete('/:postId', requireAuth(), async (req, res) => {
    await posts.deletePost(currentUser(req), postId(req.params));
    res.status(204).end();
  });
  r.post('/:postId/comments', requireAuth(), async (req, res) => {
    const actor = currentUser(req);
    const c = await addComment(actor, postId(req.params), commentInputSchema.parse(req.body));
    res.status(201).json({ data: toCommentDto(c, null) });
  });
  r.put('/:postId/accepted-answer', requireAuth(), async (req, res) => {
    const actor = currentUser(req);
    const { commentId } = acceptAnswerSchema.parse(req.body);
    const post = await acceptAnswer(actor, postId(req.params), commentId);
    res.json({ data: { acceptedCommentId: post.acceptedCommentId } });
  });
  r.put('/:postId/vote', requireAuth(), async (req, res) => {
    res.json({
      data: { helpfulCount: await vote(currentUser(req), postId(req.params)), hasVoted: true },
    });
  });
  r.delete('/:postId/vote', requireAuth(), async (req, res) => {
    res.json({
      data: { helpfulCount: await unvote(currentUser(req), postId(req.params)), hasVoted: false },
    });
  });
  return r;
}
