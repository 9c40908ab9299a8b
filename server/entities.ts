import { FrameRevision } from './modules/frames/frame-revision.entity';
import { Frame } from './modules/frames/frame.entity';
import { Project } from './modules/projects/project.entity';
import { User } from './modules/users/user.entity';
import { Membership } from './modules/workshops/membership.entity';
import { Workshop } from './modules/workshops/workshop.entity';

/** Every entity the ORM knows, listed explicitly (no folder scanning). */
export const entities = [User, Workshop, Membership, Project, Frame, FrameRevision];
export { Frame, FrameRevision, Membership, Project, User, Workshop };
