import { Tab, TabList } from '@fluentui/react-components';
import { useState } from 'react';
import { PageHeader } from '@/components/page-header';
import { Section } from '@/components/section';
import { InvitationsPanel } from '../components/invitations-panel';
import { ProjectsPanel } from '../components/projects-panel';
import { UsersPanel } from '../components/users-panel';

export function Component() {
  const [tab, setTab] = useState('users');
  return (
    <>
      <PageHeader
        eyebrow="Admin"
        title="People and projects"
        description="Invite people, set their roles, and put them on projects."
      />
      <TabList
        selectedValue={tab}
        onTabSelect={(_, d) => setTab(String(d.value))}
        aria-label="Admin sections"
      >
        <Tab value="users">Users</Tab>
        <Tab value="invitations">Invitations</Tab>
        <Tab value="projects">Projects and members</Tab>
      </TabList>
      <Section>
        {tab === 'users' && <UsersPanel />}
        {tab === 'invitations' && <InvitationsPanel />}
        {tab === 'projects' && <ProjectsPanel />}
      </Section>
    </>
  );
}
