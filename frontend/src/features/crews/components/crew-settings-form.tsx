import type { CrewView } from '@shoalbook/shared';
import { Button, Heading, Text, ToggleSwitch } from '@primer/react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { updateCrew } from '../api/crews-api';
import styles from './crew-settings.module.css';

/** The crew's name and who may see exact positions (owners only). */
export function CrewSettingsForm({ crew }: { crew: CrewView }) {
  const queryClient = useQueryClient();
  const [name, setName] = useState(crew.name);
  const rename = useMutation({
    mutationFn: (newName: string) => updateCrew(crew.id, { name: newName }),
    onSuccess: (updated) => refresh(updated),
  });
  const positions = useMutation({
    mutationFn: (value: boolean) => updateCrew(crew.id, { viewersSeePositions: value }),
    onSuccess: (updated) => refresh(updated),
  });

  function refresh(updated: CrewView) {
    queryClient.setQueryData(['crews', crew.id], updated);
    void queryClient.invalidateQueries({ queryKey: ['crews'], exact: true });
    void queryClient.invalidateQueries({ queryKey: ['me'] });
  }

  return (
    <div className={styles.settings}>
      <FormStack label="Crew name" onSubmit={() => rename.mutate(name.trim())}>
        <FormError error={rename.error} title="Could not rename the crew" />
        <TextField
          name="name"
          label="Crew name"
          required
          value={name}
          onChange={(e) => setName(e.target.value)}
          serverError={rename.error}
        />
        <FormActions>
          <Button type="submit" loading={rename.isPending} disabled={name.trim() === crew.name}>
            Save name
          </Button>
          {rename.isSuccess && name.trim() === crew.name ? <Text role="status">Saved.</Text> : null}
        </FormActions>
      </FormStack>

      <div className={styles.toggleRow}>
        <div>
          <Heading as="h3" id="viewers-positions-label" className={styles.toggleHeading}>
            Viewers see exact positions
          </Heading>
          <Text as="p" id="viewers-positions-caption" className={styles.caption}>
            When off, viewers (a coach or sponsor) see finds and catches without their coordinates. Turn it on only for
            people you would hand your waypoints to.
          </Text>
        </div>
        <ToggleSwitch
          aria-labelledby="viewers-positions-label"
          aria-describedby="viewers-positions-caption"
          checked={crew.viewersSeePositions}
          loading={positions.isPending}
          onChange={(value) => positions.mutate(value)}
        />
      </div>
      <FormError error={positions.error} title="Could not change who sees positions" />
    </div>
  );
}
