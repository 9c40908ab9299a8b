import { FrameRevision } from './modules/frames/frame-revision.entity';
import { Frame } from './modules/frames/frame.entity';
import { Project } from './modules/projects/project.entity';
import { User } from './modules/users/user.entity';
import { Membership } from './modules/workshops/membership.entity';
import { Workshop } from './modules/workshops/workshop.entity';
import { Attachment } from './modules/attachments/attachment.entity';
import { CutSession } from './modules/cutting/cut-session.entity';
import { CutTick } from './modules/cutting/cut-tick.entity';
import { Order } from './modules/orders/order.entity';
import { CustomProfile } from './modules/stock/custom-profile.entity';
import { StockOffcut } from './modules/stock/stock-offcut.entity';
import { Supplier } from './modules/suppliers/supplier.entity';
import { ProjectClient } from './modules/access/project-client.entity';
import { ShareLink } from './modules/sharing/share-link.entity';
import { Invitation } from './modules/invitations/invitation.entity';
import { PasswordReset } from './modules/auth/password-reset.entity';
import { Activity } from './modules/activity/activity.entity';
import { SignInThrottle } from './modules/auth/sign-in-throttle.entity';

/** Every entity the ORM knows, listed explicitly (no folder scanning). */
export const entities = [User, Workshop, Membership, Project, Frame, FrameRevision, Supplier, Order, CutSession, CutTick, StockOffcut, CustomProfile, Attachment, ProjectClient, ShareLink, Invitation, PasswordReset, Activity, SignInThrottle];
export { Frame, FrameRevision, Membership, Project, User, Workshop };
