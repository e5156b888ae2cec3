// Routes only; the guards live in ./guards.ts. Views are loaded on demand.
import { createRouter, createWebHistory, type RouteRecordRaw } from 'vue-router'
import { installGuards } from './guards'

const routes: RouteRecordRaw[] = [
  { path: '/', redirect: { name: 'projects' } },
  { path: '/sign-in', name: 'sign-in', component: () => import('@/views/auth/SignInView.vue'), meta: { public: true, guestOnly: true, layout: 'auth', title: 'Sign in' } },
  { path: '/sign-up', name: 'sign-up', component: () => import('@/views/auth/SignUpView.vue'), meta: { public: true, guestOnly: true, layout: 'auth', title: 'Create an organisation' } },
  { path: '/forgot-password', name: 'forgot-password', component: () => import('@/views/auth/ForgotPasswordView.vue'), meta: { public: true, layout: 'auth', title: 'Forgot password' } },
  { path: '/reset-password', name: 'reset-password', component: () => import('@/views/auth/ResetPasswordView.vue'), meta: { public: true, layout: 'auth', title: 'Choose a new password' } },
  { path: '/accept-invitation', name: 'accept-invitation', component: () => import('@/views/auth/AcceptInvitationView.vue'), meta: { public: true, layout: 'auth', title: 'Join an organisation' } },
  { path: '/projects', name: 'projects', component: () => import('@/views/projects/ProjectsView.vue'), meta: { action: 'project.read', title: 'Projects' } },
  { path: '/projects/:id', name: 'project', component: () => import('@/views/projects/ProjectView.vue'), meta: { action: 'project.read', title: 'Project' } },
  { path: '/projects/:id/design', name: 'design', component: () => import('@/views/editor/DesignEditorView.vue'), meta: { action: 'project.read', layout: 'bare', title: 'Design' } },
  { path: '/projects/:id/revisions/:revisionId', name: 'revision', component: () => import('@/views/revisions/RevisionView.vue'), meta: { action: 'project.read', layout: 'bare', title: 'Revision' } },
  { path: '/members', name: 'members', component: () => import('@/views/members/MembersView.vue'), meta: { action: 'member.read', title: 'Members' } },
  { path: '/devices', name: 'devices', component: () => import('@/views/devices/DeviceLibraryView.vue'), meta: { action: 'project.readAll', title: 'Device library' } },
  { path: '/outbox', name: 'outbox', component: () => import('@/views/outbox/OutboxView.vue'), meta: { action: 'outbox.read', title: 'Mail outbox' } },
  { path: '/s/:token', name: 'shared-design', component: () => import('@/views/share/SharedDesignView.vue'), meta: { public: true, layout: 'bare', title: 'Shared design' } },
  { path: '/:pathMatch(.*)*', name: 'not-found', component: () => import('@/views/NotFoundView.vue'), meta: { public: true, title: 'Not found' } },
]

export const router = createRouter({ history: createWebHistory(), routes })
installGuards(router)
