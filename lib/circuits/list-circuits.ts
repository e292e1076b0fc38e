import 'server-only';
import type { Order } from 'sequelize';
import { getSequelize } from '@/lib/db';
import type { ListCircuitsQuery } from '@/lib/circuits/schemas';
import { Circuit, CircuitRevision, User } from '@/models';

export interface CircuitListItem {
  id: string;
  title: string;
  description: string;
  revisionCount: number;
  updatedAt: string;
  /** Author of the newest revision. */
  author: { id: string; name: string } | null;
}

export interface CircuitPage {
  items: CircuitListItem[];
  total: number;
  page: number;
  pageSize: number;
}

type CircuitWithRevision = Circuit & { currentRevision?: CircuitRevision & { author?: User } };

function orderFor(query: ListCircuitsQuery): Order {
  const dir = query.dir.toUpperCase() as 'ASC' | 'DESC';
  const byId: [string, string] = ['id', 'ASC'];
  switch (query.sort) {
    case 'title':
      return [[getSequelize().fn('lower', getSequelize().col('title')), dir], byId];
    case 'revisions':
      return [['currentRevisionNumber', dir], byId];
    case 'author':
      return [[{ model: CircuitRevision, as: 'currentRevision' }, { model: User, as: 'author' }, 'name', dir], byId];
    case 'updated':
      return [['updatedAt', dir], byId];
  }
}

/** One page of a workspace's circuits, sorted as asked; ties break on id so paging is stable. */
export async function listCircuits({ workspaceId, query }: { workspaceId: string; query: ListCircuitsQuery }): Promise<CircuitPage> {
  getSequelize();
  const { rows, count } = await Circuit.findAndCountAll({
    where: { workspaceId },
    include: [
      {
        model: CircuitRevision,
        as: 'currentRevision',
        attributes: ['id', 'number', 'authorId'],
        include: [{ model: User, as: 'author', attributes: ['id', 'name'] }],
      },
    ],
    order: orderFor(query),
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
    distinct: true,
  });
  return {
    items: (rows as CircuitWithRevision[]).map((circuit) => {
      const author = circuit.currentRevision?.author;
      return {
        id: circuit.id,
        title: circuit.title,
        description: circuit.description,
        revisionCount: circuit.currentRevisionNumber,
        updatedAt: circuit.updatedAt.toISOString(),
        author: author ? { id: author.id, name: author.name } : null,
      };
    }),
    total: count,
    page: query.page,
    pageSize: query.pageSize,
  };
}
